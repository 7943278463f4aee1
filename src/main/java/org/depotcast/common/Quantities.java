package org.depotcast.common;

import java.math.BigDecimal;
import java.math.RoundingMode;

/** Quantity rules shared by the ledger, orders and repairs: stored with three decimals, whole units stay whole. */
public final class Quantities {
    public static final int SCALE = 3;

    private Quantities() {
    }

    public static BigDecimal normalise(BigDecimal quantity) {
        return quantity.setScale(SCALE, RoundingMode.UNNECESSARY);
    }

    public static boolean isWhole(BigDecimal quantity) {
        return quantity.stripTrailingZeros().scale() <= 0;
    }

    /**
     * Throws a 400 naming {@code field} unless the quantity is positive, at most {@link Bounds#QUANTITY_MAX}, has at
     * most three decimals and is whole where it must be. Size and decimals are checked first, by comparison only, so
     * a number like 1e3000000 is refused without being expanded.
     */
    public static BigDecimal requirePositive(String field, BigDecimal quantity, boolean wholeUnits) {
        if (quantity == null) {
            throw new InvalidInputException(field, "is required");
        }
        if (quantity.abs().compareTo(Bounds.QUANTITY_MAX_VALUE) > 0) {
            throw new InvalidInputException(field, "must be at most " + Bounds.QUANTITY_MAX);
        }
        if (quantity.signum() != 0 && quantity.stripTrailingZeros().scale() > SCALE) {
            throw new InvalidInputException(field, "has more than " + SCALE + " decimals");
        }
        if (quantity.signum() <= 0) {
            throw new InvalidInputException(field, "must be greater than zero, was " + quantity.toPlainString());
        }
        if (wholeUnits && !isWhole(quantity)) {
            throw new InvalidInputException(field, "must be a whole number for a part issued in whole units, was "
                    + quantity.toPlainString());
        }
        return normalise(quantity);
    }
}
