package org.depotcast.access;

import org.junit.jupiter.api.Test;

import java.util.Arrays;
import java.util.Optional;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Production mode needs a configured session key; demo mode makes a random one; a cookie only checks under its key. */
class SessionKeyTest {
    private static final String KEY = "k".repeat(SessionService.MIN_KEY_LENGTH);

    @Test
    void productionRefusesToStartWithoutAKey() {
        IllegalStateException missing = assertThrows(IllegalStateException.class,
                () -> SessionService.keyFor(true, Optional.empty()));
        assertTrue(missing.getMessage().contains("DEPOTCAST_SESSION_KEY"));
        assertThrows(IllegalStateException.class, () -> SessionService.keyFor(true, Optional.of("  ")));
        IllegalStateException tooShort = assertThrows(IllegalStateException.class,
                () -> SessionService.keyFor(true, Optional.of("short-but-secret")));
        assertFalse(tooShort.getMessage().contains("short-but-secret"), "the key is never printed");
        assertArrayEquals(KEY.getBytes(), SessionService.keyFor(true, Optional.of(KEY)));
    }

    @Test
    void demoModeMakesARandomKeyPerStart() {
        byte[] first = SessionService.keyFor(false, Optional.empty());
        byte[] second = SessionService.keyFor(false, Optional.empty());
        assertEquals(32, first.length);
        assertFalse(Arrays.equals(first, second));
    }

    @Test
    void aCookieChecksOnlyUnderItsOwnKey() {
        SessionCookie.Issued issued = SessionCookie.issue(KEY.getBytes());
        assertEquals(Optional.of(issued.idHash()), SessionCookie.idHashOf(KEY.getBytes(), issued.value()));
        assertTrue(SessionCookie.idHashOf(("x" + KEY).getBytes(), issued.value()).isEmpty());
        assertFalse(issued.value().contains(issued.idHash()), "the stored hash is not in the cookie");
    }
}
