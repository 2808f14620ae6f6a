package com.crustplan.system;

import java.io.IOException;
import java.time.Duration;

import jakarta.servlet.http.HttpServletRequest;
import jakarta.servlet.http.HttpServletResponse;

import com.github.benmanes.caffeine.cache.Ticker;

import org.springframework.beans.factory.annotation.Value;
import org.springframework.context.annotation.Bean;
import org.springframework.context.annotation.Configuration;
import org.springframework.core.annotation.Order;
import org.springframework.http.HttpHeaders;
import org.springframework.http.HttpMethod;
import org.springframework.http.HttpStatus;
import org.springframework.security.access.hierarchicalroles.RoleHierarchy;
import org.springframework.security.access.hierarchicalroles.RoleHierarchyImpl;
import org.springframework.security.access.AccessDeniedException;
import org.springframework.security.authentication.AnonymousAuthenticationToken;
import org.springframework.security.authentication.AuthenticationManager;
import org.springframework.security.authentication.ProviderManager;
import org.springframework.security.authentication.dao.DaoAuthenticationProvider;
import org.springframework.security.authentication.InternalAuthenticationServiceException;
import org.springframework.security.config.annotation.web.builders.HttpSecurity;
import org.springframework.security.config.annotation.web.configurers.HeadersConfigurer;
import org.springframework.security.config.http.SessionCreationPolicy;
import org.springframework.security.crypto.bcrypt.BCryptPasswordEncoder;
import org.springframework.security.core.Authentication;
import org.springframework.security.core.AuthenticationException;
import org.springframework.security.core.context.SecurityContextHolder;
import org.springframework.security.core.userdetails.UserDetailsService;
import org.springframework.security.crypto.password.PasswordEncoder;
import org.springframework.security.web.AuthenticationEntryPoint;
import org.springframework.security.web.SecurityFilterChain;
import org.springframework.security.web.access.AccessDeniedHandler;
import org.springframework.security.web.access.AccessDeniedHandlerImpl;
import org.springframework.security.web.csrf.CsrfException;
import org.springframework.security.web.servlet.util.matcher.PathPatternRequestMatcher;
import org.springframework.security.web.authentication.AuthenticationFailureHandler;
import org.springframework.security.web.authentication.LoginUrlAuthenticationEntryPoint;
import org.springframework.security.web.header.writers.ReferrerPolicyHeaderWriter.ReferrerPolicy;
import org.springframework.security.web.util.matcher.AndRequestMatcher;
import org.springframework.security.web.util.matcher.AnyRequestMatcher;
import org.springframework.security.web.util.matcher.RequestMatcher;

import com.crustplan.api.Problems;

/**
 * Who may do what. Reading needs a signed-in cook; writing needs a chef; user accounts
 * need an admin. Computing an unsaved plan through the API changes nothing and is open.
 * Pages send strangers to the sign-in page; the API answers 401/403 in JSON.
 * <p>
 * API clients sign in with HTTP Basic on each request (same accounts and passwords as the
 * sign-in page). Only requests to {@code /api/**} that carry Basic credentials go to that
 * chain: it keeps no session, so no cookie can act for the caller and CSRF tokens have
 * nothing to protect there. Every other request, a browser's API call on its session
 * included, goes through the page chain with form sign-in and CSRF exactly as before.
 * <p>
 * Both chains sign in through one {@link SignInGuard}: wrong passwords are counted per
 * account and per address ({@link SignInThrottle}), and a right password is remembered
 * for a few minutes ({@link CredentialCheckCache}) so Basic clients do not pay the slow
 * hash on every request.
 */
@Configuration
public class SecurityConfig {

	/**
	 * Longest password the hash takes, in UTF-8 bytes: BCrypt reads at most 72 bytes of
	 * its key (Provos &amp; Mazières 1999), and Spring Security refuses longer ones.
	 */
	public static final int MAX_PASSWORD_BYTES = 72;

	static final String CHEF = "CHEF";

	static final String COOK = "COOK";

	static final String ADMIN = "ADMIN";

