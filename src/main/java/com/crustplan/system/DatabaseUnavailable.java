package com.crustplan.system;

import org.springframework.core.Ordered;
import org.springframework.core.annotation.Order;
import org.springframework.dao.DataAccessResourceFailureException;
import org.springframework.dao.UncategorizedDataAccessException;
import jakarta.servlet.http.HttpServletRequest;

import org.springframework.http.HttpHeaders;
import org.springframework.http.HttpStatus;
import org.springframework.http.MediaType;
import org.springframework.http.ResponseEntity;
import org.springframework.stereotype.Controller;
import org.springframework.transaction.CannotCreateTransactionException;
import org.springframework.transaction.TransactionSystemException;
import org.springframework.web.bind.annotation.ControllerAdvice;
import org.springframework.web.bind.annotation.ExceptionHandler;
import org.springframework.web.servlet.ModelAndView;

import com.crustplan.api.Problems;

/**
 * A page whose database does not answer (server down, no free connection within the
 * pool's 3 s) or cannot store anything now (disk full) shows the 503 page: try again
 * shortly, nothing half-saved. The pool keeps trying, so the next request after the
 * database is back succeeds.
 */
@ControllerAdvice(annotations = Controller.class)
// before the API's catch-all advice: Spring asks advices in order and takes the first
// with a handler
@Order(Ordered.LOWEST_PRECEDENCE - 1)
class DatabaseUnavailable {

	@ExceptionHandler({ DataAccessResourceFailureException.class, CannotCreateTransactionException.class,
			UncategorizedDataAccessException.class, TransactionSystemException.class })
	Object unavailable(HttpServletRequest request) {
		if (request.getRequestURI().startsWith(request.getContextPath() + "/api/")) {
			// this advice also sees the API's controllers: answer them in the API's one
			// error shape
			return ResponseEntity.status(HttpStatus.SERVICE_UNAVAILABLE)
				.contentType(MediaType.APPLICATION_PROBLEM_JSON)
				.header(HttpHeaders.RETRY_AFTER, "30")
				.body(Problems.of(HttpStatus.SERVICE_UNAVAILABLE, "server",
						"the database is not answering; nothing was saved; try again shortly"));
		}
		ModelAndView page = new ModelAndView("error/503");
		page.setStatus(HttpStatus.SERVICE_UNAVAILABLE);
		return page;
	}

}
