package com.crustplan.system;

import java.util.List;
import java.util.Locale;

import org.springframework.context.support.ResourceBundleMessageSource;
import org.springframework.stereotype.Component;

import com.crustplan.engine.message.Argument;
import com.crustplan.engine.message.Duration;
import com.crustplan.engine.message.Message;
import com.crustplan.engine.message.PlainNumber;
import com.crustplan.engine.message.Quantity;
import com.crustplan.engine.message.StatedTemperature;
import com.crustplan.engine.message.Temperature;
import com.crustplan.engine.message.TemperatureDifference;
import com.crustplan.engine.message.Text;

/**
 * Engine and planner messages as a cook reads them: the wording from
 * {@code messages.properties}, each typed value formatted in the cook's unit. Called from
 * templates as {@code @text}; the JSON API renders in °C. Figures are formatted here, so
 * patterns take each argument as finished text. Thread-safe: one instance serves every
 * request.
 */
@Component("text")
public class MessageText {

	/**
	 * The wording is English; numbers use a point for decimals whatever the server's
	 * locale.
	 */
	static final Locale LOCALE = Locale.ENGLISH;

	private final ResourceBundleMessageSource source = new ResourceBundleMessageSource();

	/**
	 * Its own source over {@code messages.properties}, so every pattern goes through
	 * MessageFormat (an apostrophe is written '' in each), while form errors keep their
	 * default texts as written.
	 */
	public MessageText() {
		source.setBasename("messages");
		source.setDefaultEncoding("UTF-8");
		source.setFallbackToSystemLocale(false);
		source.setAlwaysUseMessageFormat(true);
	}

	/** Empty for no message, so an optional note renders as nothing. */
	public String render(Message message, TemperatureUnit unit) {
		if (message == null) {
			return "";
		}
		Object[] args = message.args().stream().map(a -> argument(a, unit)).toArray();
		return source.getMessage(message.code(), args, LOCALE);
	}

	public List<String> render(List<Message> messages, TemperatureUnit unit) {
		return messages.stream().map(m -> render(m, unit)).toList();
	}

	/**
	 * As the JSON API answers: °C, with plain spaces (the no-break spaces are for pages,
	 * where a line may end between a figure and its unit).
	 */
	public String celsius(Message message) {
		return render(message, TemperatureUnit.CELSIUS).replace(Formats.NBSP, " ");
	}

	public List<String> celsius(List<Message> messages) {
		return messages.stream().map(this::celsius).toList();
	}

	/**
	 * Every temperature in both scales, "230 °C / 446 °F": a station card hangs where
	 * cooks of either habit read it, so it names both (a code's figures as the code
	 * states them).
	 */
	public String bothScales(Message message) {
		if (message == null) {
			return "";
		}
		Object[] args = message.args().stream().map(this::bothScales).toArray();
		return source.getMessage(message.code(), args, LOCALE);
	}

	private String bothScales(Argument a) {
		if (a instanceof Message m) {
			return bothScales(m);
		}
		if (a instanceof Temperature t) {
			return Formats.bothScales(t.celsius());
		}
		if (a instanceof StatedTemperature s) {
			return whole(s.celsius()) + Formats.NBSP + "°C" + Formats.NBSP + "/ " + whole(s.fahrenheit()) + Formats.NBSP
					+ "°F";
		}
		if (a instanceof TemperatureDifference d) {
			return TemperatureUnit.CELSIUS.formatDifference(d.kelvin()) + Formats.NBSP + "/ "
					+ TemperatureUnit.FAHRENHEIT.formatDifference(d.kelvin());
		}
		return argument(a, TemperatureUnit.CELSIUS);
	}

	String argument(Argument a, TemperatureUnit unit) {
		if (a instanceof Message m) {
			return render(m, unit);
		}
		if (a instanceof Temperature t) {
			return unit.format(t.celsius());
		}
		if (a instanceof StatedTemperature s) {
			// the code's own figure in each scale; in °C the °F figure may follow, never
			// the other way round
			if (unit == TemperatureUnit.FAHRENHEIT) {
				return whole(s.fahrenheit()) + NBSP + "°F";
			}
			return whole(s.celsius()) + NBSP + "°C"
					+ (s.withFahrenheit() ? " (" + whole(s.fahrenheit()) + NBSP + "°F)" : "");
		}
		if (a instanceof TemperatureDifference d) {
			// a cook reads "40 °C cooler", not kelvin (the API too: its temperatures are
			// °C)
			return unit.formatDifference(d.kelvin());
		}
		if (a instanceof Quantity q) {
			return fixed(q.value(), q.decimals()) + NBSP + q.unit();
		}
		if (a instanceof Duration d) {
			return d.inMinutes() ? whole(d.seconds() / 60) + NBSP + "min" : whole(d.seconds()) + NBSP + "s";
		}
		if (a instanceof PlainNumber n) {
			return fixed(n.value(), n.decimals());
		}
		if (a instanceof Text t) {
			return t.text();
		}
		throw new IllegalArgumentException("no rendering for " + a);
	}

	private static final String NBSP = Formats.NBSP;

	private static String whole(double v) {
		return fixed(v, 0);
	}

	private static String fixed(double v, int decimals) {
		return Double.isFinite(v) ? String.format(Locale.ROOT, "%." + decimals + "f", v) : "–";
	}

}
