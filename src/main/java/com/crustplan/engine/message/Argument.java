package com.crustplan.engine.message;

/**
 * A value inside a {@link Message}, typed so the page can show it in the cook's units: a
 * temperature stays a temperature until it is rendered.
 */
public sealed interface Argument
		permits Temperature, StatedTemperature, TemperatureDifference, Quantity, Duration, PlainNumber, Text, Message {

}
