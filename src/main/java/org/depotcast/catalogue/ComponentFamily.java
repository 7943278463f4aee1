package org.depotcast.catalogue;

/** Component families of a lever-action deep-well hand pump, in the trade's plain words. */
public enum ComponentFamily {
    CUP_SEAL, O_RING, PLUNGER, FOOT_VALVE, PUMP_ROD, RISING_MAIN, ROD_CENTRALISER, BEARING, FULCRUM_PIN, HANGER_PIN,
    HANDLE, CYLINDER, OTHER
}
