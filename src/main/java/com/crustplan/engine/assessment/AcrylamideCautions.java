package com.crustplan.engine.assessment;

import java.util.List;

import com.crustplan.engine.message.Message;

/** The cautions shown with every acrylamide estimate. */
public final class AcrylamideCautions {

	/** IARC Monographs vol. 60 (1994): acrylamide, Group 2A. */
	public static final Message CARCINOGEN = Message.of("caution.acrylamide.carcinogen");

	public static final Message ESTIMATE = Message.of("caution.acrylamide.estimate");

	public static final Message AUTHORITY = Message.of("caution.acrylamide.authority");

	/**
	 * Regulation (EU) 2017/2158: benchmark levels are performance indicators, not limits.
	 */
	public static final Message BENCHMARK_MEANING = Message.of("caution.acrylamide.benchmark-meaning");

	public static final List<Message> ALL = List.of(CARCINOGEN, ESTIMATE, AUTHORITY, BENCHMARK_MEANING);

	private AcrylamideCautions() {
	}

}
