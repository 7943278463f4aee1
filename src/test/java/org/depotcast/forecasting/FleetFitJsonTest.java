package org.depotcast.forecasting;

import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.Test;

import java.util.List;
import java.util.Map;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

/** A stored fleet model's lists as JSON: what is written, what is read back, and what is refused. */
class FleetFitJsonTest {
    @Test
    void listsRoundTripAtFullPrecisionWithGapsAsNull() throws Exception {
        FleetFitJson.Numbers numbers = new FleetFitJson.Numbers();
        String column = numbers.convertToDatabaseColumn(new double[]{-7.123456789012, 1.0e-9, Double.NaN});
        assertEquals("[-7.123456789012,1.0E-9,null]", column);
        assertArrayEquals(new double[]{-7.123456789012, 1.0e-9, Double.NaN}, numbers.convertToEntityAttribute(column), 0.0);
        assertArrayEquals(new double[]{-7.123456789012, 1.0e-9}, new ObjectMapper().readValue(
                numbers.convertToDatabaseColumn(new double[]{-7.123456789012, 1.0e-9}), double[].class), 0.0);

        FleetFitJson.Terms terms = new FleetFitJson.Terms();
        assertEquals("[\"log_depth\",\"usage_hours\"]", terms.convertToDatabaseColumn(List.of("log_depth", "usage_hours")));
        assertEquals(List.of(), terms.convertToEntityAttribute("[]"));
    }

    @Test
    void aCovarianceKeepsItsRowsAndDepotRatiosTheirIds() {
        FleetFitJson.Matrix matrix = new FleetFitJson.Matrix();
        double[][] covariance = {{0.0121, -3.5e-7}, {-3.5e-7, 2.0e-8}};
        String column = matrix.convertToDatabaseColumn(covariance);
        assertEquals("[[0.0121,-3.5E-7],[-3.5E-7,2.0E-8]]", column);
        double[][] back = matrix.convertToEntityAttribute(column);
        assertArrayEquals(covariance[0], back[0], 0.0);
        assertArrayEquals(covariance[1], back[1], 0.0);

        FleetFitJson.DepotRatios ratios = new FleetFitJson.DepotRatios();
        String stored = ratios.convertToDatabaseColumn(Map.of(14L, 1.3, 2L, 0.75));
        assertEquals("{\"2\":0.75,\"14\":1.3}", stored);
        assertEquals(Map.of(14L, 1.3, 2L, 0.75), ratios.convertToEntityAttribute(stored));
        assertEquals(Map.of(), ratios.convertToEntityAttribute("{}"));
    }

    @Test
    void textThatIsNotTheExpectedJsonIsRefused() {
        assertThrows(IllegalStateException.class, () -> new FleetFitJson.Numbers().convertToEntityAttribute("-7.1;0.4"));
        assertThrows(IllegalStateException.class, () -> new FleetFitJson.Terms().convertToEntityAttribute("[1,2]"));
        assertThrows(IllegalStateException.class, () -> new FleetFitJson.DepotRatios().convertToEntityAttribute("[0.5]"));
        assertThrows(IllegalStateException.class, () -> new FleetFitJson.Matrix().convertToEntityAttribute("[1.0]"));
    }
}
