package org.depotcast.sensors;

import com.fasterxml.jackson.databind.ObjectMapper;
import io.quarkus.logging.Log;
import io.quarkus.narayana.jta.QuarkusTransaction;
import jakarta.enterprise.context.ApplicationScoped;
import jakarta.persistence.EntityManager;
import org.depotcast.access.AccessScope;
import org.depotcast.access.AuditService;
import org.depotcast.common.DateBounds;
import org.depotcast.common.ExclusiveLock;
import org.depotcast.fleet.PumpService;

import java.io.InputStream;
import java.sql.SQLException;
import java.time.Clock;
import java.time.LocalDate;
import java.time.OffsetDateTime;
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
 * Rows are gathered in chunks; each chunk reads the pump-months it touches, applies its rows and writes each month
 * once with its sum and days covered (the monthly roll-up), so a file's memory is bounded by one chunk whatever its
 * length.
 *
 * <p>Files are taken one at a time in this process: a chunk reads the months held before writing them back, which two
 * files writing the same month at once would overwrite.
 */
@ApplicationScoped
public class SensorIntakeService {
    /** Rows held before a write: a week of 50,000 pumps is about two chunks (some 20 MB). */
    static final int CHUNK_ROWS = 200_000;
    static final int REFUSED_LISTED = 1_000;
    private static final int TRANSACTION_TIMEOUT_SECONDS = 3_600;

    /**
     * The database lock a file's transaction holds: a file's pump-months are read, merged and rewritten whole, so two
     * instances sharing a database must not take files at once (the later write would drop the other's days).
     */
    static final String INTAKE_LOCK = "SENSOR_INTAKE";

    private final ReentrantLock oneFileAtATime = new ReentrantLock(true);
    private final ExclusiveLock acrossInstances;
    private final Clock clock;
    private final SensorReadingStore store;
    private final PumpService pumps;
    private final AccessScope scope;
    private final AuditService audit;
    private final SensorConversionService conversions;
    private final ObjectMapper json;
    private final StopFlagService stopFlags;
    private final EntityManager session;

    SensorIntakeService(SensorReadingStore store, PumpService pumps, AccessScope scope, AuditService audit,
                        SensorConversionService conversions, ObjectMapper json, StopFlagService stopFlags,
                        EntityManager session, ExclusiveLock acrossInstances, Clock clock) {
        this.acrossInstances = acrossInstances;
        this.clock = clock;
        this.session = session;
        this.stopFlags = stopFlags;
        this.json = json;
        this.store = store;
        this.pumps = pumps;
        this.scope = scope;
        this.audit = audit;
        this.conversions = conversions;
    }

    /** A CSV file: {@code asset_id,day} and one of {@code hours,strokes,litres} (see {@link ReadingFiles}). */
    public IntakeResult intakeCsv(InputStream body) {
        return intake(rows -> ReadingFiles.readCsv(body, rows));
    }

    /** Newline-delimited JSON: one object a line (see {@link ReadingFiles}). */
    public IntakeResult intakeNdjson(InputStream body) {
        return intake(rows -> ReadingFiles.readNdjson(body, json, rows));
    }

    /** Reads the file through {@code reader}, which hands over one raw row at a time. */
    IntakeResult intake(Consumer<Consumer<RawReading>> reader) {
        oneFileAtATime.lock();
        try {
            // The transaction ends (commits) before the next file may read what is held.
            Tally tally = QuarkusTransaction.requiringNew().timeout(TRANSACTION_TIMEOUT_SECONDS).call(() -> run(reader));
            if (!tally.touchedPumps.isEmpty()) {
                // Judged as of the file's last day: a late file does not read as a gap.
                stopFlags.refresh(tally.touchedPumps, tally.lastDay);
            }
            return tally.result();
        } finally {
            oneFileAtATime.unlock();
        }
    }

    private Tally run(Consumer<Consumer<RawReading>> reader) {
        acrossInstances.take(INTAKE_LOCK, OffsetDateTime.now(clock));
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
            tally.touchedPumps.add(outcome.reading().pump().id());
            if (tally.lastDay == null || outcome.reading().day().isAfter(tally.lastDay)) {
                tally.lastDay = outcome.reading().day();
            }
            if (chunk.size() == CHUNK_ROWS) {
                write(chunk, tally);
                chunk.clear();
            }
        });
        write(chunk, tally);
        audit.record("SENSOR_READINGS_RECEIVED", "sensor_reading", tally.rowsRead + " rows", null,
                Map.of("added", tally.added, "replaced", tally.replaced, "unchanged", tally.unchanged,
                        "refused", tally.refused));
        Log.infof("sensor intake: %d rows, %d added, %d replaced, %d unchanged, %d refused", tally.rowsRead,
                tally.added, tally.replaced, tally.unchanged, tally.refused);
        return tally;
    }

    /**
     * Reads the chunk's pump-months once, applies its rows in file order (a later row for the same day replaces the
     * earlier, audited), and writes each touched month once.
     */
    private void write(List<ReadingCheck.Checked> chunk, Tally tally) {
        if (chunk.isEmpty()) {
            return;
        }
        Set<Long> pumpIds = new HashSet<>();
        Set<Long> keys = new HashSet<>();
        LocalDate from = LocalDate.MAX, to = LocalDate.MIN;
        for (ReadingCheck.Checked r : chunk) {
            pumpIds.add(r.pump().id());
            keys.add(SensorReadingStore.key(r.pump().id(), r.day()));
            from = r.day().isBefore(from) ? r.day() : from;
            to = r.day().isAfter(to) ? r.day() : to;
        }
        try {
            Map<Long, MonthDays> held = store.held(pumpIds, from.withDayOfMonth(1), to.withDayOfMonth(1), keys);
            Map<Long, MonthDays> touched = new LinkedHashMap<>();
            for (ReadingCheck.Checked r : chunk) {
                long key = SensorReadingStore.key(r.pump().id(), r.day());
                MonthDays days = held.computeIfAbsent(key, k -> MonthDays.empty(r.day().withDayOfMonth(1)));
                int old = days.set(r.day(), r.hundredths());
                if (old == r.hundredths()) {
                    tally.unchanged++;
                    continue;
                }
                touched.put(key, days);
                if (old == MonthDays.MISSING) {
                    tally.added++;
                } else {
                    tally.replaced++;
                    audit.record("SENSOR_READING_REPLACED", "sensor_reading", r.pump().assetId() + "@" + r.day(),
                            Map.of("hours", old / 100.0), Map.of("hours", r.hundredths() / 100.0, "row", r.row()));
                }
            }
            store.write(new ArrayList<>(touched.entrySet()));
            // A bulk file may replace millions of days: their audit entries go out with each chunk, not held to the end.
            session.flush();
            session.clear();
        } catch (SQLException e) {
            throw new IllegalStateException("sensor readings could not be written", e);
        }
    }

    private static final class Tally {
        long rowsRead, added, replaced, unchanged, refused;
        final Set<Long> touchedPumps = new HashSet<>();
        LocalDate lastDay;
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
