package org.kneepoint.db;

import java.nio.file.Path;
import java.util.Map;
import java.util.regex.Pattern;
import org.jooq.SQLDialect;
import org.kneepoint.fitter.error.BadInputException;

/**
 * Where the library lives: a JDBC URL, and for a shared server the user and password to log in
 * with. A value that starts with {@code jdbc:} is used as it is (H2 or PostgreSQL); any other value
 * names a folder, which holds an embedded H2 database file {@code kneepoint.mv.db}. Chosen by, in
 * order: the {@code --db} option, the {@code KNEEPOINT_DB} environment variable, the folder
 * {@code .kneepoint} in the user's home. Credentials come only from the environment
 * ({@code KNEEPOINT_DB_USER}, {@code KNEEPOINT_DB_PASSWORD}): a password in the {@code --db} option
 * is refused, since a command line shows in process lists and shell histories.
 *
 * @param jdbcUrl  the URL, without credentials when they come from the environment
 * @param user     user name for the server, or null (the URL's own, or the driver's default)
 * @param password password, or null; never shown by {@link #toString()} or {@link #describe()}
 */
public record DatabaseLocation(String jdbcUrl, String user, String password) {

    public static final String ENVIRONMENT_VARIABLE = "KNEEPOINT_DB";
    public static final String USER_VARIABLE = "KNEEPOINT_DB_USER";
    public static final String PASSWORD_VARIABLE = "KNEEPOINT_DB_PASSWORD";
    static final String H2_FILE_NAME = "kneepoint";
    private static final Pattern PASSWORD_PARAMETER = Pattern.compile("(?i)(password=)[^&;]*");

    public DatabaseLocation {
        if (jdbcUrl == null || !(jdbcUrl.startsWith("jdbc:h2:") || jdbcUrl.startsWith("jdbc:postgresql:"))) {
            throw new BadInputException("expected a folder or a jdbc:h2: or jdbc:postgresql: URL for the database, got '"
                    + (jdbcUrl == null ? null : PASSWORD_PARAMETER.matcher(jdbcUrl).replaceAll("$1***")) + "'");
        }
        user = blankToNull(user);
        password = blankToNull(password);
    }

    /** A location without separate credentials. */
    public DatabaseLocation(String jdbcUrl) {
        this(jdbcUrl, null, null);
    }

    /** Resolves the option value (may be null) against the environment and the home folder. */
    public static DatabaseLocation resolve(String option, Map<String, String> environment, Path home) {
        boolean fromOption = option != null && !option.isBlank();
        if (fromOption && PASSWORD_PARAMETER.matcher(option).find()) {
            throw new BadInputException("--db: a password on the command line shows in process lists and shell histories; "
                    + "leave it out of the URL and set " + PASSWORD_VARIABLE + " instead");
        }
        String value = fromOption ? option : environment.get(ENVIRONMENT_VARIABLE);
        if (value == null || value.isBlank()) {
            return ofFolder(home.resolve(".kneepoint"));
        }
        if (!value.startsWith("jdbc:")) {
            return ofFolder(Path.of(value));
        }
        return new DatabaseLocation(value, environment.get(USER_VARIABLE), environment.get(PASSWORD_VARIABLE));
    }

    /** An embedded H2 database in the given folder. */
    public static DatabaseLocation ofFolder(Path folder) {
        return new DatabaseLocation("jdbc:h2:file:" + folder.toAbsolutePath().normalize().resolve(H2_FILE_NAME));
    }

    public SQLDialect dialect() {
        return jdbcUrl.startsWith("jdbc:postgresql:") ? SQLDialect.POSTGRES : SQLDialect.H2;
    }

    /** The URL without any password, and the user when one is set, for messages. */
    public String describe() {
        String url = PASSWORD_PARAMETER.matcher(jdbcUrl).replaceAll("$1***");
        return user == null ? url : url + " (as " + user + ")";
    }

    @Override
    public String toString() {
        return describe();
    }

    private static String blankToNull(String value) {
        return value == null || value.isBlank() ? null : value;
    }
}
