package org.depotcast.access;

import jakarta.enterprise.context.ApplicationScoped;
import jakarta.enterprise.event.Observes;

/** Drops remembered sign-ins and scopes whenever an account or its assignments change. */
@ApplicationScoped
class SignInCacheReset {
    private final PasswordCheck passwords;
    private final AccessScope scope;

    SignInCacheReset(PasswordCheck passwords, AccessScope scope) {
        this.passwords = passwords;
        this.scope = scope;
    }

    void onChange(@Observes AccountService.AccountsChanged event) {
        passwords.forgetAll();
        scope.forgetAll();
    }
}
