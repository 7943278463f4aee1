package org.depotcast.repairs;

import jakarta.persistence.CollectionTable;
import jakarta.persistence.Column;
import jakarta.persistence.ElementCollection;
import jakarta.persistence.Entity;
import jakarta.persistence.EnumType;
import jakarta.persistence.Enumerated;
import jakarta.persistence.FetchType;
import jakarta.persistence.GeneratedValue;
import jakarta.persistence.GenerationType;
import jakarta.persistence.Id;
import jakarta.persistence.JoinColumn;
import jakarta.persistence.Table;
import jakarta.persistence.Version;

import java.time.LocalDate;
import java.time.OffsetDateTime;
import java.util.ArrayList;
import java.util.List;

/**
 * A repair the ledger refused because the kit's books held fewer parts than it used: the stores officer's notice.
 * One per repair reference, however often the phone sends it again; it holds the parts short at the last refusal.
 * It closes when the repair is recorded, the officer dismisses it or the mechanic withdraws it, with the reason in words.
 */
@Entity
@Table(name = "refused_repair")
public class RefusedRepair {
    /** Open, or closed with its reason in words. */
    public enum State {
        OPEN(null), RECORDED("the repair was recorded"), DISMISSED("dismissed by the stores officer"),
        WITHDRAWN("withdrawn by the mechanic");

        final String reason;

        State(String reason) {
            this.reason = reason;
        }
    }

    @Id
    @GeneratedValue(strategy = GenerationType.IDENTITY)
    public Long id;
    @Column(name = "repair_ref", nullable = false)
    public String repairRef;
    @Column(nullable = false)
    public String mechanic;
    @Column(name = "kit_id", nullable = false)
    public long kitId;
    @Column(name = "pump_id", nullable = false)
    public long pumpId;
    @Column(name = "fixed_on", nullable = false)
    public LocalDate fixedOn;
    @Column(name = "first_refused_at", nullable = false)
    public OffsetDateTime firstRefusedAt;
    @Column(name = "last_refused_at", nullable = false)
    public OffsetDateTime lastRefusedAt;
    @Column(nullable = false)
    public int attempts;
    @Enumerated(EnumType.STRING)
    @Column(nullable = false)
    public State state;
    @Column(name = "closed_at")
    public OffsetDateTime closedAt;
    @Column(name = "closed_by")
    public String closedBy;
    @Column(name = "closed_reason")
    public String closedReason;
    @ElementCollection(fetch = FetchType.EAGER)
    @CollectionTable(name = "refused_repair_line", joinColumns = @JoinColumn(name = "refused_repair_id"))
    public List<RefusedRepairLine> lines = new ArrayList<>();
    @Version
    public long version;

    /** Another refusal of the same report: counted, the parts short replaced by today's, open again if dismissed. */
    void refusedAgain(OffsetDateTime at, List<RefusedRepairLine> shortNow) {
        attempts++;
        lastRefusedAt = at;
        lines.clear();
        lines.addAll(shortNow);
        state = State.OPEN;
        closedAt = null;
        closedBy = null;
        closedReason = null;
    }

    void close(State how, String by, OffsetDateTime at) {
        state = how;
        closedBy = by.length() > 80 ? by.substring(0, 80) : by;
        closedAt = at;
        closedReason = how.reason;
    }
}