	@Bean
	@Order(1)
	SecurityFilterChain apiBasicChain(HttpSecurity http, AuthenticationManager signIn) throws Exception {
		RequestMatcher api = PathPatternRequestMatcher.withDefaults().matcher("/api/**");
		RequestMatcher basic = req -> {
			String h = req.getHeader(HttpHeaders.AUTHORIZATION);
			return h != null && h.regionMatches(true, 0, "Basic ", 0, 6);
		};
		AuthenticationEntryPoint unauthorized = SecurityConfig::apiUnauthorized;
		http.securityMatcher(new AndRequestMatcher(api, basic))
			.authorizeHttpRequests(auth -> auth.requestMatchers(HttpMethod.GET, "/api/v1/categories")
				.permitAll()
				.requestMatchers(HttpMethod.POST, "/api/v1/plans", "/api/v1/plans/search", "/api/v1/maps")
				.permitAll()
				.requestMatchers(HttpMethod.GET, "/api/**")
				.hasRole(COOK)
				.anyRequest()
				.hasRole(CHEF))
			.authenticationManager(signIn)
			.httpBasic(b -> b.authenticationEntryPoint(unauthorized))
			.sessionManagement(sm -> sm.sessionCreationPolicy(SessionCreationPolicy.STATELESS))
			// stateless and credentials in every request: nothing a forged cross-site
			// request could borrow
			.csrf(csrf -> csrf.disable())
			.exceptionHandling(ex -> ex.authenticationEntryPoint(unauthorized)
				.accessDeniedHandler(
						(req, res, e) -> json(res, HttpServletResponse.SC_FORBIDDEN, "your role does not allow this")))
			.headers(SecurityConfig::privacyHeaders);
		return http.build();
	}

