package com.crustplan.engine.cook;

import com.crustplan.engine.food.Shape;
import com.crustplan.engine.heat.FaceExchange;
import com.crustplan.engine.heat.FaceFlux;
import com.crustplan.engine.heat.FaceSchedule;
import com.crustplan.engine.heat.HeatedBody;
import com.crustplan.engine.message.Message;

/**
 * The heat the food is in now: the current step's face schedule, on a clock that starts
 * with the step (a flip every 60 s counts from when the food went into that pan).
 * <p>
 * A slab's two faces see the schedule's two faces. A strip, cube or ball has one outer
 * face (face 0) and a centre (face 1's node) that is a symmetry point: the centre
 * exchanges nothing. Where the two faces' heats differ (a pan, a grill) the piece is
 * taken as turned side by side, each side down for as long as the schedule keeps a face
 * down: every part of its surface then faces the heat for the shape's share s of the
 * time, so the outer face sees the heated exchange for one turn and the open one for the
 * next 1/s − 1 turns (a strip: one down, three up). A piece that is never turned sees
 * both at once, weighted by the share ({@link TurnedSurface}).
 */
final class ActiveHeat {

	/** The centre of a cylinder or sphere: no flux crosses it (symmetry). */
	static final FaceExchange CENTRE = new FaceExchange() {
		@Override
		public void evaluate(double surfaceK, double waterActivity, double boilingFlux, FaceFlux out) {
			out.heatFlux = 0;
			out.heatFluxSlope = 0;
			out.evaporation = 0;
			out.evaporationSlopeT = 0;
			out.evaporationSlopeAw = 0;
		}

		@Override
		public Message describe() {
			// the no-flux centre of a strip, cube or ball is never described as a heat:
			// no caller reaches it
			throw new IllegalStateException("the centre of a piece is not a face");
		}
	};

	private FaceSchedule schedule;

	private double startS;

	private final boolean radial;

	private final double heatedShare;

	/**
	 * The outer face's last blend, kept while the schedule's pair of exchanges is the
	 * same.
	 */
	private TurnedSurface turned;

	private double turnedShare;

	ActiveHeat(FaceSchedule schedule, Shape shape) {
		this.schedule = schedule;
		this.radial = shape.factor() > 0;
		this.heatedShare = TurnedSurface.shareOf(shape);
		this.turnS = schedule.nextChangeAfter(0);
	}

	/**
	 * How long a side stays down, s (the schedule's first change); +∞ if never turned.
	 */
	private double turnS;

	/** Moves the food into another heat at time startS. */
	void use(FaceSchedule next, double start) {
		this.schedule = next;
		this.startS = start;
		this.turnS = next.nextChangeAfter(0);
	}

	/** Whether a strip, cube or ball is turned side by side in this heat. */
	private boolean timeShared() {
		return radial && !schedule.symmetric() && Double.isFinite(turnS) && turnS > 0;
	}

	FaceExchange at(int face, double timeS) {
		double t = timeS - startS;
		if (!radial) {
			return schedule.at(face, t);
		}
		if (face == 1) {
			return CENTRE;
		}
		FaceExchange a = schedule.at(0, t);
		FaceExchange b = schedule.at(1, t);
		if (a == b) {
			return a;
		}
		boolean aHeated = schedule.heated(0, t);
		boolean oneHeated = aHeated != schedule.heated(1, t);
		FaceExchange heated = aHeated ? a : b;
		FaceExchange open = aHeated ? b : a;
		if (oneHeated && timeShared()) {
			turnedShare = Math.max(turnedShare, heatedShare);
			// a step starting on a turn (to rounding) belongs to the turn it starts
			double u = t + 1e-9;
			return u - Math.floor(u / cycleS()) * cycleS() < turnS ? heated : open;
		}
		if (turned == null || turned.heated() != heated || turned.open() != open) {
			turned = new TurnedSurface(heated, open, oneHeated ? heatedShare : 0.5);
			turnedShare = Math.max(turnedShare, oneHeated ? heatedShare : 0.5);
		}
		return turned;
	}

	/**
	 * The next time after timeS (on the cook's clock) at which the faces' conditions
	 * change.
	 */
	double nextChangeAfter(double timeS) {
		double t = timeS - startS;
		if (timeShared()) {
			double cycle = cycleS();
			double u = t + 1e-9;
			double start = Math.floor(u / cycle) * cycle;
			return startS + (u < start + turnS ? start + turnS : start + cycle);
		}
		return startS + schedule.nextChangeAfter(t);
	}

	/** One round of a turned piece: each side down once, s. */
	private double cycleS() {
		return turnS / heatedShare;
	}

	/**
	 * The share of the time the outer face the model follows touches the heat: 1 for a
	 * slab and for an unturned or evenly heated piece, s for a turned strip, cube or
	 * ball.
	 */
	double touchingShare() {
		return timeShared() ? heatedShare : 1;
	}

	/**
	 * The share of the outer surface that faced the heat where a strip, cube or ball met
	 * a heat that differs from side to side; 0 if it never did.
	 */
	double turnedShare() {
		return turnedShare;
	}

	/**
	 * The pan or oil of the current heat, where it is a body whose temperature moves;
	 * null otherwise.
	 */
	HeatedBody body() {
		return schedule.body();
	}

}
