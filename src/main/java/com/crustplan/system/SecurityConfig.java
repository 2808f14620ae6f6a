package com.crustplan.system;

import java.io.IOException;

import jakarta.servlet.http.HttpServletRequest;
import jakarta.servlet.http.HttpServletResponse;

import org.springframework.context.annotation.Bean;
import org.springframework.context.annotation.Configuration;
import org.springframework.core.annotation.Order;
import org.springframework.http.HttpHeaders;
import org.springframework.http.HttpMethod;
import org.springframework.http.MediaType;
import org.springframework.security.access.hierarchicalroles.RoleHierarchy;
import org.springframework.security.access.hierarchicalroles.RoleHierarchyImpl;
import org.springframework.security.access.AccessDeniedException;
import org.springframework.security.authentication.AnonymousAuthenticationToken;
import org.springframework.security.authentication.InternalAuthenticationServiceException;
import org.springframework.security.config.annotation.web.builders.HttpSecurity;
import org.springframework.security.config.http.SessionCreationPolicy;
import org.springframework.security.crypto.bcrypt.BCryptPasswordEncoder;
import org.springframework.security.core.Authentication;
import org.springframework.security.core.context.SecurityContextHolder;
import org.springframework.security.crypto.password.PasswordEncoder;
import org.springframework.security.web.AuthenticationEntryPoint;
import org.springframework.security.web.SecurityFilterChain;
import org.springframework.security.web.access.AccessDeniedHandler;
import org.springframework.security.web.access.AccessDeniedHandlerImpl;
import org.springframework.security.web.csrf.CsrfException;
import org.springframework.security.web.servlet.util.matcher.PathPatternRequestMatcher;
import org.springframework.security.web.authentication.LoginUrlAuthenticationEntryPoint;
import org.springframework.security.web.util.matcher.AndRequestMatcher;
import org.springframework.security.web.util.matcher.AnyRequestMatcher;
import org.springframework.security.web.util.matcher.RequestMatcher;

/**
 * Who may do what. Reading needs a signed-in cook; writing needs a chef; user accounts need an admin.
 * Computing an unsaved plan through the API changes nothing and is open. Pages send strangers to the
 * sign-in page; the API answers 401/403 in JSON.
 * <p>
 * API clients sign in with HTTP Basic on each request (same accounts and passwords as the sign-in
 * page). Only requests to {@code /api/**} that carry Basic credentials go to that chain: it keeps no
 * session, so no cookie can act for the caller and CSRF tokens have nothing to protect there. Every
 * other request, a browser's API call on its session included, goes through the page chain with form
 * sign-in and CSRF exactly as before.
 */
@Configuration
public class SecurityConfig {

	static final String CHEF = "CHEF";

	static final String COOK = "COOK";

	static final String ADMIN = "ADMIN";

	@Bean
	@Order(1)
	SecurityFilterChain apiBasicChain(HttpSecurity http) throws Exception {
		RequestMatcher api = PathPatternRequestMatcher.withDefaults().matcher("/api/**");
		RequestMatcher basic = req -> {
			String h = req.getHeader(HttpHeaders.AUTHORIZATION);
			return h != null && h.regionMatches(true, 0, "Basic ", 0, 6);
		};
		// an account that could not be read (database down or full) is our fault, not wrong credentials
		AuthenticationEntryPoint unauthorized = (req, res, e) -> json(res,
				e instanceof InternalAuthenticationServiceException ? HttpServletResponse.SC_SERVICE_UNAVAILABLE
						: HttpServletResponse.SC_UNAUTHORIZED,
				e instanceof InternalAuthenticationServiceException
						? "the account database is not answering; try again shortly" : "sign in to do this");
		http.securityMatcher(new AndRequestMatcher(api, basic))
			.authorizeHttpRequests(auth -> auth.requestMatchers(HttpMethod.GET, "/api/v1/categories")
				.permitAll()
				.requestMatchers(HttpMethod.POST, "/api/v1/plans")
				.permitAll()
				.requestMatchers(HttpMethod.GET, "/api/**")
				.hasRole(COOK)
				.anyRequest()
				.hasRole(CHEF))
			.httpBasic(b -> b.authenticationEntryPoint(unauthorized))
			.sessionManagement(sm -> sm.sessionCreationPolicy(SessionCreationPolicy.STATELESS))
			// stateless and credentials in every request: nothing a forged cross-site request could borrow
			.csrf(csrf -> csrf.disable())
			.exceptionHandling(ex -> ex.authenticationEntryPoint(unauthorized)
				.accessDeniedHandler(
						(req, res, e) -> json(res, HttpServletResponse.SC_FORBIDDEN, "your role does not allow this")));
		return http.build();
	}

