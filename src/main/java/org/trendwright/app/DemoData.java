package org.trendwright.app;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;
import org.trendwright.series.CsvIntake;
import org.trendwright.series.IntakeLimits;
import org.trendwright.series.IntakeOptions;
import org.trendwright.series.SeriesAssembly;
import org.trendwright.series.SeriesDraft;
import org.trendwright.store.SeriesRepository;

/**
 * Loads the demo series (demo-data/ in the repository, packaged into the jar) into an empty store,
 * through the same CSV intake as an upload, in one transaction. The files are listed in
 * demo-data/manifest.txt.
 */
final class DemoData {

    private static final Logger LOG = LoggerFactory.getLogger(DemoData.class);
    private static final String FOLDER = "/demo-data/";

    private DemoData() {
    }

    static void loadIfEmpty(SeriesRepository repository, IntakeLimits limits) {
        if (!repository.isEmpty()) {
            return;
        }
        List<SeriesDraft> drafts = new ArrayList<>();
        for (String file : read("manifest.txt").lines().map(String::trim).filter(l -> !l.isEmpty()).toList()) {
            byte[] csv = read(file).getBytes(StandardCharsets.UTF_8);
            IntakeOptions options = IntakeOptions.defaults(limits);
            CsvIntake.read(csv, options).forEach(in -> drafts.add(SeriesAssembly.create(in, options)));
        }
        repository.createAll(drafts);
        LOG.info("event=demo-data-loaded series={}", drafts.size());
    }

    private static String read(String name) {
        try (InputStream in = DemoData.class.getResourceAsStream(FOLDER + name)) {
            if (in == null) {
                throw new IllegalStateException("Demo data file " + name + " is missing from the class path.");
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
