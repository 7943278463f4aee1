package org.depotcast.forecasting;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import io.quarkus.narayana.jta.QuarkusTransaction;
import jakarta.enterprise.context.ApplicationScoped;
import org.depotcast.access.AccessScope;
import org.depotcast.access.CurrentUser;
import org.depotcast.common.EntityMissingException;
import org.depotcast.common.InvalidInputException;
import org.depotcast.jobs.JobKind;
import org.depotcast.jobs.JobProgress;
import org.depotcast.jobs.JobRunner;
import org.depotcast.jobs.JobService;
import org.depotcast.jobs.JobView;

import java.time.Clock;
import java.time.LocalDate;
import java.time.OffsetDateTime;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * The accuracy report for the programme lead: a forecast run as of a past origin (the as-of machinery: nothing dated
 * on or after the origin is used, and planning never reads the run) scored against the demand the repair records
 * show for the 12 months after it, beside the last-12-month mean and Croston. Runs as a background job.
 */
@ApplicationScoped
public class AccuracyReportService {
    private final ForecastRunService forecastRuns;
    private final ForecastRepository forecasts;
    private final FleetSnapshotLoader loader;
    private final JobRunner jobs;
    private final JobService jobViews;
    private final AccessScope scope;
    private final CurrentUser currentUser;
    private final ObjectMapper json;
    private final Clock clock;
    private final PastOrigins pastOrigins;

    AccuracyReportService(ForecastRunService forecastRuns, ForecastRepository forecasts, FleetSnapshotLoader loader,
                          JobRunner jobs, JobService jobViews, AccessScope scope, CurrentUser currentUser, ObjectMapper json,
                          Clock clock, PastOrigins pastOrigins) {
        this.pastOrigins = pastOrigins;
        this.forecastRuns = forecastRuns;
        this.forecasts = forecasts;
        this.loader = loader;
        this.jobs = jobs;
        this.jobViews = jobViews;
        this.scope = scope;
        this.currentUser = currentUser;
        this.json = json;
        this.clock = clock;
    }

    /** A report while it runs (results null) and once done. */
    public record ReportView(long id, LocalDate origin, Long forecastRunId, JobView job, AccuracyResults results) {
    }

    /**
     * Starts a report in the background; 400 naming {@code origin} unless its month starts at least 12 months before
     * the current month's (the year compared must be over); 409 while another report or a forecast run is going
     * (it computes a forecast run of its own, and two at once would share the machine's cores).
     */
    public long start(LocalDate origin) {
        scope.requireProgramme();
        LocalDate latest = forecastRuns.currentOrigin().minusMonths(AccuracyScoring.MONTHS);
        if (origin == null) {
            // A client that sends it in a JSON body meets this too, so say where it goes.
            throw new InvalidInputException("origin", "is required, as a query parameter (?origin=yyyy-mm-dd, at most "
                    + latest + "); a request body is not read");
        }
        LocalDate from = origin.withDayOfMonth(1);
        if (from.isAfter(latest)) {
            throw new InvalidInputException("origin", "must be at least 12 months in the past (at most " + latest
                    + ", so that the 12 months after it are over), was " + origin);
        }
        pastOrigins.requireHistoryBefore(from, origin);
        long[] ids = create(from);
        jobs.launch(ids[1], progress -> compute(ids[0], from, progress));
        return ids[0];
    }

    /** One report or forecast run at a time across instances: the job runner checks and inserts under a row lock (409). */
    private long[] create(LocalDate origin) {
        String by = currentUser.name();
        return jobs.createExclusive(JobKind.ACCURACY_REPORT, jobId -> {
            AccuracyReport report = new AccuracyReport();
            report.jobId = jobId;
            report.origin = origin;
            report.createdBy = by.substring(0, Math.min(80, by.length()));
            report.createdAt = OffsetDateTime.now(clock);
            forecasts.getEntityManager().persist(report);
            return new long[]{report.id, jobId};
        });
    }

