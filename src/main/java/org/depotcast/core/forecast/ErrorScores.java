package org.depotcast.core.forecast;

/**
 * Scaled error scores of forecasts against actuals, both scaled by the in-sample one-step naive differences of the
 * training series (so series of any size compare):
 * MASE = mean|e| / mean|y_t − y_{t−1}| (Hyndman &amp; Koehler 2006, IJF 22(4):679–688);
 * RMSSE = √(mean e² / mean (y_t − y_{t−1})²) (M5 competition, Makridakis et al. 2022, IJF 38(4));
 * scaled bias = mean(f − y) / mean(training y): positive means over-forecasting.
 * MAE-type scores reward an all-zero forecast on intermittent data (Kolassa 2016, IJF 32:788–803), so the method
 * choice uses RMSSE and reports the others beside it. NaN where the scale is zero.
 */
public record ErrorScores(double mase, double rmsse, double scaledBias, int forecasts) {

    public static ErrorScores of(double[] training, double[] forecasts, double[] actuals) {
        double absDiff = 0, sqDiff = 0, sum = 0;
        for (int t = 1; t < training.length; t++) {
            double d = training[t] - training[t - 1];
            absDiff += Math.abs(d);
            sqDiff += d * d;
        }
        for (double y : training) {
            sum += y;
        }
        int steps = training.length - 1;
        double meanAbsDiff = steps > 0 ? absDiff / steps : Double.NaN;
        double meanSqDiff = steps > 0 ? sqDiff / steps : Double.NaN;
        double meanY = sum / training.length;
        double abs = 0, sq = 0, bias = 0;
        for (int i = 0; i < forecasts.length; i++) {
            double e = forecasts[i] - actuals[i];
            abs += Math.abs(e);
            sq += e * e;
            bias += e;
        }
        int n = forecasts.length;
        return new ErrorScores(ratio(abs / n, meanAbsDiff), meanSqDiff > 0 ? Math.sqrt(sq / n / meanSqDiff) : Double.NaN,
                ratio(bias / n, meanY), n);
    }

    private static double ratio(double value, double scale) {
        return scale > 0 ? value / scale : Double.NaN;
    }
}
