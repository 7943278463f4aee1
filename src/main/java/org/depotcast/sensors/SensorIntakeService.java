package org.depotcast.sensors;

import io.quarkus.logging.Log;
import io.quarkus.narayana.jta.QuarkusTransaction;
import jakarta.enterprise.context.ApplicationScoped;
import org.depotcast.access.AccessScope;
import org.depotcast.access.AuditService;
import org.depotcast.common.DateBounds;
import org.depotcast.fleet.PumpService;

import java.sql.SQLException;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.locks.ReentrantLock;
import java.util.function.Consumer;

/**
 * Takes daily readings from sensors in bulk. Every row is checked on its own ({@link ReadingCheck}): a row that
 * cannot be right is refused with its reason and the rest of the file is taken. One reading per pump and day: the
 * same value again changes nothing; a different value replaces the one held and is audited (before and after).
 * Rows are written in chunks with multi-row upserts, and each chunk adds its change to the monthly roll-up, so a
 * file's memory is bounded by one chunk whatever its length.
 *
 * <p>Files are taken one at a time in this process: a chunk reads the values held before writing, and the roll-up
 * adds differences, which two files writing the same day at once could count twice.
 */
@ApplicationScoped
public class SensorIntakeService {
    static final int CHUNK_ROWS = 5_000;
    static final int REFUSED_LISTED = 1_000;
    private static final int TRANSACTION_TIMEOUT_SECONDS = 3_600;

    private final ReentrantLock oneFileAtATime = new ReentrantLock(true);
    private final SensorReadingStore store;
    private final PumpService pumps;
    private final AccessScope scope;
    private final AuditService audit;
    private final SensorConversionService conversions;

    SensorIntakeService(SensorReadingStore store, PumpService pumps, AccessScope scope, AuditService audit,
                        SensorConversionService conversions) {
        this.store = store;
        this.pumps = pumps;
        this.scope = scope;
        this.audit = audit;
        this.conversions = conversions;
    }

    /** Reads the file through {@code reader}, which hands over one raw row at a time. */
    public IntakeResult intake(Consumer<Consumer<RawReading>> reader) {
        oneFileAtATime.lock();
        try {
            // The transaction ends (commits) before the next file may read what is held.
            return QuarkusTransaction.requiringNew().timeout(TRANSACTION_TIMEOUT_SECONDS).call(() -> run(reader));
        } finally {
            oneFileAtATime.unlock();
        }
    }

    private IntakeResult run(Consumer<Consumer<RawReading>> reader) {
        PumpIndex index = PumpIndex.of(pumps.intakeRows(), scope.current());
        ReadingCheck check = new ReadingCheck(index, conversions.factorsByModel(), DateBounds.latestEvent());
        Tally tally = new Tally();
        List<ReadingCheck.Checked> chunk = new ArrayList<>(CHUNK_ROWS);
        reader.accept(raw -> {
            tally.rowsRead++;
            ReadingCheck.Outcome outcome = check.check(raw);
            if (outcome.refusal() != null) {
                tally.refuse(outcome.refusal());
                return;
            }
            chunk.add(outcome.reading());
            if (chunk.size() == CHUNK_ROWS) {
                write(chunk, tally);
                chunk.clear();
            }
        });
        write(chunk, tally);
        audit.record("SENSOR_READINGS_RECEIVED", "sensor_daily_usage", tally.rowsRead + " rows", null,
                Map.of("added", tally.added, "replaced", tally.replaced, "unchanged", tally.unchanged,
                        "refused", tally.refused));
        Log.infof("sensor intake: %d rows, %d added, %d replaced, %d unchanged, %d refused", tally.rowsRead,
                tally.added, tally.replaced, tally.unchanged, tally.refused);
        return tally.result();
    }

    private void write(List<ReadingCheck.Checked> chunk, Tally tally) {
        if (chunk.isEmpty()) {
            return;
        }
        Set<Long> pumpIds = new HashSet<>();
        Set<Long> keys = new HashSet<>(chunk.size() * 2);
        LocalDate from = LocalDate.MAX, to = LocalDate.MIN;
        for (ReadingCheck.Checked r : chunk) {
            pumpIds.add(r.pump().id());
            keys.add(SensorReadingStore.key(r.pump().id(), r.day()));
            from = r.day().isBefore(from) ? r.day() : from;
            to = r.day().isAfter(to) ? r.day() : to;
        }
        try {
            Map<Long, Integer> current = store.held(pumpIds, from, to, keys);
            Map<Long, SensorReadingStore.DayWrite> writes = new LinkedHashMap<>();
            Map<Long, long[]> months = new LinkedHashMap<>();
            for (ReadingCheck.Checked r : chunk) {
                long key = SensorReadingStore.key(r.pump().id(), r.day());
                Integer old = current.put(key, r.hundredths());
                if (old != null && old == r.hundredths()) {
                    tally.unchanged++;
                    continue;
                }
                if (old == null) {
                    tally.added++;
                } else {
                    tally.replaced++;
                    audit.record("SENSOR_READING_REPLACED", "sensor_daily_usage", r.pump().assetId() + "@" + r.day(),
                            Map.of("hours", old / 100.0), Map.of("hours", r.hundredths() / 100.0, "row", r.row()));
                }
                writes.put(key, new SensorReadingStore.DayWrite(r.pump().id(), r.day(), r.hundredths()));
                long[] month = months.computeIfAbsent(SensorReadingStore.key(r.pump().id(), r.day().withDayOfMonth(1)),
                        k -> new long[]{r.pump().id(), r.day().withDayOfMonth(1).toEpochDay(), 0, 0});
                month[2] += r.hundredths() - (old == null ? 0 : old);
                month[3] += old == null ? 1 : 0;
            }
            store.writeDays(new ArrayList<>(writes.values()));
            store.addToMonths(months.values().stream().map(m -> new SensorReadingStore.MonthDelta(m[0],
                    LocalDate.ofEpochDay(m[1]), m[2], (int) m[3])).toList());
        } catch (SQLException e) {
            throw new IllegalStateException("sensor readings could not be written", e);
        }
    }

    private static final class Tally {
        long rowsRead, added, replaced, unchanged, refused;
        final List<RefusedRow> listed = new ArrayList<>();

        void refuse(RefusedRow row) {
            refused++;
            if (listed.size() < REFUSED_LISTED) {
                listed.add(row);
            }
        }

        IntakeResult result() {
            return new IntakeResult(rowsRead, added + replaced + unchanged, added, replaced, unchanged, refused,
                    List.copyOf(listed), refused == listed.size());
        }
    }
}
