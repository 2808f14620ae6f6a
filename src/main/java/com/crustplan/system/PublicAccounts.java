package com.crustplan.system;

import java.util.List;

/**
 * Accounts whose passwords the sign-in page shows openly. Only the demo kitchen supplies
 * them (its accounts are invented and public); without a bean of this type the page shows
 * none.
 */
public interface PublicAccounts {

	List<Account> accounts();

	/** A sign-in the page shows: user name, password and the role's label. */
	record Account(String username, String password, String role) {
	}

}
