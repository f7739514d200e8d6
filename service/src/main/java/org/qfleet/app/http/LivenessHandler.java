package org.qfleet.app.http;

import com.sun.net.httpserver.HttpExchange;
import com.sun.net.httpserver.HttpHandler;
import java.io.IOException;

/** {@code /health/live}: 200 as long as the process runs and serves HTTP. */
public final class LivenessHandler implements HttpHandler {

    public static final String PATH = "/health/live";

    @Override
    public void handle(HttpExchange exchange) throws IOException {
        if (!TextResponse.refused(exchange, PATH)) {
            TextResponse.send(exchange, 200, TextResponse.PLAIN, "live\n");
        }
    }
}
