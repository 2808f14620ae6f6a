package com.crustplan.model;

import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.web.bind.annotation.GetMapping;

import com.crustplan.engine.catalogue.ModelCatalogue;

/**
 * The model and its sources, generated from the engine's own catalogue of equations and
 * constants.
 */
@Controller
class ModelController {

	@GetMapping("/model")
	String model(Model model) {
		model.addAttribute("sections", ModelCatalogue.sections());
		return "model/model";
	}

}
