package com.crustplan.demo;

import java.util.List;

import org.springframework.boot.autoconfigure.condition.ConditionalOnProperty;
import org.springframework.stereotype.Component;

import com.crustplan.system.PublicAccounts;
import com.crustplan.user.Role;

/**
 * The demo kitchen's accounts: created by the loader, shown on the sign-in page while the
 * demo is enabled.
 */
@Component
@ConditionalOnProperty(name = "crustplan.demo.enabled", havingValue = "true")
class DemoAccounts implements PublicAccounts {

	record DemoAccount(String username, String password, Role role) {
	}

	static final List<DemoAccount> ALL = List.of(new DemoAccount("chef", "chef-demo", Role.CHEF),
			new DemoAccount("cook", "cook-demo", Role.COOK));

	@Override
	public List<Account> accounts() {
		return ALL.stream().map(a -> new Account(a.username(), a.password(), a.role().label())).toList();
	}

}
