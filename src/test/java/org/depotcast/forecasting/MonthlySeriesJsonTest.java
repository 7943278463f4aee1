package org.depotcast.forecasting;

import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** A stored monthly series as JSON: what is written, what is read back, and what is refused. */
class MonthlySeriesJsonTest {
    private final MonthlySeriesJson converter = new MonthlySeriesJson();

    @Test
    void aSeriesRoundTripsToSixDecimalsWithGapsAsNull() {
        double[] series = {0.0, 1.5, 0.123456789, 1.0e-7, 2.5e6, Double.NaN, -0.25, Double.POSITIVE_INFINITY};
        String column = converter.convertToDatabaseColumn(series);
        assertEquals("[0.0,1.5,0.123457,0.0,2500000.0,null,-0.25,null]", column);
        double[] back = converter.convertToEntityAttribute(column);
        assertArrayEquals(new double[]{0.0, 1.5, 0.123457, 0.0, 2.5e6, Double.NaN, -0.25, Double.NaN}, back, 0.0);
    }

    @Test
    void theColumnIsJsonAnyJsonReaderTakes() throws Exception {
        double[] series = new double[120];
        for (int m = 0; m < series.length; m++) {
            series[m] = Math.sin(m) * 3.75 + m / 7.0;
        }
        String column = converter.convertToDatabaseColumn(series);
        double[] byJackson = new ObjectMapper().readValue(column, double[].class);
        assertEquals(120, byJackson.length);
        for (int m = 0; m < series.length; m++) {
            assertEquals(series[m], byJackson[m], 5e-7, "month " + m);
        }
        assertArrayEquals(byJackson, converter.convertToEntityAttribute(column), 0.0);
    }

    @Test
    void emptyAndNullAreKeptApart() {
        assertEquals("[]", converter.convertToDatabaseColumn(new double[0]));
        assertEquals(0, converter.convertToEntityAttribute("[]").length);
        assertNull(converter.convertToDatabaseColumn(null));
        assertNull(converter.convertToEntityAttribute(null), "runs made before monthly variances were kept have none");
    }

    @Test
    void theOldSemicolonFormIsRefusedNotMisread() {
        IllegalStateException e = assertThrows(IllegalStateException.class, () -> converter.convertToEntityAttribute("1.5;2.0"));
        assertTrue(e.getMessage().contains("JSON"), e.getMessage());
        assertThrows(IllegalStateException.class, () -> converter.convertToEntityAttribute("[1.5,\"two\"]"));
        assertThrows(IllegalStateException.class, () -> converter.convertToEntityAttribute("[1.5,2.0"));
    }
}
