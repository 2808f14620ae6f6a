package com.crustplan.plan;

/**
 * One step row of the plan page: {@code setup} is a saved setup's id or {@link #REST},
 * and the step ends after {@code minutes}, at a {@code stage}, or at a {@code core}
 * temperature (in the form's unit), whichever comes first. A row with no setup is left
 * out.
 */
public record StepForm(String setup, Double minutes, String stage, Double core) {

	/** The value of the "rest in kitchen air" choice. */
	public static final String REST = "rest";

	public boolean blank() {
		return setup == null || setup.isBlank();
	}

	public boolean rest() {
		return REST.equals(setup == null ? null : setup.trim());
	}

	/** The saved setup's id, or null for a rest or an unreadable value. */
	public Long setupId() {
		if (blank() || rest()) {
			return null;
		}
		try {
			return Long.valueOf(setup.trim());
		}
		catch (NumberFormatException e) {
			return null;
		}
	}

	public String stageOrNull() {
		return stage == null || stage.isBlank() ? null : stage.trim();
	}

}
