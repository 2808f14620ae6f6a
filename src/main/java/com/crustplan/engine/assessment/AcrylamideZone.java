package com.crustplan.engine.assessment;

/** Where an estimate lies against the product's benchmark level. */
public enum AcrylamideZone {

	LOW("Well below", "below half the benchmark level"),
	ELEVATED("Approaching", "between half the benchmark level and the benchmark level"),
	HIGH("Over", "above the benchmark level"),
	NO_BENCHMARK("No benchmark", "the regulation sets no benchmark level for this food"),
	NOT_ESTIMATED("Not estimated", "no estimate: the run gave no value");

	private final String label;

	private final String meaning;

	AcrylamideZone(String label, String meaning) {
		this.label = label;
		this.meaning = meaning;
	}

	public String label() {
		return label;
	}

	public String meaning() {
		return meaning;
	}

	/**
	 * Low below half the benchmark, elevated from half up to the benchmark, high above
	 * it.
	 */
	public static AcrylamideZone of(double ugPerKg, double benchmarkUgPerKg) {
		if (!Double.isFinite(ugPerKg)) {
			return NOT_ESTIMATED;
		}
		if (ugPerKg > benchmarkUgPerKg) {
			return HIGH;
		}
		return ugPerKg < 0.5 * benchmarkUgPerKg ? LOW : ELEVATED;
	}

}
