package com.crustplan.api;

import java.io.IOException;
import java.net.URI;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;

import jakarta.servlet.http.HttpServletRequest;
import jakarta.servlet.http.HttpServletResponse;

import org.springframework.http.HttpStatus;
import org.springframework.http.MediaType;
import org.springframework.http.ProblemDetail;

import tools.jackson.databind.json.JsonMapper;

/**
 * The API's error answer: an RFC 9457 problem detail ({@code application/problem+json})
 * whose extension member {@code errors} lists each problem as {@code {field, message}},
 * the list API clients read from the start. {@code type} is left at {@code about:blank},
 * so {@code title} is the status's reason phrase (RFC 9457 §4.2.1); {@code detail} says
 * the same as the list in one sentence.
 */
public final class Problems {

	/**
	 * Errors written outside Spring MVC (filters, security) hold only text and numbers.
	 */
	private static final JsonMapper JSON = JsonMapper.builder().build();

	private Problems() {
	}

	public static ProblemDetail of(HttpStatus status, List<FieldError> errors) {
		ProblemDetail p = ProblemDetail.forStatus(status);
		p.setTitle(status.getReasonPhrase());
		p.setDetail(errors.stream().map(e -> e.field() + " " + e.message()).collect(Collectors.joining("; ")));
		p.setProperty("errors", errors);
		return p;
	}

	public static ProblemDetail of(HttpStatus status, String field, String message) {
		return of(status, List.of(new FieldError(field, message)));
	}

	static ProblemDetail tooLarge(long maxBytes) {
		return of(HttpStatus.CONTENT_TOO_LARGE, "body",
				"is too large: the API reads at most " + maxBytes / 1024 + " KB (" + maxBytes + " bytes) per request");
	}

	/**
	 * The request's path as the problem's {@code instance} (RFC 9457 §3.1.5), or none if
	 * it is no URI.
	 */
	static URI instance(HttpServletRequest request) {
		try {
			return URI.create(request.getRequestURI());
		}
		catch (IllegalArgumentException e) {
			return null;
		}
	}

	/**
	 * Writes a problem straight to the response, for answers given before a controller is
	 * reached.
	 * @param request the request, for the problem's {@code instance}; null to leave it
	 * out
	 */
	public static void write(HttpServletRequest request, HttpServletResponse response, ProblemDetail problem)
			throws IOException {
		if (problem.getInstance() == null && request != null) {
			problem.setInstance(instance(request));
		}
		Map<String, Object> body = new LinkedHashMap<>();
		// no type means about:blank (RFC 9457 §3.1.1), as Spring writes it in the
		// advice's answers
		if (problem.getType() != null && !problem.getType().toString().equals("about:blank")) {
			body.put("type", problem.getType().toString());
		}
		body.put("title", problem.getTitle());
		body.put("status", problem.getStatus());
		body.put("detail", problem.getDetail());
		if (problem.getInstance() != null) {
			body.put("instance", problem.getInstance().toString());
		}
		if (problem.getProperties() != null) {
			body.putAll(problem.getProperties());
		}
		response.setStatus(problem.getStatus());
		response.setContentType(MediaType.APPLICATION_PROBLEM_JSON_VALUE);
		response.setCharacterEncoding("UTF-8");
		JSON.writeValue(response.getOutputStream(), body);
	}

	/**
	 * One field's problem, as the security filters answer 401 and 403 (no instance: they
	 * have no request).
	 */
	public static void write(HttpServletResponse response, HttpStatus status, String field, String message)
			throws IOException {
		write(null, response, of(status, field, message));
	}

}
