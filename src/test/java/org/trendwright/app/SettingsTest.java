package org.trendwright.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.Map;
import org.junit.jupiter.api.Test;

/** Settings from flags and TRENDWRIGHT_* variables; the defaults the issue asks for. */
class SettingsTest {

    @Test
    void defaults_are_local_port_7070_an_embedded_sqlite_file_and_the_issues_limits() {
        Settings settings = Settings.defaults();
        assertEquals("127.0.0.1", settings.host());
        assertEquals(7070, settings.port());
        assertEquals("jdbc:sqlite:" + Path.of("trendwright-data", "trendwright.db").toAbsolutePath(),
                settings.jdbcUrl());
        assertEquals(10L * 1024 * 1024, settings.maxBodyBytes());
        assertEquals(100_000, settings.maxObservationsPerSeries());
        assertEquals(1_000, settings.maxSeriesPerUpload());
        assertTrue(settings.loadDemoData());
        assertTrue(settings.usesEmbeddedStore());
    }

    @Test
    void a_flag_wins_over_the_environment_which_wins_over_the_default() {
        Map<String, String> env = Map.of("TRENDWRIGHT_PORT", "8080", "TRENDWRIGHT_HOST", "0.0.0.0",
                "TRENDWRIGHT_DATABASE_URL", "jdbc:postgresql://db/tw", "TRENDWRIGHT_DEMO_DATA", "false");
        Settings fromEnv = Settings.from(new String[0], env);
        assertEquals(8080, fromEnv.port());
        assertEquals("0.0.0.0", fromEnv.host());
        assertEquals("jdbc:postgresql://db/tw", fromEnv.jdbcUrl());
        assertFalse(fromEnv.loadDemoData());
        Settings flagged = Settings.from(new String[] {"--port=9090", "--max-observations=50", "--demo-data=on"}, env);
        assertEquals(9090, flagged.port());
        assertEquals(50, flagged.maxObservationsPerSeries());
        assertTrue(flagged.loadDemoData());
        assertFalse(Settings.from(new String[] {"--no-demo-data"}, Map.of()).loadDemoData());
    }

    @Test
    void refuses_unknown_flags_and_unreadable_values_but_ignores_unknown_variables() {
        assertThrows(IllegalArgumentException.class, () -> Settings.from(new String[] {"--prot=1"}, Map.of()));
        assertThrows(IllegalArgumentException.class, () -> Settings.from(new String[] {"verbose"}, Map.of()));
        IllegalArgumentException bad = assertThrows(IllegalArgumentException.class,
                () -> Settings.from(new String[0], Map.of("TRENDWRIGHT_PORT", "seventy")));
        assertTrue(bad.getMessage().contains("TRENDWRIGHT_PORT"), bad.getMessage());
        assertEquals(7070, Settings.from(new String[0], Map.of("TRENDWRIGHT_SOMETHING_ELSE", "x")).port());
    }
}
