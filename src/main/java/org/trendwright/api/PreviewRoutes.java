package org.trendwright.api;

import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.trendwright.series.IntakeException;
import org.trendwright.series.IntakeOptions;
import org.trendwright.series.MissingValues;
import org.trendwright.series.SeriesAssembly;
import org.trendwright.series.SeriesDraft;
import org.trendwright.series.SeriesInput;

/**
 * The dry run of an upload: {@code POST /api/series/preview} reads the body exactly as
 * {@code POST /api/series} would and answers with the parsed series, their frequency and every
 * problem found, storing nothing. Intake stops at its first problem, so for a CSV body the preview
 * leaves out the offending line and reads again, up to {@value #MAX_PROBLEMS} times: each problem
 * that sits on a data line is reported with its line in the upload, then the rest of the file is
 * still checked (those later readings treat missing periods as gaps, since leaving a line out
 * makes its period missing). Thread-safe.
 */
final class PreviewRoutes {

    /** Problems reported at most; a file with more is usually in the wrong layout altogether. */
    static final int MAX_PROBLEMS = 50;

    private final Uploads uploads;

    PreviewRoutes(Uploads uploads) {
        this.uploads = uploads;
    }

    void register(RoutesConfig routes) {
        routes.post("/api/series/preview", this::preview);
    }

    /** One problem: where it sits (line and column of the CSV, or JSON field) and what is wrong. */
    record PreviewProblem(Integer line, Integer column, String field, String reason, String detail) {
    }

    /** One parsed series. */
    record PreviewSeries(String name, String frequency, int periodsPerYear, int observationCount,
                         List<SeriesBodies.Observation> observations) {
    }

    /** The answer: what would be stored if the upload had no problems, and every problem found. */
    record Preview(boolean acceptable, List<PreviewSeries> series, List<PreviewProblem> problems) {
    }

    private void preview(Context ctx) {
        IntakeOptions options = uploads.options(ctx);
        List<PreviewProblem> problems = new ArrayList<>();
        if (!isCsv(ctx)) {
            ctx.json(attempt(() -> parse(uploads.readMany(ctx), options), problems, null));
            return;
        }
        List<String> lines = new ArrayList<>(List.of(
                new String(ctx.bodyAsBytes(), StandardCharsets.UTF_8).split("\n", -1)));
        // originalLines.get(i) is the line number in the upload of what is now line i + 1.
        List<Integer> originalLines = new ArrayList<>();
        for (int i = 1; i <= lines.size(); i++) {
            originalLines.add(i);
        }
        Preview answer = attempt(() -> parse(uploads.readCsv(join(lines), options), options), problems, originalLines);
        // A left-out line leaves its period missing; later readings take that as a gap, not as a problem.
        IntakeOptions gaps = new IntakeOptions(MissingValues.GAP, options.limits(), options.delimiter(), options.name());
        while (!answer.acceptable() && canRetry(problems, originalLines)) {
            int index = originalLines.indexOf(problems.get(problems.size() - 1).line());
            lines.remove(index);
            originalLines.remove(index);
            answer = attempt(() -> parse(uploads.readCsv(join(lines), gaps), gaps), problems, originalLines);
        }
        ctx.json(answer);
    }

    /**
     * True when the last problem sits on a data line still present (the header line, line 1 of
     * what is left, is never removed) and the limit is not reached.
     */
    private static boolean canRetry(List<PreviewProblem> problems, List<Integer> originalLines) {
        PreviewProblem last = problems.get(problems.size() - 1);
        int index = last.line() == null ? -1 : originalLines.indexOf(last.line());
        return problems.size() < MAX_PROBLEMS && index > 0;
    }

    /**
     * Parses once; a problem is added with its line mapped back to the upload's numbering
     * ({@code originalLines} null: no mapping). The detail is intake's message without its
     * "line, column" prefix, which counts lines of the text as read (lines may have been left out).
     */
    private static Preview attempt(java.util.function.Supplier<List<PreviewSeries>> parse,
                                   List<PreviewProblem> problems, List<Integer> originalLines) {
        try {
            List<PreviewSeries> series = parse.get();
            return new Preview(problems.isEmpty(), series, List.copyOf(problems));
        } catch (IntakeException e) {
            Integer line = e.where().line();
            Integer mapped = line == null || originalLines == null || line < 1 || line > originalLines.size() ? line
                    : originalLines.get(line - 1);
            problems.add(new PreviewProblem(mapped, e.where().column(), e.where().field(),
                    e.reason().name().toLowerCase(Locale.ROOT).replace('_', '-'), withoutPlace(e)));
            return new Preview(false, List.of(), List.copyOf(problems));
        }
    }

    private static String withoutPlace(IntakeException e) {
        String prefix = e.where().describe() + ": ";
        String message = e.getMessage();
        return !e.where().describe().isEmpty() && message.startsWith(prefix) ? message.substring(prefix.length())
                : message;
    }

    private static List<PreviewSeries> parse(List<SeriesInput> inputs, IntakeOptions options) {
        return inputs.stream().map(in -> SeriesAssembly.create(in, options)).map(PreviewRoutes::series).toList();
    }

    private static PreviewSeries series(SeriesDraft draft) {
        List<SeriesBodies.Observation> observations = draft.points().stream()
                .map(p -> new SeriesBodies.Observation(p.period().label(), p.value())).toList();
        return new PreviewSeries(draft.name(), draft.frequency().jsonName(), draft.frequency().periodsPerYear(),
                observations.size(), observations);
    }

    private static byte[] join(List<String> lines) {
        return String.join("\n", lines).getBytes(StandardCharsets.UTF_8);
    }

    private static boolean isCsv(Context ctx) {
        String type = ctx.contentType() == null ? "" : ctx.contentType().toLowerCase(Locale.ROOT);
        return type.startsWith("text/") || type.startsWith("application/csv");
    }
}
