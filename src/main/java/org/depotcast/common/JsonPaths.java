package org.depotcast.common;

import com.fasterxml.jackson.databind.JsonMappingException;

import java.util.List;

/** Where in a JSON body a value stood, written as the field a problem names ({@link ProblemMapper}). */
final class JsonPaths {
    private JsonPaths() {
    }

    /** Jackson's path to a value as a field: lines, index 0, quantity → "lines[0].quantity"; "body" for the root. */
    static String fieldOf(List<JsonMappingException.Reference> path) {
        StringBuilder sb = new StringBuilder();
        for (JsonMappingException.Reference ref : path) {
            if (ref.getFieldName() != null) {
                if (!sb.isEmpty()) {
                    sb.append('.');
                }
                sb.append(ref.getFieldName());
            } else if (ref.getIndex() >= 0) {
                sb.append('[').append(ref.getIndex()).append(']');
            }
        }
        return sb.isEmpty() ? "body" : sb.toString();
    }

    /** "/lines/0/quantity" as "lines[0].quantity"; "body" for the root. */
    static String fromPointer(String pointer) {
        StringBuilder sb = new StringBuilder();
        for (String step : pointer.split("/")) {
            if (step.isEmpty()) {
                continue;
            }
            if (step.chars().allMatch(Character::isDigit)) {
                sb.append('[').append(step).append(']');
            } else {
                sb.append(sb.isEmpty() ? "" : ".").append(step.replace("~1", "/").replace("~0", "~"));
            }
        }
        return sb.isEmpty() ? "body" : sb.toString();
    }
}
