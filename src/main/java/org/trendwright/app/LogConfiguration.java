package org.trendwright.app;

import ch.qos.logback.classic.Level;
import ch.qos.logback.classic.LoggerContext;
import ch.qos.logback.classic.encoder.PatternLayoutEncoder;
import ch.qos.logback.classic.spi.Configurator;
import ch.qos.logback.classic.spi.ILoggingEvent;
import ch.qos.logback.core.ConsoleAppender;
import ch.qos.logback.core.spi.ContextAwareBase;
import org.slf4j.Logger;

/**
 * The server's logging, set up in code (found by Logback through META-INF/services) because
 * parsing an XML configuration costs a noticeable part of the start-up time. One line per event on
 * standard output:
 * <pre>
 *   time=2025-01-31T09:15:00.123Z level=INFO logger=requests method=GET path=/health ... ms=0.84
 * </pre>
 * Jetty, Javalin, HikariCP and Flyway log warnings only. An operator's own file
 * ({@code -Dlogback.configurationFile=...}) or a {@code logback-test.xml} on the class path (the
 * tests') takes precedence: this configurator then steps aside.
 */
public final class LogConfiguration extends ContextAwareBase implements Configurator {

    static final String PATTERN = "time=%d{yyyy-MM-dd'T'HH:mm:ss.SSSXXX,UTC} level=%level logger=%logger{0} %msg%n%ex";

    @Override
    public ExecutionStatus configure(LoggerContext context) {
        if (System.getProperty("logback.configurationFile") != null
                || LogConfiguration.class.getResource("/logback-test.xml") != null) {
            return ExecutionStatus.INVOKE_NEXT_IF_ANY;
        }
        PatternLayoutEncoder encoder = new PatternLayoutEncoder();
        encoder.setContext(context);
        encoder.setPattern(PATTERN);
        encoder.start();
        ConsoleAppender<ILoggingEvent> console = new ConsoleAppender<>();
        console.setContext(context);
        console.setName("STDOUT");
        console.setEncoder(encoder);
        console.start();
        ch.qos.logback.classic.Logger root = context.getLogger(Logger.ROOT_LOGGER_NAME);
        root.setLevel(Level.INFO);
        root.addAppender(console);
        for (String quiet : new String[] {"org.eclipse.jetty", "io.javalin", "com.zaxxer.hikari", "org.flywaydb"}) {
            context.getLogger(quiet).setLevel(Level.WARN);
        }
        return ExecutionStatus.DO_NOT_INVOKE_NEXT_IF_ANY;
    }
}
