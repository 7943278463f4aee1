package org.depotcast.repairs;

import org.depotcast.common.NotEnoughStockException;
import org.depotcast.stock.LocationSummary;

import java.math.BigDecimal;
import java.time.LocalDate;
import java.util.List;
import java.util.Map;

/**
 * The ledger's refusal of a repair's parts (answered as any {@link NotEnoughStockException}), carrying what the
 * stores officer's notice needs once the repair's own transaction has rolled back, and then whether the notice was
 * written: the answer says so ({@code officerNoticeRecorded}, and the notice's id as {@code officerNotice}), so the
 * phone says "the officer has been told" only when it is true.
 */
class RefusedRepairException extends NotEnoughStockException {
    private final transient Refusal refusal;
    private Long noticeId;

    /** The repair as sent: who, which kit and pump, the day of the fix and every part it used. */
    record Refusal(String repairRef, String mechanic, long kitId, String kitCode, long pumpId, LocalDate fixedOn,
                   List<Used> used) {
    }

    record Used(long partId, String partNumber, BigDecimal units) {
    }

    RefusedRepairException(NotEnoughStockException cause, Refusal refusal) {
        super(cause.field(), cause.getMessage());
        this.refusal = refusal;
    }

    static RefusedRepairException of(NotEnoughStockException e, Repair repair, LocationSummary kit,
                                     Map<Long, String> partNumbers) {
        return new RefusedRepairException(e, new Refusal(repair.repairRef, repair.mechanic, kit.id(), kit.code(),
                repair.pumpId, repair.fixedOn, repair.lines.stream()
                .map(l -> new Used(l.partId, partNumbers.get(l.partId), l.quantity)).toList()));
    }

    Refusal refusal() {
        return refusal;
    }

    /** The notice written for this refusal, or null when none was (a failed write, or the parts booked since). */
    void noted(Long noticeId) {
        this.noticeId = noticeId;
    }

    @Override
    public Map<String, Object> members() {
        return noticeId == null ? Map.of("officerNoticeRecorded", false)
                : Map.of("officerNoticeRecorded", true, "officerNotice", noticeId);
    }
}
