package org.kneepoint.db;

import java.net.URLDecoder;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * A URL from the environment with its credentials taken out: H2's {@code ;USER=} and
 * {@code ;PASSWORD=} settings, PostgreSQL's {@code password=} parameter (percent-decoded, as the
 * driver reads it). The connection pool passes them to the driver separately, so the URL that is
 * kept and shown never holds a password, and H2 does not see the same setting twice.
 *
 * @param url      the URL without them
 * @param user     the user named in the URL (H2), or null
 * @param password the password, or null
 */
record UrlCredentials(String url, String user, String password) {

    static UrlCredentials split(String url) {
        return url.startsWith("jdbc:h2:") ? splitH2(url) : splitPostgresql(url);
    }

    private static UrlCredentials splitH2(String url) {
        String[] parts = url.split(";", -1);
        StringBuilder kept = new StringBuilder(parts[0]);
        String user = null;
        String password = null;
        for (int i = 1; i < parts.length; i++) {
            String key = key(parts[i]);
            if (key.equals("USER")) {
                user = value(parts[i]);
            } else if (key.equals("PASSWORD")) {
                password = value(parts[i]);
            } else {
                kept.append(';').append(parts[i]);
            }
        }
        return new UrlCredentials(kept.toString(), user, password);
    }

    private static UrlCredentials splitPostgresql(String url) {
        int query = url.indexOf('?');
        if (query < 0) {
            return new UrlCredentials(url, null, null);
        }
        List<String> kept = new ArrayList<>();
        String password = null;
        for (String parameter : url.substring(query + 1).split("&", -1)) {
            if (key(URLDecoder.decode(parameter, StandardCharsets.UTF_8)).equals("PASSWORD")) {
                password = URLDecoder.decode(value(parameter), StandardCharsets.UTF_8);
            } else {
                kept.add(parameter);
            }
        }
        return new UrlCredentials(url.substring(0, query) + (kept.isEmpty() ? "" : "?" + String.join("&", kept)), null, password);
    }

    private static String key(String setting) {
        int equals = setting.indexOf('=');
        return (equals < 0 ? setting : setting.substring(0, equals)).strip().toUpperCase(Locale.ROOT);
    }

    private static String value(String setting) {
        int equals = setting.indexOf('=');
        return equals < 0 ? "" : setting.substring(equals + 1);
    }
}
