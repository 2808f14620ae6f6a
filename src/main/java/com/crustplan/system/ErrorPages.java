package com.crustplan.system;

import jakarta.servlet.DispatcherType;
import jakarta.servlet.Filter;
import jakarta.servlet.RequestDispatcher;
import jakarta.servlet.http.HttpServletResponse;

import org.springframework.boot.web.servlet.FilterRegistrationBean;
import org.springframework.context.annotation.Bean;
import org.springframework.context.annotation.Configuration;

/**
 * {@code /error} is where the container sends a request that failed. Opened directly it
 * has no error to show (the framework would say "Status 999"): it is then simply an
 * address with nothing at it, and answers with the not-found page.
 */
@Configuration
class ErrorPages {

	@Bean
	FilterRegistrationBean<Filter> errorAddressOpenedDirectly() {
		Filter notFound = (req, res, chain) -> {
			if (req.getAttribute(RequestDispatcher.ERROR_STATUS_CODE) == null) {
				((HttpServletResponse) res).sendError(HttpServletResponse.SC_NOT_FOUND);
			}
			else {
				chain.doFilter(req, res);
			}
		};
		FilterRegistrationBean<Filter> r = new FilterRegistrationBean<>(notFound);
		r.addUrlPatterns("/error");
		// only requests that arrive from outside; the container's own error dispatch
		// passes
		r.setDispatcherTypes(DispatcherType.REQUEST);
		return r;
	}

}
