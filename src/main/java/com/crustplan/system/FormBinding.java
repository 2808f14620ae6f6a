package com.crustplan.system;

import java.beans.PropertyEditorSupport;
import java.lang.reflect.RecordComponent;
import java.util.Arrays;
import java.util.Collection;
import java.util.regex.Pattern;

import org.springframework.beans.BeanUtils;
import org.springframework.beans.PropertyAccessException;
import org.springframework.core.ResolvableType;
import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.validation.BeanPropertyBindingResult;
import org.springframework.validation.BindingResult;
import org.springframework.validation.DefaultBindingErrorProcessor;
import org.springframework.validation.FieldError;
import org.springframework.web.bind.WebDataBinder;
import org.springframework.web.bind.annotation.ControllerAdvice;
import org.springframework.web.bind.annotation.InitBinder;
import org.springframework.web.context.request.WebRequest;

import com.crustplan.api.StoredText;

/**
 * How page forms read and show numbers: plain decimals only (a comma is read as a decimal
 * point, as many kitchens type it), no NaN or Infinity. Unreadable input becomes the
 * field error "must be a number" (messages.properties), never an exception. A field sent
 * more than once is refused by name: Spring would join the values with a comma
 * ({@code 1,2}), which the decimal comma would then read as 1.2.
 */
@ControllerAdvice(annotations = Controller.class)
public class FormBinding {

	/** The message code of a field sent more than once (messages.properties). */
	static final String REPEATED = "repeated";

	/**
	 * Puts a form and its errors in the model for a page. A fresh binding result is
	 * needed because a record whose constructor binding failed (text in a number field)
	 * leaves none to render from.
	 */
	public static void put(Model model, Object form, BindingResult errors) {
		BeanPropertyBindingResult r = new BeanPropertyBindingResult(form, "form");
		if (errors != null) {
			r.addAllErrors(errors);
		}
		model.addAttribute("form", form);
		model.addAttribute(BindingResult.MODEL_KEY_PREFIX + "form", r);
	}

	@InitBinder
	void numbers(WebDataBinder binder, WebRequest request) {
		binder.registerCustomEditor(Double.class, new DecimalEditor());
		binder.registerCustomEditor(String.class, new PlainTextEditor());
		// a password is taken exactly as typed: sign-in compares it untrimmed
		binder.registerCustomEditor(String.class, "password", new PropertyEditorSupport() {
			@Override
			public void setAsText(String text) {
				setValue(text);
			}
		});
		request.getParameterMap().forEach((name, values) -> {
			if (values.length > 1 && singleValued(binder, name)) {
				binder.registerCustomEditor(null, name, new RepeatedEditor());
			}
		});
		binder.setBindingErrorProcessor(new RepeatedFieldErrors());
	}

	/** Whether the form has {@code name} as a field that takes one value (not a list). */
	private static boolean singleValued(WebDataBinder binder, String name) {
		ResolvableType target = binder.getTargetType();
		Class<?> type = target != null ? target.resolve()
				: binder.getTarget() != null ? binder.getTarget().getClass() : null;
		if (type == null) {
			return false;
		}
		Class<?> field = type.isRecord() ? Arrays.stream(type.getRecordComponents())
			.filter(c -> c.getName().equals(name))
			.map(RecordComponent::getType)
			.findFirst()
			.orElse(null) : BeanUtils.findPropertyType(name, type);
		return field != null && field != Object.class && !field.isArray() && !Collection.class.isAssignableFrom(field);
	}

	/**
	 * Text fields: trimmed, after {@link StoredText} has checked the text as sent; a
	 * control character becomes the field error {@code typeMismatch} (messages.properties
	 * says why).
	 */
	static final class PlainTextEditor extends PropertyEditorSupport {

		@Override
		public void setAsText(String text) {
			if (!StoredText.isPlain(text)) {
				throw new IllegalArgumentException(StoredText.REASON);
			}
			setValue(text == null ? null : text.trim());
		}

	}

	static final class DecimalEditor extends PropertyEditorSupport {

		private static final Pattern DECIMAL = Pattern.compile("[+-]?(\\d+([.,]\\d*)?|[.,]\\d+)([eE][+-]?\\d{1,3})?");

		@Override
		public void setAsText(String text) {
			if (text == null || text.isBlank()) {
				setValue(null);
				return;
			}
			String t = text.trim();
			if (t.length() > 40 || !DECIMAL.matcher(t).matches()) {
				throw new IllegalArgumentException("not a number");
			}
			double v = Double.parseDouble(t.replace(',', '.'));
			if (!Double.isFinite(v)) {
				throw new IllegalArgumentException("not a finite number");
			}
			setValue(v);
		}

	}

	/**
	 * Registered only for a field that came more than once: whatever it was joined into
	 * is refused.
	 */
	static final class RepeatedEditor extends PropertyEditorSupport {

		@Override
		public void setAsText(String text) {
			throw new IllegalArgumentException(REPEATED);
		}

	}

	/**
	 * Names a repeated field's error {@code repeated} instead of the usual type mismatch.
	 */
	static final class RepeatedFieldErrors extends DefaultBindingErrorProcessor {

		@Override
		public void processPropertyAccessException(PropertyAccessException ex, BindingResult result) {
			Throwable cause = ex.getCause();
			if (cause == null || !REPEATED.equals(cause.getMessage())) {
				super.processPropertyAccessException(ex, result);
				return;
			}
			String field = ex.getPropertyName();
			result.addError(new FieldError(result.getObjectName(), field, ex.getValue(), true,
					result.resolveMessageCodes(REPEATED, field), null, "was sent more than once; give one value"));
		}

	}

}
