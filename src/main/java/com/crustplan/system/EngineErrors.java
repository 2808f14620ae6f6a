package com.crustplan.system;

import java.util.Locale;
import java.util.function.UnaryOperator;

import org.springframework.validation.BindingResult;

import com.crustplan.engine.input.InvalidInputException;

/**
 * Puts an engine input error on the form field it belongs to, so the form shows it beside
 * the input.
 */
public final class EngineErrors {

	private EngineErrors() {
	}

	/**
	 * @param toFormField maps the engine's field name to the form's, or to null for a
	 * check across several fields (shown at the top of the form)
	 * @param temperatureFields form fields entered in the cook's unit: the engine's
	 * limits are in °C, so the message says what the entry was in °C
	 */
	public static void bind(InvalidInputException e, BindingResult result, UnaryOperator<String> toFormField,
			TemperatureUnit unit, Double enteredC, String... temperatureFields) {
		String field = toFormField.apply(e.field());
		String message = e.reason();
		if (field != null && unit == TemperatureUnit.FAHRENHEIT && enteredC != null) {
			for (String t : temperatureFields) {
				if (t.equals(field)) {
					message = message + String.format(Locale.ROOT, " (limits in °C; you entered %.0f °C)", enteredC);
				}
			}
		}
		if (field != null && !result.hasFieldErrors(field)) {
			result.rejectValue(field, "engine." + e.field(), message);
		}
		else if (field == null) {
			result.reject("engine." + e.field(), message);
		}
	}

}
