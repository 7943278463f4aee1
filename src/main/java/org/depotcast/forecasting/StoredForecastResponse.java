package org.depotcast.forecasting;

import java.time.LocalDate;
import java.time.OffsetDateTime;
import java.util.List;

/**
 * A stored forecast with the history it was made from, month by month. {@code historyFrom} and
 * {@code historyMonths} state the window the series methods saw: from the series' real start (the first repair on
 * record, or the first installation of a pump using the part there) to the origin. Each month, and {@code year}
 * (the first 12 months' total), carries its 80 % and 95 % range.
 */
public record StoredForecastResponse(String partNumber, String location, long runId, OffsetDateTime computedAt,
                                     String method, Double alpha, Double beta, Double adi, Double cv2,
                                     String demandClass, Double mase, Double rmsse, Double scaledBias,
                                     Double fleetRmsse, Double historyRmsse,
                                     LocalDate historyFrom, int historyMonths, String methodDetail, double breakdownPerMonth,
                                     double variancePerMonth, List<Month> forecast, List<HistoryMonth> history,
                                     ForecastRange year) {
    public record Month(LocalDate month, double total, double breakdown, double preventive, ForecastRange range) {
    }

    public record HistoryMonth(LocalDate month, double quantity) {
    }
}
