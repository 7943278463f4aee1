package org.depotcast.forecasting;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import io.quarkus.logging.Log;
import io.quarkus.runtime.StartupEvent;
import jakarta.enterprise.context.ApplicationScoped;
import jakarta.enterprise.event.Observes;
import org.depotcast.catalogue.ComponentFamily;
import org.depotcast.core.forecast.ForecastMethod;
import org.eclipse.microprofile.config.inject.ConfigProperty;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.Iterator;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.stream.Stream;

/**
 * Reads the declarative demand models in forecast-models/*.json. Checked at start-up (a malformed file stops the
 * service with the file and field named) and read again at every forecast run, so a planner's edit shows in the next
 * run without a restart. Families without a file use a stated built-in default.
 */
@ApplicationScoped
public class ForecastModelFiles {
    private static final Set<String> FIELDS = Set.of("family", "covariates", "priorEventsPer1000Hours", "unitsPerEvent",
            "methodPolicy", "preventive", "note");

    private final Path directory;

    ForecastModelFiles(@ConfigProperty(name = "depotcast.forecast.models-directory") String directory) {
        this.directory = Path.of(directory);
    }

    /** Thrown for a malformed model file; names the file and the field. */
    public static final class MalformedModelFile extends IllegalStateException {
        MalformedModelFile(String file, String field, String problem) {
            super("forecast model file " + file + ", field '" + field + "': " + problem);
        }
    }

    void checkAtStart(@Observes StartupEvent event) {
        Map<ComponentFamily, ForecastModelDefinition> models = load();
        if (!Files.isDirectory(directory)) {
            // Started from another folder, the service found no files and forecast every part without its scheduled
            // services (the defaults declare none), without a word: the demo's accuracy check of Dec 2025 then gave
            // 2,487 units forecast against 6,133 used (6,134 forecast with the folder).
            Log.warnf("forecast models: no folder %s, so every family takes the built-in default, which leaves out "
                    + "scheduled services; set DEPOTCAST_FORECAST_MODELS to the forecast-models folder",
                    directory.toAbsolutePath());
            return;
        }
        Log.infof("forecast models: %d families from %s", models.size(), directory.toAbsolutePath());
    }

    /** Every family's model: from its file where there is one, else the built-in default. */
    public Map<ComponentFamily, ForecastModelDefinition> load() {
        Map<ComponentFamily, ForecastModelDefinition> models = new EnumMap<>(ComponentFamily.class);
        if (Files.isDirectory(directory)) {
            try (Stream<Path> files = Files.list(directory)) {
                for (Path file : files.filter(f -> f.toString().endsWith(".json")).sorted().toList()) {
                    ForecastModelDefinition model = parse(file.getFileName().toString(), Files.readString(file));
                    if (models.put(model.family(), model) != null) {
                        throw new MalformedModelFile(file.getFileName().toString(), "family",
                                "family " + model.family() + " is declared by two files");
                    }
                }
            } catch (IOException e) {
                throw new IllegalStateException("cannot read forecast model directory " + directory, e);
            }
        }
        for (ComponentFamily family : ComponentFamily.values()) {
            models.computeIfAbsent(family, ForecastModelDefinition::defaultFor);
        }
        return models;
    }

    static ForecastModelDefinition parse(String file, String content) {
        JsonNode root;
        try {
            root = new ObjectMapper().readTree(content);
        } catch (com.fasterxml.jackson.core.JsonProcessingException e) {
            throw new MalformedModelFile(file, "(file)", "not well-formed JSON: " + e.getOriginalMessage());
        }
        if (root == null || !root.isObject()) {
            throw new MalformedModelFile(file, "(file)", "must hold one JSON object");
        }
        for (Iterator<String> names = root.fieldNames(); names.hasNext(); ) {
            String name = names.next();
            if (!FIELDS.contains(name)) {
                throw new MalformedModelFile(file, name, "unknown field; known fields are " + FIELDS);
            }
        }
        ComponentFamily family = enumField(file, root, "family", ComponentFamily.class);
        List<org.depotcast.core.forecast.RateCovariate> covariates = new ArrayList<>();
        JsonNode list = root.path("covariates");
        if (!list.isMissingNode()) {
            if (!list.isArray()) {
                throw new MalformedModelFile(file, "covariates", "must be a list such as [\"log_depth\", \"age_years\"]");
            }
            for (JsonNode item : list) {
                covariates.add(parseEnum(file, "covariates", item.asText(), org.depotcast.core.forecast.RateCovariate.class));
            }
        }
        double prior = root.path("priorEventsPer1000Hours").isMissingNode() ? 0.02
                : positiveNumber(file, root, "priorEventsPer1000Hours");
        Double units = root.path("unitsPerEvent").isMissingNode() || root.path("unitsPerEvent").isNull() ? null
                : positiveNumber(file, root, "unitsPerEvent");
        String policy = root.path("methodPolicy").asText("auto").toLowerCase(Locale.ROOT);
        if (!policy.equals("auto") && !policy.equals("fleet")) {
            parseEnum(file, "methodPolicy", policy, ForecastMethod.class);
        }
        JsonNode preventive = root.path("preventive");
        if (!preventive.isMissingNode() && !preventive.isBoolean()) {
            throw new MalformedModelFile(file, "preventive", "must be true or false");
        }
        return new ForecastModelDefinition(family, List.copyOf(covariates), prior, units, policy,
                preventive.asBoolean(false), file);
    }

    private static double positiveNumber(String file, JsonNode root, String field) {
        JsonNode node = root.path(field);
        if (!node.isNumber() || !(node.asDouble() > 0)) {
            throw new MalformedModelFile(file, field, "must be a number greater than 0, was " + node);
        }
        return node.asDouble();
    }

    private static <E extends Enum<E>> E enumField(String file, JsonNode root, String field, Class<E> type) {
        JsonNode node = root.path(field);
        if (!node.isTextual()) {
            throw new MalformedModelFile(file, field, "is required");
        }
        return parseEnum(file, field, node.asText(), type);
    }

    private static <E extends Enum<E>> E parseEnum(String file, String field, String value, Class<E> type) {
        return org.depotcast.common.EnumNames.parse(type, value).orElseThrow(() -> new MalformedModelFile(file, field,
                "'" + value + "' is not one of " + org.depotcast.common.EnumNames.allowed(type).toLowerCase(Locale.ROOT)));
    }
}
