package org.depotcast.common;

import jakarta.ws.rs.core.HttpHeaders;
import jakarta.ws.rs.core.MediaType;
import jakarta.ws.rs.core.UriInfo;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;

/**
 * What {@link ProblemMapper} answers a browser that opens an address with no page behind it (a mistyped link, an
 * old bookmark): a page in words with the way to its own pages, not a problem-details body it cannot read. Only page addresses get it: anything
 * under /api/ or /q/, and any client that does not ask for HTML, keeps the RFC 9457 answer.
 */
final class PageNotFound {
    private static final String PAGE = "META-INF/resources/app/not-found.html";
    private static volatile String template;

    private PageNotFound() {
    }

    /** Whether a 404 for this request is answered with the page: a browser (it asks for HTML) outside the API. */
    static boolean answers(UriInfo uri, HttpHeaders headers) {
        if (uri == null || headers == null) {
            return false;
        }
        String path = uri.getPath();
        boolean api = path.startsWith("/api/") || path.equals("/api") || path.startsWith("/q/");
        return !api && headers.getAcceptableMediaTypes().stream()
                .anyMatch(t -> !t.isWildcardType() && t.isCompatible(MediaType.TEXT_HTML_TYPE));
    }

    /** The page's HTML, naming the address asked for. */
    static String html(String path) {
        return template().replace("{{address}}", escape(path));
    }

    private static String template() {
        if (template == null) {
            try (InputStream in = PageNotFound.class.getClassLoader().getResourceAsStream(PAGE)) {
                if (in == null) {
                    throw new IllegalStateException("missing " + PAGE);
                }
                template = new String(in.readAllBytes(), StandardCharsets.UTF_8);
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        }
        return template;
    }

    private static String escape(String text) {
        return text.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;").replace("\"", "&quot;")
                .replace("'", "&#39;");
    }
}
