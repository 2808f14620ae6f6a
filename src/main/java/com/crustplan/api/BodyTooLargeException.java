package com.crustplan.api;

/**
 * A request body past the API's size limit: answered 413, whoever was reading it when it
 * overflowed.
 */
public class BodyTooLargeException extends RuntimeException {

	private final long limitBytes;

	BodyTooLargeException(long limitBytes) {
		super("request body over " + limitBytes + " bytes", null, false, false);
		this.limitBytes = limitBytes;
	}

	long limitBytes() {
		return this.limitBytes;
	}

	/** The limit's exception where a reader (Jackson) wrapped it, or null. */
	static BodyTooLargeException in(Throwable e) {
		for (Throwable t = e; t != null; t = t.getCause()) {
			if (t instanceof BodyTooLargeException b) {
				return b;
			}
		}
		return null;
	}

}
