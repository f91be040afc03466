package org.kneepoint.db;

import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * What Kneepoint allows in a database URL. Passwords are recognized in every form a driver reads
 * (a {@code password=}-like setting in any case, percent-encoded, or user-info {@code user:pw@host});
 * settings that run code, load classes, write trace files, open network ports or change the
 * database's security or durability are refused from any source (see {@link #REFUSED_H2} and
 * {@link #REFUSED_POSTGRESQL}).
 */
final class UrlSettings {

    /**
     * H2 settings refused: start-up SQL ({@code INIT}), file locking ({@code FILE_LOCK}), encryption
     * and authentication ({@code CIPHER}, {@code AUTHENTICATOR}, {@code AUTHREALM}, {@code AUTHZPWD}),
     * classes loaded by name ({@code DATABASE_EVENT_LISTENER}, {@code JAVA_OBJECT_SERIALIZER},
     * {@code DEFAULT_TABLE_ENGINE}, {@code BUILTIN_ALIAS_OVERRIDE}), management beans ({@code JMX}),
     * durability ({@code WRITE_DELAY}, {@code LOG}, {@code REUSE_SPACE}, {@code RETENTION_TIME}:
     * Kneepoint sets how commits are written itself, see {@link DatabaseLocation#H2_SETTINGS}) and
     * opening a damaged file as if it were sound ({@code RECOVER}).
     */
    static final List<String> REFUSED_H2 = List.of("INIT", "FILE_LOCK", "CIPHER", "AUTHENTICATOR", "AUTHREALM", "AUTHZPWD",
            "DATABASE_EVENT_LISTENER", "JAVA_OBJECT_SERIALIZER", "DEFAULT_TABLE_ENGINE", "BUILTIN_ALIAS_OVERRIDE", "JMX",
            "WRITE_DELAY", "LOG", "RECOVER", "REUSE_SPACE", "RETENTION_TIME");

    /**
     * H2 settings refused by the start of their name: trace files that copy statements and data to
     * disk ({@code TRACE_LEVEL_FILE}, ...), file access modes ({@code ACCESS_MODE_DATA}) and a TCP
     * server inside the process ({@code AUTO_SERVER}, {@code AUTO_SERVER_PORT}).
     */
    static final List<String> REFUSED_H2_PREFIXES = List.of("TRACE", "ACCESS_MODE", "AUTO_SERVER");

    /** PostgreSQL driver settings refused: each names a class the driver loads and runs, or a log file. */
    static final List<String> REFUSED_POSTGRESQL = List.of("SOCKETFACTORY", "SSLFACTORY", "SSLHOSTNAMEVERIFIER",
            "SSLPASSWORDCALLBACK", "AUTHENTICATIONPLUGINCLASSNAME", "LOGGERFILE");

    /** A setting whose name says it is a password (PASSWORD, FILE_PASSWORD, sslpassword, pwd, passwd). */
    private static final Pattern PASSWORD_SETTING = Pattern.compile("(?i)(?:^|[;?&])\\s*[a-z_]*(?:password|passwd|pwd)\\s*=");
    /** User-info with a password: {@code //user:pw@host}. */
    private static final Pattern USER_INFO_PASSWORD = Pattern.compile("//[^/?;@]*:[^/?;@]*@");
    private static final Pattern PASSWORD_VALUE = Pattern.compile("(?i)((?:^|[;?&])\\s*[a-z_]*(?:password|passwd|pwd)\\s*=)[^&;]*");
    private static final Pattern SETTING = Pattern.compile("(?:^|[;?&])\\s*([^;?&=]+?)\\s*=");
    private static final Pattern PERCENT = Pattern.compile("%([0-9a-fA-F]{2})");

    private UrlSettings() {
    }

    /** Whether the URL carries a password in any form a driver would read. */
    static boolean holdsPassword(String url) {
        String decoded = decoded(url);
        return PASSWORD_SETTING.matcher(decoded).find() || USER_INFO_PASSWORD.matcher(decoded).find();
    }

    /** The first refused setting in the URL (its name as written, decoded), if any. */
    static Optional<String> refusedSetting(String url) {
        String decoded = decoded(url);
        boolean h2 = decoded.startsWith("jdbc:h2:");
        int start = h2 ? decoded.indexOf(';') : decoded.indexOf('?');
        if (start < 0) {
            return Optional.empty();
        }
        Matcher setting = SETTING.matcher(decoded.substring(start));
        while (setting.find()) {
            String name = setting.group(1).strip().toUpperCase(Locale.ROOT);
            boolean refused = h2 ? REFUSED_H2.contains(name) || REFUSED_H2_PREFIXES.stream().anyMatch(name::startsWith)
                    : REFUSED_POSTGRESQL.contains(name);
            if (refused) {
                return Optional.of(name);
            }
        }
        return Optional.empty();
    }

    /**
     * The URL for messages: user-info passwords and the values of password settings replaced by
     * {@code ***}. A password spelled so that it cannot be cut out as written (percent-encoded) hides
     * everything after the engine's prefix.
     */
    static String masked(String url) {
        boolean plain = PASSWORD_SETTING.matcher(url).find() || USER_INFO_PASSWORD.matcher(url).find();
        if (holdsPassword(url) && !plain) {
            int prefix = url.startsWith("jdbc:postgresql:") ? "jdbc:postgresql:".length() : Math.min(url.length(), "jdbc:h2:".length());
            return url.substring(0, prefix) + "***";
        }
        String masked = USER_INFO_PASSWORD.matcher(url).replaceAll(match -> {
            String info = match.group();
            return Matcher.quoteReplacement(info.substring(0, info.indexOf(':')) + ":***@");
        });
        return PASSWORD_VALUE.matcher(masked).replaceAll("$1***");
    }

    /** Percent-decoded until nothing changes (a few rounds at most), so that {@code %2570} is seen as {@code p}. */
    static String decoded(String url) {
        String current = url;
        for (int round = 0; round < 4; round++) {
            String next = PERCENT.matcher(current).replaceAll(match -> Matcher.quoteReplacement(
                    String.valueOf((char) Integer.parseInt(match.group(1), 16))));
            if (next.equals(current)) {
                return current;
            }
            current = next;
        }
        return current;
    }
}
