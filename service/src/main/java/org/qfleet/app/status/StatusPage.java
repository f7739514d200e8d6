package org.qfleet.app.status;

import com.sun.net.httpserver.HttpExchange;
import com.sun.net.httpserver.HttpHandler;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.time.Clock;
import java.util.Objects;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * Serves the status page of a {@link FleetView} at the path the handler is mounted on (with or
 * without a trailing slash): {@code GET} gives the page, any other method 405, any other path
 * under the mount point 404. Thread-safe.
 */
public final class StatusPage implements HttpHandler {

    private static final Logger LOG = LoggerFactory.getLogger(StatusPage.class);

    /** The page runs no script and loads nothing: a browser should refuse both, should a name ever slip through. */
    static final String CONTENT_POLICY = "default-src 'none'; style-src 'unsafe-inline'; base-uri 'none'; form-action 'none'";

    private final FleetView view;
    private final Clock clock;
    private final StatusHtml html = new StatusHtml();

    public StatusPage(FleetView view) {
        this(view, Clock.systemUTC());
    }

    public StatusPage(FleetView view, Clock clock) {
        this.view = Objects.requireNonNull(view, "view");
        this.clock = Objects.requireNonNull(clock, "clock");
    }

    @Override
    public void handle(HttpExchange exchange) throws IOException {
        try (exchange) {
            String method = exchange.getRequestMethod();
            if (!isPage(exchange.getHttpContext().getPath(), exchange.getRequestURI().getPath())) {
                reply(exchange, 404, "text/plain; charset=utf-8", "not found: the status page is at "
                        + exchange.getHttpContext().getPath() + "\n", method);
                return;
            }
            if (!"GET".equals(method)) {
                exchange.getResponseHeaders().set("Allow", "GET");
                reply(exchange, 405, "text/plain; charset=utf-8", "method " + method + " not allowed: use GET\n", method);
                return;
            }
            String page;
            try {
                page = html.render(view.snapshot(), clock.instant());
            } catch (RuntimeException e) {
                LOG.warn("cannot render the status page: {}", e.toString());
                reply(exchange, 500, "text/plain; charset=utf-8", "the status page could not be drawn\n", method);
                return;
            }
            exchange.getResponseHeaders().set("Cache-Control", "no-store");
            exchange.getResponseHeaders().set("Content-Security-Policy", CONTENT_POLICY);
            exchange.getResponseHeaders().set("X-Content-Type-Options", "nosniff");
            reply(exchange, 200, "text/html; charset=utf-8", page, method);
        }
    }

    /** The mount point itself, with or without a trailing slash. */
    static boolean isPage(String mount, String path) {
        String base = mount.endsWith("/") ? mount.substring(0, mount.length() - 1) : mount;
        return path != null && (path.equals(base) || path.equals(base + "/"));
    }

    private static void reply(HttpExchange exchange, int status, String contentType, String body, String method)
            throws IOException {
        exchange.getResponseHeaders().set("Content-Type", contentType);
        if ("HEAD".equals(method)) {
            exchange.sendResponseHeaders(status, -1);
            return;
        }
        byte[] bytes = body.getBytes(StandardCharsets.UTF_8);
        exchange.sendResponseHeaders(status, bytes.length);
        try (OutputStream out = exchange.getResponseBody()) {
            out.write(bytes);
        }
    }
}
