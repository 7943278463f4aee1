package org.depotcast.access;

import jakarta.enterprise.context.ApplicationScoped;
import jakarta.enterprise.event.Observes;

/** Drops remembered sign-ins and scopes whenever an account or its assignments change. */
@ApplicationScoped
class SignInCacheReset {
    private final AccountIdentityProvider provider;
    private final AccessScope scope;

    SignInCacheReset(AccountIdentityProvider provider, AccessScope scope) {
        this.provider = provider;
        this.scope = scope;
    }

    void onChange(@Observes AccountService.AccountsChanged event) {
        provider.forgetAll();
        scope.forgetAll();
    }
}
