package com.crustplan.api;

/**
 * One problem in a request, named in the request's own terms ({@code surface.waterPct},
 * {@code body}).
 */
public record FieldError(String field, String message) {
}
