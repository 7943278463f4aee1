package org.depotcast.requests;

import jakarta.persistence.CascadeType;
import jakarta.persistence.Column;
import jakarta.persistence.Entity;
import jakarta.persistence.EnumType;
import jakarta.persistence.Enumerated;
import jakarta.persistence.GeneratedValue;
import jakarta.persistence.GenerationType;
import jakarta.persistence.Id;
import jakarta.persistence.OneToMany;
import jakarta.persistence.OrderBy;
import jakarta.persistence.Table;
import jakarta.persistence.Version;
import org.depotcast.common.ConflictException;

import java.time.OffsetDateTime;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;

/** A mechanic's request for parts from the depot, for a pump or to top up the kit. */
@Entity
@Table(name = "parts_request")
public class PartsRequest {
    public enum Urgency { ROUTINE, PUMP_DOWN }

    @Id
    @GeneratedValue(strategy = GenerationType.IDENTITY)
    public Long id;
    @Column(name = "client_ref", nullable = false, unique = true)
    public String clientRef;
    @Column(nullable = false)
    public String mechanic;
    /** The mechanic's kit (a stock location). */
    @Column(name = "kit_id", nullable = false)
    public Long kitId;
    /** The kit's depot (a stock location), which issues the parts. */
    @Column(name = "depot_id", nullable = false)
    public Long depotId;
    /** The pump the parts are for (fleet), or null to top up the kit. */
    @Column(name = "pump_id")
    public Long pumpId;
    @Enumerated(EnumType.STRING)
    @Column(nullable = false)
    public Urgency urgency;
    public String fault;
    @Enumerated(EnumType.STRING)
    @Column(nullable = false)
    public RequestStatus status;
    @Column(name = "raised_at", nullable = false)
    public OffsetDateTime raisedAt;
    @Column(name = "issued_at")
    public OffsetDateTime issuedAt;
    @OneToMany(mappedBy = "request", cascade = CascadeType.ALL)
    @OrderBy("id")
    public List<PartsRequestLine> lines = new ArrayList<>();
    @OneToMany(mappedBy = "request", cascade = CascadeType.ALL)
    @OrderBy("id")
    public List<PartsRequestEvent> events = new ArrayList<>();
    @Version
    public long version;

    /** Moves to a new state if the current one allows it, and records who did it, when and why. */
    void moveTo(RequestStatus next, Set<RequestStatus> allowedFrom, String actor, String reason, OffsetDateTime at) {
        if (!allowedFrom.contains(status)) {
            throw new ConflictException("status", "request " + clientRef + " is " + status + "; it cannot become " + next);
        }
        status = next;
        PartsRequestEvent event = new PartsRequestEvent();
        event.request = this;
        event.status = next;
        event.actor = actor;
        event.at = at;
        event.reason = reason;
        events.add(event);
    }
}
