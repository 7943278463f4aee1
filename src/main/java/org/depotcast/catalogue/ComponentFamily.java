package org.depotcast.catalogue;

/** Component families of a lever-action deep-well hand pump, in the trade's plain words. */
public enum ComponentFamily {
    CUP_SEAL, O_RING, PLUNGER, FOOT_VALVE, PUMP_ROD, RISING_MAIN, ROD_CENTRALISER, BEARING, FULCRUM_PIN, HANGER_PIN,
    HANDLE, CYLINDER, OTHER;

    /**
     * Whether parts of this family sit in the water the pump delivers: everything down the well and the rising main.
     * The pump head's bearings, pins and handle do not; OTHER (greases, sundries) is treated as touching, to be safe.
     */
    public boolean touchesDrinkingWater() {
        return switch (this) {
            case BEARING, FULCRUM_PIN, HANGER_PIN, HANDLE -> false;
            default -> true;
        };
    }
}
