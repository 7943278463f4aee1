package org.depotcast.access;

import jakarta.persistence.Column;
import jakarta.persistence.Entity;
import jakarta.persistence.GeneratedValue;
import jakarta.persistence.GenerationType;
import jakarta.persistence.Id;
import jakarta.persistence.Table;

import java.time.OffsetDateTime;

/** A browser's signed-in session. Only the SHA-256 of its id is kept; signing out sets {@code endedAt}. */
@Entity
@Table(name = "user_session")
class UserSession {
    @Id
    @GeneratedValue(strategy = GenerationType.IDENTITY)
    Long id;
    @Column(name = "id_hash", nullable = false, unique = true)
    String idHash;
    @Column(nullable = false)
    String username;
    @Column(name = "created_at", nullable = false)
    OffsetDateTime createdAt;
    @Column(name = "expires_at", nullable = false)
    OffsetDateTime expiresAt;
    @Column(name = "ended_at")
    OffsetDateTime endedAt;

    boolean liveAt(OffsetDateTime now) {
        return endedAt == null && now.isBefore(expiresAt);
    }
}
