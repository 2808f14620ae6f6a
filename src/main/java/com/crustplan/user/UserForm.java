package com.crustplan.user;

import java.nio.charset.StandardCharsets;

import jakarta.validation.constraints.NotBlank;
import jakarta.validation.constraints.Pattern;

import jakarta.validation.constraints.Size;

import com.crustplan.system.SecurityConfig;

/**
 * An account as an administrator edits it. The password is required for a new account and
 * optional on an edit (empty keeps the current one); it is hashed before it is stored and
 * never shown.
 */
public record UserForm(
		@NotBlank(message = "give a user name") @Size(min = 2, max = 60, message = "2 to 60 characters") @Pattern(
				regexp = "[A-Za-z0-9._-]*", message = "letters, digits, dot, dash and underscore only") String username,
		@NotBlank(message = "choose a role") String role, String password, Boolean enabled) {

	/**
	 * NIST SP 800-63B (2017) asks for at least 8 characters; 10 leaves a margin for a
	 * shared kitchen.
	 */
	public static final int MIN_PASSWORD = 10;

	/**
	 * BCrypt uses at most the first 72 bytes of a password (the 18 32-bit words of
	 * Blowfish's P-array that its key schedule fills; the OpenBSD implementation and
	 * Spring Security's BCrypt both stop there, and Spring Security refuses to hash
	 * more). Counted in UTF-8 (RFC 3629): an accented letter takes 2 bytes, an emoji 4.
	 */
	public static final int MAX_PASSWORD_BYTES = SecurityConfig.MAX_PASSWORD_BYTES;

	/** What is wrong with a new password, or null if it will do. */
	public static String passwordProblem(String password) {
		if (password == null || password.length() < MIN_PASSWORD) {
			return "at least " + MIN_PASSWORD + " characters";
		}
		int bytes = password.getBytes(StandardCharsets.UTF_8).length;
		if (bytes > MAX_PASSWORD_BYTES) {
			return "at most " + MAX_PASSWORD_BYTES + " bytes (" + MAX_PASSWORD_BYTES
					+ " plain letters; accents take 2, emoji 4); this one has " + bytes;
		}
		return null;
	}

	public static UserForm of(UserAccount a) {
		return new UserForm(a.getUsername(), a.getRole().name(), "", a.isEnabled());
	}

	public static UserForm blank() {
		return new UserForm("", Role.COOK.name(), "", true);
	}

	public Role roleOrNull() {
		for (Role r : Role.values()) {
			if (r.name().equalsIgnoreCase(role == null ? "" : role.trim())) {
				return r;
			}
		}
		return null;
	}

	public boolean hasPassword() {
		return password != null && !password.isEmpty();
	}

}
