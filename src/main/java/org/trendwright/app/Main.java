package org.trendwright.app;

import java.time.Clock;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/** Starts the server with settings from flags and TRENDWRIGHT_* variables; stops it on SIGTERM/Ctrl-C. */
public final class Main {

    private static final Logger LOG = LoggerFactory.getLogger(Main.class);

    private Main() {
    }

    public static void main(String[] args) {
        Settings settings;
        try {
            settings = Settings.from(args, System.getenv());
        } catch (IllegalArgumentException e) {
            System.err.println(e.getMessage());
            System.exit(2);
            return;
        }
        LOG.info("event=starting jvmUptimeMs={}", TrendwrightApp.uptimeMs());
        try {
            TrendwrightApp app = TrendwrightApp.start(settings, Clock.systemUTC());
            Runtime.getRuntime().addShutdownHook(new Thread(app::close, "trendwright-shutdown"));
        } catch (RuntimeException e) {
            LOG.error("event=start-failed reason=\"{}\"", e.getMessage(), e);
            System.exit(1);
        }
    }
}
