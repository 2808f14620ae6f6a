package com.crustplan.engine.cook;

/**
 * What happens when a target is reached: the time, core temperature, surface browning and
 * reaction levels at that instant are kept; a one-step cook then runs on by a share of
 * the time (charts show what overcooking does), a cook in steps goes on with its steps.
 */
final class TargetRecord implements EventHandler {

	private final CookSettings settings;

	private double reachedAtS = Double.NaN;

	private double coreK = Double.NaN;

	private double crustLevel = Double.NaN;

	private double portionLevel = Double.NaN;

	private double surfaceExtent = Double.NaN;

	private double waterPct = Double.NaN;

	private double oilPct = Double.NaN;

	/**
	 * @param settings the run-past share and horizon, or null to go on as before
	 */
	TargetRecord(CookSettings settings) {
		this.settings = settings;
	}

	@Override
	public double eventOccurred(StepInterpolator step, double f) {
		Moment before = step.previous();
		Moment after = step.current();
		reachedAtS = step.timeAt(f);
		coreK = StepInterpolator.between(before.coreK(), after.coreK(), f);
		crustLevel = StepInterpolator.between(before.crustLevel(), after.crustLevel(), f);
		portionLevel = StepInterpolator.between(before.portionLevel(), after.portionLevel(), f);
		surfaceExtent = StepInterpolator.between(before.surfaceExtent(), after.surfaceExtent(), f);
		waterPct = StepInterpolator.between(before.waterPct(), after.waterPct(), f);
		oilPct = StepInterpolator.between(before.oilPct(), after.oilPct(), f);
		if (settings == null) {
			return Double.POSITIVE_INFINITY;
		}
		return Math.min(settings.horizonS(),
				Math.max(reachedAtS * (1 + settings.runPastTargetFraction()), reachedAtS + settings.timeStepS()));
	}

	boolean reached() {
		return !Double.isNaN(reachedAtS);
	}

	double reachedAtS() {
		return reachedAtS;
	}

	double coreK() {
		return coreK;
	}

	double crustLevel() {
		return crustLevel;
	}

	double portionLevel() {
		return portionLevel;
	}

	double surfaceExtent() {
		return surfaceExtent;
	}

	double waterPct() {
		return waterPct;
	}

	double oilPct() {
		return oilPct;
	}

}
