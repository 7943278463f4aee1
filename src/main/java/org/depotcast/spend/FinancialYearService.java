package org.depotcast.spend;

import jakarta.enterprise.context.ApplicationScoped;
import jakarta.persistence.EntityManager;
import jakarta.transaction.Transactional;
import org.depotcast.access.AccessScope;
import org.depotcast.access.AuditService;
import org.depotcast.access.CurrentUser;
import org.depotcast.common.InvalidInputException;
import org.eclipse.microprofile.config.inject.ConfigProperty;

import java.time.Clock;
import java.time.OffsetDateTime;
import java.util.List;
import java.util.Map;

/**
 * The month the programme's financial year starts: set by the programme lead, else
 * {@code depotcast.spend.financial-year-start-month} (January). Projections, reports and the back-check use it.
 */
@ApplicationScoped
public class FinancialYearService {
    static final String SETTING = "financial-year-start-month";

    private final EntityManager em;
    private final int configured;
    private final AccessScope scope;
    private final CurrentUser currentUser;
    private final AuditService audit;

    private final Clock clock;

    FinancialYearService(EntityManager em, @ConfigProperty(name = "depotcast.spend.financial-year-start-month",
            defaultValue = "1") int configured, AccessScope scope, CurrentUser currentUser, AuditService audit, Clock clock) {
        this.clock = clock;
        this.em = em;
        this.configured = configured;
        this.scope = scope;
        this.currentUser = currentUser;
        this.audit = audit;
    }

    @Transactional
    public FinancialYears current() {
        List<?> set = em.createNativeQuery("select setting_value from programme_setting where setting_name = ?1")
                .setParameter(1, SETTING).getResultList();
        return new FinancialYears(set.isEmpty() ? configured : Integer.parseInt((String) set.get(0)));
    }

    /** The programme lead (or an admin) sets the first month of the financial year, 1–12. */
    @Transactional
    public FinancialYears set(int startMonth) {
        scope.requireProgramme();
        if (startMonth < 1 || startMonth > 12) {
            throw new InvalidInputException("startMonth", "must be a month number 1–12, was " + startMonth);
        }
        FinancialYears before = current();
        em.createNativeQuery("delete from programme_setting where setting_name = ?1").setParameter(1, SETTING).executeUpdate();
        em.createNativeQuery("insert into programme_setting (setting_name, setting_value, set_by, set_at) values (?1, ?2, ?3, ?4)")
                .setParameter(1, SETTING).setParameter(2, Integer.toString(startMonth)).setParameter(3, currentUser.name())
                .setParameter(4, OffsetDateTime.now(clock)).executeUpdate();
        audit.record("FINANCIAL_YEAR_SET", "programme_setting", SETTING, Map.of("startMonth", before.startMonth()),
                Map.of("startMonth", startMonth));
        return new FinancialYears(startMonth);
    }
}
