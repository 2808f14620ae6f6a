package com.crustplan.user;

import java.security.SecureRandom;

import org.slf4j.Logger;
import org.slf4j.LoggerFactory;
import org.springframework.beans.factory.annotation.Value;
import org.springframework.boot.ApplicationArguments;
import org.springframework.boot.ApplicationRunner;
import org.springframework.core.annotation.Order;
import org.springframework.security.crypto.password.PasswordEncoder;
import org.springframework.stereotype.Component;
import org.springframework.transaction.annotation.Transactional;

/**
 * On a database without an administrator, creates one: name and password from
 * {@code crustplan.admin.username} / {@code crustplan.admin.password} (environment
 * CRUSTPLAN_ADMIN_USERNAME / CRUSTPLAN_ADMIN_PASSWORD), or a random password printed once
 * to the log.
 */
@Component
@Order(0)
class FirstAdmin implements ApplicationRunner {

	private static final Logger log = LoggerFactory.getLogger(FirstAdmin.class);

	/** 20 characters from a 56-symbol alphabet: about 116 bits, beyond guessing. */
	static final int RANDOM_LENGTH = 20;

	private static final String ALPHABET = "ABCDEFGHJKLMNPQRSTUVWXYZabcdefghijkmnpqrstuvwxyz23456789";

	private final UserAccountRepository users;

	private final PasswordEncoder encoder;

	private final String username;

	private final String password;

	FirstAdmin(UserAccountRepository users, PasswordEncoder encoder,
			@Value("${crustplan.admin.username:admin}") String username,
			@Value("${crustplan.admin.password:}") String password) {
		this.users = users;
		this.encoder = encoder;
		this.username = username == null || username.isBlank() ? "admin" : username.trim();
		this.password = password;
	}

	@Override
	@Transactional
	public void run(ApplicationArguments args) {
		if (users.existsByRole(Role.ADMIN) || users.existsByUsernameIgnoreCase(username)) {
			return;
		}
		boolean random = password == null || password.isEmpty();
		String problem = random ? null : UserForm.passwordProblem(password);
		if (problem != null) {
			// stop here with the setting and the reason, rather than store a hash of part
			// of it
			throw new IllegalStateException("crustplan.admin.password (CRUSTPLAN_ADMIN_PASSWORD): " + problem);
		}
		String pw = random ? randomPassword() : password;
		users.save(new UserAccount(username, encoder.encode(pw), Role.ADMIN));
		if (random) {
			// printed once: it is not stored anywhere but as a hash
			log.warn("First administrator '{}' created with the random password {} — sign in and change it.", username,
					pw);
		}
		else {
			log.info("First administrator '{}' created from the configured password.", username);
		}
	}

	static String randomPassword() {
		SecureRandom r = new SecureRandom();
		StringBuilder b = new StringBuilder(RANDOM_LENGTH);
		for (int i = 0; i < RANDOM_LENGTH; i++) {
			b.append(ALPHABET.charAt(r.nextInt(ALPHABET.length())));
		}
		return b.toString();
	}

}