	@Bean
	@Order(2)
	SecurityFilterChain securityFilterChain(HttpSecurity http, AuthenticationManager signIn) throws Exception {
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
			// searches and maps compute and save nothing, like plans; a saved surface in
			// them needs a signed-in user (checked where it is read)
			.requestMatchers(HttpMethod.POST, "/api/v1/plans", "/api/v1/plans/search", "/api/v1/maps")
			.permitAll()
			.requestMatchers("/admin/**")
			.hasRole(ADMIN)
			// the pages that lead to a change are a chef's, like the change itself
			.requestMatchers(HttpMethod.GET, "/surfaces/new", "/surfaces/*/edit", "/surfaces/*/copy",
					"/surfaces/*/delete", "/setups/new", "/setups/*/edit", "/setups/*/copy", "/setups/*/delete",
					"/plans/*/delete", "/plans/*/edit", "/plans/*/copy")
			.hasRole(CHEF)
			// recording test cooks is the one write a cook may do
			.requestMatchers(HttpMethod.POST, "/test-cooks/**")
			.hasRole(COOK)
			.requestMatchers(HttpMethod.GET, "/**")
			.hasRole(COOK)
			.anyRequest()
			.hasRole(CHEF))
			.authenticationManager(signIn)
			.formLogin(form -> form.loginPage("/signin")
				.defaultSuccessUrl("/", false)
				.failureHandler(signInFailed())
				.permitAll())
			.logout(out -> out.logoutUrl("/signout").logoutSuccessUrl("/signin?signedout").permitAll())
			// the open plan API keeps no session state, so it carries no CSRF token
			.csrf(csrf -> csrf.ignoringRequestMatchers(
					PathPatternRequestMatcher.withDefaults().matcher(HttpMethod.POST, "/api/v1/plans"),
					PathPatternRequestMatcher.withDefaults().matcher(HttpMethod.POST, "/api/v1/plans/search"),
					PathPatternRequestMatcher.withDefaults().matcher(HttpMethod.POST, "/api/v1/maps"),
					PathPatternRequestMatcher.withDefaults().matcher(HttpMethod.GET, "/api/v1/categories")))
			.exceptionHandling(ex -> ex.defaultAuthenticationEntryPointFor(SecurityConfig::apiUnauthorized, api)
				.defaultAccessDeniedHandlerFor(SecurityConfig::apiDenied, api)
				// pages always go to the sign-in page, whatever the Accept header says
				.defaultAuthenticationEntryPointFor(signInPage(), AnyRequestMatcher.INSTANCE)
				.defaultAccessDeniedHandlerFor(pageDenied(), AnyRequestMatcher.INSTANCE))
			.headers(h -> privacyHeaders(h.contentSecurityPolicy(csp -> csp.policyDirectives(
					"default-src 'self'; img-src 'self' data:; style-src 'self'; style-src-attr 'unsafe-inline'; "
							+ "script-src 'self'; "
							+ "object-src 'none'; frame-ancestors 'none'; form-action 'self'"))));
		return http.build();
	}

	/**
	 * Links to other sites get the origin only, never a page address with record ids
	 * (strict-origin-when-cross-origin, W3C Referrer Policy); and no page may use the
	 * camera, microphone, location or payment features (W3C Permissions Policy):
	 * Crustplan needs none.
	 */
	private static void privacyHeaders(HeadersConfigurer<HttpSecurity> h) {
		h.referrerPolicy(r -> r.policy(ReferrerPolicy.STRICT_ORIGIN_WHEN_CROSS_ORIGIN))
			.permissionsPolicyHeader(p -> p.policy("camera=(), microphone=(), geolocation=(), payment=(), usb=()"));
	}

	/**
	 * The sign-in redirect as a path only ("/signin"), never built from the request's
	 * Host header, which a client can forge (with server.tomcat.use-relative-redirects
	 * the container keeps it so).
	 */
	private static LoginUrlAuthenticationEntryPoint signInPage() {
		LoginUrlAuthenticationEntryPoint e = new LoginUrlAuthenticationEntryPoint("/signin");
		e.setFavorRelativeUris(true);
		return e;
	}

	/**
	 * A throttled sign-in says so and for how long; an account that could not be read
	 * (the database down or full) says that, not "wrong password"; any other failure is
	 * the usual "do not match".
	 */
	static AuthenticationFailureHandler signInFailed() {
		return (req, res, e) -> {
			String to = e instanceof SignInThrottle.Refused r ? "/signin?locked=" + r.minutes()
					: e instanceof InternalAuthenticationServiceException ? "/signin?unavailable" : "/signin?error";
			res.sendRedirect(req.getContextPath() + to);
		};
	}

	private static void apiUnauthorized(HttpServletRequest req, HttpServletResponse res, AuthenticationException e)
			throws IOException {
		if (e instanceof SignInThrottle.Refused r) {
			// RFC 6585 §4: 429 Too Many Requests, with Retry-After in seconds (RFC 9110
			// §10.2.3)
			res.setHeader(HttpHeaders.RETRY_AFTER, Long.toString(Math.max(1, r.retryAfter().toSeconds())));
			json(res, 429, "too many wrong passwords for this account or from this address: try again in " + r.minutes()
					+ " minute(s)");
		}
		else if (e instanceof InternalAuthenticationServiceException) {
			// an account that could not be read (database down or full) is our fault, not
			// wrong credentials
			json(res, HttpServletResponse.SC_SERVICE_UNAVAILABLE,
					"the account database is not answering; try again shortly");
		}
		else {
			json(res, HttpServletResponse.SC_UNAUTHORIZED, "sign in to do this");
		}
	}

	/**
	 * An API request refused on the page chain. A write without a CSRF token from someone
	 * not signed in is a missing sign-in (401); from a signed-in session it is the
	 * missing token; else the role.
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

	/**
	 * What {@code accessDeniedPage("/error/403")} sets up, as a handler the CSRF filter
	 * also uses.
	 */
	private static AccessDeniedHandler pageDenied() {
		AccessDeniedHandlerImpl h = new AccessDeniedHandlerImpl();
		h.setErrorPage("/error/403");
		return h;
	}

	/**
	 * As every API error: an RFC 9457 problem detail with the {@code errors} list
	 * (api/Problems).
	 */
	private static void json(HttpServletResponse res, int status, String message) throws IOException {
		Problems.write(res, HttpStatus.valueOf(status), "authorization", message);
	}

	@Bean
	static RoleHierarchy roleHierarchy() {
		return RoleHierarchyImpl.withDefaultRolePrefix().role(ADMIN).implies(CHEF).role(CHEF).implies(COOK).build();
	}

	/**
	 * Limits from common practice: 5 wrong passwords pause an account and 20 pause an
	 * address for 15 minutes, well inside NIST SP 800-63B §5.2.2 (no more than 100
	 * consecutive failures per account). The address limit is the higher one because a
	 * kitchen's staff share one router.
	 */
	@Bean
	SignInThrottle signInThrottle(@Value("${crustplan.signin.max-failures-per-account:5}") int perAccount,
			@Value("${crustplan.signin.max-failures-per-address:20}") int perAddress,
			@Value("${crustplan.signin.cooling:15m}") Duration cooling) {
		return new SignInThrottle(perAccount, perAddress, cooling, Ticker.systemTicker());
	}

	@Bean
	CredentialCheckCache credentialCheckCache(PasswordEncoder passwordEncoder) {
		return new CredentialCheckCache(passwordEncoder, Ticker.systemTicker());
	}

	/**
	 * The one sign-in both chains use: throttle, then the stored hash (through the check
	 * cache).
	 */
	@Bean
	AuthenticationManager signInManager(UserDetailsService accounts, CredentialCheckCache checks,
			SignInThrottle throttle) {
		DaoAuthenticationProvider passwords = new DaoAuthenticationProvider(accounts);
		passwords.setPasswordEncoder(checks.encoder());
		return new ProviderManager(new SignInGuard(passwords, throttle));
	}

	@Bean
	PasswordEncoder passwordEncoder() {
		// BCrypt cost 10: Spring Security's default, about 0.1 s per check on a server
		// core
		return new BCryptPasswordEncoder();
	}

}
