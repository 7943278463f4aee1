package org.depotcast.common;

import io.quarkus.arc.Arc;
import io.quarkus.arc.ArcContainer;

import java.time.Clock;
import java.time.LocalDate;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;

/**
 * The documented range of dates the service accepts. Nothing recorded happened before {@link #EARLIEST}; a thing that
 * happened (a movement, a count, a receipt, a repair, a reading) may be dated at most one day after today in UTC, so
 * a phone a time zone ahead is not refused; a planned date (an expected delivery, a snooze) at most ten years ahead.
 * Year 0000 or -999999999 is refused instead of being stored as something else.
 */
public final class DateBounds {
    public static final LocalDate EARLIEST = LocalDate.of(1900, 1, 1);
    public static final int EVENT_DAYS_AHEAD = 1;
    public static final int PLAN_YEARS_AHEAD = 10;

    /** Marks a violation for a date after the latest allowed: well-formed but not yet possible, answered 422. */
    public static final class InTheFuture {
        private InTheFuture() {
        }

        public static final InTheFuture INSTANCE = new InTheFuture();
    }

    private DateBounds() {
    }

    public static LocalDate today() {
        return LocalDate.now(clock());
    }

    /**
     * The service's clock ({@link ClockProducer}). Looked up rather than injected because Bean Validation's validators
     * and CSV row checks call these helpers statically; the system clock where no container runs (plain unit tests).
     */
    private static Clock clock() {
        ArcContainer container = Arc.container();
        return container == null || !container.isRunning() ? Clock.systemUTC() : container.instance(Clock.class).get();
    }

    public static LocalDate latestEvent() {
        return today().plusDays(EVENT_DAYS_AHEAD);
    }

    public static LocalDate latestPlan() {
        return today().plusYears(PLAN_YEARS_AHEAD);
    }

    public static boolean tooEarly(LocalDate date) {
        return date.isBefore(EARLIEST);
    }

    public static boolean tooEarly(OffsetDateTime at) {
        return at.isBefore(EARLIEST.atStartOfDay().atOffset(ZoneOffset.UTC));
    }

    /** More than a day ahead of now: the end of tomorrow in UTC is the latest an event may carry. */
    public static boolean eventInFuture(LocalDate date) {
        return date.isAfter(latestEvent());
    }

    public static boolean eventInFuture(OffsetDateTime at) {
        return at.isAfter(OffsetDateTime.now(clock()).plusDays(EVENT_DAYS_AHEAD));
    }

    /** Throws a 400 naming {@code field} for a date outside [EARLIEST, today + ten years]: for filters and plans. */
    public static LocalDate requirePlausible(String field, LocalDate date) {
        if (date != null && (tooEarly(date) || date.isAfter(latestPlan()))) {
            throw new InvalidInputException(field, "must be between " + EARLIEST + " and " + latestPlan() + ", was " + date);
        }
        return date;
    }

    public static OffsetDateTime requirePlausible(String field, OffsetDateTime at) {
        if (at != null) {
            requirePlausible(field, at.withOffsetSameInstant(ZoneOffset.UTC).toLocalDate());
        }
        return at;
    }

    /**
     * Throws for a date a thing happened on: 400 before {@link #EARLIEST}, 422 more
     * than a day ahead ({@link DatedInFutureException}); for rows read outside Bean Validation.
     */
    public static LocalDate requireEvent(String field, LocalDate date) {
        if (date == null) {
            return null;
        }
        if (tooEarly(date)) {
            throw new InvalidInputException(field, earliestMessage());
        }
        if (eventInFuture(date)) {
            throw new DatedInFutureException(field);
        }
        return date;
    }

    public static String earliestMessage() {
        return "must be on or after " + EARLIEST;
    }

    public static String futureMessage() {
        return "must not be more than " + EVENT_DAYS_AHEAD + " day after today (" + today() + ", UTC)";
    }
}
