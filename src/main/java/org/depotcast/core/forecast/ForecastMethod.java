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
    POISSON,
    /** Mean of the last 12 periods (all of them when fewer): the plain benchmark a method has to beat. */
    MEAN12,
    /**
     * Median of the forecasts of SBA, TSB, SES, the Poisson mean and the 12-period mean, each with its own tuned
     * constants: combining forecasts is more robust than choosing one on a short backtest (Clemen 1989, IJF
     * 5(4):559–583; for intermittent demand Petropoulos &amp; Kourentzes 2015, JORS 66(6):914–924), and the median
     * more than the average where one or two parts go astray (Jose &amp; Winkler 2008, IJF 24(1):163–169; the median
     * combination of Petropoulos &amp; Svetunkov 2020, IJF 36(1):110–115): Croston's and the whole-history mean's
     * forecasts do not fall when a part goes obsolete (AutoAcrossDemandPatternsTest).
     */
    COMBINED;

    /** The methods {@link #COMBINED} takes the median of. */
    public static final java.util.List<ForecastMethod> COMBINED_PARTS = java.util.List.of(SBA, TSB, SES, POISSON, MEAN12);

    public boolean usesAlpha() {
        return this != POISSON && this != MEAN12 && this != COMBINED;
    }

    public boolean usesBeta() {
        return this == TSB;
    }
}
