package org.depotcast.access;

import io.quarkus.arc.Arc;
import io.quarkus.arc.ManagedContext;
import jakarta.enterprise.context.ApplicationScoped;

import java.util.function.Supplier;

/**
 * Runs work as the system: every location in scope, recorded as {@code system:<purpose>}. For start-up loading,
 * scheduled and background runs, and for computations that must see the whole programme before their result is
 * filtered to the caller's scope. Only code calls this; nothing a client sends can. The system identity holds for
 * the current thread and the call only (work handed to other threads must call this again).
 */
@ApplicationScoped
public class SystemWork {
    public <T> T call(String purpose, Supplier<T> work) {
        if (purpose == null || purpose.isBlank()) {
            throw new IllegalArgumentException("purpose must name the work, was " + purpose);
        }
        String previous = CurrentUser.actAsSystem(purpose);
        ManagedContext requestContext = Arc.container().requestContext();
        // Reads outside a transaction need a request context; a background thread has none of its own.
        boolean activated = !requestContext.isActive();
        if (activated) {
            requestContext.activate();
        }
        try {
            return work.get();
        } finally {
            if (activated) {
                requestContext.terminate();
            }
            CurrentUser.restore(previous);
        }
    }

    public void run(String purpose, Runnable work) {
        call(purpose, () -> {
            work.run();
            return null;
        });
    }
}
