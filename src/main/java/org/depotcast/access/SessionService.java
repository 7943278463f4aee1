package org.depotcast.access;

import io.quarkus.narayana.jta.QuarkusTransaction;
import io.quarkus.runtime.StartupEvent;
import io.quarkus.security.AuthenticationFailedException;
import jakarta.enterprise.context.ApplicationScoped;
import jakarta.enterprise.event.Observes;
import jakarta.transaction.Transactional;
import org.eclipse.microprofile.config.inject.ConfigProperty;

import java.nio.charset.StandardCharsets;
import java.security.SecureRandom;
import java.time.Duration;
import java.time.Clock;
import java.time.OffsetDateTime;
import java.util.Optional;
import java.util.Set;

/**
 * Browser sessions: started by a checked password, ended by signing out or by their lifetime, and checked against
 * the account on every request (a disabled account's sessions stop working at once, and role changes apply at once).
 */
@ApplicationScoped
public class SessionService {
    static final int MIN_KEY_LENGTH = 32;

    /** A started session: the cookie value and how long the cookie should live. */
    public record Started(String cookieValue, String username, Set<String> roles, Duration lifetime) {
    }

    /** Who a live session belongs to. */
    record Live(String username, Set<String> roles, String idHash) {
    }

    private final UserSessionRepository sessions;
    private final AccountService accounts;
    private final PasswordCheck passwords;
    private final SessionSettings settings;
    private final byte[] key;
    private final boolean production;
    private final Clock clock;

    SessionService(UserSessionRepository sessions, AccountService accounts, PasswordCheck passwords,
                   SessionSettings settings, @ConfigProperty(name = "depotcast.mode") String mode, Clock clock) {
        this.sessions = sessions;
        this.accounts = accounts;
        this.passwords = passwords;
        this.settings = settings;
        this.production = "production".equals(mode);
        this.key = keyFor(production, settings.key());
        this.clock = clock;
    }

    /** Creating the bean resolves the key, so production mode without one refuses to start. */
    void resolveKeyAtStart(@Observes StartupEvent event) {
        // Nothing more to do: the constructor has checked the key.
    }

    /**
     * The configured key, or in demo mode a random one made now. The message never contains the key.
     *
     * @throws IllegalStateException in production mode without a key of at least {@link #MIN_KEY_LENGTH} characters
     */
    static byte[] keyFor(boolean production, Optional<String> configured) {
        Optional<String> given = configured.filter(k -> !k.isBlank());
        if (given.isPresent() && given.get().length() >= MIN_KEY_LENGTH) {
            return given.get().getBytes(StandardCharsets.UTF_8);
        }
        if (production || given.isPresent()) {
            throw new IllegalStateException("refusing to start: set DEPOTCAST_SESSION_KEY (depotcast.session.key) to a "
                    + "secret of at least " + MIN_KEY_LENGTH + " characters, e.g. from 'openssl rand -base64 32'");
        }
        byte[] random = new byte[32];
        new SecureRandom().nextBytes(random);
        return random;
    }

    /**
     * Checks the password (paced by the sign-in throttle, which may refuse with 429) and starts a session.
     *
     * @return empty when the name or password is wrong
     */
    public Optional<Started> signIn(String username, String password, String clientAddress) {
        Set<String> roles;
        try {
            // Outside any transaction: bcrypt takes a while and needs no database connection held.
            roles = passwords.check(username == null ? "" : username, password == null ? "" : password, clientAddress);
        } catch (AuthenticationFailedException e) {
            return Optional.empty();
        }
        SessionCookie.Issued issued = SessionCookie.issue(key);
        QuarkusTransaction.requiringNew().run(() -> {
            OffsetDateTime now = OffsetDateTime.now(clock);
            sessions.deleteExpiredBefore(now);
            UserSession session = new UserSession();
            session.idHash = issued.idHash();
            session.username = username;
            session.createdAt = now;
            session.expiresAt = now.plus(settings.lifetime());
            sessions.persist(session);
        });
        return Optional.of(new Started(issued.value(), username, roles, settings.lifetime()));
    }

    /** The account of a genuine, live session whose account is still enabled. */
    @Transactional
    Optional<Live> resolve(String cookieValue) {
        OffsetDateTime now = OffsetDateTime.now(clock);
        return SessionCookie.idHashOf(key, cookieValue).flatMap(sessions::byIdHash).filter(s -> s.liveAt(now))
                .flatMap(s -> accounts.findEnabled(s.username).map(a -> new Live(a.username, a.roleSet(), s.idHash)));
    }

    /** Ends the session of this cookie (nothing happens for an unknown or already ended one). */
    @Transactional
    public void signOut(String cookieValue) {
        SessionCookie.idHashOf(key, cookieValue).flatMap(sessions::byIdHash).filter(s -> s.endedAt == null)
                .ifPresent(s -> s.endedAt = OffsetDateTime.now(clock));
    }

    /** Whether the cookie must carry Secure on this answer. */
    public boolean secureCookie(boolean overHttps) {
        return overHttps || settings.secureCookie().orElse(production);
    }
}
