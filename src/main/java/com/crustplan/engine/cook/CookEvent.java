package com.crustplan.engine.cook;

/**
 * A discrete event of a cook: a value of the moment crossing a threshold, upwards
 * (browning reaching a target, the core reaching a temperature) or downwards (a face
 * drying). What happens when it fires is an {@link EventHandler}'s business, not the
 * event's.
 */
public interface CookEvent {

	double value(Moment moment);

	double threshold();

	/**
	 * True when the event fires as the value rises to the threshold, false as it falls to
	 * it.
	 */
	default boolean rising() {
		return true;
	}

	/** Whether the event has happened by the moment. */
	default boolean happened(Moment moment) {
		return rising() ? value(moment) >= threshold() : value(moment) <= threshold();
	}

	/**
	 * Where in the step the value crossed the threshold, 0 (its start) to 1 (its end),
	 * linearly.
	 */
	default double crossing(StepInterpolator step) {
		double before = value(step.previous());
		double after = value(step.current());
		return after == before ? 1 : (threshold() - before) / (after - before);
	}

	/** The target colour: face 0's browning extent reaches the target's. */
	static CookEvent targetColourReached(double targetExtent) {
		return new Crossing(Quantity.SURFACE_EXTENT, targetExtent, true);
	}

	/** The centre reaches a temperature, K. */
	static CookEvent coreTemperatureReached(double coreK) {
		return new Crossing(Quantity.CORE_K, coreK, true);
	}

	/** Face 0 reaches a temperature, K. */
	static CookEvent surfaceTemperatureReached(double surfaceK) {
		return new Crossing(Quantity.SURFACE_K, surfaceK, true);
	}

	/**
	 * Face 0 has dried: its water activity falls to the threshold (standing water gone,
	 * layer drying).
	 */
	static CookEvent faceDried(double waterActivity) {
		return new Crossing(Quantity.SURFACE_WATER_ACTIVITY, waterActivity, false);
	}

	/** What an event can watch. */
	enum Quantity {

		SURFACE_EXTENT, CORE_K, SURFACE_WATER_ACTIVITY, SURFACE_K;

		double of(Moment m) {
			return switch (this) {
				case SURFACE_EXTENT -> m.surfaceExtent();
				case CORE_K -> m.coreK();
				case SURFACE_WATER_ACTIVITY -> m.surfaceWaterActivity();
				case SURFACE_K -> m.surfaceK();
			};
		}

	}

	/** A quantity crossing a threshold. */
	record Crossing(Quantity quantity, double threshold, boolean rising) implements CookEvent {

		@Override
		public double value(Moment moment) {
			return quantity.of(moment);
		}

	}

}
