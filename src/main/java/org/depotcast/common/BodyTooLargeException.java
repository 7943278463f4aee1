package org.depotcast.common;

/** A request body longer than the configured limit; answered 413 before the body is read (or as soon as it passes). */
public class BodyTooLargeException extends RuntimeException {
    private final long limitBytes;

    public BodyTooLargeException(long limitBytes) {
        super("the request body is larger than the limit of " + limitBytes + " bytes");
        this.limitBytes = limitBytes;
    }

    public long limitBytes() {
        return limitBytes;
    }
}
