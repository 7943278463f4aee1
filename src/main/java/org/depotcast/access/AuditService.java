package org.depotcast.access;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import io.quarkus.hibernate.orm.panache.PanacheRepository;
import io.quarkus.panache.common.Sort;
import jakarta.enterprise.context.ApplicationScoped;
import jakarta.transaction.Transactional;
import org.depotcast.common.CsvExport;

import java.time.Clock;
import java.time.OffsetDateTime;
import java.util.List;

/**
 * The append-only audit log. Callers record inside their own transaction, so a change and its audit entry are
 * written together or not at all.
 */
@ApplicationScoped
public class AuditService {
    private static final int MAX_JSON = 4000;

    private final Entries entries;
    private final CurrentUser currentUser;
    private final ObjectMapper json;
    private final Clock clock;

    @ApplicationScoped
    static class Entries implements PanacheRepository<AuditEntry> {
    }

    AuditService(Entries entries, CurrentUser currentUser, ObjectMapper json, Clock clock) {
        this.entries = entries;
        this.currentUser = currentUser;
        this.json = json;
        this.clock = clock;
    }

    /** Records a change; {@code before} is null for a creation, {@code after} null for a removal. */
    @Transactional(Transactional.TxType.MANDATORY)
    public void record(String action, String entityType, String entityKey, Object before, Object after) {
        AuditEntry entry = new AuditEntry();
        entry.at = OffsetDateTime.now(clock);
        entry.actor = currentUser.name();
        entry.action = action;
        entry.entityType = entityType;
        entry.entityKey = entityKey.length() > 120 ? entityKey.substring(0, 120) : entityKey;
        entry.beforeJson = toJson(before);
        entry.afterJson = toJson(after);
        entries.persist(entry);
    }

    @Transactional
    public List<AuditEntry> recent(String entityType, int limit) {
        Sort newest = Sort.descending("id");
        return entityType == null ? entries.findAll(newest).page(0, limit).list()
                : entries.find("entityType", newest, entityType).page(0, limit).list();
    }

    @Transactional
    public CsvExport exportCsv(String entityType) {
        return CsvExport.of("audit-log.csv", List.of("at", "actor", "action", "entity_type", "entity_key", "before", "after"),
                recent(entityType, Integer.MAX_VALUE), e -> java.util.Arrays.asList(e.at, e.actor, e.action,
                        e.entityType, e.entityKey, e.beforeJson == null ? "" : e.beforeJson,
                        e.afterJson == null ? "" : e.afterJson));
    }

    private String toJson(Object value) {
        if (value == null) {
            return null;
        }
        try {
            String text = value instanceof String s ? s : json.writeValueAsString(value);
            return text.length() > MAX_JSON ? text.substring(0, MAX_JSON - 1) + "…" : text;
        } catch (JsonProcessingException e) {
            return String.valueOf(value);
        }
    }
}
