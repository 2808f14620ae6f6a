package com.crustplan.api;

import java.io.IOException;
import java.io.InputStreamReader;
import java.lang.reflect.Type;
import java.nio.charset.Charset;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.Map;

import org.springframework.core.ResolvableType;
import org.springframework.http.HttpInputMessage;
import org.springframework.http.HttpOutputMessage;
import org.springframework.http.MediaType;
import org.springframework.http.converter.HttpMessageNotWritableException;
import org.springframework.http.converter.SmartHttpMessageConverter;

import tools.jackson.core.JacksonException;
import tools.jackson.core.JsonParser;
import tools.jackson.core.JsonToken;
import tools.jackson.core.StreamReadFeature;
import tools.jackson.core.exc.StreamConstraintsException;
import tools.jackson.databind.DeserializationFeature;
import tools.jackson.databind.ObjectReader;
import tools.jackson.databind.json.JsonMapper;

/**
 * Reads a request body into {@link Bound}{@code <T>}: Jackson binds the record from the
 * stream (never the whole body into a string) and {@link CollectingDeserializers} turn
 * each wrong value into a field error. What cannot be bound at all (not JSON, not an
 * object) is a 400 on {@code body}. Read whatever the Content-Type says, as the API
 * always has; the charset, when given, is honoured.
 */
final class BoundBodyConverter implements SmartHttpMessageConverter<Bound<?>> {

	private final JsonMapper mapper;

	BoundBodyConverter(JsonMapper json) {
		this.mapper = json.rebuild()
			.addModule(CollectingDeserializers.module())
			// unknown fields are ignored, as they always were; a field given twice is
			// refused (RFC 8259 §4:
			// names SHOULD be unique, and readers disagree on which value wins)
			.disable(DeserializationFeature.FAIL_ON_UNKNOWN_PROPERTIES)
			.enable(StreamReadFeature.STRICT_DUPLICATE_DETECTION)
			.build();
	}

	@Override
	public boolean canRead(ResolvableType type, MediaType mediaType) {
		return Bound.class == type.toClass();
	}

	@Override
	public boolean canWrite(ResolvableType type, Class<?> valueClass, MediaType mediaType) {
		return false;
	}

	@Override
	public List<MediaType> getSupportedMediaTypes() {
		return List.of(MediaType.ALL);
	}

	@Override
	public Bound<?> read(ResolvableType type, HttpInputMessage input, Map<String, Object> hints) {
		FieldErrors errors = new FieldErrors();
		Type target = type.getGeneric(0).getType();
		ObjectReader reader = this.mapper.readerFor(this.mapper.constructType(target))
			.withAttribute(FieldErrors.class, errors);
		MediaType contentType = input.getHeaders().getContentType();
		Charset charset = contentType == null ? null : contentType.getCharset();
		JsonParser p = null;
		try {
			// Jackson detects UTF-8/16/32 from the bytes itself (RFC 8259 §8.1); another
			// charset is decoded first
			p = (charset == null || charset.equals(StandardCharsets.UTF_8)) ? reader.createParser(input.getBody())
					: reader.createParser(new InputStreamReader(input.getBody(), charset));
			JsonToken first = p.nextToken();
			if (first == null) {
				return new Bound<>(null, errors);
			}
			if (first != JsonToken.START_OBJECT) {
				throw InvalidRequestException.of("body", "must be a JSON object");
			}
			Object value = reader.readValue(p);
			if (p.nextToken() != null) {
				throw InvalidRequestException.of("body", "malformed JSON: more content after the object");
			}
			return new Bound<>(value, errors);
		}
		catch (StreamConstraintsException e) {
			// a reading limit (number length, nesting depth): named where the parser
			// stood
			throw InvalidRequestException.of(CollectingDeserializers.path(p), "is too long: " + shortMessage(e));
		}
		catch (JacksonException e) {
			BodyTooLargeException tooLarge = BodyTooLargeException.in(e);
			if (tooLarge != null) {
				throw tooLarge;
			}
			throw InvalidRequestException.of("body", "malformed JSON: " + shortMessage(e));
		}
		catch (IOException e) {
			throw InvalidRequestException.of("body", "could not be read: " + e.getMessage());
		}
		finally {
			if (p != null) {
				p.close();
			}
		}
	}

	@Override
	public void write(Bound<?> value, ResolvableType type, MediaType contentType, HttpOutputMessage output,
			Map<String, Object> hints) {
		// canWrite is false: Spring never asks this converter to write; a bound body is
		// read-only
		throw new HttpMessageNotWritableException("a bound request body is never written");
	}

	private static String shortMessage(JacksonException e) {
		String m = e.getOriginalMessage();
		if (m == null) {
			return "cannot be read";
		}
		m = m.replaceAll("[\\r\\n]+", " ");
		return m.length() > 200 ? m.substring(0, 200) + "…" : m;
	}

}
