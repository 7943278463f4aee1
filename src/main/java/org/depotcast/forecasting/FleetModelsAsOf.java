package org.depotcast.forecasting;

import jakarta.enterprise.context.ApplicationScoped;
import org.depotcast.catalogue.ComponentFamily;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * Fits the fleet models as they would have been fitted on a past date, from the history before it only: what a
 * back-check of a projection needs. Nothing is stored.
 */
@ApplicationScoped
public class FleetModelsAsOf {
    private final ForecastModelFiles files;

    FleetModelsAsOf(ForecastModelFiles files) {
        this.files = files;
    }

    public Map<ComponentFamily, FleetModelResponse> fit(FleetSnapshot snapshot) {
        Map<ComponentFamily, FleetModelFitter.Breakdowns> breakdowns = FleetModelFitter.Breakdowns.of(snapshot);
        Map<ComponentFamily, FleetModelResponse> out = new EnumMap<>(ComponentFamily.class);
        for (ForecastModelDefinition definition : files.load().values()) {
            FleetModel model = FleetModelFitter.fit(definition, snapshot, breakdowns.get(definition.family()), 0);
            List<String> terms = new ArrayList<>();
            terms.add("intercept");
            definition.covariates().forEach(c -> terms.add(c.name().toLowerCase(Locale.ROOT)));
            Map<String, Double> coefficients = new LinkedHashMap<>(), errors = new LinkedHashMap<>();
            if (model.fit() == null) {
                coefficients.put("intercept", Math.log(model.priorPerHour()));
            } else {
                for (int i = 0; i < terms.size(); i++) {
                    coefficients.put(terms.get(i), model.fit().coefficients()[i]);
                    errors.put(terms.get(i), model.fit().standardErrors()[i]);
                }
            }
            out.put(definition.family(), new FleetModelResponse(definition.family().name(), 0, model.source(), coefficients,
                    errors, model.fit() == null ? null : model.fit().deviance(),
                    model.fit() == null ? null : model.fit().dfResidual(),
                    model.fit() == null ? null : model.fit().dispersion(), model.fit() != null && model.fit().overdispersed(),
                    model.events(), model.exposureHours(), model.unitsPerEvent(), Math.exp(coefficients.get("intercept")) * 1000));
        }
        return out;
    }
}
