package org.kneepoint.server.http;

import io.javalin.http.Context;
import java.nio.charset.StandardCharsets;
import java.security.InvalidKeyException;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.security.SecureRandom;
import java.util.Base64;
import java.util.HexFormat;
import javax.crypto.Mac;
import javax.crypto.spec.SecretKeySpec;

/**
 * The per-session form token that every write from a page carries (hidden field {@code formToken}), so that a page
 * of another site cannot write even to a server on loopback: it can neither read the token nor send the session's
 * cookie. The session is a random id in the cookie {@code kneepoint_session} (HttpOnly, SameSite=Lax); the token is
 * the HMAC-SHA256 of that id under a key drawn when the server starts, so nothing is stored per session and a restart
 * makes old forms invalid (the page is simply loaded again).
 */
public final class FormTokens {

    /** The name of the forms' hidden field. */
    public static final String FIELD = "formToken";

    static final String COOKIE = "kneepoint_session";

    private static final SecureRandom RANDOM = new SecureRandom();

    private final SecretKeySpec key;

    public FormTokens() {
        byte[] secret = new byte[32];
        RANDOM.nextBytes(secret);
        this.key = new SecretKeySpec(secret, "HmacSHA256");
    }

    /** The token for the forms of the page being answered; starts a session (sets its cookie) when there is none. */
    public String issue(Context context) {
        String session = session(context);
        if (session == null) {
            byte[] id = new byte[16];
            RANDOM.nextBytes(id);
            session = HexFormat.of().formatHex(id);
            context.res().addHeader("Set-Cookie", COOKIE + "=" + session + "; Path=/; HttpOnly; SameSite=Lax");
        }
        return tokenOf(session);
    }

    /** Whether {@code presented} is the token of the request's session (compared in constant time). */
    boolean valid(Context context, String presented) {
        String session = session(context);
        if (session == null || presented == null) {
            return false;
        }
        return MessageDigest.isEqual(tokenOf(session).getBytes(StandardCharsets.US_ASCII), presented.getBytes(StandardCharsets.UTF_8));
    }

    /** The request's session id, or null when it has no well-formed one. */
    private static String session(Context context) {
        String value = context.cookie(COOKIE);
        return value != null && value.matches("[0-9a-f]{32}") ? value : null;
    }

    private String tokenOf(String session) {
        try {
            Mac mac = Mac.getInstance("HmacSHA256");
            mac.init(key);
            return Base64.getUrlEncoder().withoutPadding().encodeToString(mac.doFinal(session.getBytes(StandardCharsets.US_ASCII)));
        } catch (NoSuchAlgorithmException | InvalidKeyException e) {
            throw new IllegalStateException("HmacSHA256 is part of every Java runtime", e);
        }
    }
}
