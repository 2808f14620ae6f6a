package com.crustplan.api;

import java.util.ArrayDeque;
import java.util.Deque;
import java.util.Locale;

import tools.jackson.core.JsonParser;
import tools.jackson.core.JsonToken;
import tools.jackson.core.TokenStreamContext;
import tools.jackson.databind.BeanDescription;
import tools.jackson.databind.DeserializationConfig;
import tools.jackson.databind.DeserializationContext;
import tools.jackson.databind.ValueDeserializer;
import tools.jackson.databind.deser.ValueDeserializerModifier;
import tools.jackson.databind.deser.std.DelegatingDeserializer;
import tools.jackson.databind.deser.std.StdDeserializer;
import tools.jackson.databind.module.SimpleModule;

/**
 * Deserializers for request records that never fail on a value: a value of the wrong kind
 * is added to the request's {@link FieldErrors} under its JSON path and read as null, and
 * binding goes on. Only the API's request reader uses this module; the application's own
 * mapper stays strict.
 */
final class CollectingDeserializers {

	private CollectingDeserializers() {
	}

	static SimpleModule module() {
		SimpleModule m = new SimpleModule("crustplan-api-requests");
		m.addDeserializer(Double.class, new Numbers());
		m.addDeserializer(String.class, new Texts());
		m.addDeserializer(Boolean.class, new Booleans());
		m.setDeserializerModifier(new ObjectsOnly());
		return m;
	}

	/**
	 * The value's place in the request, dotted as the API names fields
	 * ({@code surface.waterPct}), list elements by their index
	 * ({@code steps[2].minutes}).
	 */
	static String path(JsonParser p) {
		TokenStreamContext c = p.streamReadContext();
		if (p.currentToken() == JsonToken.START_OBJECT || p.currentToken() == JsonToken.START_ARRAY) {
			// the parser has already entered the value; its name is in the enclosing
			// context
			c = c.getParent();
		}
		Deque<String> names = new ArrayDeque<>();
		for (; c != null && !c.inRoot(); c = c.getParent()) {
			if (c.inObject()) {
				names.push(String.valueOf(c.currentName()));
			}
			else {
				// an element of a list: its index belongs to the list's name
				String index = "[" + Math.max(0, c.getCurrentIndex()) + "]";
				names.push(names.isEmpty() ? index : index + "." + names.pop());
			}
		}
		if (names.isEmpty()) {
			return "body";
		}
		StringBuilder out = new StringBuilder();
		for (String n : names) {
			out.append(out.length() == 0 || n.startsWith("[") ? "" : ".").append(n);
		}
		return out.toString();
	}

	private static <T> T reject(JsonParser p, DeserializationContext ctxt, String message) {
		FieldErrors errors = (FieldErrors) ctxt.getAttribute(FieldErrors.class);
		errors.add(path(p), message);
		p.skipChildren();
		return null;
	}

	/**
	 * A finite number. Integers of any length are read exactly, so one too large for a
	 * double is named.
	 */
	static final class Numbers extends StdDeserializer<Double> {

		Numbers() {
			super(Double.class);
		}

		@Override
		public Double deserialize(JsonParser p, DeserializationContext ctxt) {
			JsonToken t = p.currentToken();
			if (t == JsonToken.VALUE_NUMBER_INT || t == JsonToken.VALUE_NUMBER_FLOAT) {
				// an integer beyond a long is read exactly; BigInteger.doubleValue()
				// gives Infinity past about
				// 1.8e308 (IEEE 754 binary64) where asking the parser for a double would
				// fail
				double v = t == JsonToken.VALUE_NUMBER_INT && p.getNumberType() == JsonParser.NumberType.BIG_INTEGER
						? p.getBigIntegerValue().doubleValue() : p.getDoubleValue();
				return Double.isFinite(v) ? v : reject(p, ctxt, "is too large a number");
			}
			if (t == JsonToken.VALUE_STRING) {
				String text = p.getString().trim().toLowerCase(Locale.ROOT);
				return reject(p, ctxt, text.contains("nan") || text.contains("inf")
						? "must be a finite number (NaN and Infinity are not allowed)" : "must be a number, not text");
			}
			return reject(p, ctxt, "must be a number");
		}

	}

	/**
	 * Text, trimmed; blank is read as absent, as the forms read it. Control characters
	 * are refused as sent, before the trim (which would quietly drop a NUL at either
	 * end).
	 */
	static final class Texts extends StdDeserializer<String> {

		Texts() {
			super(String.class);
		}

		@Override
		public String deserialize(JsonParser p, DeserializationContext ctxt) {
			if (p.currentToken() != JsonToken.VALUE_STRING) {
				return reject(p, ctxt, "must be text");
			}
			String raw = p.getString();
			if (!StoredText.isPlain(raw)) {
				return reject(p, ctxt, StoredText.REASON);
			}
			String v = raw.trim();
			return v.isEmpty() ? null : v;
		}

	}

	static final class Booleans extends StdDeserializer<Boolean> {

		Booleans() {
			super(Boolean.class);
		}

		@Override
		public Boolean deserialize(JsonParser p, DeserializationContext ctxt) {
			JsonToken t = p.currentToken();
			if (t == JsonToken.VALUE_TRUE || t == JsonToken.VALUE_FALSE) {
				return t == JsonToken.VALUE_TRUE;
			}
			return reject(p, ctxt, "must be true or false");
		}

	}

	/**
	 * A nested request record must come as a JSON object; anything else is named, not a
	 * failure.
	 */
	static final class ObjectsOnly extends ValueDeserializerModifier {

		@Override
		public ValueDeserializer<?> modifyDeserializer(DeserializationConfig config, BeanDescription.Supplier beanDesc,
				ValueDeserializer<?> deserializer) {
			return beanDesc.getBeanClass().isRecord() ? new ObjectOnly(deserializer) : deserializer;
		}

	}

	static final class ObjectOnly extends DelegatingDeserializer {

		ObjectOnly(ValueDeserializer<?> delegate) {
			super(delegate);
		}

		@Override
		protected ValueDeserializer<?> newDelegatingInstance(ValueDeserializer<?> delegate) {
			return new ObjectOnly(delegate);
		}

		@Override
		public Object deserialize(JsonParser p, DeserializationContext ctxt) {
			if (p.currentToken() != JsonToken.START_OBJECT) {
				return reject(p, ctxt, "must be a JSON object");
			}
			return super.deserialize(p, ctxt);
		}

	}

}
