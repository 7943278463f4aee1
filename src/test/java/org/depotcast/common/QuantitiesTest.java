package org.depotcast.common;

import org.junit.jupiter.api.Test;

import java.math.BigDecimal;
import java.time.Duration;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;

class QuantitiesTest {
    @Test
    void wholeUnitsRefuseFractions() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> Quantities.requirePositive("quantity", new BigDecimal("1.5"), true));
        assertEquals("quantity", e.errors().get(0).field());
        assertEquals(new BigDecimal("2.000"), Quantities.requirePositive("quantity", new BigDecimal("2.0"), true));
    }

    @Test
    void measuredUnitsTakeUpToThreeDecimals() {
        assertEquals(new BigDecimal("1.250"), Quantities.requirePositive("q", new BigDecimal("1.25"), false));
        assertThrows(InvalidInputException.class, () -> Quantities.requirePositive("q", new BigDecimal("1.2345"), false));
    }

    @Test
    void zeroNegativeAndMissingAreRefused() {
        assertThrows(InvalidInputException.class, () -> Quantities.requirePositive("q", BigDecimal.ZERO, false));
        assertThrows(InvalidInputException.class, () -> Quantities.requirePositive("q", new BigDecimal("-1"), false));
        assertThrows(InvalidInputException.class, () -> Quantities.requirePositive("q", null, false));
    }

    @Test
    void hugeExponentsAreRefusedByComparisonWithoutExpandingTheNumber() {
        assertTimeoutPreemptively(Duration.ofSeconds(2), () -> {
            for (String huge : new String[]{"1e3000000", "-1e3000000", "1e-3000000", "-1e-3000000", "1000000.001"}) {
                InvalidInputException e = assertThrows(InvalidInputException.class,
                        () -> Quantities.requirePositive("quantity", new BigDecimal(huge), true));
                assertEquals("quantity", e.errors().get(0).field());
                assertTrue(e.getMessage().length() < 200, e.getMessage());
            }
        });
        assertEquals(new BigDecimal("1000000.000"), Quantities.requirePositive("q", new BigDecimal("1e6"), true));
    }
}
