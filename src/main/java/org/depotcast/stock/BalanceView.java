package org.depotcast.stock;

import java.math.BigDecimal;

/** On hand and on order for one part at one location. */
public record BalanceView(String partNumber, String description, String locationCode, BigDecimal onHand,
                          BigDecimal onOrder) {
}
