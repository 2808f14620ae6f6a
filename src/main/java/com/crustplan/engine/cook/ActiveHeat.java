package com.crustplan.engine.cook;

import com.crustplan.engine.heat.FaceExchange;
import com.crustplan.engine.heat.FaceSchedule;
import com.crustplan.engine.heat.HeatedBody;

/**
 * The heat the food is in now: the current step's face schedule, on a clock that starts
 * with the step (a flip every 60 s counts from when the food went into that pan).
 */
final class ActiveHeat {

	private FaceSchedule schedule;

	private double startS;

	ActiveHeat(FaceSchedule schedule) {
		this.schedule = schedule;
	}

	/** Moves the food into another heat at time startS. */
	void use(FaceSchedule next, double start) {
		this.schedule = next;
		this.startS = start;
	}

	FaceExchange at(int face, double timeS) {
		return schedule.at(face, timeS - startS);
	}

	/**
	 * The next time after timeS (on the cook's clock) at which the faces' conditions
	 * change.
	 */
	double nextChangeAfter(double timeS) {
		return startS + schedule.nextChangeAfter(timeS - startS);
	}

	/**
	 * The pan or oil of the current heat, where it is a body whose temperature moves;
	 * null otherwise.
	 */
	HeatedBody body() {
		return schedule.body();
	}

}
