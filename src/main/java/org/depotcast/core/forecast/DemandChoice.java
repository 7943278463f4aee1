package org.depotcast.core.forecast;

import java.util.Arrays;
import java.util.Locale;

/**
 * One series' breakdown demand over the horizon: from the fleet model or from the part's own history, as its family's
 * rule says, with scheduled-service demand added on top and the variance of every month and of the first 12 months
 * together.
 * <ul>
 * <li>{@code auto}: a series the fleet model covers takes the fleet's expected units times its credibility ratio
 * ({@link CredibilityWeight}: the fleet rate updated by the series' own history), never a choice on one window;
 * a series it does not cover takes the best history method ({@link SeriesForecaster}).</li>
 * <li>{@code fleet}: the fleet's expected units as they are, where the model covers the series; else history.</li>
 * <li>a method name ({@code croston}, {@code sba}, …): that method on the history.</li>
 * </ul>
 * Both sources are scored on the last {@link #HOLDOUT_MONTHS} months of a series with at least 14 (the history
 * method fitted on the months before, the fleet model fitted without them), as diagnostics: RMSSE and MASE
 * ({@link ErrorScores}). History variances are per month and add up over a year; the fleet's carry the process, the
 * fitted rate's and the ratio's uncertainty ({@link FleetDemandVariance}).
 */
public final class DemandChoice {
    /** Months held out to score each source. */
    public static final int HOLDOUT_MONTHS = 12;
    private static final ErrorScores UNSCORED = new ErrorScores(Double.NaN, Double.NaN, Double.NaN, 0);

    /** Where breakdown demand comes from: "auto", "fleet", or one history method. */
    public record Rule(boolean auto, boolean fleet, ForecastMethod method) {
        /** {@code auto}, {@code fleet} or a {@link ForecastMethod} name, in any case. */
        public static Rule parse(String policy) {
            String p = policy.toLowerCase(Locale.ROOT);
            return switch (p) {
                case "auto" -> new Rule(true, true, null);
                case "fleet" -> new Rule(false, true, null);
                default -> new Rule(false, false, ForecastMethod.valueOf(p.toUpperCase(Locale.ROOT)));
            };
        }
    }

    /**
     * What the fleet model expects of a series over the horizon: units per month (before any ratio), and the parts of
     * their spread ({@link FleetDemandVariance}: {@code process} null when none); {@code fit} null for a prior.
     */
    public record Fleet(double[] monthly, double[] process, double[] gradient, PoissonFit fit) {
    }

    /**
     * @param history      breakdown units per month from the series' real start
     * @param fleet        null where no fleet model covers the series over the horizon
     * @param fleetHoldout the fleet model's expected units over the last 12 history months (fitted without them);
     *                     null where none
     * @param weight       the series' credibility under "auto" ({@link CredibilityWeight#FLEET_ONLY} where unweighed)
     * @param services     scheduled-service units per horizon month
     * @param serviceVariance their variance per month, then the first 12 months' total's (length horizon + 1)
     */
    public record Input(double[] history, Rule rule, Fleet fleet, double[] fleetHoldout, CredibilityWeight weight,
                        double[] services, double[] serviceVariance) {
        public Input {
            if (fleet != null && fleet.monthly().length != services.length
                    || serviceVariance.length != services.length + 1) {
                throw new IllegalArgumentException("fleet and services must cover the same horizon and serviceVariance "
                        + "one more; had " + (fleet == null ? "-" : fleet.monthly().length) + ", " + services.length
                        + ", " + serviceVariance.length);
            }
        }
    }

    /**
     * The forecast of one series. From the fleet: {@code historyMethod} is the best history method (scored beside
     * it), alpha and beta are NaN and {@code weight} is the credibility applied.
     *
     * @param breakdownPerMonth first month's breakdown units; {@code variancePerMonth} its variance
     * @param monthly           breakdowns + services per horizon month
     * @param chosenScores      holdout scores of the source used
     */
    public record Result(boolean fromFleet, ForecastMethod historyMethod, double alpha, double beta,
                         DemandProfile profile, double breakdownPerMonth, double variancePerMonth, double[] monthly,
                         double[] monthlyVariance, double yearVariance, ErrorScores chosenScores, double fleetRmsse,
                         double historyRmsse, CredibilityWeight weight) {
    }

    private record Scores(ErrorScores history, ErrorScores fleet) {
    }

    private DemandChoice() {
    }

    public static Result choose(Input in) {
        double[] series = in.history();
        int horizon = in.services().length;
        SeriesForecast fromHistory = SeriesForecaster.forecast(series, in.rule().method(), Double.NaN, Double.NaN,
                horizon);
        Scores scores = score(series, fromHistory.method(), in.fleetHoldout());
        boolean useFleet = in.fleet() != null && in.rule().fleet();
        CredibilityWeight weight = useFleet && in.rule().auto() ? in.weight() : CredibilityWeight.FLEET_ONLY;
        double[] fleet = useFleet ? in.fleet().monthly() : null;
        double[] fleetVariance = useFleet ? FleetDemandVariance.of(in.fleet().process(), in.fleet().gradient(), fleet,
                weight, in.fleet().fit()) : null;
        double historyVariance = fromHistory.perPeriodVariance();
        double breakdown = useFleet ? fleet[0] * weight.ratio() : fromHistory.forecast()[0];
        double[] monthly = new double[horizon], monthlyVariance = new double[horizon];
        for (int m = 0; m < horizon; m++) {
            monthly[m] = (useFleet ? fleet[m] * weight.ratio() : breakdown) + in.services()[m];
            monthlyVariance[m] = (useFleet ? fleetVariance[m] : historyVariance) + in.serviceVariance()[m];
        }
        double yearVariance = (useFleet ? fleetVariance[horizon] : historyVariance * Math.min(12, horizon))
                + in.serviceVariance()[horizon];
        ErrorScores chosen = useFleet && scores.fleet() != null ? scores.fleet() : scores.history();
        return new Result(useFleet, fromHistory.method(), useFleet ? Double.NaN : fromHistory.alpha(),
                useFleet ? Double.NaN : fromHistory.beta(), DemandProfile.of(series), breakdown,
                useFleet ? fleetVariance[0] : historyVariance, monthly, monthlyVariance, yearVariance, chosen,
                scores.fleet() == null ? Double.NaN : scores.fleet().rmsse(), scores.history().rmsse(), weight);
    }

    /** The history method (refitted on the months before) and the fleet model on the last 12 months. */
    private static Scores score(double[] series, ForecastMethod method, double[] fleetHoldout) {
        int n = series.length;
        if (n < HOLDOUT_MONTHS + 2) {
            return new Scores(UNSCORED, null);
        }
        double[] training = Arrays.copyOf(series, n - HOLDOUT_MONTHS);
        double[] actual = Arrays.copyOfRange(series, n - HOLDOUT_MONTHS, n);
        double historyFlat = SeriesFitter.fitOptimised(training, method, Double.NaN, Double.NaN).perPeriod();
        double[] historyHoldout = new double[HOLDOUT_MONTHS];
        Arrays.fill(historyHoldout, historyFlat);
        return new Scores(ErrorScores.of(training, historyHoldout, actual),
                fleetHoldout == null ? null : ErrorScores.of(training, fleetHoldout, actual));
    }
}
