package org.depotcast.sensors;

import jakarta.enterprise.context.ApplicationScoped;
import jakarta.transaction.Transactional;
import org.depotcast.access.AccessScope;
import org.depotcast.access.AuditService;
import org.depotcast.access.CurrentUser;
import org.depotcast.common.InvalidInputException;
import org.depotcast.common.ProgrammeSettings;

import java.time.Clock;
import java.time.OffsetDateTime;
import java.util.Map;

/**
 * How sure the sensors must make a pump's stop before {@link StopFlagService} opens a "probably down" flag: the least
 * probability down, set by the programme lead (a programme setting), else {@value #DEFAULT}. Higher means fewer false
 * alarms and fewer, later early warnings; the README measures the trade on the demo. A change applies to flags opened
 * from then on: flags already open stay open.
 */
@ApplicationScoped
public class StopCertaintyService {
    static final String SETTING = "stop-flag-least-probability";
    static final double DEFAULT = 0.5;
    static final double LOWEST = 0.5;
    static final double HIGHEST = 0.99;
    /** Said beside the field; a per-cent figure (80 for 80 %) arriving as a fraction is refused, not clamped. */
    static final String RANGE = "must be a fraction from 0.5 to 0.99 (50 % to 99 %)";

    /** The least probability in force, and the default it replaces. */
    public record StopCertainty(double leastProbability, double defaultLeastProbability) {
    }

    private final ProgrammeSettings settings;
    private final AccessScope scope;
    private final CurrentUser currentUser;
    private final AuditService audit;
    private final Clock clock;

    StopCertaintyService(ProgrammeSettings settings, AccessScope scope, CurrentUser currentUser, AuditService audit,
                         Clock clock) {
        this.settings = settings;
        this.scope = scope;
        this.currentUser = currentUser;
        this.audit = audit;
        this.clock = clock;
    }

    @Transactional
    public StopCertainty inForce() {
        return new StopCertainty(leastProbability(), DEFAULT);
    }

    /** The probability down at which a flag opens now. */
    double leastProbability() {
        return settings.value(SETTING).map(Double::parseDouble).orElse(DEFAULT);
    }

    /** The programme lead (or an admin) sets the least probability, 0.5 to 0.99. */
    @Transactional
    public StopCertainty set(double leastProbability) {
        scope.requireProgramme();
        if (!(leastProbability >= LOWEST && leastProbability <= HIGHEST)) {
            throw new InvalidInputException("leastProbability", RANGE);
        }
        double before = leastProbability();
        settings.set(SETTING, Double.toString(leastProbability), currentUser.name(), OffsetDateTime.now(clock));
        audit.record("STOP_CERTAINTY_SET", "programme_setting", SETTING, Map.of("leastProbability", before),
                Map.of("leastProbability", leastProbability));
        return new StopCertainty(leastProbability, DEFAULT);
    }
}
