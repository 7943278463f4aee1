package org.depotcast.access;

import io.quarkus.security.identity.SecurityIdentity;
import jakarta.enterprise.inject.Instance;
import jakarta.enterprise.context.ApplicationScoped;
import io.quarkus.arc.Arc;

/** Who is acting: the signed-in account, or "system" for start-up loading and scheduled jobs. */
@ApplicationScoped
public class CurrentUser {
    public static final String SYSTEM = "system";

    private final Instance<SecurityIdentity> identity;

    CurrentUser(Instance<SecurityIdentity> identity) {
        this.identity = identity;
    }

    public String name() {
        if (!Arc.container().requestContext().isActive()) {
            return SYSTEM;
        }
        SecurityIdentity current = identity.get();
        return current == null || current.isAnonymous() ? SYSTEM : current.getPrincipal().getName();
    }

    public boolean hasRole(String role) {
        return Arc.container().requestContext().isActive() && identity.get().hasRole(role);
    }
}
