package com.crustplan.engine.message;

import java.util.List;

/**
 * What the engine says to a cook, as a code (a key of the web app's
 * {@code messages.properties}) and typed arguments, so that wording and units are chosen
 * where the text is shown, not here. A message may itself be an argument of another.
 */
public record Message(String code, List<Argument> args) implements Argument {

	public Message {
		if (code == null || code.isBlank()) {
			throw new IllegalArgumentException("a message needs a code");
		}
		args = List.copyOf(args);
	}

	public static Message of(String code, Argument... args) {
		return new Message(code, List.of(args));
	}

}
