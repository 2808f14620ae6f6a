package com.crustplan.setup;

import java.util.Arrays;
import java.util.Optional;

/**
 * The four ways heat reaches food, with the words a cook uses and which settings each one
 * reads.
 */
public enum HeatMode {

	PAN("pan", "Pan or griddle (contact)", true, false, false, true),
	OVEN("oven", "Oven (hot air)", false, true, true, false),
	GRILL("grill", "Radiant grill (salamander, broiler)", true, false, false, false),
	FRYER("fryer", "Deep fryer (oil)", false, false, false, false);

	private final String key;

	private final String label;

	private final boolean usesFlip;

	private final boolean usesFan;

	private final boolean usesSteam;

	private final boolean usesFatFilm;

	HeatMode(String key, String label, boolean usesFlip, boolean usesFan, boolean usesSteam, boolean usesFatFilm) {
		this.key = key;
		this.label = label;
		this.usesFlip = usesFlip;
		this.usesFan = usesFan;
		this.usesSteam = usesSteam;
		this.usesFatFilm = usesFatFilm;
	}

	public static Optional<HeatMode> byKey(String key) {
		return Arrays.stream(values()).filter(m -> m.key.equalsIgnoreCase(key == null ? "" : key.trim())).findFirst();
	}

	public String key() {
		return key;
	}

	public String label() {
		return label;
	}

	public boolean usesFlip() {
		return usesFlip;
	}

	public boolean usesFan() {
		return usesFan;
	}

	public boolean usesSteam() {
		return usesSteam;
	}

	/**
	 * A grill reads its kind, and either a heat flux at the food or an element
	 * temperature with a distance.
	 */
	public boolean usesGrill() {
		return this == GRILL;
	}

	public boolean usesFatFilm() {
		return usesFatFilm;
	}

	/** What the dial temperature means in this mode. */
	public String temperatureLabel() {
		return switch (this) {
			case PAN -> "Pan surface temperature";
			case OVEN -> "Oven air temperature";
			case GRILL -> "Heating element temperature";
			case FRYER -> "Oil temperature";
		};
	}

}
