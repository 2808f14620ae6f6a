package com.crustplan.system;

import java.time.ZoneId;
import java.time.Instant;
import java.time.format.DateTimeFormatter;
import java.util.Locale;

import org.springframework.stereotype.Component;

/** Number and time formats for the pages, called from templates as {@code @fmt}. */
@Component("fmt")
public class Formats {

	public String temp(Double celsius, TemperatureUnit unit) {
		return celsius == null ? "–" : unit.format(celsius);
	}

	/** A no-break space: a figure never parts from its unit at a line end. */
	static final String NBSP = "\u00a0";

	/**
	 * Text for the JSON API: the pages' no-break spaces as plain spaces, so the API's
	 * wording stays as it was.
	 */
	public static String apiText(String pageText) {
		return pageText == null ? null : pageText.replace(NBSP, " ");
	}

	public static java.util.List<String> apiText(java.util.List<String> pageTexts) {
		return pageTexts.stream().map(Formats::apiText).toList();
	}

	/** "230 °C / 446 °F", for pages read in either scale (the station card). */
	public String tempBoth(Double celsius) {
		return celsius == null ? "–" : bothScales(celsius);
	}

	/**
	 * A rule's figures as the rule states them in each scale ("68 °C / 155 °F", where a
	 * conversion would give 154 °F).
	 */
	public String tempStated(double celsius, double fahrenheit) {
		return String.format(Locale.ROOT, "%.0f%s°C%s/ %.0f%s°F", celsius, NBSP, NBSP, fahrenheit, NBSP);
	}

	static String bothScales(double celsius) {
		if (!Double.isFinite(celsius)) {
			return "–";
		}
		return String.format(Locale.ROOT, "%.0f%s°C%s/ %.0f%s°F", celsius, NBSP, NBSP,
				TemperatureUnit.FAHRENHEIT.fromCelsius(celsius), NBSP);
	}

	/**
	 * Whole seconds of a time, the one rule for every time on a page: floored, as a
	 * kitchen timer counts (26:12.7 shows 26:12 at the top and in the steps table alike).
	 * A hair under a whole second (floating point) counts as that second.
	 */
	public static long wholeSeconds(double seconds) {
		return (long) Math.floor(seconds + 1e-6);
	}

	/** Minutes and seconds the way a kitchen timer shows them. */
	public static String duration(double seconds) {
		if (!Double.isFinite(seconds)) {
			return "–";
		}
		long s = wholeSeconds(seconds);
		long h = s / 3600;
		long m = (s % 3600) / 60;
		long r = s % 60;
		if (h > 0) {
			return String.format(Locale.ROOT, "%d%sh%s%02d%smin", h, NBSP, NBSP, m, NBSP);
		}
		if (m > 0) {
			return String.format(Locale.ROOT, "%d%smin%s%02d%ss", m, NBSP, NBSP, r, NBSP);
		}
		return r + NBSP + "s";
	}

	public String time(Double seconds) {
		return seconds == null ? "–" : duration(seconds);
	}

	/** mm:ss labels under the colour swatches and in the steps table. */
	public String clock(double seconds) {
		if (!Double.isFinite(seconds)) {
			return "–";
		}
		long s = wholeSeconds(seconds);
		return String.format(Locale.ROOT, "%d:%02d", s / 60, s % 60);
	}

	/** Up to {@code digits} decimals, trailing zeros dropped. */
	public static String number(double v, int digits) {
		if (!Double.isFinite(v)) {
			return "–";
		}
		String s = String.format(Locale.ROOT, "%." + digits + "f", v);
		if (s.contains(".")) {
			s = s.replaceAll("0+$", "").replaceAll("\\.$", "");
		}
		return s.equals("-0") ? "0" : s;
	}

	/**
	 * Four significant figures for model constants (1.6e+05 stays readable next to 0.85).
	 */
	public String sig(double v) {
		if (v != 0 && (Math.abs(v) >= 1e5 || Math.abs(v) < 1e-3)) {
			return String.format(Locale.ROOT, "%.3g", v)
				.replace("e+0", "×10^")
				.replace("e-0", "×10^-")
				.replace("e+", "×10^")
				.replace("e-", "×10^-");
		}
		return number(v, 4);
	}

	private static final DateTimeFormatter DATE = DateTimeFormatter.ofPattern("d MMM yyyy", Locale.UK);

	private static final DateTimeFormatter DATE_TIME = DateTimeFormatter.ofPattern("d MMM yyyy, HH:mm", Locale.UK);

	/** Dates in the server's zone: a kitchen's server sits in the kitchen's time zone. */
	public String date(Instant t) {
		return t == null ? "–" : DATE.format(t.atZone(ZoneId.systemDefault()));
	}

	public String dateTime(Instant t) {
		return t == null ? "–" : DATE_TIME.format(t.atZone(ZoneId.systemDefault()));
	}

	/** A form input's value: up to 6 decimals, no trailing zeros, empty for none. */
	public String plain(Object v) {
		if (v instanceof Double d) {
			return Double.isFinite(d) ? number(d, 6) : "";
		}
		return v == null ? "" : v.toString();
	}

	/** A relative change as a signed percentage: −30 %, +5 %. */
	public String signedPct(double relative) {
		if (!Double.isFinite(relative)) {
			return "–";
		}
		long p = Math.round(relative * 100);
		return (p > 0 ? "+" : p < 0 ? "−" : "") + Math.abs(p) + NBSP + "%";
	}

	public String num(Double v, int digits) {
		return v == null ? "–" : number(v, digits);
	}

}
