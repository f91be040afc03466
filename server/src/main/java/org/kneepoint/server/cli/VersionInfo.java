package org.kneepoint.server.cli;

import java.io.IOException;
import java.io.InputStream;
import java.util.Properties;
import picocli.CommandLine;

/** Program version for {@code --version}, taken from the build (a filtered resource). */
public final class VersionInfo implements CommandLine.IVersionProvider {

    /** The version string, e.g. "0.1.0-SNAPSHOT". */
    public static String version() {
        Properties properties = new Properties();
        try (InputStream in = VersionInfo.class.getResourceAsStream("/kneepoint-version.properties")) {
            if (in != null) {
                properties.load(in);
            }
        } catch (IOException e) {
            return "unknown";
        }
        return properties.getProperty("version", "unknown");
    }

    @Override
    public String[] getVersion() {
        return new String[] {"kneepoint " + version(), "library schema version " + org.kneepoint.db.Library.SCHEMA_VERSION,
            "Java " + System.getProperty("java.version")};
    }
}
