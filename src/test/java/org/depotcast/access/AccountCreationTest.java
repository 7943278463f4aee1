package org.depotcast.access;

import io.quarkus.test.junit.QuarkusTest;
import jakarta.inject.Inject;
import org.depotcast.TestData;
import org.depotcast.common.EntityMissingException;
import org.junit.jupiter.api.Test;

import java.util.List;
import java.util.Locale;
import java.util.Set;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Creating an account is one transaction: whatever refuses it, no account (and no assignment) is left behind. */
@QuarkusTest
class AccountCreationTest {
    @Inject
    AccountService accounts;
    @Inject
    SystemWork system;

    private static String name() {
        return TestData.unique("acct").toLowerCase(Locale.ROOT);
    }

    private boolean exists(String username) {
        return system.call("test", () -> accounts.all().stream().anyMatch(a -> a.username.equals(username)));
    }

    @Test
    void anUnknownLocationCodeIsRefusedNamingTheFieldAndLeavesNoAccount() {
        String username = name();
        long before = accounts.count();
        EntityMissingException refused = assertThrows(EntityMissingException.class, () -> system.call("test",
                () -> accounts.create(new AccountService.NewAccount(username, "long-enough-1", Set.of(Roles.STORES_OFFICER),
                        null, List.of("DEP-TESHVALE", "DEP-NOWHERE")))));
        assertEquals("locationCodes", refused.field());
        assertEquals(before, accounts.count());
        assertTrue(!exists(username), "no account '" + username + "' after the refusal");
    }

    @Test
    void aFailureAfterTheAccountIsWrittenRollsTheAccountBackToo() {
        // The account row is written first, then its assignments: a location id with no row fails the second
        // insert (foreign key), and the account written just before must go with it.
        String username = name();
        long before = accounts.count();
        assertThrows(RuntimeException.class, () -> system.call("test", () -> accounts.create(username,
                "long-enough-1", Set.of(Roles.STORES_OFFICER), null, List.of(Long.MAX_VALUE))));
        assertEquals(before, accounts.count());
        assertTrue(!exists(username), "no account '" + username + "' after the refusal");
    }

    @Test
    void knownCodesMakeTheAccountWithItsLocations() {
        String username = name();
        long before = accounts.count();
        system.call("test", () -> accounts.create(new AccountService.NewAccount(username, "long-enough-1",
                Set.of(Roles.STORES_OFFICER), null, List.of("DEP-TESHVALE", "DEP-PELLOWDENE"))));
        assertEquals(before + 1, accounts.count());
        assertEquals(List.of("DEP-PELLOWDENE", "DEP-TESHVALE"), system.call("test",
                () -> accounts.profile(username).locationCodes()));
    }

    @Test
    void anUnknownCodeInANewAssignmentKeepsTheAssignmentsBefore() {
        String username = name();
        system.call("test", () -> accounts.create(new AccountService.NewAccount(username, "long-enough-1",
                Set.of(Roles.STORES_OFFICER), null, List.of("DEP-TESHVALE"))));
        EntityMissingException refused = assertThrows(EntityMissingException.class, () -> system.run("test",
                () -> accounts.assignLocationCodes(username, List.of("DEP-PELLOWDENE", "DEP-NOWHERE"))));
        assertEquals("codes", refused.field());
        assertEquals(List.of("DEP-TESHVALE"), system.call("test", () -> accounts.profile(username).locationCodes()));
    }
}
