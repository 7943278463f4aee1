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
 * it is read and refused once it passes the limit.
 */
@Provider
public class BodySizeLimit implements ReaderInterceptor {
    private final long limitBytes;

    BodySizeLimit(@ConfigProperty(name = "depotcast.http.max-body-size") MemorySize limit) {
        this.limitBytes = limit.asLongValue();
    }

    @ServerRequestFilter(preMatching = true)
    void refuseDeclaredLength(ContainerRequestContext request) {
        String declared = request.getHeaderString(HttpHeaders.CONTENT_LENGTH);
        if (declared == null) {
            return;
        }
        try {
            if (Long.parseLong(declared.trim()) > limitBytes) {
                throw new BodyTooLargeException(limitBytes);
            }
        } catch (NumberFormatException e) {
            throw new InvalidInputException("Content-Length", "must be a whole number of bytes");
        }
    }

    @Override
    public Object aroundReadFrom(ReaderInterceptorContext context) throws IOException {
        context.setInputStream(new Counting(context.getInputStream(), limitBytes));
        return context.proceed();
    }

    /**
     * The body a resource reads as a stream itself (CSV uploads), counted against the limit: such a parameter is not
     * read through a message body reader, so {@link #aroundReadFrom} does not see it.
     */
    public static InputStream counted(InputStream body) {
        MemorySize limit = ConfigProvider.getConfig().getValue("depotcast.http.max-body-size", MemorySize.class);
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
