package org.trendwright.robustness;

import java.io.IOException;
import java.io.Reader;
import java.io.UncheckedIOException;
import java.net.URISyntaxException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.Properties;
import java.util.stream.Stream;

/**
 * One malformed request of the corpus under src/test/resources/bad-input/: a folder holding
 * request.properties (method, path, contentType, the expected status and a fragment of the expected
 * problem detail) and either a file named body or a descriptor of a large body to generate
 * (repeat.prefix + repeat.unit x repeat.count + repeat.suffix, where {i} in the unit becomes the
 * index, or with repeat.index=day the index-th day after 1700-01-01), so megabytes need not be
 * committed.
 */
record BadInputCase(String name, String method, String path, String contentType, int status, String message,
                    Path folder, Properties properties) {

    static Stream<BadInputCase> all() {
        try {
            Path root = Path.of(BadInputCase.class.getResource("/bad-input").toURI());
            try (Stream<Path> folders = Files.list(root)) {
                return folders.filter(Files::isDirectory).sorted().map(BadInputCase::read).toList().stream();
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        } catch (URISyntaxException e) {
            throw new IllegalStateException(e);
        }
    }

    private static BadInputCase read(Path folder) {
        Properties p = new Properties();
        try (Reader in = Files.newBufferedReader(folder.resolve("request.properties"), StandardCharsets.UTF_8)) {
            p.load(in);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return new BadInputCase(folder.getFileName().toString(), p.getProperty("method"), p.getProperty("path"),
                p.getProperty("contentType"), Integer.parseInt(p.getProperty("status")), p.getProperty("message"),
                folder, p);
    }

    /** The body bytes, read or generated; null when the request has none. */
    byte[] body() {
        Path file = folder.resolve("body");
        try {
            if (Files.exists(file)) {
                return Files.readAllBytes(file);
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return properties.getProperty("repeat.unit") == null ? null : generated();
    }

    private byte[] generated() {
        String unit = properties.getProperty("repeat.unit");
        int count = Integer.parseInt(properties.getProperty("repeat.count"));
        boolean days = "day".equals(properties.getProperty("repeat.index"));
        StringBuilder text = new StringBuilder(properties.getProperty("repeat.prefix"));
        LocalDate start = LocalDate.of(1700, 1, 1);
        for (int i = 0; i < count; i++) {
            text.append(unit.contains("{i}")
                    ? unit.replace("{i}", days ? start.plusDays(i).toString() : Integer.toString(i)) : unit);
        }
        return text.append(properties.getProperty("repeat.suffix")).toString().getBytes(StandardCharsets.UTF_8);
    }

    @Override
    public String toString() {
        return name;
    }
}
