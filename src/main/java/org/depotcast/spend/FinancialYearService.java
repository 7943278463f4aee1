package org.depotcast.spend;

import jakarta.enterprise.context.ApplicationScoped;
import jakarta.transaction.Transactional;
import org.depotcast.access.AccessScope;
import org.depotcast.access.AuditService;
import org.depotcast.access.CurrentUser;
import org.depotcast.common.InvalidInputException;
import org.depotcast.common.ProgrammeSettings;
import org.eclipse.microprofile.config.inject.ConfigProperty;

import java.time.Clock;
import java.time.OffsetDateTime;
import java.util.Map;

/**
 * The month the programme's financial year starts: set by the programme lead, else
 * {@code depotcast.spend.financial-year-start-month} (January). Projections, reports and the back-check use it.
 */
@ApplicationScoped
public class FinancialYearService {
    static final String SETTING = "financial-year-start-month";

    private final ProgrammeSettings settings;
    private final int configured;
    private final AccessScope scope;
    private final CurrentUser currentUser;
    private final AuditService audit;

    private final Clock clock;

    FinancialYearService(ProgrammeSettings settings, @ConfigProperty(name = "depotcast.spend.financial-year-start-month",
            defaultValue = "1") int configured, AccessScope scope, CurrentUser currentUser, AuditService audit, Clock clock) {
        this.clock = clock;
        this.settings = settings;
        this.configured = configured;
        this.scope = scope;
        this.currentUser = currentUser;
        this.audit = audit;
    }

    @Transactional
    public FinancialYears current() {
        return new FinancialYears(settings.value(SETTING).map(Integer::parseInt).orElse(configured));
    }

    /** The programme lead (or an admin) sets the first month of the financial year, 1–12. */
    @Transactional
    public FinancialYears set(int startMonth) {
        scope.requireProgramme();
        if (startMonth < 1 || startMonth > 12) {
            throw new InvalidInputException("startMonth", "must be a month number 1–12, was " + startMonth);
        }
        FinancialYears before = current();
        settings.set(SETTING, Integer.toString(startMonth), currentUser.name(), OffsetDateTime.now(clock));
        audit.record("FINANCIAL_YEAR_SET", "programme_setting", SETTING, Map.of("startMonth", before.startMonth()),
                Map.of("startMonth", startMonth));
        return new FinancialYears(startMonth);
    }
}
