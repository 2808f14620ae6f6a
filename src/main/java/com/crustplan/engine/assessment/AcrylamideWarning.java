package com.crustplan.engine.assessment;

import com.crustplan.engine.message.Message;

/**
 * A setup that breaks one of the acrylamide measures of Regulation (EU) 2017/2158 Annex
 * II (retail and catering), or an estimate over its benchmark: a stable code for the
 * page, a message a cook acts on and the citation it rests on.
 */
public record AcrylamideWarning(String code, Message message, String basis) {

	public static final String FRYING_TOO_HOT = "FRYING_AT_175_OR_ABOVE";

	public static final String DARKER_THAN_GUIDE = "DARKER_THAN_COLOUR_GUIDE";

	public static final String HIGH_SUGAR_POTATO = "HIGH_SUGAR_POTATO";

	public static final String OVER_BENCHMARK = "ESTIMATE_OVER_BENCHMARK";

	public static final String NEAR_BENCHMARK = "ESTIMATE_NEAR_BENCHMARK";

}
