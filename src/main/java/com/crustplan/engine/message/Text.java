package com.crustplan.engine.message;

/**
 * Words that are data, not wording: a category's or stage's label, a product's name, a
 * citation.
 */
public record Text(String text) implements Argument {

	public static Text of(String text) {
		return new Text(text == null ? "" : text);
	}

}
