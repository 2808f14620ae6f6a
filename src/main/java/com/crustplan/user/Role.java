package com.crustplan.user;

/**
 * What a signed-in person may do; chef includes cook, admin includes chef (see
 * SecurityConfig).
 */
public enum Role {

	COOK("Cook", "views surfaces, setups and plans; records test cooks"),
	CHEF("Chef", "everything in the kitchen: surfaces, setups, plans"),
	ADMIN("Administrator", "manages user accounts, and everything a chef does");

	private final String label;

	private final String description;

	Role(String label, String description) {
		this.label = label;
		this.description = description;
	}

	public String label() {
		return label;
	}

	public String description() {
		return description;
	}

	public String authority() {
		return "ROLE_" + name();
	}

}
