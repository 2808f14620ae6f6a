package com.crustplan.engine.assessment;

import java.util.List;
import java.util.Optional;

import com.crustplan.engine.cook.CookResult;
import com.crustplan.engine.cook.Sample;
import com.crustplan.engine.cook.Target;
import com.crustplan.engine.input.InvalidInputException;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.heat.HeatSetup;
import com.crustplan.engine.message.Message;

/**
 * Acrylamide for one planned cook: crust and portion levels (µg/kg as eaten), the
 * product's benchmark, the zone, the warnings and the cautions. Levels are at the target
 * colour when it is reached, otherwise at the end of the run ({@code atTarget} false).
 */
public record AcrylamideEstimate(double crustUgPerKg, double portionUgPerKg, boolean atTarget, Product product,
		BenchmarkLevel benchmarkOrNull, AcrylamideZone zone, List<AcrylamideWarning> warnings, Message basis,
		List<Message> cautions) {

	/**
	 * What the figures are: fresh weight as eaten, crust the outer 1 mm, portion the
	 * whole piece.
	 */
	public static final Message BASIS = Message.of("acrylamide.basis");

	public AcrylamideEstimate {
		warnings = List.copyOf(warnings);
		cautions = List.copyOf(cautions);
	}

	public Optional<BenchmarkLevel> benchmark() {
		return Optional.ofNullable(benchmarkOrNull);
	}

	/** The benchmark in µg/kg, or null where the regulation sets none. */
	public Double benchmarkUgPerKgOrNull() {
		return benchmarkOrNull == null ? null : benchmarkOrNull.microgramsPerKg();
	}

	/** The estimate for a finished run of the engine. */
	public static AcrylamideEstimate of(Surface surface, Product product, HeatSetup setup, Target target,
			CookResult result) {
		if (product.category() != surface.category()) {
			throw new InvalidInputException("product",
					"'" + product.key() + "' is not a product of " + surface.category().label());
		}
		double crust = result.crustAcrylamideAtTargetUgPerKg();
		double portion = result.portionAcrylamideAtTargetUgPerKg();
		boolean atTarget = result.reached();
		if (!atTarget && !result.series().isEmpty()) {
			Sample last = result.series().get(result.series().size() - 1);
			crust = last.crustAcrylamideUgPerKg();
			portion = last.portionAcrylamideUgPerKg();
		}
		BenchmarkLevel b = product.benchmark().orElse(null);
		AcrylamideZone zone = b == null ? AcrylamideZone.NO_BENCHMARK : b.zoneOf(portion);
		return new AcrylamideEstimate(crust, portion, atTarget, product, b, zone,
				AcrylamideWarnings.check(surface, product, setup, target, portion), BASIS, AcrylamideCautions.ALL);
	}

}
