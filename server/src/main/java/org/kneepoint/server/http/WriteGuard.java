package org.kneepoint.server.http;

import io.javalin.http.Context;
import io.javalin.http.HandlerType;
import java.net.URI;
import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;

/**
 * Checks every write (POST) before it is handled. A write from a page of another site is refused
 * (its Origin must be this server). When the server requires a token (it is bound to an address
 * other than loopback), the write must carry it as {@code Authorization: Bearer TOKEN}, or, from
 * the import page's form, in the field {@code token}. The token is compared in constant time and
 * never logged.
 */
final class WriteGuard {

    private final byte[] token;

    /** {@code token} null means writes need no token (loopback only). */
    WriteGuard(String token) {
        this.token = token == null ? null : token.getBytes(StandardCharsets.UTF_8);
    }

    void check(Context context) {
        if (context.method() != HandlerType.POST) {
            return;
        }
        checkOrigin(context);
        if (token == null) {
            return;
        }
        String presented = bearer(context.header("Authorization"));
        if (presented == null && isForm(context)) {
            presented = context.formParam("token");
        }
        if (presented == null) {
            throw new RequestRefused(401, "TOKEN_REQUIRED", "this server needs a token for writes: send 'Authorization: Bearer TOKEN'");
        }
        if (!MessageDigest.isEqual(token, presented.getBytes(StandardCharsets.UTF_8))) {
            throw new RequestRefused(403, "TOKEN_REFUSED", "the token does not match the server's");
        }
    }

    private static void checkOrigin(Context context) {
        String origin = context.header("Origin");
        if (origin == null) {
            return;
        }
        String host = context.header("Host");
        String originHost;
        try {
            originHost = URI.create(origin).getRawAuthority();
        } catch (IllegalArgumentException e) {
            originHost = null;
        }
        if (host == null || !host.equalsIgnoreCase(originHost)) {
            throw new RequestRefused(403, "FOREIGN_ORIGIN", "writes are accepted only from this server's own pages");
        }
    }

    private static String bearer(String header) {
        if (header == null || !header.regionMatches(true, 0, "Bearer ", 0, 7)) {
            return null;
        }
        String value = header.substring(7).strip();
        return value.isEmpty() ? null : value;
    }

    private static boolean isForm(Context context) {
        String type = context.contentType();
        return type != null && (type.startsWith("multipart/form-data") || type.startsWith("application/x-www-form-urlencoded"));
    }
}
