package org.kneepoint.server.cli;

import org.kneepoint.db.Library;
import org.kneepoint.server.app.version.VersionInfo;
import picocli.CommandLine;

/** {@code kneepoint --version}: the program's version, the library schema it writes and the Java it runs on. */
final class VersionProvider implements CommandLine.IVersionProvider {

    @Override
    public String[] getVersion() {
        return new String[] {"kneepoint " + VersionInfo.version(), "library schema version " + Library.SCHEMA_VERSION,
            "Java " + System.getProperty("java.version")};
    }
}
