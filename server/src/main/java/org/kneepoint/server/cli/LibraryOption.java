package org.kneepoint.server.cli;

import java.nio.file.Path;
import org.kneepoint.db.DatabaseLocation;
import org.kneepoint.db.Library;
import picocli.CommandLine.Option;

/**
 * The {@code --db} option of every command that uses the library: a folder (embedded H2) or a
 * JDBC URL; without it {@code KNEEPOINT_DB}, then {@code ~/.kneepoint}.
 */
public final class LibraryOption {

    @Option(names = "--db", paramLabel = "FOLDER|JDBC-URL",
            description = "The library: a folder (embedded database) or a jdbc:h2:/jdbc:postgresql: URL. "
                    + "Default: $KNEEPOINT_DB, else ~/.kneepoint.")
    private String db;

    /** Opens (creating and migrating if needed) the library this option names. */
    public Library open() {
        return Library.open(location());
    }

    public DatabaseLocation location() {
        return DatabaseLocation.resolve(db, System.getenv(), Path.of(System.getProperty("user.home")));
    }
}
