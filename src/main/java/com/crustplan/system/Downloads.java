package com.crustplan.system;

import java.nio.charset.StandardCharsets;
import java.util.Locale;

import org.springframework.http.ContentDisposition;
import org.springframework.http.HttpHeaders;
import org.springframework.http.MediaType;
import org.springframework.http.ResponseEntity;

/**
 * Files the pages hand out: a JSON record or a CSV series, named after what they hold.
 */
public final class Downloads {

	private Downloads() {
	}

	public static ResponseEntity<String> json(String body, String kind, String name) {
		return file(body, new MediaType("application", "json", StandardCharsets.UTF_8), kind, name, "json");
	}

	public static ResponseEntity<String> csv(String body, String kind, String name) {
		return file(body, new MediaType("text", "csv", StandardCharsets.UTF_8), kind, name, "csv");
	}

	private static ResponseEntity<String> file(String body, MediaType type, String kind, String name, String ext) {
		ContentDisposition d = ContentDisposition.attachment()
			.filename(kind + "-" + slug(name) + "." + ext, StandardCharsets.UTF_8)
			.build();
		return ResponseEntity.ok().contentType(type).header(HttpHeaders.CONTENT_DISPOSITION, d.toString()).body(body);
	}

	/** A file name part: lower-case letters and digits joined by dashes. */
	static String slug(String name) {
		String s = name == null ? "" : name.toLowerCase(Locale.ROOT).replaceAll("[^\\p{L}\\p{N}]+", "-");
		s = s.replaceAll("^-+|-+$", "");
		return s.isEmpty() ? "unnamed" : s.length() > 60 ? s.substring(0, 60) : s;
	}

}
