package org.depotcast.common;

import org.eclipse.microprofile.openapi.OASFactory;
import org.eclipse.microprofile.openapi.OASFilter;
import org.eclipse.microprofile.openapi.models.OpenAPI;
import org.eclipse.microprofile.openapi.models.Operation;
import org.eclipse.microprofile.openapi.models.PathItem;
import org.eclipse.microprofile.openapi.models.media.Schema;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Completes the API document: each operation's summary and description from {@code openapi/operations.txt} (one
 * place to read and review them; an {@code @Operation} annotation wins), a tag per feature from the path, and the
 * document's description with the safety caution of the README. Field bounds come from the Bean Validation
 * constraints, which SmallRye OpenAPI writes into the schemas itself.
 */
public class ApiDocumentFilter implements OASFilter {
    static final String OPERATIONS = "openapi/operations.txt";

    /** Path prefix → feature tag and what the feature covers; the first prefix that matches wins. */
    private static final Map<String, String[]> TAGS = new LinkedHashMap<>();

    static {
        TAGS.put("/api/parts", new String[]{"Catalogue", "Parts, substitutes and pump models with their bills of materials"});
        TAGS.put("/api/pump-models", TAGS.get("/api/parts"));
        TAGS.put("/api/pumps", new String[]{"Fleet", "Installed pumps, their status and usage readings"});
        TAGS.put("/api/locations", new String[]{"Stock", "Locations, the stock ledger, balances, counts and purchase orders"});
        TAGS.put("/api/stock", TAGS.get("/api/locations"));
        TAGS.put("/api/purchase-orders", TAGS.get("/api/locations"));
        TAGS.put("/api/repairs", new String[]{"Repairs", "Repairs recorded by mechanics and the parts they consume"});
        TAGS.put("/api/requests", new String[]{"Parts requests", "Mechanics' requests for parts, approved and issued by officers"});
        TAGS.put("/api/forecast", new String[]{"Forecasting", "Stored forecasts, forecast runs, fleet models and what-if forecasts"});
        TAGS.put("/api/planning", new String[]{"Planning", "Stock policies, alerts, purchase plans and transfers between depots"});
        TAGS.put("/api/policy", TAGS.get("/api/planning"));
        TAGS.put("/api/sensors", new String[]{"Sensors", "Daily readings from pump sensors, measured hours and pumps that have probably stopped"});
        TAGS.put("/api/spend", new String[]{"Spend", "Spend scenarios, Monte Carlo projections and back-checks"});
        TAGS.put("/", new String[]{"Access", "Sign-in, sessions, accounts, the signed-in profile and the audit trail"});
    }

    /** Units (and date ranges) of request fields by name, for fields whose schema says nothing yet. */
    private static final Map<String, String> UNITS = new HashMap<>();

    static {
        String ofPart = "units of the part, in its unit of issue (each, metre, kilogram, litre or set)";
        for (String name : List.of("quantity", "receivedQuantity", "writtenOffQuantity", "serviceKitQuantity")) {
            UNITS.put(name, ofPart);
        }
        UNITS.put("orderQuantity", "order quantity Q, in units");
        UNITS.put("unitCost", "money per unit: in the part's currency, or for a lane per unit moved");
        UNITS.put("budget", "money, in the catalogue's currency");
        UNITS.put("packSize", "units in one pack");
        UNITS.put("minOrderQty", "least units a supplier sells");
        UNITS.put("leadTimeDays", "days from order to arrival");
        UNITS.put("shelfLifeDays", "days a part keeps in store");
        UNITS.put("serviceIntervalHours", "operating hours between preventive services");
        UNITS.put("depthM", "metres, pump setting depth");
        UNITS.put("usageHoursPerDay", "operating hours per day");
        UNITS.put("hoursPerDay", "operating hours per day");
        UNITS.put("latitude", "degrees north (WGS 84)");
        UNITS.put("longitude", "degrees east (WGS 84)");
        UNITS.put("leadTimeDemandMean", "units demanded over the protection period, mean");
        UNITS.put("variance", "units squared, variance of demand over the protection period");
        UNITS.put("serviceLevel", "probability, strictly between 0 and 1");
        UNITS.put("level", "cycle service level, a probability strictly between 0 and 1");
        UNITS.put("alpha", "smoothing constant in (0, 1]; chosen by the lowest in-sample error when absent");
        UNITS.put("beta", "smoothing constant of TSB's demand probability in (0, 1]");
        UNITS.put("horizon", "periods ahead");
        UNITS.put("history", "units demanded per period, oldest first");
        UNITS.put("count", "events counted in the row");
        UNITS.put("exposure", "exposure of the row, e.g. operating hours");
        UNITS.put("covariates", "named covariate values of the row");
        UNITS.put("horizonYears", "financial years projected");
        UNITS.put("decommissionPercentPerYear", "percent of today's pumps taken out of service per year");
        UNITS.put("usageChangePercent", "percent change of every pump's daily load");
        UNITS.put("priceEscalationPercentPerYear", "percent price rise per year, compounded from year 2");
        UNITS.put("exchangeRate", "units of the projection currency per unit of the catalogue currency");
        UNITS.put("draws", "Monte Carlo draws");
        UNITS.put("seed", "seed of the random draws, so a run can be repeated");
        UNITS.put("version", "the version read; a stale one is a 409");
        UNITS.put("year", "projection year, 1 = the first");
        UNITS.put("startMonth", "month the financial year starts, 1 = January");
        String happened = "date it happened, 1900-01-01 to one day after today (UTC); later is a 422";
        for (String name : List.of("occurredAt", "orderedOn", "reportedOn", "diagnosedOn", "partsAvailableOn", "fixedOn",
                "installedOn", "statusSince", "since", "readOn")) {
            UNITS.put(name, happened);
        }
        String planned = "planned date, 1900-01-01 to ten years after today";
        for (String name : List.of("expectedOn", "snoozeUntil", "planningDate")) {
            UNITS.put(name, planned);
        }
    }

