package org.depotcast.repairs;

import java.math.BigDecimal;
import java.time.LocalDate;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;

/**
 * Whether a repair sent again under a known reference is the one stored. Every value the resend carries must equal
 * the stored value; dates, fault and lines it leaves out may have been recorded since (repair progress), so their
 * absence is no difference.
 */
final class RepairResend {
    private RepairResend() {
    }

    /**
     * The first field that differs, or null when the resend is the stored repair.
     *
     * @param assetId     the stored repair's pump
     * @param partNumbers part numbers by part id (the stored lines hold ids)
     */
    static String firstDifference(Repair stored, String assetId, RepairRequest resend, Map<Long, String> partNumbers) {
        if (!assetId.equals(resend.assetId())) {
            return "assetId";
        }
        if (stored.kind != resend.kind()) {
            return "kind";
        }
        if (!stored.reportedOn.equals(resend.reportedOn())) {
            return "reportedOn";
        }
        String[] names = {"diagnosedOn", "partsAvailableOn", "fixedOn"};
        LocalDate[] sent = {resend.diagnosedOn(), resend.partsAvailableOn(), resend.fixedOn()};
        LocalDate[] kept = {stored.diagnosedOn, stored.partsAvailableOn, stored.fixedOn};
        for (int i = 0; i < names.length; i++) {
            if (sent[i] != null && !sent[i].equals(kept[i])) {
                return names[i];
            }
        }
        if (resend.fault() != null && !Objects.equals(resend.fault(), stored.fault)) {
            return "fault";
        }
        List<RepairRequest.Line> lines = resend.lines() == null ? List.of() : resend.lines();
        if (!lines.isEmpty() && !sameLines(stored.lines, lines, partNumbers)) {
            return "lines";
        }
        return null;
    }

    static boolean sameLines(List<RepairLine> stored, List<RepairRequest.Line> sent, Map<Long, String> partNumbers) {
        Map<String, BigDecimal> kept = new HashMap<>();
        stored.forEach(l -> kept.put(partNumbers.get(l.partId), l.quantity));
        if (kept.size() != sent.size()) {
            return false;
        }
        for (RepairRequest.Line line : sent) {
            BigDecimal quantity = kept.get(line.partNumber());
            if (quantity == null || line.quantity() == null || quantity.compareTo(line.quantity()) != 0) {
                return false;
            }
        }
        return true;
    }
}
