package com.crustplan.user;

import org.springframework.security.core.userdetails.User;
import org.springframework.security.core.userdetails.UserDetails;
import org.springframework.security.core.userdetails.UserDetailsService;
import org.springframework.security.core.userdetails.UsernameNotFoundException;
import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;

/** Looks up accounts for sign-in. */
@Service
class AccountDetailsService implements UserDetailsService {

	private final UserAccountRepository users;

	AccountDetailsService(UserAccountRepository users) {
		this.users = users;
	}

	@Override
	@Transactional(readOnly = true)
	public UserDetails loadUserByUsername(String username) {
		UserAccount a = users.findByUsernameIgnoreCase(username == null ? "" : username.trim())
			.orElseThrow(() -> new UsernameNotFoundException("no such user"));
		return User.withUsername(a.getUsername())
			.password(a.getPasswordHash())
			.roles(a.getRole().name())
			.disabled(!a.isEnabled())
			.build();
	}

}
