package org.depotcast.common;

import org.junit.jupiter.api.Test;

import java.math.BigDecimal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

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
}
