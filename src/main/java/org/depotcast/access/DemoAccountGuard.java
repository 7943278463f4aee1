package org.depotcast.access;

import io.quarkus.runtime.StartupEvent;
import jakarta.annotation.Priority;
import jakarta.enterprise.context.ApplicationScoped;
import jakarta.enterprise.event.Observes;
import org.eclipse.microprofile.config.inject.ConfigProperty;

/**
 * In production mode the service refuses to start while any account still signs in with its demo password
 * ("&lt;name&gt;-demo"): a programme must not go live with passwords printed in the README.
 */
@ApplicationScoped
class DemoAccountGuard {
    private final AccountService accounts;
    private final String mode;

    DemoAccountGuard(AccountService accounts, @ConfigProperty(name = "depotcast.mode") String mode) {
        this.accounts = accounts;
        this.mode = mode;
    }

    void check(@Observes @Priority(10) StartupEvent event) {
        if (!"production".equals(mode)) {
            return;
        }
        for (UserAccount account : accounts.all()) {
            if (PasswordHasher.matches(account.username + "-demo", account.passwordHash)) {
                throw new IllegalStateException("refusing to start in production mode: account '" + account.username
                        + "' still has its demo password; change or remove it first");
            }
        }
    }
}
