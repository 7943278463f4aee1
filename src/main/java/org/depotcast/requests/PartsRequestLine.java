package org.depotcast.requests;

import jakarta.persistence.Column;
import jakarta.persistence.Entity;
import jakarta.persistence.FetchType;
import jakarta.persistence.GeneratedValue;
import jakarta.persistence.GenerationType;
import jakarta.persistence.Id;
import jakarta.persistence.JoinColumn;
import jakarta.persistence.ManyToOne;
import jakarta.persistence.Table;

import java.math.BigDecimal;

/** A part asked for, what the officer approved (possibly a substitute) and what was issued. */
@Entity
@Table(name = "parts_request_line")
public class PartsRequestLine {
    @Id
    @GeneratedValue(strategy = GenerationType.IDENTITY)
    public Long id;
    @ManyToOne(fetch = FetchType.LAZY, optional = false)
    @JoinColumn(name = "parts_request_id")
    public PartsRequest request;
    /** The catalogue part asked for. */
    @Column(name = "part_id", nullable = false)
    public Long partId;
    @Column(name = "quantity_requested", nullable = false)
    public BigDecimal quantityRequested;
    /** The substitute approved in its place, or null when the part itself is approved. */
    @Column(name = "approved_part_id")
    public Long approvedPartId;
    @Column(name = "quantity_approved", nullable = false)
    public BigDecimal quantityApproved = BigDecimal.ZERO;
    @Column(name = "quantity_issued", nullable = false)
    public BigDecimal quantityIssued = BigDecimal.ZERO;

    long partIdToIssue() {
        return approvedPartId == null ? partId : approvedPartId;
    }
}
