package org.depotcast.common;

import com.fasterxml.jackson.annotation.JsonAnyGetter;
import com.fasterxml.jackson.annotation.JsonIgnore;
import com.fasterxml.jackson.annotation.JsonInclude;

import java.util.List;
import java.util.Map;

/**
 * RFC 9457 problem details. {@code type} is a relative URI naming our problem kinds, {@code errors} lists each
 * field (or CSV row and column) that was wrong; {@code extensions} are the problem kind's own members, written beside
 * the standard ones (RFC 9457 §3.2), e.g. whether a refused repair's notice reached the stores officer.
 */
@JsonInclude(JsonInclude.Include.NON_EMPTY)
public record Problem(String type, String title, int status, String detail, String instance, List<FieldError> errors,
                      @JsonIgnore Map<String, Object> extensions) {
    public static final String MEDIA_TYPE = "application/problem+json";

    public Problem(String type, String title, int status, String detail, String instance, List<FieldError> errors) {
        this(type, title, status, detail, instance, errors, Map.of());
    }

    @JsonAnyGetter
    Map<String, Object> members() {
        return extensions;
    }
}