	@Bean
	@Order(2)
	SecurityFilterChain securityFilterChain(HttpSecurity http) throws Exception {
		RequestMatcher api = PathPatternRequestMatcher.withDefaults().matcher("/api/**");
		http.authorizeHttpRequests(auth -> auth
			.requestMatchers("/css/**", "/js/**", "/images/**", "/webjars/**", "/favicon.ico", "/error", "/error/**")
			.permitAll()
			.requestMatchers("/", "/signin", "/model", "/actuator/health", "/actuator/health/**")
			.permitAll()
			.requestMatchers(HttpMethod.POST, "/units")
			.permitAll()
			.requestMatchers(HttpMethod.GET, "/api/v1/categories")
			.permitAll()
			.requestMatchers(HttpMethod.POST, "/api/v1/plans")
			.permitAll()
			.requestMatchers("/admin/**")
			.hasRole(ADMIN)
			// the pages that lead to a change are a chef's, like the change itself
			.requestMatchers(HttpMethod.GET, "/surfaces/new", "/surfaces/*/edit", "/surfaces/*/copy",
					"/surfaces/*/delete", "/setups/new", "/setups/*/edit", "/setups/*/copy", "/setups/*/delete",
					"/plans/*/delete")
			.hasRole(CHEF)
			// recording test cooks is the one write a cook may do
			.requestMatchers(HttpMethod.POST, "/test-cooks/**")
			.hasRole(COOK)
			.requestMatchers(HttpMethod.GET, "/**")
			.hasRole(COOK)
			.anyRequest()
			.hasRole(CHEF))
			.formLogin(form -> form.loginPage("/signin").defaultSuccessUrl("/", false).permitAll())
			.logout(out -> out.logoutUrl("/signout").logoutSuccessUrl("/signin?signedout").permitAll())
			// the open plan API keeps no session state, so it carries no CSRF token
			.csrf(csrf -> csrf.ignoringRequestMatchers(PathPatternRequestMatcher.withDefaults()
				.matcher(HttpMethod.POST, "/api/v1/plans"), PathPatternRequestMatcher.withDefaults()
				.matcher(HttpMethod.GET, "/api/v1/categories")))
			.exceptionHandling(ex -> ex
				.defaultAuthenticationEntryPointFor(
						(req, res, e) -> json(res, HttpServletResponse.SC_UNAUTHORIZED, "sign in to do this"), api)
				.defaultAccessDeniedHandlerFor(SecurityConfig::apiDenied, api)
				// pages always go to the sign-in page, whatever the Accept header says
				.defaultAuthenticationEntryPointFor(new LoginUrlAuthenticationEntryPoint("/signin"),
						AnyRequestMatcher.INSTANCE)
				.defaultAccessDeniedHandlerFor(pageDenied(), AnyRequestMatcher.INSTANCE))
			.headers(h -> h.contentSecurityPolicy(csp -> csp.policyDirectives(
					"default-src 'self'; img-src 'self' data:; style-src 'self'; style-src-attr 'unsafe-inline'; "
							+ "script-src 'self'; "
							+ "object-src 'none'; frame-ancestors 'none'; form-action 'self'")));
		return http.build();
	}

	/**
	 * An API request refused on the page chain. A write without a CSRF token from someone not signed in
	 * is a missing sign-in (401); from a signed-in session it is the missing token; else the role.
	 */
	private static void apiDenied(HttpServletRequest req, HttpServletResponse res, AccessDeniedException e)
			throws IOException {
		Authentication who = SecurityContextHolder.getContext().getAuthentication();
		boolean signedIn = who != null && who.isAuthenticated() && !(who instanceof AnonymousAuthenticationToken);
		if (!signedIn) {
			json(res, HttpServletResponse.SC_UNAUTHORIZED, "sign in to do this");
		}
		else if (e instanceof CsrfException) {
			json(res, HttpServletResponse.SC_FORBIDDEN,
					"a browser session must send its CSRF token; API clients sign in with HTTP Basic instead");
		}
		else {
			json(res, HttpServletResponse.SC_FORBIDDEN, "your role does not allow this");
		}
	}

	/** What {@code accessDeniedPage("/error/403")} sets up, as a handler the CSRF filter also uses. */
	private static AccessDeniedHandler pageDenied() {
		AccessDeniedHandlerImpl h = new AccessDeniedHandlerImpl();
		h.setErrorPage("/error/403");
		return h;
	}

	private static void json(HttpServletResponse res, int status, String message) throws IOException {
		res.setStatus(status);
		res.setContentType(MediaType.APPLICATION_JSON_VALUE);
		res.setCharacterEncoding("UTF-8");
		res.getWriter().write("{\"errors\":[{\"field\":\"authorization\",\"message\":\"" + message + "\"}]}");
	}

	@Bean
	static RoleHierarchy roleHierarchy() {
		return RoleHierarchyImpl.withDefaultRolePrefix()
			.role(ADMIN)
			.implies(CHEF)
			.role(CHEF)
			.implies(COOK)
			.build();
	}

	@Bean
	PasswordEncoder passwordEncoder() {
		// BCrypt cost 10: Spring Security's default, about 0.1 s per check on a server core
		return new BCryptPasswordEncoder();
	}

}
