package org.depotcast.common;

import io.quarkus.runtime.configuration.MemorySize;
import jakarta.ws.rs.container.ContainerRequestContext;
import jakarta.ws.rs.core.HttpHeaders;
import jakarta.ws.rs.ext.Provider;
import jakarta.ws.rs.ext.ReaderInterceptor;
import jakarta.ws.rs.ext.ReaderInterceptorContext;
import org.eclipse.microprofile.config.ConfigProvider;
import org.eclipse.microprofile.config.inject.ConfigProperty;
import org.jboss.resteasy.reactive.server.ServerRequestFilter;

import java.io.FilterInputStream;
import java.io.IOException;
import java.io.InputStream;

/**
 * The request body limit ({@code depotcast.http.max-body-size}), enforced here rather than by the HTTP layer so that
 * a body over it is answered with a 413 problem like every other refusal (the HTTP layer's own limit, set higher,
 * answers with an empty body). A declared length is refused before anything is read; a chunked body is counted as
 * it is read and refused once it passes the limit. Bulk streams that are read in bounded memory (the CSV batch
 * forecast) have their own, higher limit, {@code depotcast.http.bulk-max-body-size}, on the paths
 * {@code depotcast.http.bulk-paths} lists.
 */
@Provider
public class BodySizeLimit implements ReaderInterceptor {
    /** The limit chosen for a request by its path, kept for the reader of its body. */
    private static final String LIMIT_PROPERTY = "depotcast.body-limit";
    private final long limitBytes;
    private final long bulkLimitBytes;
    private final java.util.Set<String> bulkPaths;

    BodySizeLimit(@ConfigProperty(name = "depotcast.http.max-body-size") MemorySize limit,
                  @ConfigProperty(name = "depotcast.http.bulk-max-body-size") MemorySize bulkLimit,
                  @ConfigProperty(name = "depotcast.http.bulk-paths") java.util.List<String> bulkPaths) {
        this.limitBytes = limit.asLongValue();
        this.bulkLimitBytes = bulkLimit.asLongValue();
        this.bulkPaths = java.util.Set.copyOf(bulkPaths);
    }

    @ServerRequestFilter(preMatching = true)
    void refuseDeclaredLength(ContainerRequestContext request) {
        long limit = bulkPaths.contains(request.getUriInfo().getRequestUri().getPath()) ? bulkLimitBytes : limitBytes;
        request.setProperty(LIMIT_PROPERTY, limit);
        String declared = request.getHeaderString(HttpHeaders.CONTENT_LENGTH);
        if (declared == null) {
            return;
        }
        try {
            if (Long.parseLong(declared.trim()) > limit) {
                throw new BodyTooLargeException(limit);
            }
        } catch (NumberFormatException e) {
            throw new InvalidInputException("Content-Length", "must be a whole number of bytes");
        }
    }

    @Override
    public Object aroundReadFrom(ReaderInterceptorContext context) throws IOException {
        Object limit = context.getProperty(LIMIT_PROPERTY);
        context.setInputStream(new Counting(context.getInputStream(), limit instanceof Long l ? l : limitBytes));
        return context.proceed();
    }

    /**
     * The body a resource reads as a stream itself (CSV uploads), counted against the limit: such a parameter is not
     * read through a message body reader, so {@link #aroundReadFrom} does not see it.
     */
    public static InputStream counted(InputStream body) {
        return counted(body, "depotcast.http.max-body-size");
    }

    /** A bulk stream (one of {@code depotcast.http.bulk-paths}) counted against the bulk limit. */
    public static InputStream countedBulk(InputStream body) {
        return counted(body, "depotcast.http.bulk-max-body-size");
    }

    private static InputStream counted(InputStream body, String limitProperty) {
        MemorySize limit = ConfigProvider.getConfig().getValue(limitProperty, MemorySize.class);
        return new Counting(body, limit.asLongValue());
    }

    private static final class Counting extends FilterInputStream {
        private final long limitBytes;
        private long read;

        Counting(InputStream in, long limitBytes) {
            super(in);
            this.limitBytes = limitBytes;
        }

        @Override
        public int read() throws IOException {
            int b = super.read();
            if (b >= 0) {
                count(1);
            }
            return b;
        }

        @Override
        public int read(byte[] buffer, int offset, int length) throws IOException {
            int n = super.read(buffer, offset, length);
            if (n > 0) {
                count(n);
            }
            return n;
        }

        private void count(int n) {
            read += n;
            if (read > limitBytes) {
                throw new BodyTooLargeException(limitBytes);
            }
        }
    }
}
