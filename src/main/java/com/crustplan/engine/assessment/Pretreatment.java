package com.crustplan.engine.assessment;

import java.util.Optional;
import java.util.Set;

/**
 * What was already done to a food before it reaches the heat, so the changes that lower
 * acrylamide do not offer it again: a blanched chip has had its sugars leached once (its
 * entered composition is the blanched one).
 */
public enum Pretreatment {

	NONE("", "nothing", Set.of()), SOAKED("soaked", "soaked in cold water", Set.of("SOAK")),
	// blanching leaches the same sugars as soaking, and more: a blanched food is not
	// offered soaking either (Pedreschi et al. 2005 measured the two separately)
	BLANCHED("blanched", "blanched or parboiled in hot water", Set.of("SOAK", "BLANCH"));

	private final String key;

	private final String label;

	private final Set<String> done;

	Pretreatment(String key, String label, Set<String> done) {
		this.key = key;
		this.label = label;
		this.done = done;
	}

	public String key() {
		return key;
	}

	public String label() {
		return label;
	}

	/** The short form of the label, for a list to choose from. */
	public String choice() {
		return switch (this) {
			case NONE -> "Nothing";
			case SOAKED -> "Soaked";
			case BLANCHED -> "Blanched or parboiled";
		};
	}

	/** The codes of the changes this stands for (see {@link Mitigations}). */
	public Set<String> done() {
		return done;
	}

	/** Null or blank is {@link #NONE}; an unknown key is empty. */
	public static Optional<Pretreatment> byKey(String key) {
		if (key == null || key.isBlank()) {
			return Optional.of(NONE);
		}
		for (Pretreatment p : values()) {
			if (p.key.equalsIgnoreCase(key.trim()) || p.name().equalsIgnoreCase(key.trim())) {
				return Optional.of(p);
			}
		}
		return Optional.empty();
	}

}
