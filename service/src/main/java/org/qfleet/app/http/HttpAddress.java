package org.qfleet.app.http;

import java.net.InetSocketAddress;
import java.util.Locale;
import java.util.Optional;

/**
 * Where the metrics and health endpoints listen: a host name or address and a port (0 for a free
 * one). Written {@code HOST:PORT}, an IPv6 address in brackets ({@code [::1]:9464}); {@code off}
 * turns the endpoints off.
 *
 * @param host host name or literal address to bind to
 * @param port port, 0 for one the system chooses
 */
public record HttpAddress(String host, int port) {

    /** Local only by default: the endpoints have no authentication. */
    public static final HttpAddress DEFAULT = new HttpAddress("localhost", 9464);
    public static final String OFF = "off";

    public HttpAddress {
        if (host == null || host.isBlank()) {
            throw new IllegalArgumentException("the host is empty");
        }
        if (port < 0 || port > 65535) {
            throw new IllegalArgumentException("the port must lie between 0 and 65535, got " + port);
        }
    }

    /**
     * Reads {@code HOST:PORT} or {@code off}.
     *
     * @return empty for {@code off}
     * @throws IllegalArgumentException saying what is wrong with {@code text}
     */
    public static Optional<HttpAddress> parse(String text) {
        String t = text.trim();
        if (t.toLowerCase(Locale.ROOT).equals(OFF)) {
            return Optional.empty();
        }
        int colon = t.lastIndexOf(':');
        if (colon <= 0 || colon == t.length() - 1) {
            throw new IllegalArgumentException("expected HOST:PORT (e.g. localhost:9464) or 'off'");
        }
        String host = t.substring(0, colon);
        if (host.startsWith("[") && host.endsWith("]")) {
            host = host.substring(1, host.length() - 1);
        } else if (host.contains(":")) {
            throw new IllegalArgumentException("write an IPv6 address in brackets, e.g. [::1]:9464");
        }
        int port;
        try {
            port = Integer.parseInt(t.substring(colon + 1));
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("the port '" + t.substring(colon + 1) + "' is not a whole number");
        }
        return Optional.of(new HttpAddress(host, port));
    }

    InetSocketAddress socketAddress() {
        return new InetSocketAddress(host, port);
    }

    /** As written in settings, with {@code port} in place of this one's (which may be 0). */
    String withPort(int actualPort) {
        return (host.contains(":") ? "[" + host + "]" : host) + ":" + actualPort;
    }

    @Override
    public String toString() {
        return withPort(port);
    }
}
