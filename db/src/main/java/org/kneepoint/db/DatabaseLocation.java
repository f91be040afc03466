package org.kneepoint.db;

import java.nio.file.Path;
import java.util.Map;
import org.jooq.SQLDialect;
import org.kneepoint.fitter.error.BadInputException;

/**
 * Where the library lives: a JDBC URL. A value that starts with {@code jdbc:} is used as it is
 * (H2 or PostgreSQL); any other value names a folder, which holds an embedded H2 database file
 * {@code kneepoint.mv.db}. Chosen by, in order: the {@code --db} option, the {@code KNEEPOINT_DB}
 * environment variable, the folder {@code .kneepoint} in the user's home.
 */
public record DatabaseLocation(String jdbcUrl) {

    public static final String ENVIRONMENT_VARIABLE = "KNEEPOINT_DB";
    static final String H2_FILE_NAME = "kneepoint";

    public DatabaseLocation {
        if (jdbcUrl == null || !(jdbcUrl.startsWith("jdbc:h2:") || jdbcUrl.startsWith("jdbc:postgresql:"))) {
            throw new BadInputException("expected a folder or a jdbc:h2: or jdbc:postgresql: URL for the database, got '" + jdbcUrl + "'");
        }
    }

    /** Resolves the option value (may be null) against the environment and the home folder. */
    public static DatabaseLocation resolve(String option, Map<String, String> environment, Path home) {
        String value = option != null && !option.isBlank() ? option : environment.get(ENVIRONMENT_VARIABLE);
        if (value == null || value.isBlank()) {
            return ofFolder(home.resolve(".kneepoint"));
        }
        return value.startsWith("jdbc:") ? new DatabaseLocation(value) : ofFolder(Path.of(value));
    }

    /** An embedded H2 database in the given folder. */
    public static DatabaseLocation ofFolder(Path folder) {
        return new DatabaseLocation("jdbc:h2:file:" + folder.toAbsolutePath().normalize().resolve(H2_FILE_NAME));
    }

    public SQLDialect dialect() {
        return jdbcUrl.startsWith("jdbc:postgresql:") ? SQLDialect.POSTGRES : SQLDialect.H2;
    }

    /** The URL without any password parameter, for messages. */
    public String describe() {
        return jdbcUrl.replaceAll("(?i)(password=)[^&;]*", "$1***");
    }
}
