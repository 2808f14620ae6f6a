package com.crustplan.system;

/**
 * A save made from a form showing an older version of the record than the one saved now:
 * refused, so one chef's change never silently overwrites another's. The page shows both
 * versions.
 */
public class StaleEditException extends RuntimeException {

	public StaleEditException(String what, Object id) {
		super(what + " " + id + " was changed by someone else since the form was opened");
	}

}
