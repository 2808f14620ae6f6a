package com.crustplan.api;

import java.util.List;

import jakarta.servlet.http.HttpServletRequest;

import org.springframework.beans.factory.annotation.Value;
import org.springframework.boot.web.servlet.FilterRegistrationBean;
import org.springframework.context.annotation.Bean;
import org.springframework.context.annotation.Configuration;
import org.springframework.core.Ordered;
import org.springframework.http.MediaType;
import org.springframework.http.converter.HttpMessageConverters;
import org.springframework.util.unit.DataSize;
import org.springframework.web.accept.ContentNegotiationStrategy;
import org.springframework.web.accept.HeaderContentNegotiationStrategy;
import org.springframework.web.servlet.config.annotation.ContentNegotiationConfigurer;
import org.springframework.web.servlet.config.annotation.WebMvcConfigurer;

import tools.jackson.databind.json.JsonMapper;

/**
 * How the JSON API ({@code /api/**}) reads requests and answers: bodies bound by
 * {@link BoundBodyConverter}, a size limit in front of everything else, and JSON whatever
 * the Accept header asks for.
 */
@Configuration(proxyBeanMethods = false)
public class ApiConfig implements WebMvcConfigurer {

	private final JsonMapper json;

	ApiConfig(JsonMapper json) {
		this.json = json;
	}

	/** Whether a request is the API's (as opposed to a page's). */
	public static boolean isApi(HttpServletRequest request) {
		return request.getRequestURI().startsWith(request.getContextPath() + "/api/");
	}

	@Override
	public void configureMessageConverters(HttpMessageConverters.ServerBuilder converters) {
		converters.addCustomConverter(new BoundBodyConverter(this.json));
	}

	/**
	 * The API has one representation, JSON; an Accept header that does not list it (a
	 * browser's {@code text/html}) is disregarded rather than answered 406, as RFC 9110
	 * §12.5.1 allows. Pages negotiate from the Accept header as before.
	 */
	@Override
	public void configureContentNegotiation(ContentNegotiationConfigurer configurer) {
		ContentNegotiationStrategy api = request -> {
			HttpServletRequest r = request.getNativeRequest(HttpServletRequest.class);
			return r != null && isApi(r) ? List.of(MediaType.APPLICATION_JSON, MediaType.APPLICATION_PROBLEM_JSON)
					: ContentNegotiationStrategy.MEDIA_TYPE_ALL_LIST;
		};
		configurer.strategies(List.of(api, new HeaderContentNegotiationStrategy()));
	}

	/**
	 * @param maxRequestSize the largest API body: a plan or surface body is under 2 KB,
	 * and a surface's 1000 characters of notes at most 6 KB when every one is sent as a
	 * \\u escape (RFC 8259 §7); 64 KB leaves room for that ten times over (our own
	 * sizing)
	 */
	@Bean
	FilterRegistrationBean<RequestSizeLimit> apiRequestSizeLimit(
			@Value("${crustplan.api.max-request-size:64KB}") DataSize maxRequestSize) {
		FilterRegistrationBean<RequestSizeLimit> r = new FilterRegistrationBean<>(
				new RequestSizeLimit(maxRequestSize.toBytes()));
		r.addUrlPatterns("/api/*");
		// before sessions and security: an oversized body costs no database read and no
		// password check
		r.setOrder(Ordered.HIGHEST_PRECEDENCE + 10);
		return r;
	}

}
