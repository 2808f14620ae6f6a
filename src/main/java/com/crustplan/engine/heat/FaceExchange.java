package com.crustplan.engine.heat;

import com.crustplan.engine.message.Message;

/** The boundary condition of one face of the food at one moment. */
public interface FaceExchange {

	/**
	 * @param surfaceK face temperature
	 * @param waterActivity of the face (1 while standing water covers it)
	 * @param boilingFlux water boiling off behind this face in the last step, kg/(m²·s),
	 * which stirs a fryer's oil
	 */
	void evaluate(double surfaceK, double waterActivity, double boilingFlux, FaceFlux out);

	/** A short description for the result's assumptions. */
	Message describe();

	/**
	 * The pan or oil this face touches, where it is a body whose temperature moves; null
	 * otherwise.
	 */
	default HeatedBody body() {
		return null;
	}

	/** True where the face is under frying oil, which can enter the pores it opens. */
	default boolean inOil() {
		return false;
	}

}
