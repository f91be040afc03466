package org.kneepoint.server.http;

import io.javalin.http.Context;
import io.javalin.http.HandlerType;
import java.net.URI;
import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;

/**
 * Checks every write (POST) before it is handled, after the Host header was checked ({@link HostGuard}).
 * A write that the browser says comes from another site ({@code Sec-Fetch-Site}), or whose {@code Origin} is not this
 * server, is refused. A write to a
 * page (outside {@code /api}) must carry the session's form token ({@link FormTokens}) or the server's token as
 * {@code Authorization: Bearer TOKEN}. When the server requires a token (it is bound to an address other than
 * loopback), every write must carry it as {@code Authorization: Bearer TOKEN}, or, from a page's form, in the field
 * {@code token}. Tokens are compared in constant time and never logged.
 */
final class WriteGuard {

    private final byte[] token;
    private final FormTokens forms;

    /** {@code token} null means writes to the API need no token (loopback only). */
    WriteGuard(String token, FormTokens forms) {
        this.token = token == null ? null : token.getBytes(StandardCharsets.UTF_8);
        this.forms = forms;
    }

    void check(Context context) {
        if (context.method() != HandlerType.POST) {
            return;
        }
        checkOrigin(context);
        String bearer = bearer(context.header("Authorization"));
        boolean page = !context.path().startsWith("/api/");
        if (page && !(bearer != null && matches(bearer)) && !forms.valid(context, isForm(context) ? context.formParam(FormTokens.FIELD) : null)) {
            throw new RequestRefused(403, "FORM_TOKEN_REFUSED",
                    "this form has expired or was not sent by this server's page; load the page again and resend it");
        }
        if (token == null) {
            return;
        }
        String presented = bearer;
        if (presented == null && isForm(context)) {
            presented = context.formParam("token");
        }
        if (presented == null) {
            throw new RequestRefused(401, "TOKEN_REQUIRED", "this server needs a token for writes: send 'Authorization: Bearer TOKEN'");
        }
        if (!matches(presented)) {
            throw new RequestRefused(403, "TOKEN_REFUSED", "the token does not match the server's");
        }
    }

    private boolean matches(String presented) {
        return token != null && MessageDigest.isEqual(token, presented.getBytes(StandardCharsets.UTF_8));
    }

    /**
     * Refuses a write sent by a page of another site: {@code Sec-Fetch-Site} {@code cross-site} or {@code same-site}
     * (another port is another origin), or an {@code Origin} other than this server's own (the Host it is compared with
     * was checked before). Browsers send {@code Origin: null} for a same-origin form when the page's referrer policy
     * is {@code no-referrer}, as ours is; such a write is accepted only when the browser also says
     * {@code Sec-Fetch-Site: same-origin}.
     */
    private static void checkOrigin(Context context) {
        String site = context.header("Sec-Fetch-Site");
        if (site != null && !site.equals("same-origin") && !site.equals("none")) {
            throw foreign();
        }
        String origin = context.header("Origin");
        if (origin == null) {
            return;
        }
        if (origin.equals("null")) {
            if (!"same-origin".equals(site)) {
                throw foreign();
            }
            return;
        }
        String originHost;
        try {
            originHost = URI.create(origin).getRawAuthority();
        } catch (IllegalArgumentException e) {
            originHost = null;
        }
        String host = context.header("Host");
        if (host == null || !host.equalsIgnoreCase(originHost)) {
            throw foreign();
        }
    }

    private static RequestRefused foreign() {
        return new RequestRefused(403, "FOREIGN_ORIGIN", "writes are accepted only from this server's own pages");
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
