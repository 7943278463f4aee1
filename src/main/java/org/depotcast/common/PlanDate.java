package org.depotcast.common;

import jakarta.validation.Constraint;
import jakarta.validation.Payload;

import java.lang.annotation.Documented;
import java.lang.annotation.ElementType;
import java.lang.annotation.Retention;
import java.lang.annotation.RetentionPolicy;
import java.lang.annotation.Target;

/** A planned date (expected delivery, snooze, planning date): 1900-01-01 to ten years after today (else 400). */
@Documented
@Constraint(validatedBy = PlanDateValidator.class)
@Target({ElementType.FIELD, ElementType.PARAMETER, ElementType.RECORD_COMPONENT, ElementType.METHOD, ElementType.TYPE_USE})
@Retention(RetentionPolicy.RUNTIME)
public @interface PlanDate {
    String message() default "must be between 1900-01-01 and ten years after today";

    Class<?>[] groups() default {};

    Class<? extends Payload>[] payload() default {};
}
