package com.crustplan.engine.heat;

import com.crustplan.engine.message.Message;

/**
 * A face pressed on a hot pan through a thin fat film: q = h_c(T_pan − Ts). Vapour cannot
 * leave into gas here; water at the face boils off at the local boiling point instead
 * (handled by the stepper).
 */
final class ContactExchange implements FaceExchange {

	private final double panK;

	private final double contact;

	private final Message description;

	/**
	 * The pan as a body whose temperature moves with the load; null for a pan held at
	 * panK.
	 */
	private final HeatedBody body;

	ContactExchange(double panK, double contactWPerM2K, Message description) {
		this(panK, contactWPerM2K, description, null);
	}

	ContactExchange(double panK, double contactWPerM2K, Message description, HeatedBody body) {
		this.body = body;
		this.panK = panK;
		this.contact = contactWPerM2K;
		this.description = description;
	}

	@Override
	public void evaluate(double surfaceK, double waterActivity, double boilingFlux, FaceFlux out) {
		out.clear();
		double pan = body == null ? panK : body.temperatureK();
		out.heatFlux = contact * (pan - surfaceK);
		out.heatFluxSlope = -contact;
	}

	@Override
	public Message describe() {
		return description;
	}

	@Override
	public HeatedBody body() {
		return body;
	}

}
