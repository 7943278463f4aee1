package org.depotcast.sensors;

import java.time.LocalDate;
import java.util.Arrays;
import java.util.List;
import java.util.SplittableRandom;

/**
 * A demo pump's invented daily hours of use, seeded by the pump's asset id so a pump always gets the same series:
 * its recorded load scaled by a lasting pump factor (lognormal, σ 0.2); a seasonal swing of ±25 % peaking in March
 * (the dry season, when other sources fail); one quiet day a week at 35 %; day-to-day noise (lognormal, σ 0.15);
 * for 8 % of pumps a gradual decline to 45 % over 60 days from a day in the year; for 30 % of pumps, low-use days
 * ({@link #idleDays}); transmission gaps (1.5 % of days start one of 1–7 days with no reading); and each recorded
 * breakdown as use near nothing from some days before its
 * report (the sensor sees the stop before anyone reports it; {@link ReportDelay}) until its fix, or to the end while
 * it is open.
 */
final class DemoSensorSeries {
    /** Share of demo pumps fitted with a sensor. */
    static final double SENSOR_SHARE = 0.40;
    /** Share of sensor pumps that have low-use days while working (see seed-data/README.md: invented). */
    static final double IDLING_SHARE = 0.30;

    record Stop(LocalDate reportedOn, LocalDate fixedOn) {
    }

    /** Days from a pump's stop to its breakdown report (see seed-data/README.md for why the demo uses the second). */
    enum ReportDelay {
        /** 0–3 days, uniform: the first demo's choice, a programme where a stop is reported at once. */
        WITHIN_THREE_DAYS,
        /**
         * Poisson with a mean of 3 days, at most 14: the caretaker sees the stop, tells the committee, and word reaches
         * the area mechanic by phone or on market day; 1 stop in 20 reported the same day, 4 in 5 within 5 days.
         */
        CARETAKER_TO_MECHANIC;

        int draw(SplittableRandom random) {
            if (this == WITHIN_THREE_DAYS) {
                return random.nextInt(4);
            }
            // Knuth's product-of-uniforms method for a Poisson draw (The Art of Computer Programming, vol. 2, 3.4.1).
            double limit = Math.exp(-3.0), product = random.nextDouble();
            int days = 0;
            while (product > limit) {
                days++;
                product *= random.nextDouble();
            }
            return Math.min(14, days);
        }
    }

    /** The hours, and for each stop (in the order given) the day its use fell, and the series' own settings. */
    record Series(double[] hours, List<LocalDate> stoppedFrom, Settings settings) {
    }

    /**
     * What the series was drawn from, which a detector never sees (for the evidence tests' bound on what any detector
     * could do): the pump factor times its load, its quiet weekday (0 = Monday), the day its decline starts
     * ({@link Integer#MAX_VALUE} for none), and its chance of starting an idle spell on a day (0 for a pump that never
     * idles).
     */
    record Settings(double level, int quietWeekday, int declineFrom, double spellsPerDay) {
        /** The day's expected hours in use before noise: level, season, quiet weekday and decline. */
        double expected(LocalDate firstDay, int d) {
            LocalDate day = firstDay.plusDays(d);
            double season = 1 + 0.25 * Math.cos(2 * Math.PI * (day.getDayOfYear() - 75) / 365.25);
            double week = day.getDayOfWeek().getValue() - 1 == quietWeekday ? 0.35 : 1.0;
            double decline = d < declineFrom ? 1 : Math.max(0.45, 1 - 0.55 * (d - declineFrom) / 60.0);
            return level * season * week * decline;
        }
    }

    private DemoSensorSeries() {
    }

    static boolean hasSensor(String assetId, long seed) {
        return new SplittableRandom(seed * 1_000_003L + assetId.hashCode()).nextDouble() < SENSOR_SHARE;
    }

