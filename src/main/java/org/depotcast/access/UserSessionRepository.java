package org.depotcast.access;

import io.quarkus.hibernate.orm.panache.PanacheRepository;
import jakarta.enterprise.context.ApplicationScoped;

import java.time.OffsetDateTime;
import java.util.Optional;

@ApplicationScoped
class UserSessionRepository implements PanacheRepository<UserSession> {
    Optional<UserSession> byIdHash(String idHash) {
        return find("idHash", idHash).firstResultOptional();
    }

    long deleteExpiredBefore(OffsetDateTime cutoff) {
        return delete("expiresAt < ?1", cutoff);
    }
}
