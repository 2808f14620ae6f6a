package com.crustplan.system;

import java.io.IOException;

import jakarta.servlet.http.HttpServletResponse;

import org.springframework.context.annotation.Bean;
import org.springframework.context.annotation.Configuration;
import org.springframework.http.HttpMethod;
import org.springframework.http.MediaType;
import org.springframework.security.access.hierarchicalroles.RoleHierarchy;
import org.springframework.security.access.hierarchicalroles.RoleHierarchyImpl;
import org.springframework.security.config.annotation.web.builders.HttpSecurity;
import org.springframework.security.crypto.bcrypt.BCryptPasswordEncoder;
import org.springframework.security.crypto.password.PasswordEncoder;
import org.springframework.security.web.SecurityFilterChain;
import org.springframework.security.web.servlet.util.matcher.PathPatternRequestMatcher;
import org.springframework.security.web.authentication.LoginUrlAuthenticationEntryPoint;
import org.springframework.security.web.util.matcher.AnyRequestMatcher;
import org.springframework.security.web.util.matcher.RequestMatcher;

/**
 * Who may do what. Reading needs a signed-in cook; writing needs a chef; user accounts need an admin.
 * Computing an unsaved plan through the API changes nothing and is open. Pages send strangers to the
 * sign-in page; the API answers 401/403 in JSON.
 */
@Configuration
public class SecurityConfig {

	static final String CHEF = "CHEF";

	static final String COOK = "COOK";

	static final String ADMIN = "ADMIN";

	@Bean
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
				.defaultAccessDeniedHandlerFor(
						(req, res, e) -> json(res, HttpServletResponse.SC_FORBIDDEN, "your role does not allow this"),
						api)
				// pages always go to the sign-in page, whatever the Accept header says
				.defaultAuthenticationEntryPointFor(new LoginUrlAuthenticationEntryPoint("/signin"),
						AnyRequestMatcher.INSTANCE)
				.accessDeniedPage("/error/403"))
			.headers(h -> h.contentSecurityPolicy(csp -> csp.policyDirectives(
					"default-src 'self'; img-src 'self' data:; style-src 'self'; style-src-attr 'unsafe-inline'; "
							+ "script-src 'self'; "
							+ "object-src 'none'; frame-ancestors 'none'; form-action 'self'")));
		return http.build();
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
