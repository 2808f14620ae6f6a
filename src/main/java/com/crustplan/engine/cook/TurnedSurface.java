package com.crustplan.engine.cook;

import java.util.List;

import com.crustplan.engine.food.Shape;
import com.crustplan.engine.heat.FaceExchange;
import com.crustplan.engine.heat.FaceFlux;
import com.crustplan.engine.heat.HeatedBody;
import com.crustplan.engine.message.Message;
import com.crustplan.engine.model.Parameter;

/**
 * The share s of a strip's, cube's or ball's surface that faces the heat of a pan or
 * grill at a time, and the one outer face of such a piece that is never turned: it sees
 * the heated exchange over the share s of its surface and the open one over the rest, q =
 * s·q_heated + (1 − s)·q_open (and likewise for evaporation). A piece that is turned
 * instead sees each in turn ({@link ActiveHeat}); a slab keeps its two faces and its
 * flips and never comes here.
 * <p>
 * The share is the part of the surface that faces the heat at a time: one side of a
 * square strip's four, one face of a cube's six, and for a ball its projected area over
 * its surface, πr²/4πr² (the share of the irradiance from a plane source; in a pan, the
 * ring of fat a rolled ball sits in, taken the same). All assumptions, not measurements.
 * One instance per run: it holds the scratch of its last evaluation.
 */
public final class TurnedSurface implements FaceExchange {

	/** One side of four faces the heat (assumption: a square strip lying on a side). */
	public static final Parameter STRIP_SHARE = Parameter.assumption("s_strip",
			"share of a turned strip's surface facing the pan or grill", 0.25, "",
			"assumption: one side of a square strip's four faces the heat at a time");

	/** One face of six faces the heat (assumption). */
	public static final Parameter CUBE_SHARE = Parameter.assumption("s_cube",
			"share of a turned cube's surface facing the pan or grill", 1.0 / 6, "",
			"assumption: one face of a cube's six faces the heat at a time");

	/**
	 * Projected area over surface, πr²/4πr² (geometry; its use for a pan an assumption).
	 */
	public static final Parameter BALL_SHARE = Parameter.assumption("s_ball",
			"share of a rolled ball's surface facing the pan or grill", 0.25, "",
			"assumption: a ball's projected area over its surface (πr²/4πr²), taken for a pan's fat ring too");

	private final FaceExchange heated;

	private final FaceExchange open;

	private final double share;

	private final FaceFlux part = new FaceFlux();

	/**
	 * Heat into the part of the surface touching the body, per m² of that part, and its
	 * slope, as of the last evaluation (NaN where no part touches it).
	 */
	double bodyHeatFlux;

	double bodyHeatFluxSlope;

	TurnedSurface(FaceExchange heated, FaceExchange open, double share) {
		this.heated = heated;
		this.open = open;
		this.share = share;
	}

	public static List<Parameter> parameters() {
		return List.of(STRIP_SHARE, CUBE_SHARE, BALL_SHARE);
	}

	/** The share of a shape's surface that faces the heated side at a time. */
	static double shareOf(Shape shape) {
		return switch (shape) {
			case SLAB -> 0.5;
			case STRIP -> STRIP_SHARE.value();
			case CUBE -> CUBE_SHARE.value();
			case BALL -> BALL_SHARE.value();
		};
	}

	FaceExchange heated() {
		return heated;
	}

	FaceExchange open() {
		return open;
	}

	@Override
	public void evaluate(double surfaceK, double waterActivity, double boilingFlux, FaceFlux out) {
		HeatedBody body = body();
		double bodyWeight = 0;
		bodyHeatFlux = 0;
		bodyHeatFluxSlope = 0;
		heated.evaluate(surfaceK, waterActivity, boilingFlux, part);
		out.heatFlux = share * part.heatFlux;
		out.heatFluxSlope = share * part.heatFluxSlope;
		out.evaporation = share * part.evaporation;
		out.evaporationSlopeT = share * part.evaporationSlopeT;
		out.evaporationSlopeAw = share * part.evaporationSlopeAw;
		if (body != null && heated.body() == body) {
			bodyWeight += share;
			bodyHeatFlux += share * part.heatFlux;
			bodyHeatFluxSlope += share * part.heatFluxSlope;
		}
		double rest = 1 - share;
		open.evaluate(surfaceK, waterActivity, boilingFlux, part);
		out.heatFlux += rest * part.heatFlux;
		out.heatFluxSlope += rest * part.heatFluxSlope;
		out.evaporation += rest * part.evaporation;
		out.evaporationSlopeT += rest * part.evaporationSlopeT;
		out.evaporationSlopeAw += rest * part.evaporationSlopeAw;
		if (body != null && open.body() == body) {
			bodyWeight += rest;
			bodyHeatFlux += rest * part.heatFlux;
			bodyHeatFluxSlope += rest * part.heatFluxSlope;
		}
		if (bodyWeight > 0) {
			bodyHeatFlux /= bodyWeight;
			bodyHeatFluxSlope /= bodyWeight;
		}
	}

	@Override
	public Message describe() {
		return heated.describe();
	}

	@Override
	public HeatedBody body() {
		return heated.body() != null ? heated.body() : open.body();
	}

}
