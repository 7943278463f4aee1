package org.depotcast.access;

import io.quarkus.runtime.StartupEvent;
import jakarta.annotation.Priority;
import jakarta.enterprise.context.ApplicationScoped;
import jakarta.enterprise.event.Observes;
import org.eclipse.microprofile.config.inject.ConfigProperty;

import java.util.List;
import java.util.Optional;
import java.util.Set;

/**
 * In production mode the service refuses to start while any account still signs in with its demo password
 * ("&lt;name&gt;-demo"): a programme must not go live with passwords printed in the README. On a first start with
 * no accounts at all, {@code depotcast.bootstrap.admin-password} creates the {@code admin} account.
 */
@ApplicationScoped
class DemoAccountGuard {
    private final AccountService accounts;
    private final SystemWork system;
    private final String mode;
    private final Optional<String> bootstrapAdminPassword;

    DemoAccountGuard(AccountService accounts, SystemWork system, @ConfigProperty(name = "depotcast.mode") String mode,
                     @ConfigProperty(name = "depotcast.bootstrap.admin-password") Optional<String> bootstrapAdminPassword) {
        this.accounts = accounts;
        this.system = system;
        this.mode = mode;
        this.bootstrapAdminPassword = bootstrapAdminPassword;
    }

    void check(@Observes @Priority(10) StartupEvent event) {
        if (!"production".equals(mode)) {
            return;
        }
        if (accounts.count() == 0 && bootstrapAdminPassword.isPresent()) {
            system.run("bootstrap", () -> accounts.create("admin", bootstrapAdminPassword.get(), Set.of(Roles.ADMIN), null));
        }
        List<String> demo = withDemoPasswords(accounts.all());
        if (!demo.isEmpty()) {
            throw new IllegalStateException("refusing to start in production mode: accounts " + demo
                    + " still have their demo passwords; change or remove them first");
        }
    }

    static List<String> withDemoPasswords(List<UserAccount> all) {
        return all.stream().filter(a -> PasswordHasher.matches(a.username + "-demo", a.passwordHash))
                .map(a -> a.username).toList();
    }
}
