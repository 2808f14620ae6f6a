package com.crustplan.surface;

import static java.lang.annotation.ElementType.ANNOTATION_TYPE;
import static java.lang.annotation.ElementType.CONSTRUCTOR;
import static java.lang.annotation.ElementType.FIELD;
import static java.lang.annotation.ElementType.METHOD;
import static java.lang.annotation.ElementType.PARAMETER;
import static java.lang.annotation.ElementType.TYPE_USE;
import static java.lang.annotation.RetentionPolicy.RUNTIME;

import java.lang.annotation.Documented;
import java.lang.annotation.Retention;
import java.lang.annotation.Target;

import jakarta.validation.Constraint;
import jakarta.validation.ConstraintValidator;
import jakarta.validation.ConstraintValidatorContext;
import jakarta.validation.Payload;

import com.crustplan.engine.food.SurfaceField;

/**
 * A form number within the engine's range for a surface field, read from
 * {@link SurfaceField} so the form and the engine cannot disagree. Empty passes (pair it
 * with {@code @NotNull} where a value is required). The message names the range and unit,
 * e.g. "must be 0.5 to 200 mm".
 */
@Documented
@Constraint(validatedBy = InRange.Check.class)
@Target({ METHOD, FIELD, ANNOTATION_TYPE, CONSTRUCTOR, PARAMETER, TYPE_USE })
@Retention(RUNTIME)
public @interface InRange {

	SurfaceField value();

	/** Said after the range, such as what an empty field means. */
	String orElse() default "";

	/** Not used: the message is built from the range. */
	String message() default "";

	Class<?>[] groups() default {};

	Class<? extends Payload>[] payload() default {};

	/** Checks the value against the field's range and words the message from it. */
	class Check implements ConstraintValidator<InRange, Double> {

		private SurfaceField field;

		private String message;

		@Override
		public void initialize(InRange range) {
			field = range.value();
			message = message(field, range.orElse());
		}

		@Override
		public boolean isValid(Double value, ConstraintValidatorContext context) {
			if (value == null || field.accepts(value)) {
				return true;
			}
			context.disableDefaultConstraintViolation();
			context.buildConstraintViolationWithTemplate(escaped(message)).addConstraintViolation();
			return false;
		}

		static String message(SurfaceField field, String orElse) {
			return "must be " + range(field) + (orElse.isEmpty() ? "" : ", " + orElse);
		}

		/** The range as a cook reads it: "0.5 to 200 mm". */
		static String range(SurfaceField field) {
			String unit = field.unit().isEmpty() ? "" : " " + field.unit();
			return SurfaceField.plain(field.min()) + " to " + SurfaceField.plain(field.max()) + unit;
		}

		/**
		 * The message as a literal template: braces, $ and \ would otherwise be
		 * interpolated.
		 */
		private static String escaped(String text) {
			return text.replaceAll("([{}$\\\\])", "\\\\$1");
		}

	}

}
