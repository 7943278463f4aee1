package org.depotcast.access;

/** The four roles of the programme. */
public final class Roles {
    public static final String STORES_OFFICER = "stores-officer";
    public static final String MECHANIC = "mechanic";
    public static final String PROGRAMME_LEAD = "programme-lead";
    public static final String ADMIN = "admin";

    private Roles() {
    }
}
