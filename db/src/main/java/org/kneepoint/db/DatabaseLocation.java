package org.kneepoint.db;

import java.nio.file.Path;
import java.util.Map;
import org.jooq.SQLDialect;
import org.kneepoint.fitter.error.BadInputException;

/**
 * Where the library lives: a JDBC URL, and for a shared server the user and password to log in
 * with. A value that starts with {@code jdbc:} is used as it is (H2 or PostgreSQL); any other value
 * names a folder, which holds an embedded H2 database file {@code kneepoint.mv.db}. Chosen by, in
 * order: the {@code --db} option, the {@code KNEEPOINT_DB} environment variable, the folder
 * {@code .kneepoint} in the user's home ({@code $HOME}). Credentials come only from the environment
 * ({@code KNEEPOINT_DB_USER}, {@code KNEEPOINT_DB_PASSWORD}, or a password inside
 * {@code KNEEPOINT_DB}, which is moved out of the URL): a password in the {@code --db} option, in
 * any spelling, is refused, since a command line shows in process lists and shell histories.
 * Settings that run code or change security ({@link UrlSettings}) are refused from any source.
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
    /**
     * Appended to every H2 URL (and {@link #H2_FILE_SETTINGS} to a file's). {@code WRITE_DELAY=0}: a commit is written to the file before the
     * statement returns (H2's default keeps commits in memory for up to 500 ms, so a killed process
     * lost confirmed writes). {@code REUSE_SPACE=FALSE}: every commit is appended at the end of the
     * file. With space reused, H2 2.5 writes a commit into a free gap in the middle of the file and
     * only sometimes updates the file header that points to it; after a crash it looks for the
     * newest commit from the header and from the end of the file, and silently opened an older
     * state without the last acknowledged writes (found with {@code AcknowledgedWritesTest}). The
     * space is given back when the library is closed ({@link Library#close()}).
     * {@code TRACE_LEVEL_FILE=0}: no trace file beside the library (H2 prints a stack trace to
     * standard error when it cannot write one, e.g. in a read-only folder).
     */
    static final String H2_SETTINGS = ";WRITE_DELAY=0;TRACE_LEVEL_FILE=0";
    /** Appended to the URL of an H2 file (an in-memory database has no file and refuses it). */
    static final String H2_FILE_SETTINGS = ";REUSE_SPACE=FALSE";

    public DatabaseLocation {
        if (jdbcUrl == null || !(jdbcUrl.startsWith("jdbc:h2:") || jdbcUrl.startsWith("jdbc:postgresql:"))) {
            throw new BadInputException("expected a folder or a jdbc:h2: or jdbc:postgresql: URL for the database, got '"
                    + (jdbcUrl == null ? null : UrlSettings.masked(jdbcUrl)) + "'");
        }
        refuseUnsafeSettings("the database URL", jdbcUrl);
        user = blankToNull(user);
        password = blankToNull(password);
    }

    /** A location without separate credentials. */
    public DatabaseLocation(String jdbcUrl) {
        this(jdbcUrl, null, null);
    }

    /**
     * Resolves the option value (may be null) against the environment and the home folder: {@code $HOME} when the
     * environment sets it, else {@code accountHome} (the account's home from the user database).
     */
    public static DatabaseLocation resolve(String option, Map<String, String> environment, Path accountHome) {
        String homeVariable = environment.get("HOME");
        Path home = homeVariable != null && !homeVariable.isBlank() ? Path.of(homeVariable) : accountHome;
        boolean fromOption = option != null && !option.isBlank();
        if (fromOption && UrlSettings.holdsPassword(option)) {
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
        refuseUnsafeSettings(fromOption ? "--db" : ENVIRONMENT_VARIABLE, value);
        UrlCredentials inUrl = UrlCredentials.split(value);
        String user = environment.get(USER_VARIABLE);
        String password = environment.get(PASSWORD_VARIABLE);
        return new DatabaseLocation(inUrl.url(), user == null || user.isBlank() ? inUrl.user() : user,
                password == null || password.isBlank() ? inUrl.password() : password);
    }

    /** An embedded H2 database in the given folder. */
    public static DatabaseLocation ofFolder(Path folder) {
        return new DatabaseLocation("jdbc:h2:file:" + folder.toAbsolutePath().normalize().resolve(H2_FILE_NAME));
    }

    public SQLDialect dialect() {
        return jdbcUrl.startsWith("jdbc:postgresql:") ? SQLDialect.POSTGRES : SQLDialect.H2;
    }

    /** The URL the driver is given: for H2 with the settings that make every commit durable. */
    String connectionUrl() {
        if (dialect() != SQLDialect.H2) {
            return jdbcUrl;
        }
        return jdbcUrl + H2_SETTINGS + (jdbcUrl.startsWith("jdbc:h2:mem:") ? "" : H2_FILE_SETTINGS);
    }

    /** The URL without any password, and the user when one is set, for messages. */
    public String describe() {
        String url = UrlSettings.masked(jdbcUrl);
        return user == null ? url : url + " (as " + user + ")";
    }

    /** The text with this location's password, wherever it appears, replaced by {@code ***}. */
    String withoutPassword(String text) {
        return password == null || text == null ? text : text.replace(password, "***");
    }

    @Override
    public String toString() {
        return describe();
    }

    private static void refuseUnsafeSettings(String source, String url) {
        UrlSettings.refusedSetting(url).ifPresent(name -> {
            throw new BadInputException(source + ": the setting " + name + " runs code, writes files or changes the library's "
                    + "security or durability, so Kneepoint refuses it; leave it out of the URL");
        });
    }

    private static String blankToNull(String value) {
        return value == null || value.isBlank() ? null : value;
    }
}
