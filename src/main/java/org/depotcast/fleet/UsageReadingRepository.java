package org.depotcast.fleet;

import io.quarkus.hibernate.orm.panache.PanacheRepository;
import io.quarkus.panache.common.Sort;
import jakarta.enterprise.context.ApplicationScoped;

import java.time.LocalDate;
import java.util.HashMap;
import java.util.HashSet;
import java.util.Map;
import java.util.List;
import java.util.Set;

@ApplicationScoped
class UsageReadingRepository implements PanacheRepository<UsageReading> {
    List<UsageReading> ofPump(long pumpId) {
        return list("pump.id", Sort.by("readOn"), pumpId);
    }

    boolean exists(long pumpId, LocalDate readOn) {
        return count("pump.id = ?1 and readOn = ?2", pumpId, readOn) > 0;
    }

    /** "pumpId@date" of every stored reading, to refuse duplicates in one query. */
    Set<String> keys() {
        Set<String> keys = new HashSet<>();
        for (Object[] row : getEntityManager().createQuery("select r.pump.id, r.readOn from UsageReading r",
                Object[].class).getResultList()) {
            keys.add(row[0] + "@" + row[1]);
        }
        return keys;
    }

    /** The newest reading of each pump: pump id -> {hours per day, source}. One ordered scan, no correlated subquery. */
    Map<Long, Object[]> latestPerPump() {
        Map<Long, Object[]> latest = new HashMap<>();
        for (Object[] row : getEntityManager().createQuery(
                "select r.pump.id, r.hoursPerDay, r.source from UsageReading r order by r.pump.id, r.readOn",
                Object[].class).getResultList()) {
            latest.put((Long) row[0], new Object[]{row[1], row[2]});
        }
        return latest;
    }

    /** Every reading, oldest first per pump; rows: pump id, read on, hours per day. */
    List<UsageReadingRow> allReadings() {
        return getEntityManager().createQuery("select new org.depotcast.fleet.UsageReadingRow(r.pump.id, r.readOn, "
                + "r.hoursPerDay) from UsageReading r order by r.pump.id, r.readOn", UsageReadingRow.class).getResultList();
    }
}
