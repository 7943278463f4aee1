package org.depotcast.forecasting;

import jakarta.persistence.Column;
import jakarta.persistence.Convert;
import jakarta.persistence.Entity;
import jakarta.persistence.GeneratedValue;
import jakarta.persistence.GenerationType;
import jakarta.persistence.Id;
import jakarta.persistence.Table;
import org.depotcast.catalogue.ComponentFamily;
import org.depotcast.core.forecast.FleetRateModel;
import org.depotcast.core.forecast.PoissonFit;
import org.depotcast.core.forecast.RateCovariate;

import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * A family's fleet model as stored with its run; its lists are JSON ({@link FleetFitJson}), coefficients intercept
 * first. A prior keeps log(prior rate) as its one coefficient. Runs stored before the covariance and the depot
 * ratios were kept have null there: their model is read with the standard errors' squares as covariance and no
 * depot ratios.
 */
@Entity
@Table(name = "fleet_model_fit")
public class FleetModelFitRecord {
    @Id
    @GeneratedValue(strategy = GenerationType.IDENTITY)
    public Long id;
    @Column(name = "run_id", nullable = false)
    public Long runId;
    @Column(nullable = false)
    public String family;
    @Column(nullable = false)
    public String source;
    @Column(nullable = false)
    @Convert(converter = FleetFitJson.Terms.class)
    public List<String> covariates;
    @Column(nullable = false)
    @Convert(converter = FleetFitJson.Numbers.class)
    public double[] coefficients;
    @Column(name = "standard_errors", nullable = false)
    @Convert(converter = FleetFitJson.Numbers.class)
    public double[] standardErrors;
    @Convert(converter = FleetFitJson.Matrix.class)
    public double[][] covariance;
    @Column(name = "depot_ratios")
    @Convert(converter = FleetFitJson.DepotRatios.class)
    public Map<Long, Double> depotRatios;
    public Double deviance;
    @Column(name = "df_residual")
    public Integer dfResidual;
    public Double dispersion;
    @Column(nullable = false)
    public boolean overdispersed;
    @Column(nullable = false)
    public int events;
    @Column(name = "exposure_hours", nullable = false)
    public double exposureHours;
    @Column(name = "units_per_event", nullable = false)
    public double unitsPerEvent;

    static FleetModelFitRecord of(long runId, ComponentFamily family, FleetRateModel model) {
        FleetModelFitRecord record = new FleetModelFitRecord();
        record.runId = runId;
        record.family = family.name();
        record.source = model.source();
        PoissonFit fit = model.fit();
        record.covariates = fit == null ? List.of() : model.covariates().stream().map(RateCovariate::term).toList();
        record.coefficients = fit == null ? new double[]{Math.log(model.priorPerHour())} : fit.coefficients();
        record.standardErrors = fit == null ? new double[0] : fit.standardErrors();
        record.covariance = fit == null ? null : fit.covariance();
        record.depotRatios = model.depotRatios();
        record.deviance = fit == null ? null : fit.deviance();
        record.dfResidual = fit == null ? null : fit.dfResidual();
        record.dispersion = fit == null ? null : ForecastRecords.finite(fit.dispersion());
        record.overdispersed = fit != null && fit.overdispersed();
        record.events = model.events();
        record.exposureHours = model.exposureHours();
        record.unitsPerEvent = model.unitsPerEvent();
        return record;
    }

    /**
     * The typed rate model the run used. A stored fit keeps neither its IRLS iterations nor the prior it stood in
     * for (neither changes a rate or its uncertainty): the fit reads as converged, the prior as exp(intercept).
     */
    FleetRateModel rateModel() {
        List<RateCovariate> terms = covariates.stream()
                .map(term -> RateCovariate.valueOf(term.toUpperCase(Locale.ROOT))).toList();
        Map<Long, Double> ratios = depotRatios == null ? Map.of() : depotRatios;
        double prior = Math.exp(coefficients[0]);
        if (!"fit".equals(source)) {
            return new FleetRateModel(List.of(), null, prior, unitsPerEvent, events, exposureHours, ratios);
        }
        PoissonFit fit = new PoissonFit(coefficients, standardErrors, deviance == null ? Double.NaN : deviance,
                dfResidual == null ? 0 : dfResidual, dispersion == null ? Double.NaN : dispersion, 0, true,
                covariance != null ? covariance : diagonal(standardErrors));
        return new FleetRateModel(terms, fit, prior, unitsPerEvent, events, exposureHours, ratios);
    }

    private static double[][] diagonal(double[] standardErrors) {
        double[][] matrix = new double[standardErrors.length][standardErrors.length];
        for (int i = 0; i < matrix.length; i++) {
            matrix[i][i] = standardErrors[i] * standardErrors[i];
        }
        return matrix;
    }
}
