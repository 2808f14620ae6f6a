package com.crustplan.api;

import java.util.List;

import jakarta.servlet.http.HttpServletRequest;

import org.slf4j.Logger;
import org.slf4j.LoggerFactory;
import org.springframework.core.Ordered;
import org.springframework.core.annotation.AnnotatedElementUtils;
import org.springframework.core.annotation.Order;
import org.springframework.dao.ConcurrencyFailureException;
import org.springframework.http.HttpStatus;
import org.springframework.http.MediaType;
import org.springframework.http.ProblemDetail;
import org.springframework.http.ResponseEntity;
import org.springframework.http.converter.HttpMessageNotReadableException;
import org.springframework.security.access.AccessDeniedException;
import org.springframework.security.core.AuthenticationException;
import org.springframework.web.ErrorResponse;
import org.springframework.web.HttpMediaTypeNotSupportedException;
import org.springframework.web.HttpRequestMethodNotSupportedException;
import org.springframework.web.bind.annotation.ExceptionHandler;
import org.springframework.web.bind.annotation.ResponseStatus;
import org.springframework.web.bind.annotation.RestControllerAdvice;
import org.springframework.web.method.annotation.MethodArgumentTypeMismatchException;
import org.springframework.web.servlet.NoHandlerFoundException;
import org.springframework.web.servlet.resource.NoResourceFoundException;

import com.crustplan.engine.input.InvalidInputException;

/**
 * Every error the JSON API answers, as {@link Problems} shapes it. It sees the exceptions
 * of every request (an advice cannot be limited to a path, and an unknown API address has
 * no controller), so each handler first hands a page's exception back to Spring, which
 * then goes on as if no handler had matched: pages keep their error pages. Ordered last,
 * so an advice made for pages is asked first.
 */
@RestControllerAdvice
@Order(Ordered.LOWEST_PRECEDENCE)
public class ApiErrors {

	private static final Logger log = LoggerFactory.getLogger(ApiErrors.class);

	@ExceptionHandler(InvalidRequestException.class)
	ResponseEntity<ProblemDetail> invalidRequest(InvalidRequestException e, HttpServletRequest request) {
		apiOnly(e, request);
		return answer(Problems.of(HttpStatus.BAD_REQUEST, e.errors()), request);
	}

	/**
	 * The engine's own checks, where a controller did not already put them in the
	 * request's terms.
	 */
	@ExceptionHandler(InvalidInputException.class)
	ResponseEntity<ProblemDetail> invalidInput(InvalidInputException e, HttpServletRequest request) {
		apiOnly(e, request);
		return answer(Problems.of(HttpStatus.BAD_REQUEST, e.field(), e.reason()), request);
	}

	/**
	 * Someone else changed or deleted the same record at the same moment: read it again
	 * and retry.
	 */
	@ExceptionHandler(ConcurrencyFailureException.class)
	ResponseEntity<ProblemDetail> conflict(ConcurrencyFailureException e, HttpServletRequest request) {
		apiOnly(e, request);
		return answer(Problems.of(HttpStatus.CONFLICT, "id",
				"the record was changed or deleted by someone else at the same moment; read it again and retry"),
				request);
	}

	@ExceptionHandler(BodyTooLargeException.class)
	ResponseEntity<ProblemDetail> tooLarge(BodyTooLargeException e, HttpServletRequest request) {
		apiOnly(e, request);
		return answer(Problems.tooLarge(e.limitBytes()), request);
	}

	@ExceptionHandler(HttpMessageNotReadableException.class)
	ResponseEntity<ProblemDetail> unreadable(HttpMessageNotReadableException e, HttpServletRequest request) {
		apiOnly(e, request);
		BodyTooLargeException tooLarge = BodyTooLargeException.in(e);
		if (tooLarge != null) {
			return tooLarge(tooLarge, request);
		}
		return answer(Problems.of(HttpStatus.BAD_REQUEST, "body", "could not be read as JSON"), request);
	}

	/** Content-Type with a charset Java does not know, or a type no reader takes. */
	@ExceptionHandler(HttpMediaTypeNotSupportedException.class)
	ResponseEntity<ProblemDetail> mediaType(HttpMediaTypeNotSupportedException e, HttpServletRequest request)
			throws HttpMediaTypeNotSupportedException {
		apiOnly(e, request);
		String why = e.getMessage() == null ? "" : " (" + e.getMessage().replaceAll("[\\r\\n]+", " ") + ")";
		return answer(Problems.of(HttpStatus.UNSUPPORTED_MEDIA_TYPE, "Content-Type",
				"cannot be read" + why + "; send application/json in UTF-8"), request);
	}

