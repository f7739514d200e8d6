package org.qfleet.app.http;

import com.sun.net.httpserver.HttpExchange;
import com.sun.net.httpserver.HttpHandler;
import java.io.IOException;
import java.util.function.Supplier;

/** {@code /health/ready}: 200 while the service processes its input, else 503 with its state in one line. */
public final class ReadinessHandler implements HttpHandler {

    public static final String PATH = "/health/ready";

    private final Supplier<Readiness> readiness;

    public ReadinessHandler(Supplier<Readiness> readiness) {
        this.readiness = readiness;
    }

    @Override
    public void handle(HttpExchange exchange) throws IOException {
        if (TextResponse.refused(exchange, PATH)) {
            return;
        }
        Readiness now = readiness.get();
        TextResponse.send(exchange, now.ready() ? 200 : 503, TextResponse.PLAIN,
                (now.ready() ? "ready: " : "not ready: ") + now.state() + "\n");
    }
}
