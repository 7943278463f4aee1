package org.depotcast.spend;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import io.quarkus.hibernate.orm.panache.PanacheRepository;
import jakarta.enterprise.context.ApplicationScoped;
import jakarta.transaction.Transactional;
import org.depotcast.access.AccessScope;
import org.depotcast.access.AuditService;
import org.depotcast.access.CurrentUser;
import org.depotcast.catalogue.PumpModelService;
import org.depotcast.common.BusinessRuleException;
import org.depotcast.common.ConflictException;
import org.depotcast.common.EntityMissingException;
import org.depotcast.stock.LocationSummary;
import org.depotcast.stock.LocationKind;
import org.depotcast.stock.LocationService;

import java.time.Clock;
import java.time.OffsetDateTime;
import java.util.List;

/** Saved spend scenarios: named, checked against the catalogue and the depots, changed with an audit record. */
@ApplicationScoped
public class SpendScenarioService {
    private final Scenarios scenarios;
    private final PumpModelService models;
    private final LocationService locations;
    private final AccessScope scope;
    private final CurrentUser currentUser;
    private final AuditService audit;
    private final ObjectMapper json;

    @ApplicationScoped
    static class Scenarios implements PanacheRepository<SpendScenario> {
    }

    private final Clock clock;

    SpendScenarioService(Scenarios scenarios, PumpModelService models, LocationService locations, AccessScope scope,
                         CurrentUser currentUser, AuditService audit, ObjectMapper json, Clock clock) {
        this.clock = clock;
        this.scenarios = scenarios;
        this.models = models;
        this.locations = locations;
        this.scope = scope;
        this.currentUser = currentUser;
        this.audit = audit;
        this.json = json;
    }

    @Transactional
    public SpendScenario save(ScenarioDefinition definition) {
        scope.requireProgramme();
        if (scenarios.count("name", definition.name()) > 0) {
            throw new ConflictException("name", "a scenario named '" + definition.name() + "' exists");
        }
        checkInstallations(definition);
        SpendScenario scenario = new SpendScenario();
        scenario.name = definition.name();
        scenario.definition = toJson(definition);
        scenario.createdAt = OffsetDateTime.now(clock);
        scenario.createdBy = currentUser.name();
        scenarios.persist(scenario);
        audit.record("SPEND_SCENARIO_SAVED", "spend_scenario", scenario.name, null, definition);
        return scenario;
    }

    /** Changes a saved scenario; runs made before keep the results they computed. */
    @Transactional
    public SpendScenario update(long id, ScenarioDefinition definition) {
        scope.requireProgramme();
        SpendScenario scenario = scenarios.findByIdOptional(id, jakarta.persistence.LockModeType.PESSIMISTIC_WRITE)
                .orElseThrow(() -> new EntityMissingException(null, "spend scenario", id));
        if (scenarios.count("name = ?1 and id <> ?2", definition.name(), id) > 0) {
            throw new ConflictException("name", "a scenario named '" + definition.name() + "' exists");
        }
        checkInstallations(definition);
        ScenarioDefinition before = fromJson(scenario.definition);
        scenario.name = definition.name();
        scenario.definition = toJson(definition);
        audit.record("SPEND_SCENARIO_CHANGED", "spend_scenario", scenario.name, before, definition);
        return scenario;
    }

    private void checkInstallations(ScenarioDefinition definition) {
        List<ScenarioDefinition.Installation> installs = definition.installations() == null ? List.of() : definition.installations();
        for (int i = 0; i < installs.size(); i++) {
            ScenarioDefinition.Installation inst = installs.get(i);
            models.require("installations[" + i + "].modelCode", inst.modelCode());
            LocationSummary depot = locations.requireSummary("installations[" + i + "].depotCode", inst.depotCode());
            if (depot.kind() != LocationKind.DEPOT) {
                throw new BusinessRuleException("installations[" + i + "].depotCode", "'" + inst.depotCode() + "' is not a depot");
            }
            if (inst.year() > definition.horizonYears()) {
                throw new BusinessRuleException("installations[" + i + "].year", "is after the horizon of "
                        + definition.horizonYears() + " years");
            }
        }
    }

    @Transactional
    public SpendScenario scenario(long id) {
        scope.requireProgramme();
        return scenarios.findByIdOptional(id).orElseThrow(() -> new EntityMissingException(null, "spend scenario", id));
    }

    @Transactional
    public List<SpendScenario> scenarios() {
        scope.requireProgramme();
        return scenarios.listAll(io.quarkus.panache.common.Sort.by("id"));
    }

    private String toJson(Object value) {
        try {
            return json.writeValueAsString(value);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException(e);
        }
    }

    ScenarioDefinition fromJson(String text) {
        try {
            return json.readValue(text, ScenarioDefinition.class);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("stored scenario cannot be read", e);
        }
    }
}
