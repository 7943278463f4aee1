package org.depotcast.common;

import com.fasterxml.jackson.core.JsonParseException;
import com.fasterxml.jackson.core.exc.InputCoercionException;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.exc.StreamReadException;
import com.fasterxml.jackson.databind.exc.InvalidFormatException;
import com.fasterxml.jackson.databind.exc.MismatchedInputException;
import com.fasterxml.jackson.databind.JsonMappingException;
import io.quarkus.logging.Log;
import io.quarkus.security.AuthenticationFailedException;
import io.quarkus.security.ForbiddenException;
import io.quarkus.security.UnauthorizedException;
import jakarta.persistence.OptimisticLockException;
import jakarta.validation.ConstraintViolation;
import jakarta.validation.ConstraintViolationException;
import jakarta.ws.rs.WebApplicationException;
import jakarta.ws.rs.core.HttpHeaders;
import jakarta.ws.rs.core.MediaType;
import jakarta.ws.rs.core.Response;
import jakarta.ws.rs.core.UriInfo;
import org.hibernate.StaleObjectStateException;
import org.hibernate.validator.engine.HibernateConstraintViolation;
import org.jboss.resteasy.reactive.server.ServerExceptionMapper;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;

/** The one place that turns exceptions into RFC 9457 problem-details answers. Nothing else builds error bodies. */
public class ProblemMapper {

    @ServerExceptionMapper
    public Response invalidInput(InvalidInputException e, UriInfo uri) {
        return respond(400, "invalid-input", "Invalid input", e.getMessage(), uri, e.errors());
    }

    @ServerExceptionMapper
    public Response constraintViolation(ConstraintViolationException e, UriInfo uri) {
        List<FieldError> errors = new ArrayList<>();
        for (ConstraintViolation<?> v : e.getConstraintViolations()) {
            errors.add(new FieldError(fieldOf(v), v.getMessage()));
        }
        errors.sort(Comparator.comparing(FieldError::field));
        if (e.getConstraintViolations().stream().allMatch(ProblemMapper::inTheFuture)) {
            // Well-formed, but dated after it could have happened: not a typing slip a resend would fix.
            return respond(422, "dated-in-future", "Dated in the future", new InvalidInputException(errors).getMessage(),
                    uri, errors);
        }
        return respond(400, "invalid-input", "Invalid input", new InvalidInputException(errors).getMessage(), uri, errors);
    }

    private static boolean inTheFuture(ConstraintViolation<?> v) {
        try {
            return v.unwrap(HibernateConstraintViolation.class).getDynamicPayload(DateBounds.InTheFuture.class) != null;
        } catch (jakarta.validation.ValidationException notHibernate) {
            return false;
        }
    }

    // Named one by one: Quarkus REST ships its own mappers for the specific Jackson types, and the most specific wins.
    @ServerExceptionMapper({JsonProcessingException.class, MismatchedInputException.class,
            InvalidFormatException.class, JsonParseException.class, StreamReadException.class})
    public Response unreadableJson(JsonProcessingException e, UriInfo uri) {
        String field = "body";
        if (e instanceof JsonMappingException m && !m.getPath().isEmpty()) {
            field = JsonPaths.fieldOf(m.getPath());
        } else if (e instanceof InputCoercionException coercion && coercion.getProcessor() != null
                && coercion.getProcessor().getParsingContext() != null) {
            // A number the parser itself refused (out of a whole number's range): where it stood.
            field = JsonPaths.fromPointer(coercion.getProcessor().getParsingContext().pathAsPointer().toString());
        }
        String detail = e instanceof JsonMappingException ? "value does not have the expected type or form"
                : "body is not well-formed JSON";
        return respond(400, "invalid-input", "Invalid input", field + ": " + detail, uri, List.of(new FieldError(field, detail)));
    }

    @ServerExceptionMapper
    public Response bodyTooLarge(BodyTooLargeException e, UriInfo uri) {
        return respond(413, "body-too-large", "Request body too large", e.getMessage(), uri,
                List.of(new FieldError("body", e.getMessage())));
    }

    @ServerExceptionMapper
    public Response missing(EntityMissingException e, UriInfo uri) {
        // A missing thing named in the path is 404; named inside a body or a query it is an unknown reference: the
        // resource exists, the request points at nothing.
        if (e.field() == null) {
            return respond(404, "not-found", "Not found", e.getMessage(), uri, List.of());
        }
        return respond(422, "unknown-reference", "Unknown reference", e.getMessage(), uri,
                List.of(new FieldError(e.field(), e.getMessage())));
    }

    @ServerExceptionMapper
    public Response businessRule(BusinessRuleException e, UriInfo uri) {
        return respond(422, "rule-violated", "Request breaks a business rule", e.getMessage(), uri, fieldList(e.field(), e.getMessage()));
    }

    @ServerExceptionMapper
    public Response notEnoughStock(NotEnoughStockException e, UriInfo uri) {
        Problem body = new Problem("/problems/not-enough-stock", "Not enough on hand", 422, e.getMessage(),
                uri == null ? null : uri.getPath(), fieldList(e.field(), e.getMessage()), e.members());
        return Response.status(422).type(Problem.MEDIA_TYPE).entity(body).build();
    }

