package org.depotcast.sensors;

import io.quarkus.hibernate.orm.panache.PanacheRepositoryBase;
import jakarta.enterprise.context.ApplicationScoped;
import jakarta.transaction.Transactional;
import org.depotcast.access.AccessScope;
import org.depotcast.access.AuditService;
import org.depotcast.catalogue.PumpModelService;
import org.depotcast.catalogue.PumpModelSummary;

import java.util.HashMap;
import java.util.List;
import java.util.Map;

/** Per pump model, strokes and litres per hour of use; set by those who keep the catalogue. */
@ApplicationScoped
public class SensorConversionService {
    @ApplicationScoped
    static class Conversions implements PanacheRepositoryBase<SensorConversion, Long> {
    }

    private final Conversions conversions;
    private final PumpModelService models;
    private final AccessScope scope;
    private final AuditService audit;

    SensorConversionService(Conversions conversions, PumpModelService models, AccessScope scope, AuditService audit) {
        this.conversions = conversions;
        this.models = models;
        this.scope = scope;
        this.audit = audit;
    }

    @Transactional
    public List<SensorConversionResponse> all() {
        Map<Long, String> codes = new HashMap<>();
        models.summariesById().forEach((id, model) -> codes.put(id, model.code()));
        return conversions.listAll().stream().map(c -> new SensorConversionResponse(codes.get(c.pumpModelId),
                c.strokesPerHour, c.litresPerHour)).toList();
    }

    @Transactional
    public SensorConversionResponse set(String modelCode, SensorConversionRequest request) {
        scope.requireCatalogue();
        PumpModelSummary model = models.requireSummary("modelCode", modelCode);
        SensorConversion conversion = conversions.findByIdOptional(model.id()).orElseGet(() -> {
            SensorConversion fresh = new SensorConversion();
            fresh.pumpModelId = model.id();
            return fresh;
        });
        SensorConversionResponse before = conversion.strokesPerHour == null && conversion.litresPerHour == null ? null
                : new SensorConversionResponse(model.code(), conversion.strokesPerHour, conversion.litresPerHour);
        conversion.strokesPerHour = request.strokesPerHour();
        conversion.litresPerHour = request.litresPerHour();
        conversions.persist(conversion);
        SensorConversionResponse after = new SensorConversionResponse(model.code(), request.strokesPerHour(),
                request.litresPerHour());
        audit.record("SENSOR_CONVERSION_SET", "pump_model", model.code(), before, after);
        return after;
    }

    @Transactional
    Map<Long, ReadingCheck.Factors> factorsByModel() {
        Map<Long, ReadingCheck.Factors> factors = new HashMap<>();
        conversions.listAll().forEach(c -> factors.put(c.pumpModelId,
                new ReadingCheck.Factors(c.strokesPerHour, c.litresPerHour)));
        return factors;
    }
}
