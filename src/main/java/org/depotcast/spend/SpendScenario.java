package org.depotcast.spend;

import jakarta.persistence.Column;
import jakarta.persistence.Entity;
import jakarta.persistence.GeneratedValue;
import jakarta.persistence.GenerationType;
import jakarta.persistence.Id;
import jakarta.persistence.Table;

import java.time.OffsetDateTime;

/** A saved scenario: its definition as the user sent it (JSON). */
@Entity
@Table(name = "spend_scenario")
public class SpendScenario {
    @Id
    @GeneratedValue(strategy = GenerationType.IDENTITY)
    public Long id;
    @Column(nullable = false, unique = true)
    public String name;
    @Column(nullable = false)
    public String definition;
    @Column(name = "created_at", nullable = false)
    public OffsetDateTime createdAt;
    @Column(name = "created_by", nullable = false)
    public String createdBy;
}
