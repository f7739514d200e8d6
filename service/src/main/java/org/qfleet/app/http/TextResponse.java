package org.qfleet.app.http;

import com.sun.net.httpserver.HttpExchange;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;

/** Sends a short text answer, and answers what a read-only endpoint cannot serve. */
final class TextResponse {

    static final String PLAIN = "text/plain; charset=utf-8";

    private TextResponse() {
    }

    /** Sends {@code body} with {@code status}; a HEAD request gets the headers only. */
    static void send(HttpExchange exchange, int status, String contentType, String body) throws IOException {
        byte[] bytes = body.getBytes(StandardCharsets.UTF_8);
        exchange.getResponseHeaders().set("Content-Type", contentType);
        exchange.getResponseHeaders().set("Cache-Control", "no-store");
        boolean head = "HEAD".equals(exchange.getRequestMethod());
        exchange.sendResponseHeaders(status, head ? -1 : bytes.length);
        if (!head) {
            try (OutputStream out = exchange.getResponseBody()) {
                out.write(bytes);
            }
        }
        exchange.close();
    }

    /**
     * Answers a request that is not a GET or HEAD of exactly {@code path} (405 or 404) and returns
     * true; returns false when the request is one to serve.
     */
    static boolean refused(HttpExchange exchange, String path) throws IOException {
        String method = exchange.getRequestMethod();
        if (!exchange.getRequestURI().getPath().equals(path)) {
            send(exchange, 404, PLAIN, "not found: " + exchange.getRequestURI().getPath() + "\n");
            return true;
        }
        if (!"GET".equals(method) && !"HEAD".equals(method)) {
            exchange.getResponseHeaders().set("Allow", "GET, HEAD");
            send(exchange, 405, PLAIN, "only GET and HEAD are served here\n");
            return true;
        }
        return false;
    }
}
