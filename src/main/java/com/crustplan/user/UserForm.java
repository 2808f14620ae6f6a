package com.crustplan.user;

import jakarta.validation.constraints.NotBlank;
import jakarta.validation.constraints.Pattern;
import jakarta.validation.constraints.Size;

/**
 * An account as an administrator edits it. The password is required for a new account and optional
 * on an edit (empty keeps the current one); it is hashed before it is stored and never shown.
 */
public record UserForm(
		@NotBlank(message = "give a user name") @Size(min = 2, max = 60, message = "2 to 60 characters") @Pattern(regexp = "[A-Za-z0-9._-]*", message = "letters, digits, dot, dash and underscore only") String username,
		@NotBlank(message = "choose a role") String role,
		@Size(max = 100, message = "at most 100 characters") String password,
		Boolean enabled) {

	/** NIST SP 800-63B (2017) asks for at least 8 characters; 10 leaves a margin for a shared kitchen. */
	public static final int MIN_PASSWORD = 10;

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
