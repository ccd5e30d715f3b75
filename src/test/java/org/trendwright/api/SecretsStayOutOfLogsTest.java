package org.trendwright.api;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import ch.qos.logback.classic.Level;
import ch.qos.logback.classic.Logger;
import ch.qos.logback.classic.LoggerContext;
import ch.qos.logback.classic.spi.ILoggingEvent;
import ch.qos.logback.classic.spi.ThrowableProxyUtil;
import ch.qos.logback.core.read.ListAppender;
import io.restassured.RestAssured;
import io.restassured.http.ContentType;
import io.restassured.response.Response;
import io.restassured.specification.RequestSpecification;
import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.time.Clock;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.slf4j.LoggerFactory;
import org.trendwright.app.Settings;
import org.trendwright.app.TrendwrightApp;
import org.trendwright.store.Database;
import org.trendwright.team.TeamSettings;
import org.trendwright.testing.FreshStore;
import org.trendwright.testing.RunningServer;
import org.trendwright.testing.TeamAccess;

/**
 * Setup, sign-in, token creation, brief publication and reading with the log at the server's own
 * level (INFO; libraries at WARN): no password, setup code, session id, CSRF token, API token or
 * brief link may appear in any log line (OWASP Logging Cheat Sheet: never log secrets). The
 * generated setup code is shown on the console only, once.
 */
class SecretsStayOutOfLogsTest {

    @Test
    void no_secret_reaches_the_log() throws Exception {
        LoggerContext context = (LoggerContext) LoggerFactory.getILoggerFactory();
        Logger root = context.getLogger(org.slf4j.Logger.ROOT_LOGGER_NAME);
        Level level = root.getLevel();
        ListAppender<ILoggingEvent> captured = new ListAppender<>();
        captured.setContext(context);
        captured.start();
        root.addAppender(captured);
        root.setLevel(Level.INFO);
        PrintStream console = System.out;
        ByteArrayOutputStream printed = new ByteArrayOutputStream();
        List<String> secrets = new ArrayList<>();
        TeamSettings generated = TeamAccess.testSettings().withSetupCode(null);
        try (FreshStore store = FreshStore.create(FreshStore.Kind.SQLITE); Database database = store.open()) {
            System.setOut(new PrintStream(printed, true, StandardCharsets.UTF_8));
            TrendwrightApp app;
            try {
                app = TrendwrightApp.start(RunningServer.testSettings(), generated, database, Clock.systemUTC());
            } finally {
                System.setOut(console);
            }
            try (app) {
                String code = setupCode(printed.toString(StandardCharsets.UTF_8));
                secrets.add(code);
                exercise(app.port(), code, secrets);
            }
        } finally {
            root.detachAppender(captured);
            root.setLevel(level);
        }
        StringBuilder log = new StringBuilder();
        for (ILoggingEvent event : captured.list) {
            log.append(event.getFormattedMessage()).append('\n');
            if (event.getThrowableProxy() != null) {
                log.append(ThrowableProxyUtil.asString(event.getThrowableProxy())).append('\n');
            }
        }
        assertTrue(log.toString().contains("/api/session"), "the requests were logged: " + log);
        for (String secret : secrets) {
            assertFalse(log.toString().contains(secret), "a secret reached the log: " + secret);
        }
    }

    private static String setupCode(String console) {
        Matcher m = Pattern.compile("enter the setup code (\\S+) to create").matcher(console);
        assertTrue(m.find(), console);
        return m.group(1);
    }

    private static void exercise(int port, String code, List<String> secrets) {
        String password = "a-long-admin-passphrase";
        secrets.add(password);
        RestAssured.given().port(port).contentType(ContentType.JSON).body("{\"setupCode\": \"wrong-code\","
                + " \"username\": \"root\", \"password\": \"" + password + "\"}").post("/api/setup").then().statusCode(403);
        RestAssured.given().port(port).contentType(ContentType.JSON).body("{\"setupCode\": \"" + code
                + "\", \"username\": \"root\", \"password\": \"" + password + "\"}").post("/api/setup").then()
                .statusCode(200);
        RestAssured.given().port(port).contentType(ContentType.JSON).body("{\"username\": \"root\", \"password\":"
                + " \"wrong-passphrase-9\"}").post("/api/session").then().statusCode(401);
        secrets.add("wrong-passphrase-9");
        Response session = RestAssured.given().port(port).contentType(ContentType.JSON)
                .body("{\"username\": \"root\", \"password\": \"" + password + "\"}").post("/api/session");
        String cookie = session.getCookie("tw_session");
        String csrf = session.path("csrfToken");
        secrets.add(cookie);
        secrets.add(csrf);
        String token = TeamAccess.token(port, cookie, csrf, "read-write");
        secrets.add(token);
        RequestSpecification admin = RestAssured.given().port(port).auth().oauth2(token);
        admin.contentType("text/csv").body("period,value\n2024-Q1,1\n2024-Q2,2\n2024-Q3,4\n2024-Q4,5\n")
                .post("/api/series?name=a").then().statusCode(201);
        String brief = RestAssured.given().port(port).auth().oauth2(token).contentType(ContentType.JSON)
                .body("{\"version\": 1, \"model\": {\"family\": \"trend\"}, \"horizon\": 2}").post("/api/series/1/briefs")
                .then().statusCode(201).extract().path("token");
        secrets.add(brief);
        assertEquals(200, RestAssured.given().port(port).get("/api/public/briefs/" + brief).statusCode());
        RestAssured.given().port(port).cookie("tw_session", cookie).header("X-CSRF-Token", csrf).delete("/api/session")
                .then().statusCode(204);
    }

    @Test
    void the_setup_code_is_not_announced_once_a_member_exists() {
        ByteArrayOutputStream printed = new ByteArrayOutputStream();
        try (RunningServer server = RunningServer.start(FreshStore.Kind.SQLITE)) {
            PrintStream console = System.out;
            System.setOut(new PrintStream(printed, true, StandardCharsets.UTF_8));
            try {
                server.restart();
            } finally {
                System.setOut(console);
            }
        }
        assertFalse(printed.toString(StandardCharsets.UTF_8).contains("setup code"));
    }
}