    static final String CAUTION = "Safety: depotcast plans parts; it does not tell anyone how to repair a well. Work on "
            + "boreholes and hand pumps (lifting rods and rising mains: heavy, under tension, a crushing and dropping "
            + "hazard; working over an open well; anything that touches drinking water) must follow local codes, national "
            + "drinking-water quality rules and the practice of trained, licensed people. Parts in contact with drinking "
            + "water (seals, pipes, grease) must be approved for that use where the pump is installed; the demo "
            + "catalogue's descriptions are invented and certify nothing. After any repair that opens the rising main, "
            + "the water supply authority's disinfection and testing rules apply.";

    static final String DESCRIPTION = "Spare-parts planning for rural water programmes: catalogue, fleet, stock ledger, "
            + "repairs, parts requests, forecasts, replenishment planning and spend projections.\n\n"
            + "Errors are application/problem+json (RFC 9457) with errors[{field, message}] naming each field: 400 for "
            + "input out of its documented bounds, 404 for an unknown thing in the path, 409 for a conflict, 422 for a "
            + "rule of the trade or a date after it could have happened. Numeric fields carry their bounds (minimum, "
            + "maximum, digits) in the schemas below; dates run from 1900-01-01 to one day after today for things that "
            + "happened, ten years ahead for plans.\n\n" + CAUTION;

    @Override
    public void filterOpenAPI(OpenAPI openAPI) {
        Map<String, String[]> described = read();
        if (openAPI.getInfo() != null) {
            openAPI.getInfo().setDescription(DESCRIPTION);
        }
        describeFields(openAPI);
        Map<String, String> tagDescriptions = new LinkedHashMap<>();
        if (openAPI.getPaths() == null || openAPI.getPaths().getPathItems() == null) {
            return;
        }
        openAPI.getPaths().getPathItems().forEach((path, item) -> {
            for (Map.Entry<PathItem.HttpMethod, Operation> entry : item.getOperations().entrySet()) {
                Operation operation = entry.getValue();
                String[] text = described.get(entry.getKey().name() + " " + path);
                if (text != null && blank(operation.getSummary())) {
                    operation.setSummary(text[0]);
                }
                if (text != null && blank(operation.getDescription())) {
                    operation.setDescription(text[1]);
                }
                String[] tag = tagFor(path);
                if (operation.getTags() == null || operation.getTags().isEmpty()) {
                    operation.setTags(List.of(tag[0]));
                }
                tagDescriptions.putIfAbsent(tag[0], tag[1]);
            }
        });
        tagDescriptions.forEach((name, text) -> {
            if (openAPI.getTags() == null || openAPI.getTags().stream().noneMatch(t -> name.equals(t.getName()))) {
                openAPI.addTag(OASFactory.createTag().name(name).description(text));
            }
        });
    }

    private static void describeFields(OpenAPI openAPI) {
        if (openAPI.getComponents() == null || openAPI.getComponents().getSchemas() == null) {
            return;
        }
        for (Schema schema : openAPI.getComponents().getSchemas().values()) {
            if (schema.getProperties() == null) {
                continue;
            }
            schema.getProperties().forEach((name, property) -> {
                String units = UNITS.get(name);
                if (units != null && blank(property.getDescription())) {
                    property.setDescription(units);
                }
            });
        }
    }

    private static String[] tagFor(String path) {
        for (Map.Entry<String, String[]> entry : TAGS.entrySet()) {
            if (path.equals(entry.getKey()) || path.startsWith(entry.getKey() + "/") || "/".equals(entry.getKey())) {
                return entry.getValue();
            }
        }
        throw new IllegalStateException("unreachable: '/' matches every path");
    }

    private static boolean blank(String text) {
        return text == null || text.isBlank();
    }

    /** "METHOD path" → {summary, description}. */
    static Map<String, String[]> read() {
        Map<String, String[]> described = new HashMap<>();
        ClassLoader loader = Thread.currentThread().getContextClassLoader();
        try (InputStream in = (loader == null ? ApiDocumentFilter.class.getClassLoader() : loader).getResourceAsStream(OPERATIONS)) {
            if (in == null) {
                return described;
            }
            BufferedReader reader = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8));
            for (String line = reader.readLine(); line != null; line = reader.readLine()) {
                String[] parts = line.split("\\s*\\|\\s*", 3);
                if (line.isBlank() || line.startsWith("#") || parts.length < 3) {
                    continue;
                }
                described.put(parts[0].strip(), new String[]{parts[1].strip(), parts[2].strip()});
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return described;
    }
}
