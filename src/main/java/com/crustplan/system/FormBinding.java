package com.crustplan.system;

import java.beans.PropertyEditorSupport;

import org.springframework.stereotype.Controller;
import org.springframework.web.bind.WebDataBinder;
import org.springframework.web.bind.annotation.ControllerAdvice;
import org.springframework.web.bind.annotation.InitBinder;

/**
 * How page forms read and show numbers: plain decimals only (a comma is read as a decimal point, as
 * many kitchens type it), no NaN or Infinity. Unreadable input becomes
 * the field error "must be a number" (messages.properties), never an exception.
 */
@ControllerAdvice(annotations = Controller.class)
public class FormBinding {

	/**
	 * Puts a form and its errors in the model for a page. A fresh binding result is needed because a
	 * record whose constructor binding failed (text in a number field) leaves none to render from.
	 */
	public static void put(org.springframework.ui.Model model, Object form,
			org.springframework.validation.BindingResult errors) {
		org.springframework.validation.BeanPropertyBindingResult r = new org.springframework.validation.BeanPropertyBindingResult(
				form, "form");
		if (errors != null) {
			r.addAllErrors(errors);
		}
		model.addAttribute("form", form);
		model.addAttribute(org.springframework.validation.BindingResult.MODEL_KEY_PREFIX + "form", r);
	}

	@InitBinder
	void numbers(WebDataBinder binder) {
		binder.registerCustomEditor(Double.class, new DecimalEditor());
		binder.registerCustomEditor(String.class, new PlainTextEditor());
		// a password is taken exactly as typed: sign-in compares it untrimmed
		binder.registerCustomEditor(String.class, "password", new PropertyEditorSupport() {
			@Override
			public void setAsText(String text) {
				setValue(text);
			}
		});
	}

	/**
	 * Text fields: trimmed, after {@link StoredText} has checked the text as sent; a control
	 * character becomes the field error {@code typeMismatch} (messages.properties says why).
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

		private static final java.util.regex.Pattern DECIMAL = java.util.regex.Pattern
			.compile("[+-]?(\\d+([.,]\\d*)?|[.,]\\d+)([eE][+-]?\\d{1,3})?");

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

}
