package org.depotcast.access;

import io.quarkus.arc.Arc;
import io.quarkus.security.identity.SecurityIdentity;
import jakarta.enterprise.context.ApplicationScoped;
import jakarta.enterprise.inject.Instance;

/**
 * Who is acting: the signed-in account, or the system itself inside {@link SystemWork} (start-up loading,
 * scheduled and background runs). The system's name has the form {@code system:<purpose>}, which no account can
 * have (account names hold no ':'), and its power comes from running inside {@link SystemWork}, never from a name:
 * no HTTP request can obtain it.
 */
@ApplicationScoped
public class CurrentUser {
    /** Name recorded for work done with no one signed in; such work is in no one's scope. */
    public static final String ANONYMOUS = "anonymous";
    static final String SYSTEM_PREFIX = "system:";
    private static final ThreadLocal<String> SYSTEM_PURPOSE = new ThreadLocal<>();

    private final Instance<SecurityIdentity> identity;

    CurrentUser(Instance<SecurityIdentity> identity) {
        this.identity = identity;
    }

    public String name() {
        String purpose = SYSTEM_PURPOSE.get();
        if (purpose != null) {
            return SYSTEM_PREFIX + purpose;
        }
        SecurityIdentity current = signedIn();
        return current == null ? ANONYMOUS : current.getPrincipal().getName();
    }

    /** True only inside {@link SystemWork}. */
    public boolean isSystem() {
        return SYSTEM_PURPOSE.get() != null;
    }

    /** True for a signed-in account (never for the system). */
    public boolean isSignedIn() {
        return !isSystem() && signedIn() != null;
    }

    public boolean hasRole(String role) {
        SecurityIdentity current = isSystem() ? null : signedIn();
        return current != null && current.hasRole(role);
    }

    private SecurityIdentity signedIn() {
        if (!Arc.container().requestContext().isActive()) {
            return null;
        }
        SecurityIdentity current = identity.get();
        return current == null || current.isAnonymous() ? null : current;
    }

    /** Sets the system purpose for the current thread; returns the one it replaces (see {@link SystemWork}). */
    static String actAsSystem(String purpose) {
        String previous = SYSTEM_PURPOSE.get();
        SYSTEM_PURPOSE.set(purpose);
        return previous;
    }

    static void restore(String previous) {
        if (previous == null) {
            SYSTEM_PURPOSE.remove();
        } else {
            SYSTEM_PURPOSE.set(previous);
        }
    }
}
