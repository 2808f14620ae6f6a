package com.crustplan.system;

import org.springframework.http.HttpStatus;
import org.springframework.web.bind.annotation.ResponseStatus;

/**
 * A record that does not exist (or no longer does): shown as the 404 page, never a 500.
 */
@ResponseStatus(HttpStatus.NOT_FOUND)
public class NotFoundException extends RuntimeException {

	public NotFoundException(String what, Object id) {
		super(what + " " + id + " was not found");
	}

}
