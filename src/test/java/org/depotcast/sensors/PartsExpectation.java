package org.depotcast.sensors;

import org.apache.commons.csv.CSVRecord;
import org.depotcast.PlantedRate;
import org.depotcast.core.sensors.StoppedPumpParts;

import java.io.IOException;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * The parts a pump down for certain is expected to need ({@link StoppedPumpParts} at probability 1), from the demo's
 * planted family rates (r30 / 1000 × (depth / 30 m)^d × exp(a × age), units per repair) and its pump models' bills
 * (per-metre lines rounded up at the pump's depth, as {@code BomLine.installedQuantity}).
 */
final class PartsExpectation {
    private record Line(String part, String family, boolean perMetre, double quantity) {
    }

    private final Map<String, PlantedRate> rates = PlantedRate.read(java.nio.file.Path.of("seed-data", "planted-rates.csv"));
    private final Map<String, List<Line>> bomByModel = new HashMap<>();

    PartsExpectation() throws IOException {
        Map<String, String> familyOf = new HashMap<>();
        for (CSVRecord r : DemoSensorYear.csv("parts.csv")) {
            familyOf.put(r.get("part_number"), r.get("family"));
        }
        for (CSVRecord r : DemoSensorYear.csv("pump-models.csv")) {
            bomByModel.computeIfAbsent(r.get("model_code"), k -> new ArrayList<>()).add(new Line(r.get("part_number"),
                    familyOf.get(r.get("part_number")), r.get("basis").equals("PER_METRE"),
                    Double.parseDouble(r.get("quantity"))));
        }
    }

    Map<String, Double> unitsByPart(String model, double depthM, double ageYears) {
        List<StoppedPumpParts.FamilyRate> familyRates = new ArrayList<>();
        for (PlantedRate r : rates.values()) {
            familyRates.add(new StoppedPumpParts.FamilyRate(r.family(), r.perHour(depthM, ageYears), r.unitsPerEvent()));
        }
        List<StoppedPumpParts.BomPart> bom = new ArrayList<>();
        for (Line line : bomByModel.get(model)) {
            bom.add(new StoppedPumpParts.BomPart(line.part(), line.family(),
                    line.perMetre() ? Math.ceil(line.quantity() * depthM - 1e-9) : line.quantity()));
        }
        return StoppedPumpParts.expect(1, familyRates, bom).unitsByPart();
    }
}
