package org.depotcast.repairs;

import jakarta.persistence.Column;
import jakarta.persistence.Embeddable;

import java.math.BigDecimal;

/** A part a refused repair used: the units it used and the units the kit's books held when it was refused. */
@Embeddable
public class RefusedRepairLine {
    @Column(name = "part_id", nullable = false)
    public long partId;
    @Column(name = "units_asked", nullable = false)
    public BigDecimal unitsAsked;
    @Column(name = "units_held", nullable = false)
    public BigDecimal unitsHeld;

    static RefusedRepairLine of(long partId, BigDecimal asked, BigDecimal held) {
        RefusedRepairLine line = new RefusedRepairLine();
        line.partId = partId;
        line.unitsAsked = asked;
        line.unitsHeld = held;
        return line;
    }
}
