package com.crustplan.engine.input;

/**
 * Input the engine cannot run on; names the field and the reason in words a cook can act
 * on.
 */
public class InvalidInputException extends IllegalArgumentException {

	private final String field;

	public InvalidInputException(String field, String reason) {
		super(field + ": " + reason);
		this.field = field;
	}

	public String field() {
		return field;
	}

	public String reason() {
		String m = getMessage();
		return m.substring(field.length() + 2);
	}

}
