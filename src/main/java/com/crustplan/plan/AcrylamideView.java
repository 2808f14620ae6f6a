package com.crustplan.plan;

/**
 * The acrylamide estimate as the plan shows it. Values are null where the engine gives no estimate;
 * {@code benchmarkUgPerKg} is null where no EU benchmark level applies and {@code zone} is null where
 * none was assessed.
 */
public record AcrylamideView(Double crustUgPerKg, Double portionUgPerKg, Double benchmarkUgPerKg, String zone) {

	public static final AcrylamideView NOT_AVAILABLE = new AcrylamideView(null, null, null, null);

	public boolean available() {
		return crustUgPerKg != null || portionUgPerKg != null;
	}

	public String zoneLabel() {
		if (zone == null) {
			return null;
		}
		return switch (zone) {
			case "low" -> "Low: well under the benchmark";
			case "elevated" -> "Elevated: approaching the benchmark";
			case "high" -> "High: at or over the benchmark";
			default -> zone;
		};
	}

}
