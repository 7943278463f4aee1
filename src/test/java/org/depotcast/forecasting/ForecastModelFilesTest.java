package org.depotcast.forecasting;

import org.depotcast.catalogue.ComponentFamily;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

class ForecastModelFilesTest {
    @Test
    void aWellFormedFileIsRead() {
        ForecastModelDefinition d = ForecastModelFiles.parse("cup-seal.json", """
                {"family": "cup_seal", "covariates": ["log_depth", "usage_hours"], "priorEventsPer1000Hours": 0.1,
                 "unitsPerEvent": 2, "methodPolicy": "sba", "preventive": true}""");
        assertEquals(ComponentFamily.CUP_SEAL, d.family());
        assertEquals(List.of(org.depotcast.core.forecast.RateCovariate.LOG_DEPTH, org.depotcast.core.forecast.RateCovariate.USAGE_HOURS),
                d.covariates());
        assertEquals("sba", d.methodPolicy());
        assertTrue(d.preventive());
    }

    @Test
    void malformedFilesNameTheFileAndField() {
        assertMessage("{\"family\": \"cup_seal\", \"covariates\": [\"depth_squared\"]}", "field 'covariates'");
        assertMessage("{\"family\": \"sprocket\"}", "field 'family'");
        assertMessage("{\"covariates\": []}", "field 'family'");
        assertMessage("{\"family\": \"cup_seal\", \"priorEventsPer1000Hours\": -1}", "field 'priorEventsPer1000Hours'");
        assertMessage("{\"family\": \"cup_seal\", \"methodPolicy\": \"guess\"}", "field 'methodPolicy'");
        assertMessage("{\"family\": \"cup_seal\", \"colour\": \"blue\"}", "field 'colour'");
        assertMessage("{\"family\": \"cup_seal\",", "field '(file)'");
    }

    private static void assertMessage(String json, String expected) {
        ForecastModelFiles.MalformedModelFile e = assertThrows(ForecastModelFiles.MalformedModelFile.class,
                () -> ForecastModelFiles.parse("bad.json", json));
        assertTrue(e.getMessage().startsWith("forecast model file bad.json"), e.getMessage());
        assertTrue(e.getMessage().contains(expected), e.getMessage());
    }
}
