package com.crustplan.api;

/**
 * The one check for text a kitchen stores (names, notes, categories, user names): no
 * control characters. PostgreSQL refuses NUL in text columns, and a control character in
 * a name is always a paste accident or an attack, never a cook's intent. Tab, line feed
 * and carriage return stay allowed (notes are typed in a text area). The check runs on
 * the text as sent, before any trimming, so {@code "potato\u0000"} is refused rather than
 * trimmed into {@code "potato"}.
 */
public final class StoredText {

	/** The reason given beside the field. */
	public static final String REASON = "must not contain control characters (such as NUL); type plain text";

	private StoredText() {
	}

	/** Whether the text may be stored; null counts as plain. */
	public static boolean isPlain(String text) {
		if (text == null) {
			return true;
		}
		for (int i = 0; i < text.length(); i++) {
			if (disallowed(text.charAt(i))) {
				return false;
			}
		}
		return true;
	}

	/**
	 * C0 controls except tab, LF and CR, DEL and the C1 controls: the Unicode general
	 * category Cc (Unicode Standard, ch. 23.1) less the three whitespace controls.
	 */
	static boolean disallowed(char c) {
		return Character.getType(c) == Character.CONTROL && c != '\t' && c != '\n' && c != '\r';
	}

}