	@ExceptionHandler(MethodArgumentTypeMismatchException.class)
	ResponseEntity<ProblemDetail> typeMismatch(MethodArgumentTypeMismatchException e, HttpServletRequest request) {
		apiOnly(e, request);
		Class<?> type = e.getRequiredType();
		boolean whole = type == long.class || type == Long.class || type == int.class || type == Integer.class;
		return answer(Problems.of(HttpStatus.BAD_REQUEST, e.getName(),
				whole ? "must be a whole number" : "is not a valid value"), request);
	}

	@ExceptionHandler(HttpRequestMethodNotSupportedException.class)
	ResponseEntity<ProblemDetail> method(HttpRequestMethodNotSupportedException e, HttpServletRequest request)
			throws HttpRequestMethodNotSupportedException {
		apiOnly(e, request);
		String allowed = e.getSupportedHttpMethods() == null ? ""
				: String.join(", ", e.getSupportedHttpMethods().stream().map(Object::toString).toList());
		return ResponseEntity.status(HttpStatus.METHOD_NOT_ALLOWED)
			.headers(e.getHeaders())
			.contentType(MediaType.APPLICATION_PROBLEM_JSON)
			.body(withInstance(
					Problems.of(HttpStatus.METHOD_NOT_ALLOWED, "method",
							e.getMethod() + " is not allowed here" + (allowed.isEmpty() ? "" : "; use " + allowed)),
					request));
	}

	/**
	 * No controller and no static file at this address (static files have their own paths
	 * only).
	 */
	@ExceptionHandler({ NoResourceFoundException.class, NoHandlerFoundException.class })
	ResponseEntity<ProblemDetail> noSuchAddress(Exception e, HttpServletRequest request) throws Exception {
		apiOnly(e, request);
		return answer(
				Problems.of(HttpStatus.NOT_FOUND, "path", "is not an address of the API: " + request.getRequestURI()),
				request);
	}

	/**
	 * The rest: Spring's own request errors keep their status; an exception marked with a
	 * status ({@code NotFoundException}: the record the path names does not exist)
	 * answers it on {@code id}; anything else is our fault, not the caller's, logged and
	 * answered 500 without internals.
	 */
	@ExceptionHandler(Exception.class)
	ResponseEntity<ProblemDetail> other(Exception e, HttpServletRequest request) throws Exception {
		apiOnly(e, request);
		if (e instanceof AccessDeniedException || e instanceof AuthenticationException) {
			throw e; // Spring Security's filters answer these (401/403)
		}
		if (e instanceof ErrorResponse r) {
			HttpStatus status = HttpStatus.valueOf(r.getStatusCode().value());
			String detail = r.getBody().getDetail();
			return ResponseEntity.status(status)
				.headers(r.getHeaders())
				.contentType(MediaType.APPLICATION_PROBLEM_JSON)
				.body(withInstance(Problems.of(status, "request", detail == null ? status.getReasonPhrase() : detail),
						request));
		}
		ResponseStatus marked = AnnotatedElementUtils.findMergedAnnotation(e.getClass(), ResponseStatus.class);
		if (marked != null && marked.code().is4xxClientError()) {
			return answer(Problems.of(marked.code(), marked.code() == HttpStatus.NOT_FOUND ? "id" : "request",
					e.getMessage()), request);
		}
		log.error("API request {} {} failed", request.getMethod(), request.getRequestURI(), e);
		return answer(
				Problems.of(HttpStatus.INTERNAL_SERVER_ERROR, List.of(new FieldError("server",
						"the request could not be completed; nothing half-saved is kept; the error is logged"))),
				request);
	}

	/** A page's exception goes back to Spring's other resolvers, untouched. */
	private static <E extends Exception> void apiOnly(E e, HttpServletRequest request) throws E {
		if (!ApiConfig.isApi(request)) {
			throw e;
		}
	}

	private static ResponseEntity<ProblemDetail> answer(ProblemDetail problem, HttpServletRequest request) {
		return ResponseEntity.status(problem.getStatus())
			.contentType(MediaType.APPLICATION_PROBLEM_JSON)
			.body(withInstance(problem, request));
	}

	private static ProblemDetail withInstance(ProblemDetail problem, HttpServletRequest request) {
		problem.setInstance(Problems.instance(request));
		return problem;
	}

}
