package org.depotcast.forecasting;

import org.junit.jupiter.api.Test;

import java.util.Locale;
import java.util.SplittableRandom;

import static org.junit.jupiter.api.Assertions.assertEquals;

/** The reference is the JDK's own formatter: every text must be what {@code String.format("%.nf")} writes. */
class FixedDecimalsTest {

    @Test
    void writesWhatTheJdkFormatterWritesOnHalfwayAndAwkwardValues() {
        double[] values = {0, -0.0, -0.001, -2.5, -0.125, 0.125, 0.375, 2.5, 0.005, 0.015, 1.005, 0.0000005, 0.0000015, 1e-7, 123456789.1234565,
                1e15, 4.35, 0.1 + 0.2, Double.MIN_VALUE, 9.9999995, 0.9999995, Double.NaN, Double.POSITIVE_INFINITY};
        for (int places : new int[]{2, 6}) {
            for (double v : values) {
                assertEquals(String.format(Locale.ROOT, "%." + places + "f", v), new FixedDecimals(places).format(v),
                        v + " at " + places + " places");
            }
        }
    }

    @Test
    void writesWhatTheJdkFormatterWritesOnRandomValuesOfEveryMagnitude() {
        SplittableRandom random = new SplittableRandom(20261202);
        FixedDecimals six = new FixedDecimals(6), two = new FixedDecimals(2);
        int checked = 0;
        for (int i = 0; i < 200_000; i++) {
            double v = (i % 5 == 0 ? -1 : 1) * random.nextDouble() * Math.pow(10, random.nextInt(-9, 10));
            if (i % 3 == 0) {
                v = Math.round(v * 1e7) / 1e7 + 5e-7; // near a rounding boundary at six places
            }
            assertEquals(String.format(Locale.ROOT, "%.6f", v), six.format(v), "value " + v);
            assertEquals(String.format(Locale.ROOT, "%.2f", v), two.format(v), "value " + v);
            checked++;
        }
        assertEquals(200_000, checked);
    }

    @Test
    void aRepeatedValueIsTheSameTextAndANewValueIsNewText() {
        FixedDecimals six = new FixedDecimals(6);
        assertEquals("0.416667", six.format(5.0 / 12));
        assertEquals("0.416667", six.format(5.0 / 12));
        assertEquals("0.500000", six.format(0.5));
        assertEquals("NaN", six.format(Double.NaN));
        assertEquals("0.500000", six.format(0.5));
    }
}
