package org.depotcast.access;

import jakarta.enterprise.context.ApplicationScoped;
import jakarta.enterprise.context.control.ActivateRequestContext;

import java.util.function.Supplier;

/**
 * Runs work as the system: every location in scope, recorded as {@code system:<purpose>}. For start-up loading,
 * scheduled and background runs, and for computations that must see the whole programme before their result is
 * filtered to the caller's scope. Only code calls this; nothing a client sends can. The system identity holds for
 * the current thread and the call only (work handed to other threads must call this again). Reads outside a
 * transaction need a request context: one is activated for the call where none is active (start-up).
 */
@ApplicationScoped
public class SystemWork {
    @ActivateRequestContext
    public <T> T call(String purpose, Supplier<T> work) {
        if (purpose == null || purpose.isBlank()) {
            throw new IllegalArgumentException("purpose must name the work, was " + purpose);
        }
        String previous = CurrentUser.actAsSystem(purpose);
        try {
            return work.get();
        } finally {
            CurrentUser.restore(previous);
        }
    }

    @ActivateRequestContext
    public void run(String purpose, Runnable work) {
        call(purpose, () -> {
            work.run();
            return null;
        });
    }
}
