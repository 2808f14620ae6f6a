package com.crustplan.system;

import java.nio.charset.StandardCharsets;

import org.springframework.security.authentication.AuthenticationProvider;
import org.springframework.security.authentication.BadCredentialsException;
import org.springframework.security.authentication.UsernamePasswordAuthenticationToken;
import org.springframework.security.core.Authentication;
import org.springframework.security.web.authentication.WebAuthenticationDetails;

/**
 * Every password sign-in (the form and HTTP Basic) passes here before the password hash
 * is computed: a throttled account or address is refused at once, and a password longer
 * than any stored one could be (72 bytes, see {@link SecurityConfig#MAX_PASSWORD_BYTES})
 * is wrong without hashing. Then the usual check against the stored hash (Spring
 * Security's DaoAuthenticationProvider), whose outcome feeds the throttle.
 */
class SignInGuard implements AuthenticationProvider {

	private final AuthenticationProvider passwords;

	private final SignInThrottle throttle;

	SignInGuard(AuthenticationProvider passwords, SignInThrottle throttle) {
		this.passwords = passwords;
		this.throttle = throttle;
	}

	@Override
	public Authentication authenticate(Authentication presented) {
		String account = presented.getName();
		String address = presented.getDetails() instanceof WebAuthenticationDetails d ? d.getRemoteAddress() : null;
		throttle.check(account, address);
		Object credentials = presented.getCredentials();
		if (credentials != null
				&& credentials.toString().getBytes(StandardCharsets.UTF_8).length > SecurityConfig.MAX_PASSWORD_BYTES) {
			throttle.failed(account, address);
			throw new BadCredentialsException("Bad credentials");
		}
		try {
			Authentication a = passwords.authenticate(presented);
			throttle.succeeded(account);
			return a;
		}
		catch (BadCredentialsException e) {
			throttle.failed(account, address);
			throw e;
		}
	}

	@Override
	public boolean supports(Class<?> authentication) {
		return UsernamePasswordAuthenticationToken.class.isAssignableFrom(authentication);
	}

}
