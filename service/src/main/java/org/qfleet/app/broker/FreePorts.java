package org.qfleet.app.broker;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.net.InetAddress;
import java.net.ServerSocket;

/** Free TCP ports on localhost, asked from the operating system. */
final class FreePorts {

    private FreePorts() {
    }

    /** Whether {@code port} on localhost can be bound now. */
    static boolean isFree(int port) {
        try (ServerSocket socket = new ServerSocket()) {
            socket.setReuseAddress(true);
            socket.bind(new java.net.InetSocketAddress(InetAddress.getLoopbackAddress(), port), 1);
            return true;
        } catch (IOException e) {
            return false;
        }
    }

    /** A port that was free a moment ago; another program could still take it before we bind it. */
    static int find() {
        try (ServerSocket socket = new ServerSocket(0, 1, InetAddress.getLoopbackAddress())) {
            socket.setReuseAddress(true);
            return socket.getLocalPort();
        } catch (IOException e) {
            throw new UncheckedIOException("no free port on localhost", e);
        }
    }
}
