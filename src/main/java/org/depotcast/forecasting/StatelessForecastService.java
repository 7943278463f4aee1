package org.depotcast.forecasting;

import jakarta.enterprise.context.ApplicationScoped;
import org.depotcast.common.Bounds;
import org.depotcast.common.FieldError;
import org.depotcast.common.InvalidInputException;
import org.depotcast.core.forecast.ErrorScores;
import org.depotcast.core.forecast.ForecastMethod;
import org.depotcast.core.forecast.PoissonFit;
import org.depotcast.core.forecast.PoissonRegression;
import org.depotcast.core.forecast.SeriesForecast;
import org.depotcast.core.forecast.SeriesForecaster;
import org.depotcast.core.policy.DemandDistribution;

import java.io.InputStream;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/** The what-if forecasts that touch no stored data: one series, a CSV batch, and a Poisson rate fit. */
@ApplicationScoped
public class StatelessForecastService {
    static final int DEFAULT_HORIZON = 12;
    /** Period numbers are whole numbers from 0 up to this (room for yyyymm numbering), so no span overflows. */
    static final int PERIOD_MAX = 10_000_000;
    private static final double[] QUANTILES = {0.5, 0.8, 0.9, 0.95, 0.99};

    /** Settings shared by the single and batch forms; checked once with the field names the client used. */
    record Settings(ForecastMethod method, double alpha, double beta, int horizon) {
        static Settings of(String method, Double alpha, Double beta, Integer horizon) {
            List<FieldError> errors = new ArrayList<>();
            ForecastMethod parsed = null;
            if (method != null && !method.isBlank() && !method.equalsIgnoreCase("auto")) {
                try {
                    parsed = ForecastMethod.valueOf(method.strip().toUpperCase(Locale.ROOT));
                } catch (IllegalArgumentException e) {
                    errors.add(new FieldError("method", "must be one of croston, sba, sbj, tsb, ses, poisson, mean12, combined, auto; was '" + method + "'"));
                }
            }
            if (alpha != null && !(alpha > 0 && alpha <= 1)) {
                errors.add(new FieldError("alpha", "must be in (0, 1], was " + alpha));
            }
            if (beta != null && !(beta > 0 && beta <= 1)) {
                errors.add(new FieldError("beta", "must be in (0, 1], was " + beta));
            }
            int h = horizon == null ? DEFAULT_HORIZON : horizon;
            if (h < 1 || h > 60) {
                errors.add(new FieldError("horizon", "must be between 1 and 60, was " + h));
            }
            if (!errors.isEmpty()) {
                throw new InvalidInputException(errors);
            }
            return new Settings(parsed, alpha == null ? Double.NaN : alpha, beta == null ? Double.NaN : beta, h);
        }
    }

    public SeriesResponse series(SeriesRequest request) {
        Settings settings = Settings.of(request.method(), request.alpha(), request.beta(), request.horizon());
        double[] history = request.history().stream().mapToDouble(Double::doubleValue).toArray();
        SeriesForecast f = SeriesForecaster.forecastScored(history, settings.method(), settings.alpha(), settings.beta(),
                settings.horizon());
        Map<String, SeriesResponse.Scores> scores = new LinkedHashMap<>();
        f.backtest().forEach((m, s) -> scores.put(m.name().toLowerCase(Locale.ROOT), scores(s)));
        DemandDistribution total = f.demandOver(settings.horizon());
        List<SeriesResponse.Quantile> quantiles = new ArrayList<>();
        for (double p : QUANTILES) {
            quantiles.add(new SeriesResponse.Quantile(p, total.quantile(p)));
        }
        return new SeriesResponse(f.forecast(), f.method().name().toLowerCase(Locale.ROOT), ForecastRecords.finite(f.alpha()),
                ForecastRecords.finite(f.beta()), ForecastRecords.finite(f.profile().adi()), ForecastRecords.finite(f.profile().cv2()),
                f.profile().demandClass().name().toLowerCase(Locale.ROOT), f.profile().periods(), f.profile().demands(),
                scores, new SeriesResponse.HorizonDemand(total.name(), total.mean(), total.variance(), quantiles));
    }

    /**
     * Long-format CSV in (series_id, period, quantity), one row per series and horizon step out, read and written as
     * a stream (see {@link BatchForecast}). A series' rows come together; a missing period within a series counts
     * as zero demand.
     */
    public jakarta.ws.rs.core.Response batch(InputStream csv, String method, Double alpha, Double beta, Integer horizon) {
        return BatchForecast.run(csv, Settings.of(method, alpha, beta, horizon));
    }

    public RateFitResponse rateFit(RateFitRequest request) {
        List<RateFitRequest.Row> rows = request.rows();
        List<String> names = new ArrayList<>(rows.get(0).covariates() == null ? Map.<String, Double>of().keySet()
                : rows.get(0).covariates().keySet());
        double[][] x = new double[rows.size()][names.size()];
        double[] counts = new double[rows.size()], exposure = new double[rows.size()];
        for (int i = 0; i < rows.size(); i++) {
            RateFitRequest.Row row = rows.get(i);
            Map<String, Double> covariates = row.covariates() == null ? Map.of() : row.covariates();
            if (!covariates.keySet().equals(new java.util.HashSet<>(names))) {
                throw new InvalidInputException("rows[" + i + "].covariates", "must name the same covariates as rows[0]: " + names);
            }
            for (int j = 0; j < names.size(); j++) {
                Double value = covariates.get(names.get(j));
                if (value == null || !Double.isFinite(value)) {
                    throw new InvalidInputException("rows[" + i + "].covariates." + names.get(j), "must be a finite number");
                }
                x[i][j] = value;
            }
            counts[i] = row.count();
            exposure[i] = row.exposure();
        }
        PoissonFit fit;
        try {
            fit = PoissonRegression.fit(x, counts, exposure);
        } catch (PoissonRegression.SingularDesignException e) {
            throw new InvalidInputException("rows", e.getMessage());
        }
        List<String> terms = new ArrayList<>();
        terms.add("intercept");
        terms.addAll(names);
        return new RateFitResponse(named(terms, fit.coefficients()), named(terms, fit.standardErrors()), fit.deviance(),
                fit.dfResidual(), ForecastRecords.finite(fit.dispersion()), fit.overdispersed(), named(terms, fit.adjustedStandardErrors()),
                fit.iterations());
    }

    private static Map<String, Double> named(List<String> terms, double[] values) {
        Map<String, Double> map = new LinkedHashMap<>();
        for (int i = 0; i < terms.size(); i++) {
            map.put(terms.get(i), values[i]);
        }
        return map;
    }

    private static SeriesResponse.Scores scores(ErrorScores s) {
        return new SeriesResponse.Scores(ForecastRecords.finite(s.mase()), ForecastRecords.finite(s.rmsse()), ForecastRecords.finite(s.scaledBias()));
    }
}
