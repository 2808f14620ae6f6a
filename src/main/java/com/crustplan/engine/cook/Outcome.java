package com.crustplan.engine.cook;

import com.crustplan.engine.message.Message;

/** Whether the target was reached, and if not, why. */
public enum Outcome {

	REACHED(Message.of("outcome.reached")), NO_REACTANTS(Message.of("outcome.no-reactants")),
	WET_PLATEAU(Message.of("outcome.wet-plateau")), TOO_COOL(Message.of("outcome.too-cool")),
	TOO_SLOW(Message.of("outcome.too-slow")), SURFACE_LIMIT(Message.of("outcome.surface-limit"));

	private final Message explanation;

	Outcome(Message explanation) {
		this.explanation = explanation;
	}

	public Message explanation() {
		return explanation;
	}

}
