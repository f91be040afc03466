package org.kneepoint.server.app.version;

import java.io.IOException;
import java.io.InputStream;
import java.util.Properties;

/** The program's version, taken from the build (a filtered resource); shown by {@code --version}, the API and stored fits. */
public final class VersionInfo {

    private VersionInfo() {
    }

    /** The version string, e.g. "0.1.0-SNAPSHOT", or "unknown" when the build left none. */
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
}
