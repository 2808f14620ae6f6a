package com.crustplan.plan;

import java.util.List;

/** The API's error body: every problem found, each naming its field in the request's own terms. */
public record ApiError(List<FieldError> errors) {

	public record FieldError(String field, String message) {
	}

	public static ApiError of(String field, String message) {
		return new ApiError(List.of(new FieldError(field, message)));
	}

}
