package org.depotcast.core.sensors;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The parts a pump that has probably stopped is expected to need, from the fleet model's breakdown rates per
 * component family for that pump (its depth, age and load).
 *
 * <p>Given the pump is down with probability p, the breakdown is taken to be in one family, family f with chance
 * r_f / Σ r (its share of the pump's breakdown rate per operating hour); a family-f repair uses u_f units (the fleet
 * model's units per event), shared among the model's parts of that family by their bill-of-materials quantities:
 * E[units of part i] = p · (r_f / Σ r) · u_f · q_i / Σ_{j in f} q_j. A family with no part on the bill gives expected
 * repairs but no part.
 */
public final class StoppedPumpParts {
    /** A family's breakdown rate for this pump (events per operating hour) and units used per event. */
    public record FamilyRate(String family, double eventsPerHour, double unitsPerEvent) {
        public FamilyRate {
            if (!(eventsPerHour >= 0) || !(unitsPerEvent >= 0)) {
                throw new IllegalArgumentException("rates must be non-negative: " + family + " " + eventsPerHour
                        + " " + unitsPerEvent);
            }
        }
    }

    /** A part on the pump model's bill: its family and quantity on one pump. */
    public record BomPart(String partNumber, String family, double quantity) {
    }

    /** Expected repairs by family and expected units by part number. */
    public record Expectation(Map<String, Double> repairsByFamily, Map<String, Double> unitsByPart) {
    }

    private StoppedPumpParts() {
    }

    public static Expectation expect(double probabilityDown, List<FamilyRate> rates, List<BomPart> bom) {
        if (!(probabilityDown >= 0 && probabilityDown <= 1)) {
            throw new IllegalArgumentException("probabilityDown must be in [0, 1]: " + probabilityDown);
        }
        double total = 0;
        for (FamilyRate r : rates) {
            total += r.eventsPerHour();
        }
        Map<String, Double> repairs = new LinkedHashMap<>();
        Map<String, Double> units = new LinkedHashMap<>();
        if (total <= 0) {
            return new Expectation(repairs, units);
        }
        Map<String, Double> familyQuantity = new LinkedHashMap<>();
        for (BomPart part : bom) {
            familyQuantity.merge(part.family(), part.quantity(), Double::sum);
        }
        Map<String, Double> unitsByFamily = new LinkedHashMap<>();
        for (FamilyRate r : rates) {
            double expectedRepairs = probabilityDown * r.eventsPerHour() / total;
            repairs.put(r.family(), expectedRepairs);
            unitsByFamily.put(r.family(), expectedRepairs * r.unitsPerEvent());
        }
        for (BomPart part : bom) {
            Double familyUnits = unitsByFamily.get(part.family());
            double shareOfFamily = familyQuantity.get(part.family()) > 0 ? part.quantity() / familyQuantity.get(part.family()) : 0;
            if (familyUnits != null) {
                units.merge(part.partNumber(), familyUnits * shareOfFamily, Double::sum);
            }
        }
        return new Expectation(repairs, units);
    }
}