    /** Hours per day from {@code firstDay} for {@code days} days; NaN where no reading came. */
    static Series of(String assetId, long seed, double loadHoursPerDay, LocalDate firstDay, int days,
                     List<Stop> stops) {
        return of(assetId, seed, loadHoursPerDay, firstDay, days, stops, ReportDelay.CARETAKER_TO_MECHANIC);
    }

    static Series of(String assetId, long seed, double loadHoursPerDay, LocalDate firstDay, int days,
                     List<Stop> stops, ReportDelay delay) {
        SplittableRandom random = new SplittableRandom(seed * 7_919L + assetId.hashCode());
        double level = loadHoursPerDay * Math.exp(0.2 * random.nextGaussian());
        int quietWeekday = random.nextInt(7);
        int declineFrom = random.nextDouble() < 0.08 ? random.nextInt(days) : Integer.MAX_VALUE;
        double[] hours = new double[days];
        Settings drawn = new Settings(level, quietWeekday, declineFrom, 0);
        for (int d = 0; d < days; d++) {
            double noise = Math.exp(0.15 * random.nextGaussian());
            hours[d] = Math.min(24, Math.round(drawn.expected(firstDay, d) * noise * 100) / 100.0);
        }
        double spellsPerDay = idleDays(hours, new SplittableRandom(seed * 104_729L + assetId.hashCode() * 31L + 17));
        List<LocalDate> stoppedFrom = new java.util.ArrayList<>();
        for (Stop stop : stops) {
            LocalDate from = stop.reportedOn().minusDays(delay.draw(random));
            for (Stop earlier : stops) {
                // A pump cannot stop again before its previous repair is done.
                if (earlier.fixedOn() != null && !earlier.fixedOn().isAfter(stop.reportedOn())
                        && earlier.fixedOn().isAfter(from)) {
                    from = earlier.fixedOn();
                }
            }
            stoppedFrom.add(from);
            LocalDate to = stop.fixedOn() == null ? firstDay.plusDays(days) : stop.fixedOn();
            for (LocalDate day = from; day.isBefore(to); day = day.plusDays(1)) {
                long d = day.toEpochDay() - firstDay.toEpochDay();
                if (d >= 0 && d < days) {
                    hours[(int) d] = random.nextDouble() < 0.7 ? 0 : Math.round(random.nextDouble() * 10) / 100.0;
                }
            }
        }
        for (int d = 0; d < days; d++) {
            if (random.nextDouble() < 0.015) {
                Arrays.fill(hours, d, Math.min(days, d + 1 + random.nextInt(7)), Double.NaN);
            }
        }
        return new Series(hours, stoppedFrom, new Settings(level, quietWeekday, declineFrom, spellsPerDay));
    }

    /**
     * Low-use days of a working pump (a market day, rain, another source nearby): for 30 % of pumps ({@link #IDLING_SHARE}),
     * spells of 1 day (60 %), 2 (30 %) or 3 (10 %) days of use under a quarter of an hour, starting on a day with a
     * chance drawn once per pump between 1 in 60 and 1 in 10 (log-uniform). Drawn from their own seeded stream, so the
     * rest of the series is the same as without them. All figures are invented for the demo. Returns the pump's chance
     * of starting a spell on a day, 0 for a pump that never idles.
     */
    private static double idleDays(double[] hours, SplittableRandom random) {
        if (random.nextDouble() >= IDLING_SHARE) {
            return 0;
        }
        double spellsPerDay = Math.exp(Math.log(1 / 60.0) + random.nextDouble() * Math.log(6.0));
        for (int d = 0; d < hours.length; d++) {
            if (random.nextDouble() < spellsPerDay) {
                double length = random.nextDouble();
                int days = length < 0.6 ? 1 : length < 0.9 ? 2 : 3;
                for (int i = d; i < Math.min(hours.length, d + days); i++) {
                    hours[i] = Math.round(random.nextDouble() * 25) / 100.0;
                }
                d += days;
            }
        }
        return spellsPerDay;
    }
}
