package org.depotcast.stock;

public enum PurchaseOrderStatus {
    OPEN, CLOSED, CANCELLED
}
