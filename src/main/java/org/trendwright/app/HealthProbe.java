package org.trendwright.app;

import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.time.Duration;

/**
 * A container health check without curl: exits 0 when GET /health answers 200 within two
 * seconds, 1 otherwise. The URL is the first argument, else http://127.0.0.1:$TRENDWRIGHT_PORT/health
 * (port 7070 by default). Used by the Dockerfile's HEALTHCHECK.
 */
public final class HealthProbe {

    private HealthProbe() {
    }

    public static void main(String[] args) {
        String port = System.getenv().getOrDefault("TRENDWRIGHT_PORT", "7070");
        String url = args.length > 0 ? args[0] : "http://127.0.0.1:" + port + "/health";
        try {
            HttpResponse<Void> response = HttpClient.newBuilder().connectTimeout(Duration.ofSeconds(2)).build()
                    .send(HttpRequest.newBuilder(URI.create(url)).timeout(Duration.ofSeconds(2)).build(),
                            HttpResponse.BodyHandlers.discarding());
            System.exit(response.statusCode() == 200 ? 0 : 1);
        } catch (Exception e) {
            System.err.println("health check of " + url + " failed: " + e.getMessage());
            System.exit(1);
        }
    }
}
