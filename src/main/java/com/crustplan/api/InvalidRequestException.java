package com.crustplan.api;

import java.util.List;

/** A request the API refuses with 400, carrying every field error found in it. */
public class InvalidRequestException extends RuntimeException {

	private final transient List<FieldError> errors;

	public InvalidRequestException(List<FieldError> errors) {
		// no stack trace: this is the caller's mistake, answered and never logged as a
		// failure
		super("invalid request", null, false, false);
		this.errors = List.copyOf(errors);
	}

	public static InvalidRequestException of(String field, String message) {
		return new InvalidRequestException(List.of(new FieldError(field, message)));
	}

	public List<FieldError> errors() {
		return this.errors;
	}

}