    public ReportView report(long id) {
        scope.requireProgramme();
        AccuracyReport report = QuarkusTransaction.requiringNew().call(() -> java.util.Optional.ofNullable(
                        forecasts.getEntityManager().find(AccuracyReport.class, id))
                .orElseThrow(() -> new EntityMissingException(null, "accuracy report", id)));
        return new ReportView(report.id, report.origin, report.forecastRunId, jobViews.job(report.jobId),
                report.results == null ? null : read(report.results));
    }

    /** A report in a list: what was asked, by whom, and where its job stands (results are read one report at a time). */
    public record ReportListing(long id, LocalDate origin, String createdBy, OffsetDateTime createdAt, JobView job) {
    }

    /** The latest {@code limit} reports, newest first. */
    public List<ReportListing> recent(int limit) {
        scope.requireProgramme();
        List<AccuracyReport> latest = QuarkusTransaction.requiringNew().call(() -> forecasts.getEntityManager()
                .createQuery("from AccuracyReport order by id desc", AccuracyReport.class).setMaxResults(limit).getResultList());
        return latest.stream().map(r -> new ReportListing(r.id, r.origin, r.createdBy, r.createdAt, jobViews.job(r.jobId))).toList();
    }

    /** The report's rows, one line per part and location with each method's forecast, ranges and error. */
    public org.depotcast.common.CsvExport csv(long id) {
        ReportView view = report(id);
        if (view.results() == null) {
            throw new org.depotcast.common.BusinessRuleException("id", "accuracy report " + id + " is "
                    + view.job().stateWords() + ": its rows are written when it is done");
        }
        return AccuracyReportCsv.of(id, view.results());
    }

    private String compute(long reportId, LocalDate origin, JobProgress progress) {
        long runId = forecastRuns.runAsOfWithin(progress, origin);
        QuarkusTransaction.requiringNew().run(() ->
                forecasts.getEntityManager().find(AccuracyReport.class, reportId).forecastRunId = runId);
        progress.phase("reading the repair records of the 12 months after the origin");
        LocalDate end = origin.plusMonths(AccuracyScoring.MONTHS);
        FleetSnapshot after = loader.load(end, 24);
        Map<String, Double> actuals = AccuracyActuals.totals(after, origin, end);
        Set<String> kits = new HashSet<>(after.kitByMechanic().values());
        progress.phase("scoring the forecasts and the benchmarks");
        List<AccuracyActuals.Stored> stored = QuarkusTransaction.requiringNew().call(() -> {
            LocalDate runFrom = forecasts.getEntityManager().find(ForecastRun.class, runId).historyFrom;
            return forecasts.list("runId = ?1 order by partId, locationCode", runId).stream()
                    .map(f -> AccuracyActuals.stored(f, after.partNumbers().get(f.partId), runFrom)).toList();
        });
        Map<String, double[]> histories = AccuracyActuals.histories(after, stored, origin);
        List<AccuracyResults.Row> rows = new ArrayList<>(stored.size());
        Set<String> scoredKeys = new HashSet<>();
        for (AccuracyActuals.Stored s : stored) {
            String key = AccuracyActuals.key(s.partNumber(), s.location());
            scoredKeys.add(key);
            AccuracyScoring.Forecast f = new AccuracyScoring.Forecast(s.partNumber(), s.location(), s.yearMean(),
                    s.yearVariance(), histories.get(key));
            rows.add(AccuracyScoring.row(f, AccuracyScoring.level(s.location(), kits), actuals.getOrDefault(key, 0.0)));
            progress.progress(rows.size(), stored.size());
        }
        List<String> notes = AccuracyActuals.notes(actuals, scoredKeys);
        AccuracyResults results = new AccuracyResults(origin, origin, end.minusDays(1), runId, notes,
                AccuracyScoring.summaries(rows), rows);
        String text = write(results);
        progress.finishWith(() -> forecasts.getEntityManager().find(AccuracyReport.class, reportId).results = text);
        return "Accuracy report " + reportId + ": " + rows.size() + " series as of " + origin + " against the 12 months after it.";
    }

    private String write(AccuracyResults results) {
        try {
            return json.writeValueAsString(results);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("accuracy results cannot be written", e);
        }
    }

    private AccuracyResults read(String text) {
        try {
            return json.readValue(text, AccuracyResults.class);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("stored accuracy results cannot be read", e);
        }
    }
}
