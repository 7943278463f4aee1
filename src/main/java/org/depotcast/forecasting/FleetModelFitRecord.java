package org.depotcast.forecasting;

import jakarta.persistence.Column;
import jakarta.persistence.Entity;
import jakarta.persistence.GeneratedValue;
import jakarta.persistence.GenerationType;
import jakarta.persistence.Id;
import jakarta.persistence.Table;

/** A family's fleet model as stored with its run. Coefficient lists are semicolon-separated, intercept first. */
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
    public String covariates;
    @Column(nullable = false)
    public String coefficients;
    @Column(name = "standard_errors", nullable = false)
    public String standardErrors;
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
}