    @ServerExceptionMapper
    public Response datedInFuture(DatedInFutureException e, UriInfo uri) {
        return respond(422, "dated-in-future", "Dated in the future", e.getMessage(), uri,
                fieldList(e.field(), e.getMessage()));
    }

    @ServerExceptionMapper
    public Response conflict(ConflictException e, UriInfo uri) {
        return respond(409, "conflict", "Conflict with current state", e.getMessage(), uri, fieldList(e.field(), e.getMessage()));
    }

    @ServerExceptionMapper
    public Response noForecastYet(NoForecastYetException e, UriInfo uri) {
        return respond(409, "no-forecast-yet", "Run the forecasts first", e.getMessage(), uri, List.of());
    }

    @ServerExceptionMapper({OptimisticLockException.class, StaleObjectStateException.class})
    public Response stale(RuntimeException e, UriInfo uri) {
        return respond(409, "conflict", "Conflict with current state",
                "the record was changed by someone else; reload and try again", uri, List.of());
    }

    @ServerExceptionMapper({UnauthorizedException.class, AuthenticationFailedException.class})
    public Response unauthorized(RuntimeException e, UriInfo uri) {
        Response base = respond(401, "unauthorized", "Sign-in required", "valid credentials are required", uri, List.of());
        return Response.fromResponse(base).header("WWW-Authenticate", "Basic realm=\"depotcast\"").build();
    }

    @ServerExceptionMapper
    public Response signInRefused(SignInRefusedException e, UriInfo uri) {
        return respond(401, "sign-in-refused", "Sign-in refused", e.getMessage(), uri, List.of());
    }

    @ServerExceptionMapper
    public Response tooManyAttempts(TooManyAttemptsException e, UriInfo uri) {
        return Response.fromResponse(respond(429, "too-many-attempts", "Too many sign-in attempts", e.getMessage(), uri,
                List.of())).header("Retry-After", e.retryAfterSeconds()).build();
    }

    @ServerExceptionMapper
    public Response forbidden(ForbiddenException e, UriInfo uri) {
        String detail = e.getMessage() == null || e.getMessage().isBlank()
                ? "your role does not allow this action" : e.getMessage();
        return respond(403, "forbidden", "Not allowed", detail, uri, List.of());
    }

    @ServerExceptionMapper
    public Response web(WebApplicationException e, UriInfo uri, HttpHeaders headers) {
        if (e.getCause() instanceof JsonProcessingException json) {
            return unreadableJson(json, uri);
        }
        InvalidInputException malformedPath = MalformedPath.refusal(e, uri);
        if (malformedPath != null) {
            return invalidInput(malformedPath, uri);
        }
        int status = e.getResponse().getStatus();
        if (status == 404 && PageNotFound.answers(uri, headers)) {
            return Response.status(404).type(MediaType.TEXT_HTML_TYPE.withCharset("UTF-8"))
                    .header("Cache-Control", "no-store").entity(PageNotFound.html(uri.getPath())).build();
        }
        if (status >= 500) {
            return unexpected(e, uri);
        }
        if (status == 415) {
            FieldError error = UnreadableMediaType.error(headers);
            return respond(415, "unsupported-media-type", "Unsupported media type",
                    error.field() + ": " + error.message(), uri, List.of(error));
        }
        String title = Response.Status.fromStatusCode(status) == null ? "Request refused"
                : Response.Status.fromStatusCode(status).getReasonPhrase();
        return respond(status, "http-" + status, title, title, uri, List.of());
    }

    @ServerExceptionMapper
    public Response unexpected(Throwable e, UriInfo uri) {
        Log.error("unexpected failure on " + (uri == null ? "?" : uri.getPath()), e);
        return respond(500, "internal", "Internal error", "the server could not complete the request", uri, List.of());
    }

    private static Response respond(int status, String type, String title, String detail, UriInfo uri,
                                    List<FieldError> errors) {
        Problem body = new Problem("/problems/" + type, title, status, detail, uri == null ? null : uri.getPath(), errors);
        return Response.status(status).type(Problem.MEDIA_TYPE).entity(body).build();
    }

    /**
     * The bodies of the answers the sign-in layer gives before a request reaches an endpoint (a 401 challenge, a
     * paused sign-in): the same problems as the mappers above give.
     */
    public static Problem beforeEndpoint(RuntimeException e, String path) {
        if (e instanceof TooManyAttemptsException paused) {
            return new Problem("/problems/too-many-attempts", "Too many sign-in attempts", 429, paused.getMessage(), path,
                    List.of());
        }
        return new Problem("/problems/unauthorized", "Sign-in required", 401, "valid credentials are required", path,
                List.of());
    }

    private static List<FieldError> fieldList(String field, String message) {
        return field == null ? List.of() : List.of(new FieldError(field, message));
    }

    /**
     * Method-validation paths read method.parameter[.property...]: the property path names the field, or the
     * parameter itself (a query or path parameter) when there is none.
     */
    private static String fieldOf(ConstraintViolation<?> v) {
        // Container elements add nodes such as "<list element>": the index on the list node already says which.
        String[] parts = java.util.Arrays.stream(v.getPropertyPath().toString().split("\\."))
                .filter(p -> !p.startsWith("<")).toArray(String[]::new);
        if (parts.length <= 1) {
            return parts[0];
        }
        return parts.length == 2 ? parts[1] : String.join(".", Arrays.copyOfRange(parts, 2, parts.length));
    }
}
