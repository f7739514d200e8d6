package org.qfleet.app.http;

import com.sun.net.httpserver.HttpHandler;
import com.sun.net.httpserver.HttpServer;
import java.io.IOException;
import java.net.BindException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.atomic.AtomicInteger;

/**
 * The service's small HTTP server (the JDK's), on which handlers are mounted by path: metrics,
 * health, a status page. Requests are served on two daemon threads of its own, never on a stream
 * thread.
 */
public final class HttpEndpoints implements AutoCloseable {

    private static final int THREADS = 2;

    private final HttpServer server;
    private final ExecutorService executor;
    private final HttpAddress address;

    private HttpEndpoints(HttpServer server, ExecutorService executor, HttpAddress address) {
        this.server = server;
        this.executor = executor;
        this.address = address;
    }

    /**
     * Binds to {@code address} and starts serving (nothing is mounted yet: every path gives 404).
     *
     * @throws HttpStartException when the address cannot be bound, saying why in one line
     */
    public static HttpEndpoints start(HttpAddress address) throws HttpStartException {
        HttpServer server;
        try {
            server = HttpServer.create(address.socketAddress(), 0);
        } catch (BindException e) {
            throw new HttpStartException("cannot listen for HTTP on " + address + ": the port is in use or the address"
                    + " is not on this machine (" + e.getMessage() + "); choose another with --http-address HOST:PORT,"
                    + " or turn it off with --http-address off", e);
        } catch (IOException | RuntimeException e) {
            throw new HttpStartException("cannot listen for HTTP on " + address + ": " + e, e);
        }
        AtomicInteger count = new AtomicInteger();
        ExecutorService executor = Executors.newFixedThreadPool(THREADS, r -> {
            Thread t = new Thread(r, "qfleet-http-" + count.incrementAndGet());
            t.setDaemon(true);
            return t;
        });
        server.setExecutor(executor);
        server.start();
        return new HttpEndpoints(server, executor, address);
    }

    /**
     * Serves {@code path} and every path below it with {@code handler} (the longest mounted path
     * wins, so a handler on {@code /} gets what no other takes).
     */
    public HttpEndpoints mount(String path, HttpHandler handler) {
        server.createContext(path, handler);
        return this;
    }

    /** The port listened on: the one chosen by the system when the address asked for 0. */
    public int port() {
        return server.getAddress().getPort();
    }

    /** {@code http://HOST:PORT} with the actual port. */
    public String baseUrl() {
        return "http://" + address.withPort(port());
    }

    /** Stops listening; requests under way get a second to finish. */
    @Override
    public void close() {
        server.stop(1);
        executor.shutdownNow();
    }
}
