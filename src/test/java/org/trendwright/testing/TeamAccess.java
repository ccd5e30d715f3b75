package org.trendwright.testing;

import io.restassured.RestAssured;
import io.restassured.http.ContentType;
import io.restassured.response.Response;
import java.time.Duration;
import org.trendwright.team.TeamSettings;

/**
 * Signs tests in: creates the first admin through POST /api/setup with a known setup code and
 * gives out an admin read-write API token, so requests made by tests carry
 * {@code Authorization: Bearer <token>}.
 */
public final class TeamAccess {

    /** The setup code test servers are started with. */
    public static final String SETUP_CODE = "test-setup-code-4711";
    public static final String ADMIN = "admin";
    public static final String ADMIN_PASSWORD = "admin-password-1";

    private TeamAccess() {
    }

    /** Sign-in settings for tests: the known setup code, no waits, lock-out after 5 failures. */
    public static TeamSettings testSettings() {
        return new TeamSettings(SETUP_CODE, Duration.ofHours(12), 3, Duration.ZERO, 5, Duration.ofMinutes(15));
    }

    /** Creates the first admin on a fresh server and returns a read-write token of theirs. */
    public static String bootstrap(int port) {
        Response setup = RestAssured.given().port(port).contentType(ContentType.JSON)
                .body("{\"setupCode\": \"" + SETUP_CODE + "\", \"username\": \"" + ADMIN + "\", \"password\": \""
                        + ADMIN_PASSWORD + "\"}").post("/api/setup");
        if (setup.statusCode() != 200) {
            throw new IllegalStateException("Setup answered " + setup.statusCode() + ": " + setup.asString());
        }
        return token(port, setup.getCookie("tw_session"), setup.path("csrfToken"), "read-write");
    }

    /** A new token of the member signed in with {@code cookie}. */
    public static String token(int port, String cookie, String csrf, String scope) {
        return RestAssured.given().port(port).cookie("tw_session", cookie).header("X-CSRF-Token", csrf)
                .contentType(ContentType.JSON).body("{\"name\": \"tests\", \"scope\": \"" + scope + "\"}")
                .post("/api/tokens").then().statusCode(201).extract().path("token");
    }
}
