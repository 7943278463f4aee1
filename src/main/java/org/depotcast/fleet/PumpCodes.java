package org.depotcast.fleet;

import java.util.Map;

/**
 * The codes a pump's answer shows for its model and depot, read once by id from the catalogue and stock (two light
 * queries) for one pump or a whole list.
 */
record PumpCodes(Map<Long, String> modelCodes, Map<Long, String> depotCodes) {
    String modelCode(long modelId) {
        return modelCodes.get(modelId);
    }

    String depotCode(long depotId) {
        return depotCodes.get(depotId);
    }

    PumpResponse response(Pump pump) {
        return PumpResponse.from(pump, this);
    }
}
