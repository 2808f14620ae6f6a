package com.crustplan.system;

import java.lang.reflect.Constructor;
import java.lang.reflect.InvocationTargetException;
import java.lang.reflect.RecordComponent;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Set;

import jakarta.validation.ConstraintViolation;
import jakarta.validation.Validator;

import org.springframework.stereotype.Component;

import tools.jackson.core.JacksonException;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * A saved record (a surface or a setup) as a file the kitchen can keep and read back:
 * JSON {@code {"kind": …, "formatVersion": 1, "<kind>": {every field of its form}}}.
 * Reading is strict, so a file that is not one of ours changes nothing: every field is
 * checked for its type, unknown fields are refused, and the form's own validation runs;
 * the first problem is reported naming the field.
 */
@Component
public class RecordFile {

	/** The version of the layout written; a file of another version is refused. */
	public static final int FORMAT_VERSION = 1;

	/** Largest file read: a surface or setup is well under 10 kB even with long notes. */
	public static final int MAX_BYTES = 64 * 1024;

	private final JsonMapper json;

	private final Validator validator;

	RecordFile(JsonMapper json, Validator validator) {
		this.json = json;
		this.validator = validator;
	}

	/** A file's reason for refusal, naming the field. */
	public static class Refused extends RuntimeException {

		private final String field;

		public Refused(String field, String reason) {
			super(field == null ? reason : field + ": " + reason);
			this.field = field;
		}

		public String field() {
			return field;
		}

	}

	public String write(String kind, Record form) {
		Map<String, Object> file = new LinkedHashMap<>();
		file.put("kind", kind);
		file.put("formatVersion", FORMAT_VERSION);
		file.put(kind, form);
		return json.writerWithDefaultPrettyPrinter().writeValueAsString(file);
	}

	/**
	 * The form a file holds, checked field by field and by the form's validation.
	 * @throws Refused naming the first field that is wrong
	 */
	public <T extends Record> T read(String kind, byte[] bytes, Class<T> type) {
		if (bytes == null || bytes.length == 0) {
			throw new Refused(null, "the file is empty; choose a " + kind + " file exported from Crustplan");
		}
		if (bytes.length > MAX_BYTES) {
			throw new Refused(null,
					"the file is larger than " + MAX_BYTES / 1024 + " kB; a " + kind + " file is far smaller");
		}
		JsonNode root;
		try {
			root = json.readTree(bytes);
		}
		catch (JacksonException e) {
			throw new Refused(null, "the file is not JSON (" + e.getOriginalMessage() + ")");
		}
		if (root == null || !root.isObject()) {
			throw new Refused(null, "the file is not a " + kind + " file: it holds no JSON object");
		}
		JsonNode k = root.get("kind");
		if (k == null || !k.isString() || !kind.equals(k.asString())) {
			throw new Refused("kind", "must be \"" + kind + "\" (this is " + (k == null ? "not a Crustplan file"
					: "a file of " + (k.isString() ? "\"" + k.asString() + "\"" : k.toString())) + ")");
		}
		JsonNode v = root.get("formatVersion");
		if (v == null || !v.isNumber() || v.doubleValue() != FORMAT_VERSION) {
			throw new Refused("formatVersion", "must be " + FORMAT_VERSION);
		}
		for (String name : root.propertyNames()) {
			if (!Set.of("kind", "formatVersion", kind).contains(name)) {
				throw new Refused(name, "is not a field of a " + kind + " file");
			}
		}
		JsonNode body = root.get(kind);
		if (body == null || !body.isObject()) {
			throw new Refused(kind, "is missing: the file holds no " + kind);
		}
		T form = construct(kind, body, type);
		Set<ConstraintViolation<T>> violations = validator.validate(form);
		if (!violations.isEmpty()) {
			ConstraintViolation<T> first = violations.stream()
				.min((a, b) -> a.getPropertyPath().toString().compareTo(b.getPropertyPath().toString()))
				.orElseThrow();
			throw new Refused(kind + "." + first.getPropertyPath(), first.getMessage());
		}
		return form;
	}

	private <T extends Record> T construct(String kind, JsonNode body, Class<T> type) {
		RecordComponent[] components = type.getRecordComponents();
		Set<String> names = new java.util.HashSet<>();
		Object[] values = new Object[components.length];
		Class<?>[] types = new Class<?>[components.length];
		for (int i = 0; i < components.length; i++) {
			RecordComponent c = components[i];
			names.add(c.getName());
			types[i] = c.getType();
			values[i] = value(kind + "." + c.getName(), body.get(c.getName()), c.getType());
		}
		for (String name : body.propertyNames()) {
			if (!names.contains(name)) {
				throw new Refused(kind + "." + name, "is not a field of a " + kind);
			}
		}
		try {
			Constructor<T> canonical = type.getDeclaredConstructor(types);
			return canonical.newInstance(values);
		}
		catch (InvocationTargetException e) {
			throw new Refused(kind, "cannot be read: " + e.getCause().getMessage());
		}
		catch (ReflectiveOperationException e) {
			throw new IllegalStateException("no canonical constructor for " + type, e);
		}
	}

	private static Object value(String field, JsonNode node, Class<?> type) {
		if (node == null || node.isNull()) {
			return null;
		}
		if (type == Double.class) {
			if (!node.isNumber()) {
				throw new Refused(field, "must be a number, not " + node);
			}
			double d = node.doubleValue();
			if (!Double.isFinite(d)) {
				throw new Refused(field, "must be a finite number");
			}
			return d;
		}
		if (type == Boolean.class) {
			if (!node.isBoolean()) {
				throw new Refused(field, "must be true or false, not " + node);
			}
			return node.booleanValue();
		}
		if (type == String.class) {
			if (!node.isString()) {
				throw new Refused(field, "must be text, not " + node);
			}
			String s = node.asString();
			if (s.chars().anyMatch(ch -> ch < 0x20 && ch != '\n' && ch != '\r' && ch != '\t')) {
				throw new Refused(field, "holds a control character");
			}
			return s;
		}
		throw new Refused(field, "cannot be read from a file");
	}

}
