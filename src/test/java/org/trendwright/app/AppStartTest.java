package org.trendwright.app;

import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.hasSize;

import io.restassured.RestAssured;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Duration;
import java.util.Comparator;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.trendwright.testing.TeamAccess;

/**
 * The server as Main starts it: its own SQLite file created in the data directory on first start,
 * the demo series loaded into the empty store once, and not when the flag turns them off.
 */
class AppStartTest {

    private Path dataDirectory;
    private String token;

    @BeforeEach
    void createFolder() throws IOException {
        dataDirectory = Files.createTempDirectory("trendwright-start-").resolve("data");
    }

    @AfterEach
    void removeFolder() throws IOException {
        try (Stream<Path> files = Files.walk(dataDirectory.getParent())) {
            for (Path p : files.sorted(Comparator.reverseOrder()).toList()) {
                Files.delete(p);
            }
        }
    }

    private TrendwrightApp start(boolean demo) {
        Settings settings = new Settings("127.0.0.1", 0, dataDirectory, null, null, 2, 1 << 20, 1000, 10, demo,
                Duration.ZERO);
        TrendwrightApp app = TrendwrightApp.start(settings, TeamAccess.testSettings(), Clock.systemUTC());
        if (token == null) {
            token = TeamAccess.bootstrap(app.port());
        }
        return app;
    }

    @Test
    void loads_the_demo_series_into_an_empty_store_once() {
        for (int run = 0; run < 2; run++) {
            try (TrendwrightApp app = start(true)) {
                RestAssured.given().port(app.port()).auth().oauth2(token).get("/api/series").then().statusCode(200)
                        .body("series", hasSize(6))
                        .body("series.name", equalTo(List.of("Kettles", "Garden furniture", "Enamel mugs",
                                "Smart plugs", "Water filters", "Tea towels")))
                        .body("series.observations", equalTo(List.of(48, 48, 48, 48, 48, 48)));
            }
        }
        org.junit.jupiter.api.Assertions.assertTrue(Files.exists(dataDirectory.resolve("trendwright.db")));
    }

    @Test
    void starts_empty_when_demo_data_is_turned_off() {
        try (TrendwrightApp app = start(false)) {
            RestAssured.given().port(app.port()).auth().oauth2(token).get("/api/series").then().body("series", hasSize(0));
        }
    }
}
