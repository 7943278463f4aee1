package org.depotcast.common;

import jakarta.validation.ConstraintValidator;
import jakarta.validation.ConstraintValidatorContext;
import org.hibernate.validator.constraintvalidation.HibernateConstraintValidatorContext;

import java.time.LocalDate;
import java.time.OffsetDateTime;

/** Checks {@link EventDate}; a date too far ahead carries {@link DateBounds.InTheFuture} so it is answered 422. */
public final class EventDateValidator {
    private EventDateValidator() {
    }

    static boolean check(boolean tooEarly, boolean inFuture, ConstraintValidatorContext context) {
        if (!tooEarly && !inFuture) {
            return true;
        }
        context.disableDefaultConstraintViolation();
        HibernateConstraintValidatorContext hibernate = context.unwrap(HibernateConstraintValidatorContext.class);
        if (inFuture) {
            hibernate.withDynamicPayload(DateBounds.InTheFuture.INSTANCE);
        }
        // Escape the braces Bean Validation would read as message parameters (there are none, but be safe).
        String message = tooEarly ? DateBounds.earliestMessage() : DateBounds.futureMessage();
        hibernate.buildConstraintViolationWithTemplate(message.replace("{", "\\{").replace("$", "\\$"))
                .addConstraintViolation();
        return false;
    }

    public static final class ForDate implements ConstraintValidator<EventDate, LocalDate> {
        @Override
        public boolean isValid(LocalDate value, ConstraintValidatorContext context) {
            return value == null || check(DateBounds.tooEarly(value), DateBounds.eventInFuture(value), context);
        }
    }

    public static final class ForDateTime implements ConstraintValidator<EventDate, OffsetDateTime> {
        @Override
        public boolean isValid(OffsetDateTime value, ConstraintValidatorContext context) {
            return value == null || check(DateBounds.tooEarly(value), DateBounds.eventInFuture(value), context);
        }
    }
}
