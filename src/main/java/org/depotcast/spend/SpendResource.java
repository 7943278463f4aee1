package org.depotcast.spend;

import jakarta.annotation.security.RolesAllowed;
import jakarta.validation.Valid;
import jakarta.validation.constraints.NotNull;
import jakarta.ws.rs.Consumes;
import jakarta.ws.rs.GET;
import jakarta.ws.rs.POST;
import jakarta.ws.rs.PUT;
import jakarta.ws.rs.Path;
import jakarta.ws.rs.PathParam;
import jakarta.ws.rs.Produces;
import jakarta.ws.rs.QueryParam;
import jakarta.ws.rs.core.MediaType;
import jakarta.ws.rs.core.Response;
import jakarta.ws.rs.core.UriInfo;
import org.depotcast.access.Roles;
import org.depotcast.common.InvalidInputException;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

@Path("/api/spend")
@Produces(MediaType.APPLICATION_JSON)
@RolesAllowed({Roles.PROGRAMME_LEAD, Roles.ADMIN, Roles.STORES_OFFICER})
class SpendResource {
    private final SpendService service;
    private final SpendScenarioService scenarios;
    private final BackCheckService backCheck;
    private final FinancialYearService financialYears;

    private final java.time.Clock clock;

    SpendResource(SpendService service, SpendScenarioService scenarios, BackCheckService backCheck,
                  FinancialYearService financialYears, java.time.Clock clock) {
        this.clock = clock;
        this.service = service;
        this.scenarios = scenarios;
        this.backCheck = backCheck;
        this.financialYears = financialYears;
    }

    /** The month the programme's financial year starts, and the current year's label and months. */
    record FinancialYearView(int startMonth, String currentYear, String currentYearMonths) {
        static FinancialYearView of(FinancialYears fy, java.time.LocalDate today) {
            FinancialYears.Period now = fy.projection(fy.startOfYearContaining(today), 1).get(0);
            return new FinancialYearView(fy.startMonth(), now.label(), now.months());
        }
    }

    record FinancialYearRequest(@NotNull @jakarta.validation.constraints.Min(1) @jakarta.validation.constraints.Max(12)
                                Integer startMonth) {
    }

    @GET
    @Path("financial-year")
    public FinancialYearView financialYear() {
        return FinancialYearView.of(financialYears.current(), java.time.LocalDate.now(clock));
    }

    /** The programme lead sets the month the financial year starts (1 = January); later runs use it. */
    @PUT
    @Path("financial-year")
    @Consumes(MediaType.APPLICATION_JSON)
    @RolesAllowed({Roles.PROGRAMME_LEAD, Roles.ADMIN})
    public FinancialYearView setFinancialYear(@Valid @NotNull FinancialYearRequest request) {
        return FinancialYearView.of(financialYears.set(request.startMonth()), java.time.LocalDate.now(clock));
    }

    /** Past years: the projection made with only earlier data, beside what was actually used. */
    @GET
    @Path("back-check")
    public List<BackCheckService.YearCheck> backCheck(@QueryParam("years") String years) {
        return backCheck.check(org.depotcast.common.QueryParams.intInRange("years", years, 3, 1, 5));
    }

    record ScenarioView(long id, String name, ScenarioDefinition definition) {
    }

    record RunView(long id, long scenarioId, java.time.LocalDate origin, String status, String phase, int draws,
                   long seed, String message, java.time.OffsetDateTime startedAt, java.time.OffsetDateTime finishedAt,
                   Long jobId) {
        static RunView from(SpendRun r) {
            return new RunView(r.id, r.scenarioId, r.origin, r.status.name(), r.phase, r.draws, r.seed, r.message,
                    r.startedAt, r.finishedAt, r.jobId);
        }
    }

    @POST
    @Path("scenarios")
    @Consumes(MediaType.APPLICATION_JSON)
    public Response save(@Valid @NotNull ScenarioDefinition definition, UriInfo uri) {
        SpendScenario s = scenarios.save(definition);
        return Response.created(uri.getAbsolutePathBuilder().path(Long.toString(s.id)).build())
                .entity(new ScenarioView(s.id, s.name, definition)).build();
    }

