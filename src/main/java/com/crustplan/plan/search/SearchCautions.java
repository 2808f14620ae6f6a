package com.crustplan.plan.search;

import java.util.List;

/** The short cautions every search and map answer carries, in plain words. */
final class SearchCautions {

	private SearchCautions() {
	}

	static final List<String> ALL = List.of(
			"These are predictions of a model: check the colour by eye and the core with a probe thermometer.",
			"Follow your local food code for minimum core temperatures and holding times; it takes precedence over any figure here.",
			"Acrylamide figures are model estimates, not measurements; the EU benchmark levels (Regulation (EU) 2017/2158, Annex IV) are for checking a kitchen's own practice.",
			"Hot oil, hot pans and radiant elements burn: use guards, dry food before it goes into oil and never leave a fryer unattended.");

}
