package org.depotcast.forecasting;

import jakarta.persistence.Column;
import jakarta.persistence.Convert;
import jakarta.persistence.Entity;
import jakarta.persistence.GeneratedValue;
import jakarta.persistence.GenerationType;
import jakarta.persistence.Id;
import jakarta.persistence.SequenceGenerator;
import jakarta.persistence.Table;

/**
 * A stored forecast of one part at one location. Monthly series are stored as JSON arrays ({@link MonthlySeriesJson}).
 * Written once by its run and only read after, so Hibernate keeps no snapshot to check it for changes: taking one
 * converted every series back from JSON as a run of 52,920 forecasts was stored.
 */
@Entity
@Table(name = "part_forecast")
@org.hibernate.annotations.Immutable
public class PartForecast {
    @Id
    @GeneratedValue(strategy = GenerationType.SEQUENCE, generator = "part_forecast_seq")
    @SequenceGenerator(name = "part_forecast_seq", sequenceName = "part_forecast_seq", allocationSize = 50)
    public Long id;
    @Column(name = "run_id", nullable = false)
    public Long runId;
    @Column(name = "part_id", nullable = false)
    public Long partId;
    @Column(name = "location_code", nullable = false)
    public String locationCode;
    @Column(nullable = false)
    public String method;
    public Double alpha;
    public Double beta;
    public Double adi;
    public Double cv2;
    @Column(name = "demand_class", nullable = false)
    public String demandClass;
    public Double mase;
    public Double rmsse;
    @Column(name = "scaled_bias")
    public Double scaledBias;
    @Column(name = "fleet_rmsse")
    public Double fleetRmsse;
    @Column(name = "history_rmsse")
    public Double historyRmsse;
    @Column(name = "breakdown_per_month", nullable = false)
    public double breakdownPerMonth;
    @Column(name = "variance_per_month", nullable = false)
    public double variancePerMonth;
    @Column(name = "monthly_forecast", nullable = false)
    @Convert(converter = MonthlySeriesJson.class)
    public double[] monthlyForecast;
    @Column(name = "preventive_monthly", nullable = false)
    @Convert(converter = MonthlySeriesJson.class)
    public double[] preventiveMonthly;
    /** First month of {@link #monthlyHistory}: the series' real start within the run's window. */
    @Column(name = "history_from")
    public java.time.LocalDate historyFrom;
    /** How the breakdown rate was reached, in words (e.g. the credibility weight given to the part's own history). */
    @Column(name = "method_detail")
    public String methodDetail;
    /** Variance of each month's total demand (null in runs made before it was kept). */
    @Column(name = "monthly_variance")
    @Convert(converter = MonthlySeriesJson.class)
    public double[] monthlyVariance;
    /** Variance of the first 12 months' total demand. */
    @Column(name = "year_variance")
    public Double yearVariance;
    /** The credibility ratio the series' fleet rate was given (null where the fleet model did not cover it). */
    @Column(name = "credibility_ratio")
    public Double credibilityRatio;
    @Column(name = "monthly_history", nullable = false)
    @Convert(converter = MonthlySeriesJson.class)
    public double[] monthlyHistory;
}
