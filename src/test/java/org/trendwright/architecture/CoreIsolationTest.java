package org.trendwright.architecture;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * Keeps the dependency rule of the folder tree: the statistics core imports only the JDK, Commons
 * Math and itself, so the service layers depend on it and never the other way round.
 */
class CoreIsolationTest {

    private static final Path CORE = Path.of("src/main/java/org/trendwright/core");

    @Test
    void the_statistics_core_imports_only_the_jdk_commons_math_and_itself() throws IOException {
        List<String> offending = new ArrayList<>();
        try (Stream<Path> files = Files.walk(CORE)) {
            for (Path file : files.filter(f -> f.toString().endsWith(".java")).toList()) {
                for (String line : Files.readAllLines(file)) {
                    String trimmed = line.trim();
                    if (trimmed.startsWith("import ") && !allowed(trimmed)) {
                        offending.add(CORE.relativize(file) + ": " + trimmed);
                    }
                }
            }
        }
        assertTrue(offending.isEmpty(), "core imports outside its rule: " + offending);
    }

    private static boolean allowed(String importLine) {
        String name = importLine.replace("import static ", "").replace("import ", "");
        return name.startsWith("java.") || name.startsWith("org.apache.commons.math3.")
                || name.startsWith("org.trendwright.core.");
    }
}
