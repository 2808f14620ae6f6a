package com.crustplan.system;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;
import org.springframework.mock.web.MockHttpServletRequest;
import org.springframework.mock.web.MockHttpServletResponse;
import org.springframework.security.authentication.BadCredentialsException;
import org.springframework.security.authentication.InternalAuthenticationServiceException;
import org.springframework.security.core.AuthenticationException;
import org.springframework.security.web.authentication.AuthenticationFailureHandler;

/**
 * Where a failed form sign-in sends the cook (issue 13: with the database down, sign-in
 * read as a wrong password). Spring Security wraps an account that could not be read in
 * InternalAuthenticationServiceException, a wrong password in BadCredentialsException.
 */
class SignInFailureTest {

	private static String redirectFor(Exception e) throws Exception {
		AuthenticationFailureHandler handler = SecurityConfig.signInFailed();
		MockHttpServletResponse res = new MockHttpServletResponse();
		handler.onAuthenticationFailure(new MockHttpServletRequest("POST", "/signin"), res,
				(AuthenticationException) e);
		return res.getRedirectedUrl();
	}

	@Test
	void shouldSayTheDatabaseIsNotAnsweringRatherThanWrongPassword() throws Exception {
		assertThat(redirectFor(new InternalAuthenticationServiceException("Connection is not available")))
			.isEqualTo("/signin?unavailable");
	}

	@Test
	void shouldSayAWrongPasswordDoesNotMatch() throws Exception {
		assertThat(redirectFor(new BadCredentialsException("Bad credentials"))).isEqualTo("/signin?error");
	}

}
