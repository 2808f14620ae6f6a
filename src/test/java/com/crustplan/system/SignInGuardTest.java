package com.crustplan.system;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.time.Duration;
import java.util.List;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.atomic.AtomicLong;

import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.springframework.mock.web.MockHttpServletRequest;
import org.springframework.security.authentication.BadCredentialsException;
import org.springframework.security.authentication.DisabledException;
import org.springframework.security.authentication.UsernamePasswordAuthenticationToken;
import org.springframework.security.authentication.dao.DaoAuthenticationProvider;
import org.springframework.security.core.Authentication;
import org.springframework.security.core.AuthenticationException;
import org.springframework.security.core.userdetails.User;
import org.springframework.security.crypto.bcrypt.BCryptPasswordEncoder;
import org.springframework.security.crypto.password.PasswordEncoder;
import org.springframework.security.provisioning.InMemoryUserDetailsManager;
import org.springframework.security.web.authentication.WebAuthenticationDetails;

/**
 * The sign-in path as SecurityConfig builds it, with a counter on the password hash: a
 * throttled or over-long attempt must not reach the hash, and a repeated right password
 * must reach it once. BCrypt at cost 4, the lowest Spring Security's BCrypt accepts,
 * keeps the test quick.
 */
class SignInGuardTest {

	final AtomicLong now = new AtomicLong();

	final AtomicInteger hashes = new AtomicInteger();

	final PasswordEncoder bcrypt = new BCryptPasswordEncoder(4);

	final PasswordEncoder counted = new PasswordEncoder() {
		@Override
		public String encode(CharSequence raw) {
			return bcrypt.encode(raw);
		}

		@Override
		public boolean matches(CharSequence raw, String encoded) {
			hashes.incrementAndGet();
			return bcrypt.matches(raw, encoded);
		}
	};

	final InMemoryUserDetailsManager accounts = new InMemoryUserDetailsManager();

	final SignInThrottle throttle = new SignInThrottle(5, 20, Duration.ofMinutes(15), now::get);

	final CredentialCheckCache checks = new CredentialCheckCache(counted, now::get);

	SignInGuard guard;

	@BeforeEach
	void setUp() {
		accounts.createUser(
				User.withUsername("api-chef").password(bcrypt.encode("line chef passphrase")).roles("CHEF").build());
		DaoAuthenticationProvider passwords = new DaoAuthenticationProvider(accounts);
		passwords.setPasswordEncoder(checks.encoder());
		guard = new SignInGuard(passwords, throttle);
	}

	@Test
	void shouldRefuseTheSixthAttemptWithoutComputingTheHashEvenWithTheRightPassword() {
		for (int i = 0; i < 5; i++) {
			assertThatThrownBy(() -> guard.authenticate(token("api-chef", "a wrong guess", "192.0.2.1")))
				.isInstanceOf(BadCredentialsException.class);
		}
		int spent = hashes.get();
		assertThat(spent).isEqualTo(5);
		assertThatThrownBy(() -> guard.authenticate(token("api-chef", "line chef passphrase", "198.51.100.2")))
			.isInstanceOf(SignInThrottle.Refused.class);
		assertThat(hashes.get()).isEqualTo(spent);
		now.addAndGet(Duration.ofMinutes(15).plusSeconds(1).toNanos());
		assertThat(guard.authenticate(token("api-chef", "line chef passphrase", "198.51.100.2")).isAuthenticated())
			.isTrue();
	}

	@Test
	void shouldCutOffAFloodFromOneAddressAfterTwentyHashesWhateverTheNames() {
		for (int i = 0; i < 100; i++) {
			String name = "nobody-" + i;
			// wrong for the first 20, refused unheard after that
			assertThatThrownBy(() -> guard.authenticate(token(name, "guess", "203.0.113.66")))
				.isInstanceOf(AuthenticationException.class);
		}
		// an unknown name still costs one hash (Spring Security hides which names exist),
		// but only 20 of them
		assertThat(hashes.get()).isEqualTo(20);
		// a client elsewhere signs in as usual
		assertThat(guard.authenticate(token("api-chef", "line chef passphrase", "203.0.113.67")).isAuthenticated())
			.isTrue();
	}

