package org.depotcast.access;

import javax.crypto.Mac;
import javax.crypto.spec.SecretKeySpec;
import java.nio.charset.StandardCharsets;
import java.security.GeneralSecurityException;
import java.security.MessageDigest;
import java.security.SecureRandom;
import java.util.Base64;
import java.util.HexFormat;
import java.util.Optional;

/**
 * The session cookie's value: {@code <id>.<mac>}, a random 256-bit session id and its HMAC-SHA-256 under the session
 * key, both base64url. The server keeps only the SHA-256 of the id, so neither a copy of the database nor a guessed
 * or altered cookie gives a session; a cookie whose mac does not check is refused before any database look-up.
 */
final class SessionCookie {
    static final String NAME = "depotcast-session";
    private static final SecureRandom RANDOM = new SecureRandom();
    private static final Base64.Encoder B64 = Base64.getUrlEncoder().withoutPadding();

    /** A new cookie value and the id hash the server stores for it. */
    record Issued(String value, String idHash) {
    }

    private SessionCookie() {
    }

    /**
     * The Set-Cookie header. HttpOnly: page scripts never read it. SameSite=Lax: other sites' forms and scripts do
     * not send it (so they cannot write through it; the cross-site guard checks writes as well), while a link to a
     * page followed from a message or an e-mail still opens signed in, which Strict would not do. Path / so that
     * the pages and /api share it; Max-Age the session's lifetime; Secure as {@link SessionService#secureCookie}.
     */
    static String header(String value, long maxAgeSeconds, boolean secure) {
        return NAME + "=" + value + "; Path=/; Max-Age=" + maxAgeSeconds + "; HttpOnly; SameSite=Lax"
                + (secure ? "; Secure" : "");
    }

    static Issued issue(byte[] key) {
        byte[] id = new byte[32];
        RANDOM.nextBytes(id);
        String encodedId = B64.encodeToString(id);
        return new Issued(encodedId + "." + B64.encodeToString(mac(key, encodedId)), sha256(encodedId));
    }

    /** The stored id hash of a genuine cookie value; empty for anything not made with this key. */
    static Optional<String> idHashOf(byte[] key, String value) {
        if (value == null || value.length() > 200) {
            return Optional.empty();
        }
        int dot = value.indexOf('.');
        if (dot <= 0) {
            return Optional.empty();
        }
        String encodedId = value.substring(0, dot);
        // Compared as text: decoding would accept several spellings of one mac (base64's unused trailing bits).
        byte[] expected = B64.encodeToString(mac(key, encodedId)).getBytes(StandardCharsets.US_ASCII);
        byte[] given = value.substring(dot + 1).getBytes(StandardCharsets.UTF_8);
        return MessageDigest.isEqual(given, expected) ? Optional.of(sha256(encodedId)) : Optional.empty();
    }

    private static byte[] mac(byte[] key, String encodedId) {
        try {
            Mac hmac = Mac.getInstance("HmacSHA256");
            hmac.init(new SecretKeySpec(key, "HmacSHA256"));
            return hmac.doFinal(("depotcast-session:" + encodedId).getBytes(StandardCharsets.UTF_8));
        } catch (GeneralSecurityException e) {
            throw new IllegalStateException(e);
        }
    }

    private static String sha256(String text) {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(text.getBytes(StandardCharsets.UTF_8)));
        } catch (GeneralSecurityException e) {
            throw new IllegalStateException(e);
        }
    }
}
