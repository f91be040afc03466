package org.kneepoint.server.app.serving;

import java.net.InetAddress;
import java.net.UnknownHostException;

/**
 * How the web server listens: the address and port (0 = any free port) and the token that writes
 * must carry (null: none). Binding to an address other than loopback requires a token.
 */
public record ServerSettings(String bind, int port, String token) {

    public static final String LOOPBACK = "127.0.0.1";

    /** Biggest upload (all files of one import together), in bytes. */
    public static final long MAX_UPLOAD_BYTES = 64L * 1024 * 1024;

    /** Biggest body of any other request, in bytes. */
    public static final long MAX_OTHER_BYTES = 64L * 1024;

    public ServerSettings {
        if (port < 0 || port > 65535) {
            throw new IllegalArgumentException("the port must be between 0 and 65535, got " + port);
        }
        if (token != null && token.isBlank()) {
            throw new IllegalArgumentException("the token must not be blank");
        }
        if (token == null && !isLoopback(bind)) {
            throw new IllegalArgumentException("bound to " + bind + ", every write needs a token: give --token or set KNEEPOINT_TOKEN");
        }
    }

    public static ServerSettings loopback(int port) {
        return new ServerSettings(LOOPBACK, port, null);
    }

    public boolean tokenRequired() {
        return token != null;
    }

    /** Whether the address is a loopback address (127.0.0.0/8, ::1, localhost). */
    public static boolean isLoopback(String bind) {
        try {
            return InetAddress.getByName(bind).isLoopbackAddress();
        } catch (UnknownHostException e) {
            return false;
        }
    }

    @Override
    public String toString() {
        return "ServerSettings[bind=" + bind + ", port=" + port + ", token=" + (token == null ? "none" : "set") + "]";
    }
}
