package org.depotcast.access;

import org.junit.jupiter.api.Test;

import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

class DemoAccountGuardTest {
    private static UserAccount account(String name, String password) {
        UserAccount account = new UserAccount();
        account.username = name;
        account.passwordHash = PasswordHasher.hash(password);
        account.roles = Roles.ADMIN;
        return account;
    }

    @Test
    void demoPasswordsAreFound() {
        List<UserAccount> all = List.of(account("lead", "lead-demo"), account("admin", "a-long-real-secret"));
        assertEquals(List.of("lead"), DemoAccountGuard.withDemoPasswords(all));
    }

    @Test
    void bcryptHashesVerifyAndAreSalted() {
        String first = PasswordHasher.hash("correct horse");
        assertTrue(first.startsWith("$2"));
        assertTrue(PasswordHasher.matches("correct horse", first));
        assertFalse(PasswordHasher.matches("correct horsE", first));
        assertFalse(first.equals(PasswordHasher.hash("correct horse")));
    }
}
