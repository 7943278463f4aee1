package org.depotcast.core.forecast;

/** The per-series methods. Each gives a flat per-period forecast and in-sample one-step fitted values. */
public enum ForecastMethod {
    /** Croston (1972), ORQ 23(3):289–303. */
    CROSTON,
    /** Syntetos–Boylan Approximation (2005), IJF 21(2):303–314: Croston × (1 − α/2). */
    SBA,
    /** Shale, Boylan &amp; Johnston (2006), JORS 57:588–592: Croston × (1 − α/(2 − α)). */
    SBJ,
    /** Teunter, Syntetos &amp; Babai (2011), EJOR 214(3):606–615. */
    TSB,
    /** Simple exponential smoothing. */
    SES,
    /** Constant Poisson rate: the mean of the history. */
    POISSON;

    public boolean usesAlpha() {
        return this != POISSON;
    }

    public boolean usesBeta() {
        return this == TSB;
    }
}
