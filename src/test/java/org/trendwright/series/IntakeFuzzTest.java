package org.trendwright.series;

import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.arbitrary;
import static org.quicktheories.generators.SourceDSL.integers;
import static org.quicktheories.generators.SourceDSL.lists;
import static org.quicktheories.generators.SourceDSL.strings;

import java.nio.charset.StandardCharsets;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.quicktheories.core.Gen;

/**
 * Property-based fuzzing of the CSV and period parsers: for arbitrary bytes, arbitrary text and
 * text built from the pieces of real uploads (period forms, numbers, delimiters, quotes, line
 * breaks), the parsers either answer or refuse with {@link IntakeException}, the one error the
 * series package documents for a refused upload; nothing else ever escapes (no
 * NumberFormatException, DateTimeException, IndexOutOfBoundsException, IllegalStateException ...).
 */
class IntakeFuzzTest {

    private static final IntakeOptions STRICT = IntakeOptions.defaults(IntakeLimits.DEFAULT);
    private static final IntakeOptions GAPS = new IntakeOptions(MissingValues.GAP, IntakeLimits.DEFAULT, null, null);

    /** Fragments of real uploads, so the fuzzer reaches past the first refusal into layout and periods. */
    private static final List<String> PIECES = List.of("period", "value", "series", "2024", "2023", "-Q", "Q", "1",
            "4", "5", "-", "W", "53", "/", "03", "12", "13", "31", "29", "-02-", ",", ";", "\t", "\"", "\n", "\r\n",
            " ", "1.5", "-0", "1e309", "NaN", "Infinity", "", "\uFEFF", "é", "x");

    private static Gen<String> uploadLike() {
        return lists().of(arbitrary().pick(PIECES)).ofSizeBetween(0, 80).map(parts -> String.join("", parts));
    }

    private static Gen<byte[]> anyBytes() {
        return lists().of(integers().between(0, 255)).ofSizeBetween(0, 200).map(list -> {
            byte[] bytes = new byte[list.size()];
            for (int i = 0; i < bytes.length; i++) {
                bytes[i] = (byte) (int) list.get(i);
            }
            return bytes;
        });
    }

    /** Reads the CSV and assembles every series as the upload route does; true when it was accepted. */
    private static boolean readsOrRefuses(byte[] body, IntakeOptions options) {
        try {
            for (SeriesInput input : CsvIntake.read(body, options)) {
                SeriesAssembly.create(input, options);
            }
            return true;
        } catch (IntakeException refused) {
            return !refused.getMessage().isBlank();
        }
    }

    @Test
    void csv_intake_of_arbitrary_bytes_only_ever_refuses_with_an_intake_exception() {
        qt().withExamples(2000).forAll(anyBytes()).check(bytes -> readsOrRefuses(bytes, STRICT));
    }

    @Test
    void csv_intake_of_arbitrary_text_only_ever_refuses_with_an_intake_exception() {
        qt().withExamples(2000).forAll(strings().allPossible().ofLengthBetween(0, 120))
                .check(text -> readsOrRefuses(text.getBytes(StandardCharsets.UTF_8), GAPS));
    }

    @Test
    void csv_intake_of_upload_like_text_only_ever_refuses_with_an_intake_exception() {
        qt().withExamples(5000).forAll(uploadLike(), arbitrary().pick(List.of(STRICT, GAPS)))
                .check((text, options) -> readsOrRefuses(text.getBytes(StandardCharsets.UTF_8), options));
    }

    @Test
    void the_period_parser_never_throws_for_any_text() {
        qt().withExamples(5000).forAll(uploadLike()).check(text -> PeriodParser.parse(text) != null);
        qt().withExamples(2000).forAll(strings().allPossible().ofLengthBetween(0, 40))
                .check(text -> PeriodParser.parse(text) != null);
    }

    @Test
    void a_period_column_resolves_or_refuses_with_an_intake_exception() {
        Gen<List<String>> columns = lists().of(uploadLike().map(s -> s.length() > 12 ? s.substring(0, 12) : s))
                .ofSizeBetween(0, 12);
        qt().withExamples(3000).forAll(columns).check(texts -> {
            List<PeriodColumn.Cell> cells = texts.stream().map(t -> new PeriodColumn.Cell(t, Where.NOWHERE)).toList();
            try {
                return PeriodColumn.resolve(cells).size() == cells.size();
            } catch (IntakeException refused) {
                return true;
            }
        });
    }
}
