package org.trendwright.series;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.doubles;
import static org.quicktheories.generators.SourceDSL.integers;
import static org.quicktheories.generators.SourceDSL.lists;

import java.nio.charset.StandardCharsets;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Round trips through the CSV intake: any quarterly series written in any accepted quarter form,
 * with any of the three delimiters, with or without header and byte-order mark, reads back as
 * exactly the periods and values written (values written by Double.toString, which parses back
 * to the same double).
 */
class CsvIntakeProperties {

    private static final String[] DELIMITERS = {",", ";", "\t"};

    private static String quarter(int index, int form) {
        int year = 1990 + index / 4;
        int q = index % 4 + 1;
        return switch (form) {
            case 0 -> year + "-Q" + q;
            case 1 -> year + "Q" + q;
            case 2 -> "Q" + q + " " + year;
            default -> year + "-" + new String[] {"03-31", "06-30", "09-30", "12-31"}[q - 1];
        };
    }

    @Test
    void any_quarterly_series_reads_back_exactly_in_any_layout() {
        qt().withExamples(300)
                .forAll(lists().of(doubles().between(-1e12, 1e12)).ofSizeBetween(2, 60), integers().between(0, 3),
                        integers().between(0, 2), integers().between(0, 3))
                .checkAssert((values, form, delimiter, flags) -> {
                    boolean header = (flags & 1) == 1;
                    boolean bom = (flags & 2) == 2;
                    String d = DELIMITERS[delimiter];
                    StringBuilder csv = new StringBuilder(bom ? "\uFEFF" : "").append(header ? "period" + d + "Sales\n" : "");
                    for (int i = 0; i < values.size(); i++) {
                        csv.append(quarter(i, form)).append(d).append(values.get(i)).append('\n');
                    }
                    IntakeOptions options = new IntakeOptions(MissingValues.REFUSE, IntakeLimits.DEFAULT, null, "Sales");
                    List<SeriesInput> read = CsvIntake.read(csv.toString().getBytes(StandardCharsets.UTF_8), options);
                    SeriesDraft draft = SeriesAssembly.create(read.get(0), options);
                    assertEquals("Sales", draft.name());
                    assertEquals(Frequency.QUARTERLY, draft.frequency());
                    assertEquals(values.size(), draft.points().size());
                    for (int i = 0; i < values.size(); i++) {
                        assertEquals(new Point(Period.quarter(1990 + i / 4, i % 4 + 1), values.get(i)), draft.points().get(i));
                    }
                });
    }
}
