package com.crustplan.user;

import java.util.List;

import org.springframework.context.ApplicationEventPublisher;
import org.springframework.security.crypto.password.PasswordEncoder;
import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;

import com.crustplan.system.NotFoundException;

/** User accounts. A kitchen always keeps at least one enabled administrator. */
@Service
public class UserService {

	/** Why a change was refused, with the form field it concerns. */
	public static class Refused extends RuntimeException {

		private final String field;

		Refused(String field, String message) {
			super(message);
			this.field = field;
		}

		public String field() {
			return field;
		}

	}

	private final UserAccountRepository users;

	private final PasswordEncoder encoder;

	private final ApplicationEventPublisher events;

	UserService(UserAccountRepository users, PasswordEncoder encoder, ApplicationEventPublisher events) {
		this.users = users;
		this.encoder = encoder;
		this.events = events;
	}

	@Transactional(readOnly = true)
	public List<UserAccount> all() {
		return users.findAllByOrderByUsernameAsc();
	}

	@Transactional(readOnly = true)
	public UserAccount get(long id) {
		return users.findById(id).orElseThrow(() -> new NotFoundException("User", id));
	}

	@Transactional
	public UserAccount create(UserForm f) {
		if (users.existsByUsernameIgnoreCase(f.username().trim())) {
			throw new Refused("username", "that user name is taken");
		}
		String problem = UserForm.passwordProblem(f.password());
		if (problem != null) {
			throw new Refused("password", problem);
		}
		UserAccount a = new UserAccount(f.username().trim(), encoder.encode(f.password()), role(f));
		a.setEnabled(f.enabled() == null || f.enabled());
		return users.save(a);
	}

	@Transactional
	public UserAccount update(long id, UserForm f) {
		UserAccount a = get(id);
		Role role = role(f);
		boolean enabled = f.enabled() != null && f.enabled();
		boolean losesAdmin = a.getRole() == Role.ADMIN && a.isEnabled() && (role != Role.ADMIN || !enabled);
		if (losesAdmin
				&& users.findAll().stream().filter(u -> u.getRole() == Role.ADMIN && u.isEnabled()).count() <= 1) {
			throw new Refused("role", "this is the last administrator: make another one first");
		}
		String oldHash = a.getPasswordHash();
		boolean revoke = role != a.getRole() || enabled != a.isEnabled() || f.hasPassword();
		if (f.hasPassword()) {
			String problem = UserForm.passwordProblem(f.password());
			if (problem != null) {
				throw new Refused("password", problem);
			}
			a.setPasswordHash(encoder.encode(f.password()));
		}
		a.setRole(role);
		a.setEnabled(enabled);
		if (revoke) {
			// acted on once this change is committed (AccountSessions)
			events.publishEvent(new AccountChanged(a.getUsername(), oldHash));
		}
		return a;
	}

	private static Role role(UserForm f) {
		Role r = f.roleOrNull();
		if (r == null) {
			throw new Refused("role", "choose cook, chef or administrator");
		}
		return r;
	}

}
