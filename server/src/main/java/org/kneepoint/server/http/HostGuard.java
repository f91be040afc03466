package org.kneepoint.server.http;

import java.net.InetAddress;
import java.net.NetworkInterface;
import java.net.SocketException;
import java.net.UnknownHostException;
import java.util.HashSet;
import java.util.Locale;
import java.util.Set;
import java.util.regex.Pattern;

/**
 * Accepts only requests whose {@code Host} names the address the server is bound to, so that a page of another site
 * whose name was made to point at this machine (DNS rebinding) is refused before anything else. Bound to loopback,
 * the names {@code localhost}, {@code 127.0.0.1} and {@code [::1]} (any loopback address) are accepted; bound to one
 * address, that address (and the name it was given by); bound to every address ({@code 0.0.0.0}, {@code ::}), the
 * addresses of this machine's interfaces and its host name. The port of the header is not compared. A name in the
 * header is never looked up.
 */
final class HostGuard {

    private static final Pattern IPV4 = Pattern.compile("\\d{1,3}(\\.\\d{1,3}){3}");
    private static final Pattern IPV6 = Pattern.compile("[0-9a-f:.]+(%[0-9a-z._-]+)?");

    private final Set<String> names;
    private final Set<InetAddress> addresses;
    private final boolean loopback;

    private HostGuard(Set<String> names, Set<InetAddress> addresses, boolean loopback) {
        this.names = Set.copyOf(names);
        this.addresses = Set.copyOf(addresses);
        this.loopback = loopback;
    }

    /** The guard of a server bound to {@code bind} (an address or a name of this machine). */
    static HostGuard boundTo(String bind) {
        Set<String> names = new HashSet<>();
        Set<InetAddress> addresses = new HashSet<>();
        String bound = bind.toLowerCase(Locale.ROOT);
        names.add(bound);
        InetAddress address;
        try {
            address = InetAddress.getByName(bind);
        } catch (UnknownHostException e) {
            return new HostGuard(names, addresses, false);
        }
        addresses.add(address);
        if (address.isLoopbackAddress()) {
            names.add("localhost");
            return new HostGuard(names, addresses, true);
        }
        if (address.isAnyLocalAddress()) {
            addInterfaces(addresses);
            try {
                names.add(InetAddress.getLocalHost().getHostName().toLowerCase(Locale.ROOT));
            } catch (UnknownHostException e) {
                // a machine without a resolvable name of its own: its addresses are still accepted
            }
        }
        return new HostGuard(names, addresses, false);
    }

    /** Refuses (421) a request whose Host header is missing or names no address of this server. */
    void check(String hostHeader) {
        if (hostHeader == null || hostHeader.isBlank()) {
            throw new RequestRefused(421, "UNKNOWN_HOST", "the request has no Host header; send the address of this server");
        }
        if (!accepts(hostHeader)) {
            String shown = hostHeader.length() > 60 ? hostHeader.substring(0, 60) + "…" : hostHeader;
            throw new RequestRefused(421, "UNKNOWN_HOST", "the Host header '" + shown.replaceAll("\\p{Cntrl}", "?")
                    + "' does not name this server; use the address it listens on");
        }
    }

    boolean accepts(String hostHeader) {
        String host = withoutPort(hostHeader.strip().toLowerCase(Locale.ROOT));
        if (host == null || host.isEmpty()) {
            return false;
        }
        if (host.endsWith(".")) {
            host = host.substring(0, host.length() - 1);
        }
        InetAddress literal = literal(host);
        if (literal != null) {
            return addresses.contains(literal) || loopback && literal.isLoopbackAddress();
        }
        return names.contains(host);
    }

    /** The host part of a Host header value, or null when it is malformed. */
    private static String withoutPort(String value) {
        if (value.startsWith("[")) {
            int end = value.indexOf(']');
            if (end < 0 || end + 1 < value.length() && !value.substring(end + 1).matches(":\\d{1,5}")) {
                return null;
            }
            return value.substring(0, end + 1);
        }
        int colon = value.indexOf(':');
        if (colon < 0) {
            return value;
        }
        return value.substring(colon + 1).matches("\\d{1,5}") ? value.substring(0, colon) : null;
    }

    /** The address a literal names ({@code 10.0.0.1}, {@code [::1]}), or null for a name, which is never looked up. */
    private static InetAddress literal(String host) {
        try {
            if (host.startsWith("[") && host.endsWith("]")) {
                String text = host.substring(1, host.length() - 1);
                // in brackets, the JDK parses the text as an IPv6 literal or refuses it, without a lookup
                return IPV6.matcher(text).matches() && text.contains(":") ? InetAddress.getByName("[" + text + "]") : null;
            }
            if (!IPV4.matcher(host).matches()) {
                return null;
            }
            String[] parts = host.split("\\.");
            byte[] bytes = new byte[4];
            for (int i = 0; i < 4; i++) {
                int part = Integer.parseInt(parts[i]);
                if (part > 255) {
                    return null;
                }
                bytes[i] = (byte) part;
            }
            return InetAddress.getByAddress(bytes);
        } catch (UnknownHostException e) {
            return null;
        }
    }

    private static void addInterfaces(Set<InetAddress> addresses) {
        try {
            NetworkInterface.networkInterfaces().flatMap(NetworkInterface::inetAddresses).forEach(addresses::add);
        } catch (SocketException e) {
            // no interfaces can be listed: only the names and the loopback stay accepted
        }
        addresses.add(InetAddress.getLoopbackAddress());
    }
}
