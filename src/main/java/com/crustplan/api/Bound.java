package com.crustplan.api;

import java.util.function.BiFunction;

/**
 * A request body bound into a record, with the field errors binding found (wrong types,
 * NaN, numbers too large for a double). The record holds null where a field was wrong, so
 * the checks that follow can go on and report the other fields too. Controllers take it
 * as {@code @RequestBody Bound<X>}.
 */
public record Bound<T>(T value, FieldErrors errors) {

	/**
	 * The body, or a 400 on {@code body} saying what to send when there is none.
	 * @param body as Spring passes it: null for an empty body
	 */
	public static <T> Bound<T> present(Bound<T> body, String whatToSend) {
		if (body == null || body.value() == null) {
			throw InvalidRequestException.of("body", whatToSend);
		}
		return body;
	}

	/**
	 * Runs the checks after binding, then answers 400 with every error found, binding's
	 * included.
	 */
	public <R> R check(BiFunction<T, FieldErrors, R> reader) {
		R result = reader.apply(this.value, this.errors);
		this.errors.throwIfAny();
		return result;
	}

}
