package com.crustplan.system;

import org.springframework.beans.factory.annotation.Value;
import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.web.bind.annotation.GetMapping;

@Controller
class SignInController {

	private final boolean demo;

	SignInController(@Value("${crustplan.demo.enabled:false}") boolean demo) {
		this.demo = demo;
	}

	@GetMapping("/signin")
	String signIn(Model model) {
		model.addAttribute("demo", demo);
		model.addAttribute("demoAccounts", demo ? DemoKitchenLoader.DEMO_ACCOUNTS : java.util.List.of());
		return "system/signin";
	}

	/** The page shown when a signed-in user's role does not allow a page. */
	@org.springframework.web.bind.annotation.RequestMapping("/error/403")
	String forbidden(jakarta.servlet.http.HttpServletRequest request, jakarta.servlet.http.HttpServletResponse response,
			Model model) {
		response.setStatus(403);
		// a form sent with a stale token is not a question of role: say what to do instead
		Object denied = request.getAttribute(org.springframework.security.web.WebAttributes.ACCESS_DENIED_403);
		model.addAttribute("staleForm", denied instanceof org.springframework.security.web.csrf.CsrfException);
		return "error/403";
	}

}
