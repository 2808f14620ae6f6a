package com.crustplan.card;

import java.util.Locale;

import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.servlet.support.ServletUriComponentsBuilder;

import com.crustplan.engine.input.InvalidInputException;
import com.crustplan.plan.PlanInputs;
import com.crustplan.plan.PlanService;
import com.crustplan.plan.SavedPlan;
import com.crustplan.plan.SavedPlanService;

import tools.jackson.core.JacksonException;

/**
 * A saved plan's station card: one page for the line, A5 by default or A6
 * ({@code ?size=a6}). Who may open the plan may open its card (the same GET rule).
 */
@Controller
class StationCardController {

	private final SavedPlanService saved;

	private final PlanService planner;

	StationCardController(SavedPlanService saved, PlanService planner) {
		this.saved = saved;
		this.planner = planner;
	}

	@GetMapping("/plans/{id}/card")
	String card(@PathVariable long id, @RequestParam(name = "size", required = false) String size, Model model) {
		SavedPlan plan = saved.get(id);
		String paper = size == null || size.isBlank() ? "a5" : size.trim().toLowerCase(Locale.ROOT);
		if (!paper.equals("a5") && !paper.equals("a6")) {
			model.addAttribute("sizeProblem", "size: a card is printed at a5 or a6; shown at A5.");
			paper = "a5";
		}
		model.addAttribute("size", paper);
		model.addAttribute("saved", plan);
		String planUrl = ServletUriComponentsBuilder.fromCurrentContextPath()
			.path("/plans/{id}")
			.buildAndExpand(id)
			.toUriString();
		model.addAttribute("planUrl", planUrl);
		model.addAttribute("qr", PlanLinkCode.of(planUrl));
		try {
			PlanInputs inputs = saved.inputs(plan);
			model.addAttribute("card", StationCard.of(plan, inputs, planner.plan(inputs)));
		}
		catch (InvalidInputException e) {
			// the saved plan is kept as it is; the card says which value the model
			// refuses
			model.addAttribute("problem", "The model no longer accepts this plan's " + e.field() + ": " + e.reason()
					+ ". Open the plan to see its saved values; no card can be printed for it.");
		}
		catch (JacksonException | NullPointerException e) {
			model.addAttribute("problem", "The saved inputs of this plan cannot be read, so no card can be printed. "
					+ "The plan is kept unchanged.");
		}
		return "card/card";
	}

}
