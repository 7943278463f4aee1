package org.depotcast.access;

import jakarta.persistence.Column;
import jakarta.persistence.Entity;
import jakarta.persistence.GeneratedValue;
import jakarta.persistence.GenerationType;
import jakarta.persistence.Id;
import jakarta.persistence.Table;
import org.hibernate.annotations.Immutable;

import java.time.OffsetDateTime;

/** One change, who made it and when, with the values before and after (JSON). Append-only. */
@Entity
@Immutable
@Table(name = "audit_log")
public class AuditEntry {
    @Id
    @GeneratedValue(strategy = GenerationType.IDENTITY)
    public Long id;
    @Column(nullable = false)
    public OffsetDateTime at;
    @Column(nullable = false)
    public String actor;
    @Column(nullable = false)
    public String action;
    @Column(name = "entity_type", nullable = false)
    public String entityType;
    @Column(name = "entity_key", nullable = false)
    public String entityKey;
    @Column(name = "before_json")
    public String beforeJson;
    @Column(name = "after_json")
    public String afterJson;
}