    @PUT
    @Path("scenarios/{id}")
    @Consumes(MediaType.APPLICATION_JSON)
    public ScenarioView update(@PathParam("id") long id, @Valid @NotNull ScenarioDefinition definition) {
        SpendScenario s = scenarios.update(id, definition);
        return new ScenarioView(s.id, s.name, definition);
    }

    @GET
    @Path("scenarios/{id}")
    public ScenarioView scenario(@PathParam("id") long id) {
        SpendScenario s = scenarios.scenario(id);
        return new ScenarioView(s.id, s.name, scenarios.fromJson(s.definition));
    }

    @GET
    @Path("scenarios")
    public List<ScenarioView> scenarios() {
        return scenarios.scenarios().stream().map(s -> new ScenarioView(s.id, s.name, scenarios.fromJson(s.definition))).toList();
    }

    /**
     * Starts a run; 202 with the run to poll. {@code origin} (yyyy-mm-dd, its month's first day is used) projects
     * from a past month with only what was known then; left out, the current month. A future one is a 400.
     */
    @POST
    @Path("scenarios/{id}/runs")
    public Response start(@PathParam("id") long id, @QueryParam("origin") String origin, UriInfo uri) {
        SpendRun run = service.start(id, org.depotcast.common.QueryParams.optionalDate("origin", origin));
        return Response.accepted(RunView.from(run))
                .location(uri.getBaseUriBuilder().path("api/spend/runs").path(Long.toString(run.id)).build()).build();
    }

    /** The newest runs first, of one scenario ({@code scenario=ID}) or of all; {@code limit} 1–100, default 20. */
    @GET
    @Path("runs")
    public List<RunView> runs(@QueryParam("scenario") String scenario, @QueryParam("limit") String limit) {
        Integer id = org.depotcast.common.QueryParams.optionalInt("scenario", scenario);
        return service.runs(id == null ? null : id.longValue(), org.depotcast.common.QueryParams.intInRange("limit", limit, 20, 1, 100))
                .stream().map(RunView::from).toList();
    }

    @GET
    @Path("runs/{id}")
    public RunView run(@PathParam("id") long id) {
        return RunView.from(service.run(id));
    }

    @GET
    @Path("runs/{id}/results")
    public SpendResults results(@PathParam("id") long id) {
        return service.results(id);
    }

    @GET
    @Path("runs/{id}/results.csv")
    @Produces("text/csv")
    public Response csv(@PathParam("id") long id) {
        return SpendReport.csv(id, service.results(id)).response();
    }

    @GET
    @Path("runs/{id}/report")
    @Produces(MediaType.TEXT_HTML)
    public String report(@PathParam("id") long id) {
        return SpendReport.html(service.results(id));
    }

    /** Totals per financial year of several finished runs side by side, e.g. ?runs=3,4 (baseline first). */
    static final int COMPARED_RUNS_MAX = 10;

    @GET
    @Path("compare")
    public List<Map<String, Object>> compare(@QueryParam("runs") String runIds) {
        if (runIds == null || runIds.isBlank()) {
            throw new InvalidInputException("runs", "name the runs to compare, e.g. runs=3,4");
        }
        String[] ids = runIds.split(",", COMPARED_RUNS_MAX + 2);
        if (ids.length > COMPARED_RUNS_MAX) {
            throw new InvalidInputException("runs", "compare at most " + COMPARED_RUNS_MAX + " runs at a time");
        }
        List<SpendResults> runs = new ArrayList<>();
        for (String part : ids) {
            long id;
            try {
                id = Long.parseLong(part.strip());
            } catch (NumberFormatException e) {
                throw new InvalidInputException("runs", "must be run ids separated by commas, was '" + org.depotcast.common.QueryParams.shown(part.strip()) + "'");
            }
            runs.add(service.results(id));
        }
        return SpendReport.compare(runs);
    }
}