	@Test
	void shouldTreatAPasswordOverSeventyTwoBytesAsWrongWithoutHashing() {
		// 20 emoji of 4 bytes each in UTF-8 (RFC 3629): 80 bytes, beyond BCrypt's 72
		String emoji = "\uD83C\uDF5F".repeat(20);
		assertThatThrownBy(() -> guard.authenticate(token("api-chef", emoji, "192.0.2.1")))
			.isInstanceOf(BadCredentialsException.class);
		assertThat(hashes.get()).isZero();
	}

	@Test
	void shouldHashARepeatedRightPasswordOnceAndAWrongOneEveryTime() {
		for (int i = 0; i < 10; i++) {
			Authentication a = guard.authenticate(token("api-chef", "line chef passphrase", "192.0.2.1"));
			assertThat(a.getAuthorities()).extracting(Object::toString).contains("ROLE_CHEF");
		}
		assertThat(hashes.get()).isEqualTo(1);
		for (int i = 0; i < 3; i++) {
			assertThatThrownBy(() -> guard.authenticate(token("api-chef", "line chef passphrasf", "192.0.2.1")))
				.isInstanceOf(BadCredentialsException.class);
		}
		assertThat(hashes.get()).isEqualTo(4);
	}

	@Test
	void shouldReadTheAccountAfreshDespiteARememberedPassword() {
		guard.authenticate(token("api-chef", "line chef passphrase", "192.0.2.1"));
		// demoted: the role comes from the account, not from the remembered check
		accounts.updateUser(User.withUsername("api-chef")
			.password(accounts.loadUserByUsername("api-chef").getPassword())
			.roles("COOK")
			.build());
		assertThat(roles(guard.authenticate(token("api-chef", "line chef passphrase", "192.0.2.1"))))
			.containsExactly("ROLE_COOK");
		// disabled
		accounts.updateUser(User.withUsername("api-chef")
			.password(accounts.loadUserByUsername("api-chef").getPassword())
			.roles("COOK")
			.disabled(true)
			.build());
		assertThatThrownBy(() -> guard.authenticate(token("api-chef", "line chef passphrase", "192.0.2.1")))
			.isInstanceOf(DisabledException.class);
		// a new password is a new salted hash: the old password no longer passes
		accounts.updateUser(
				User.withUsername("api-chef").password(bcrypt.encode("a brand new passphrase")).roles("CHEF").build());
		assertThatThrownBy(() -> guard.authenticate(token("api-chef", "line chef passphrase", "192.0.2.1")))
			.isInstanceOf(BadCredentialsException.class);
		assertThat(guard.authenticate(token("api-chef", "a brand new passphrase", "192.0.2.1")).isAuthenticated())
			.isTrue();
	}

	@Test
	void shouldForgetRememberedChecksAfterTheirTimeOrWhenTheAccountChanges() {
		String hash = accounts.loadUserByUsername("api-chef").getPassword();
		assertThat(checks.matches("line chef passphrase", hash)).isTrue();
		assertThat(checks.matches("line chef passphrase", hash)).isTrue();
		assertThat(hashes.get()).isEqualTo(1);
		checks.forget(hash);
		assertThat(checks.matches("line chef passphrase", hash)).isTrue();
		assertThat(hashes.get()).isEqualTo(2);
		now.addAndGet(CredentialCheckCache.REMEMBER.plusSeconds(1).toNanos());
		assertThat(checks.matches("line chef passphrase", hash)).isTrue();
		assertThat(hashes.get()).isEqualTo(3);
	}

	private static List<String> roles(Authentication a) {
		return a.getAuthorities().stream().map(Object::toString).filter(r -> r.startsWith("ROLE_")).toList();
	}

	private static UsernamePasswordAuthenticationToken token(String name, String password, String address) {
		MockHttpServletRequest req = new MockHttpServletRequest();
		req.setRemoteAddr(address);
		UsernamePasswordAuthenticationToken t = UsernamePasswordAuthenticationToken.unauthenticated(name, password);
		t.setDetails(new WebAuthenticationDetails(req));
		return t;
	}

}
