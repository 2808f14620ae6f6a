package com.crustplan.model;

import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.web.bind.annotation.GetMapping;

/** The model and its sources, generated from the constants the engine runs on. */
@Controller
class ModelController {

	@GetMapping("/model")
	String model(Model model) {
		model.addAttribute("sections", ModelSections.sections());
		return "model/model";
	}

}
