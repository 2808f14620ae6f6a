package com.crustplan.api;

import java.util.ArrayList;
import java.util.List;

/**
 * The thin collector behind every API answer with field errors: binding and the checks
 * after it add to one list, so a client learns every bad field in one answer, in the
 * order they were found.
 */
public final class FieldErrors {

	private final List<FieldError> errors = new ArrayList<>();

	public void add(String field, String message) {
		this.errors.add(new FieldError(field, message));
	}

	public boolean has(String field) {
		return this.errors.stream().anyMatch(e -> e.field().equals(field));
	}

	/**
	 * Whether a field under {@code prefix} (for example {@code "surface."}) is already
	 * wrong.
	 */
	public boolean hasUnder(String prefix) {
		return this.errors.stream().anyMatch(e -> e.field().startsWith(prefix));
	}

	public boolean isEmpty() {
		return this.errors.isEmpty();
	}

	public List<FieldError> list() {
		return List.copyOf(this.errors);
	}

	/**
	 * A nested object the request must have: absent or null is an error unless binding
	 * already named it.
	 */
	public <T> T requireObject(String field, T value) {
		if (value == null && !has(field)) {
			add(field, "is required (a JSON object)");
		}
		return value;
	}

	/**
	 * Text (already trimmed, blank read as absent) no longer than {@code maxLength}; else
	 * an error and null.
	 */
	public String text(String field, String value, int maxLength) {
		if (!StoredText.isPlain(value)) {
			add(field, StoredText.REASON);
			return null;
		}
		if (value != null && value.length() > maxLength) {
			add(field, "is too long (at most " + maxLength + " characters)");
			return null;
		}
		return value;
	}

	/**
	 * Ends the request with a 400 naming every field found wrong so far, if there is one.
	 */
	public void throwIfAny() {
		if (!this.errors.isEmpty()) {
			throw new InvalidRequestException(this.errors);
		}
	}

}
