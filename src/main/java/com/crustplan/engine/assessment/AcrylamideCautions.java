package com.crustplan.engine.assessment;

import java.util.List;

/** The cautions shown with every acrylamide estimate. */
public final class AcrylamideCautions {

	/** IARC Monographs vol. 60 (1994): acrylamide, Group 2A. */
	public static final String CARCINOGEN = "Acrylamide is classified by the International Agency for Research on Cancer (IARC) as probably carcinogenic to humans (Group 2A).";

	public static final String ESTIMATE = "This figure is a model estimate for planning, not an analysis. Real levels depend on the variety, storage, cut, oil and equipment and can differ several-fold.";

	public static final String AUTHORITY = "Only a laboratory analysis shows the actual level, and your local food authority decides what a business must do about it.";

	public static final String BENCHMARK_MEANING = "Benchmark levels (Regulation (EU) 2017/2158) are performance indicators for the reduction measures, not legal maximum limits.";

	public static final List<String> ALL = List.of(CARCINOGEN, ESTIMATE, AUTHORITY, BENCHMARK_MEANING);

	private AcrylamideCautions() {
	}

}
