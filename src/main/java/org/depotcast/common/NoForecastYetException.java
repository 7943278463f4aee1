package org.depotcast.common;

/** Planning asked for before any forecast run has finished; answered 409 with what to do. */
public class NoForecastYetException extends RuntimeException {
    public NoForecastYetException() {
        super("no forecast run has finished yet: run the forecasts first (POST /api/forecast/runs, or wait for the "
                + "nightly run), then ask again");
    }
}
