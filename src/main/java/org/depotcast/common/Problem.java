package org.depotcast.common;

import com.fasterxml.jackson.annotation.JsonInclude;

import java.util.List;

/**
 * RFC 9457 problem details. {@code type} is a relative URI naming our problem kinds, {@code errors} lists each
 * field (or CSV row and column) that was wrong.
 */
@JsonInclude(JsonInclude.Include.NON_EMPTY)
public record Problem(String type, String title, int status, String detail, String instance, List<FieldError> errors) {
    public static final String MEDIA_TYPE = "application/problem+json";
}
