package org.depotcast.common;

import jakarta.validation.ConstraintValidator;
import jakarta.validation.ConstraintValidatorContext;

import java.time.LocalDate;

/** Checks {@link PlanDate}. */
public final class PlanDateValidator implements ConstraintValidator<PlanDate, LocalDate> {
    @Override
    public boolean isValid(LocalDate value, ConstraintValidatorContext context) {
        return value == null || !(DateBounds.tooEarly(value) || value.isAfter(DateBounds.latestPlan()));
    }
}
