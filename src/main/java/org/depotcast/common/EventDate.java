package org.depotcast.common;

import jakarta.validation.Constraint;
import jakarta.validation.Payload;

import java.lang.annotation.Documented;
import java.lang.annotation.ElementType;
import java.lang.annotation.Retention;
import java.lang.annotation.RetentionPolicy;
import java.lang.annotation.Target;

/**
 * The date (or date-time) something happened: on or after 1900-01-01 (else 400) and at most one day after today in
 * UTC (else 422, {@link DateBounds}). For {@code LocalDate} and {@code OffsetDateTime}; null passes.
 */
@Documented
@Constraint(validatedBy = {EventDateValidator.ForDate.class, EventDateValidator.ForDateTime.class})
@Target({ElementType.FIELD, ElementType.PARAMETER, ElementType.RECORD_COMPONENT, ElementType.METHOD, ElementType.TYPE_USE})
@Retention(RetentionPolicy.RUNTIME)
public @interface EventDate {
    String message() default "must be between 1900-01-01 and one day after today";

    Class<?>[] groups() default {};

    Class<? extends Payload>[] payload() default {};
}
