package org.depotcast.access;

import jakarta.enterprise.context.ApplicationScoped;
import jakarta.enterprise.event.Observes;

/** Drops remembered sign-ins whenever an account changes. */
@ApplicationScoped
class SignInCacheReset {
    private final AccountIdentityProvider provider;

    SignInCacheReset(AccountIdentityProvider provider) {
        this.provider = provider;
    }

    void onChange(@Observes AccountService.AccountsChanged event) {
        provider.forgetAll();
    }
}
