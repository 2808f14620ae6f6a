package com.crustplan.plan;

import java.util.List;

import com.crustplan.engine.assessment.AcrylamideEstimate;
import com.crustplan.engine.assessment.AcrylamideZone;
import com.crustplan.engine.assessment.Mitigation;
import com.crustplan.engine.message.Message;

/**
 * The acrylamide estimate as the plan shows it. Levels are null where the engine gives no
 * estimate; {@code benchmarkUgPerKg} is null where no EU benchmark level applies,
 * {@code zone} (low, elevated, high) null where none can be given.
 */
public record AcrylamideView(Double crustUgPerKg, Double portionUgPerKg, Double benchmarkUgPerKg, String zone,
		String zoneLabel, String zoneMeaning, String product, String noBenchmarkReason, Message basis,
		List<Message> cautions, List<Mitigation> mitigations) {

	public AcrylamideView {
		cautions = List.copyOf(cautions);
		mitigations = List.copyOf(mitigations);
	}

	public static AcrylamideView of(AcrylamideEstimate e, List<Mitigation> mitigations) {
		AcrylamideZone z = e.zone();
		String key = switch (z) {
			case LOW -> "low";
			case ELEVATED -> "elevated";
			case HIGH -> "high";
			default -> null;
		};
		return new AcrylamideView(PlanReport.finite(e.crustUgPerKg()), PlanReport.finite(e.portionUgPerKg()),
				e.benchmarkUgPerKgOrNull(), key, z.label(), z.meaning(), e.product().label(),
				e.product().noBenchmarkReason().orElse(null), e.basis(), e.cautions(), mitigations);
	}

	public boolean available() {
		return crustUgPerKg != null || portionUgPerKg != null;
	}

}
