package com.crustplan.system;

import java.lang.reflect.RecordComponent;
import java.time.Instant;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Objects;

/**
 * What a chef sees when the record they edited was saved or deleted by someone else
 * meanwhile: in words, and field by field their value beside the saved one. Shown above
 * the form, which keeps everything they typed.
 */
public record EditConflict(String message, List<Difference> differences) {

	public record Difference(String field, String yours, String saved) {
	}

	private static final DateTimeFormatter WHEN = DateTimeFormatter.ofPattern("d MMM yyyy, HH:mm 'UTC'", Locale.ENGLISH)
		.withZone(ZoneOffset.UTC);

	/**
	 * Both versions of one form record (the same record type), compared field by field as
	 * the page shows them; the temperature unit is a display choice, not a value.
	 */
	public static EditConflict between(String what, String savedName, Instant savedAt, Record yours, Record saved) {
		List<Difference> d = new ArrayList<>();
		for (RecordComponent c : yours.getClass().getRecordComponents()) {
			if (c.getName().equals("temperatureUnit")) {
				continue;
			}
			String mine = show(value(c, yours));
			String theirs = show(value(c, saved));
			if (!Objects.equals(mine, theirs)) {
				d.add(new Difference(label(c.getName()), mine, theirs));
			}
		}
		String when = savedAt == null ? "" : " at " + WHEN.format(savedAt);
		String message = "Someone else saved this " + what + " (“" + savedName + "”)" + when
				+ " while you were editing it, so your changes were not saved. Your version is in the form below; "
				+ (d.isEmpty() ? "the saved version has the same values."
						: "the saved version differs in the fields listed here.")
				+ " Save again to replace the saved version with yours, or Cancel to keep the saved one.";
		return new EditConflict(message, List.copyOf(d));
	}

	/**
	 * The record was deleted while the chef edited it: their values are kept to save as a
	 * new one.
	 */
	public static EditConflict deleted(String what) {
		return new EditConflict(
				"This " + what + " was deleted by someone else while you were editing it. "
						+ "Your values are kept in the form below: save to keep them as a new " + what + ", or Cancel.",
				List.of());
	}

	private static Object value(RecordComponent c, Record r) {
		try {
			return c.getAccessor().invoke(r);
		}
		catch (ReflectiveOperationException e) {
			throw new IllegalStateException("cannot read " + c.getName(), e);
		}
	}

	/**
	 * As a form shows it: empty text and no value alike, numbers without a trailing .0.
	 */
	static String show(Object v) {
		if (v == null || (v instanceof String s && s.isBlank())) {
			return "(empty)";
		}
		if (v instanceof Double x) {
			return Formats.number(x, 6);
		}
		if (v instanceof Boolean b) {
			return b ? "yes" : "no";
		}
		return v.toString().trim();
	}

	/** A field name in words: {@code reducingSugarPct} → "reducing sugar (%)". */
	static String label(String field) {
		String words = field.replaceAll("([A-Z])", " $1").toLowerCase(Locale.ROOT);
		String unit = null;
		for (String[] u : new String[][] { { " mg per kg", "mg/kg" }, { " g per m2", "g/m²" }, { " g per kg", "g/kg" },
				{ " pct", "%" }, { " mm", "mm" }, { " seconds", "s" }, { " kg", "kg" }, { " cm", "cm" },
				{ " kw", "kW" }, { " litres", "L" } }) {
			if (words.endsWith(u[0])) {
				words = words.substring(0, words.length() - u[0].length());
				unit = u[1];
				break;
			}
		}
		words = words.equals("ph") ? "pH" : words;
		return unit == null ? words : words + " (" + unit + ")";
	}

}
