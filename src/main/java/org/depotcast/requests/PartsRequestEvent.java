package org.depotcast.requests;

import jakarta.persistence.Column;
import jakarta.persistence.Entity;
import jakarta.persistence.EnumType;
import jakarta.persistence.Enumerated;
import jakarta.persistence.FetchType;
import jakarta.persistence.GeneratedValue;
import jakarta.persistence.GenerationType;
import jakarta.persistence.Id;
import jakarta.persistence.JoinColumn;
import jakarta.persistence.ManyToOne;
import jakarta.persistence.Table;

import java.time.OffsetDateTime;

/** One step in a request's history. */
@Entity
@Table(name = "parts_request_event")
public class PartsRequestEvent {
    @Id
    @GeneratedValue(strategy = GenerationType.IDENTITY)
    public Long id;
    @ManyToOne(fetch = FetchType.LAZY, optional = false)
    @JoinColumn(name = "parts_request_id")
    public PartsRequest request;
    @Enumerated(EnumType.STRING)
    @Column(nullable = false)
    public RequestStatus status;
    @Column(nullable = false)
    public String actor;
    @Column(nullable = false)
    public OffsetDateTime at;
    public String reason;
}
