package com.crustplan.engine.doneness;

import java.util.List;

import com.crustplan.engine.model.Equation;
import com.crustplan.engine.model.ModelSection;

/** The doneness judge on the model page: what it compares and the limits it uses. */
public final class DonenessChapter {

	private DonenessChapter() {
	}

	public static ModelSection section() {
		return new ModelSection("Doneness", List.of(new Equation("Short of done", "T_core(pull) < T_done",
				"The centre when the food comes off (at the target colour, or at the end of the last step) against the FDA Food Code 2022, 3-401.11"
						+ " (whole cuts 63 °C, minced 68 °C, poultry 74 °C), a baked crumb, or a potato centre at boiling.",
				List.of(DonenessLimits.BREAD_BAKED_C, DonenessLimits.SWEET_DOUGH_BAKED_C, DonenessLimits.FRY_CENTRE_C)),
				new Equation("Past juiciness", "max T_core(t ≤ pull) > T_dry",
						"The hottest the centre got before the food comes off, against the temperature past which the protein dries.",
						List.of(DonenessLimits.MEAT_DRY_C, DonenessLimits.POULTRY_DRY_C, DonenessLimits.FISH_DRY_C)),
				new Equation("Colour long after the core", "t_colour − t_done ≥ Δt_late and t_done ≤ t_colour/2",
						"The centre is done long before the surface colours: it overcooks while the crust catches up.",
						List.of(DonenessLimits.LONG_BEFORE_S)),
				new Equation("Suggestions",
						"cooler by ΔT, finish in an oven at T_finish, cut to f_thin of the thickness, or brown first",
						"Each is checked by a forward run of the engine in the tests.",
						List.of(DonenessLimits.LOWER_PAN_K, DonenessLimits.LOWER_OVEN_K,
								DonenessLimits.LOWER_BREAD_OVEN_K, DonenessLimits.FRY_AT_C,
								DonenessLimits.LOWER_FRYER_K, DonenessLimits.FINISH_OVEN_C,
								DonenessLimits.THINNER_SHARE))),
				List.of("The centre is the middle of the slab; a thicker part or a bone is not modelled: probe the thickest part.",
						"The food code's holding times (15 s, 17 s) are not checked, only the temperature.",
						"Carry-over after a one-step cook is not counted; a rest step counts it."));
	}

}
