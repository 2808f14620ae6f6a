package com.crustplan.system;

import org.springframework.dao.DataAccessResourceFailureException;
import org.springframework.dao.UncategorizedDataAccessException;
import org.springframework.http.HttpStatus;
import org.springframework.stereotype.Controller;
import org.springframework.transaction.CannotCreateTransactionException;
import org.springframework.transaction.TransactionSystemException;
import org.springframework.web.bind.annotation.ControllerAdvice;
import org.springframework.web.bind.annotation.ExceptionHandler;
import org.springframework.web.servlet.ModelAndView;

/**
 * A page whose database does not answer (server down, no free connection within the pool's 3 s) or
 * cannot store anything now (disk full) shows the 503 page: try again shortly, nothing half-saved.
 * The pool keeps trying, so the next request after the database is back succeeds.
 */
@ControllerAdvice(annotations = Controller.class)
class DatabaseUnavailable {

	@ExceptionHandler({ DataAccessResourceFailureException.class, CannotCreateTransactionException.class,
			UncategorizedDataAccessException.class, TransactionSystemException.class })
	ModelAndView unavailable() {
		ModelAndView page = new ModelAndView("error/503");
		page.setStatus(HttpStatus.SERVICE_UNAVAILABLE);
		return page;
	}

}
