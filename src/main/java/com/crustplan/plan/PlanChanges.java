package com.crustplan.plan;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Set;

import com.crustplan.engine.assessment.Mitigations;
import com.crustplan.engine.food.BrowningStage;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.input.InvalidInputException;
import com.crustplan.engine.message.Message;
import com.crustplan.setup.SetupForm;
import com.crustplan.surface.SurfaceForm;

/**
 * Acrylamide-lowering changes applied to a plan's inputs, as the table of changes worked
 * them out, so "plan with this change" plans with the very food, setting and target the
 * row was computed with.
 */
final class PlanChanges {

	/** Changes of the raw food: once made, the table no longer offers them. */
	static final Set<String> OF_THE_FOOD = Set.of("SOAK", "BLANCH", "ASPARAGINASE", "ACID_DIP");

	private PlanChanges() {
	}

	/**
	 * The inputs with each change applied in order; a plan in steps takes only changes of
	 * the food (its setups are the steps').
	 * @throws InvalidInputException naming field {@code changes} for an unknown code or
	 * one that does not fit the plan
	 */
	static PlanInputs apply(PlanInputs in, List<String> codes) {
		if (codes.isEmpty()) {
			return in;
		}
		SurfaceForm surface = in.surface();
		SetupForm setup = in.setup();
		String stage = in.targetStage();
		Double lightness = in.targetLightness();
		List<String> applied = new ArrayList<>(in.appliedChanges());
		for (String raw : codes) {
			String code = raw.toUpperCase(Locale.ROOT);
			if (!Mitigations.PLANNABLE.contains(code)) {
				throw new InvalidInputException("changes", "'" + raw + "' is not a change Crustplan can plan with");
			}
			if (OF_THE_FOOD.contains(code)) {
				Surface changed = Mitigations.apply(code, surface.toSurface());
				surface = SurfaceForm.of(changed, surface.name(), surface.product(), surface.notes(),
						surface.pretreatment());
			}
			else if (in.stepped()) {
				throw new InvalidInputException("changes",
						"a plan in steps changes its setting or colour in the steps themselves");
			}
			else if (code.equals("LOWER_TEMPERATURE")) {
				setup = setup.withTemperatureC(Mitigations.lowerTemperatureC(setup.toHeatSetup()));
			}
			else {
				Surface s = surface.toSurface();
				BrowningStage lighter = Mitigations.lighterStage(s.category(), PlanInputs.target(stage, lightness))
					.orElseThrow(
							() -> new InvalidInputException("changes", "the target is already the lightest stage"));
				stage = lighter.key();
				lightness = null;
			}
			applied.add(code);
		}
		return new PlanInputs(surface, setup, stage, lightness, in.horizonMinutes(), in.steps(), in.coreTargetC(),
				List.copyOf(applied));
	}

	/**
	 * The changes of the food already made, before cooking or in this plan: the table
	 * leaves them out.
	 */
	static Set<String> done(PlanInputs in) {
		Set<String> done = new java.util.TreeSet<>(in.surface().toPretreatment().done());
		in.appliedChanges().stream().filter(OF_THE_FOOD::contains).forEach(done::add);
		return Set.copyOf(done);
	}

	/** The change's title as the table words it. */
	static Message title(String code) {
		return switch (code) {
			case "LOWER_TEMPERATURE" -> Message.of("plan.change.lower-temperature");
			case "LIGHTER_TARGET" -> Message.of("plan.change.lighter-target");
			case "SOAK" -> Message.of("plan.change.soak");
			case "BLANCH" -> Message.of("plan.change.blanch");
			case "ASPARAGINASE" -> Message.of("plan.change.asparaginase");
			default -> Message.of("plan.change.acid-dip");
		};
	}

}
