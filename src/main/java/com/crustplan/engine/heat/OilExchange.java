package com.crustplan.engine.heat;

import com.crustplan.engine.message.Message;
import com.crustplan.engine.message.PlainNumber;
import com.crustplan.engine.message.Quantity;
import com.crustplan.engine.message.Temperature;
import com.crustplan.engine.water.WaterVapour;

/**
 * A face in frying oil: q = h(T_oil − Ts), with h rising from its value without boiling
 * towards its bubbling value in proportion to the vapour leaving the face, so h falls
 * back as the crust dries (the trend measured by Hubbard &amp; Farkas 1999 and Mir-Bel,
 * Oria &amp; Salvador 2012).
 */
final class OilExchange implements FaceExchange {

	private final double oilK;

	private final double quiet;

	private final double bubbling;

	/**
	 * Vapour flux at which bubbling is fully developed: all of h_bubbling·(T_oil − 100
	 * °C) boiling water.
	 */
	private final double fullBoilingFlux;

	/**
	 * The oil as a body whose temperature moves with the load; null for oil held at oilK.
	 */
	private final HeatedBody body;

	OilExchange(double oilK, double quietWPerM2K, double bubblingWPerM2K) {
		this(oilK, quietWPerM2K, bubblingWPerM2K, null);
	}

	OilExchange(double oilK, double quietWPerM2K, double bubblingWPerM2K, HeatedBody body) {
		this.body = body;
		this.oilK = oilK;
		this.quiet = quietWPerM2K;
		this.bubbling = bubblingWPerM2K;
		this.fullBoilingFlux = bubblingWPerM2K * Math.max(1, oilK - 373.15) / WaterVapour.latentHeat(373.15);
	}

	double coefficient(double boilingFlux) {
		double share = Math.min(1, Math.max(0, boilingFlux) / fullBoilingFlux);
		return quiet + (bubbling - quiet) * share;
	}

	@Override
	public void evaluate(double surfaceK, double waterActivity, double boilingFlux, FaceFlux out) {
		out.clear();
		double h = coefficient(boilingFlux);
		double oil = body == null ? oilK : body.temperatureK();
		out.heatFlux = h * (oil - surfaceK);
		out.heatFluxSlope = -h;
	}

	@Override
	public Message describe() {
		return Message.of("exchange.fryer", Temperature.kelvin(oilK), PlainNumber.of(quiet, 0),
				Quantity.of(bubbling, "W/m²K"));
	}

	@Override
	public HeatedBody body() {
		return body;
	}

	@Override
	public boolean inOil() {
		return true;
	}

}
