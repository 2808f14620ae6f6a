package com.crustplan.system;

import org.springframework.stereotype.Controller;
import org.springframework.web.bind.annotation.GetMapping;

@Controller
class WelcomeController {

	@GetMapping("/")
	String welcome() {
		return "system/welcome";
	}

}
