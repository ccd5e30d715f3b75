package org.trendwright.api;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonMappingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import io.javalin.http.Context;
import io.javalin.http.UploadedFile;
import org.eclipse.jetty.http.BadMessageException;
import io.javalin.http.ContentTooLargeResponse;
import java.io.FilterInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.util.List;
import java.util.Locale;
import java.util.function.LongConsumer;
import java.util.stream.Collectors;
import org.trendwright.series.CsvIntake;
import org.trendwright.series.Delimiters;
import org.trendwright.series.IntakeLimits;
import org.trendwright.series.IntakeOptions;
import org.trendwright.series.JsonIntake;
import org.trendwright.series.MissingValues;
import org.trendwright.series.SeriesInput;

/**
 * Reads the series of an upload by its content type: application/json, text/csv (also
 * text/plain, text/tab-separated-values, application/csv) as the raw body, or multipart/form-data
 * with the CSV file in the part named {@code file}. Query parameters: {@code missing=refuse|gap},
 * {@code delimiter=comma|semicolon|tab}, {@code name} (for a CSV without header, or one with a single series column).
 * A CSV body is parsed as it streams in (see {@link CsvIntake}); the body limit is enforced while
 * reading. Thread-safe.
 */
final class Uploads {

    private final ObjectMapper mapper;
    private final IntakeLimits limits;
    private final long maxBodyBytes;

    Uploads(ObjectMapper mapper, IntakeLimits limits, long maxBodyBytes) {
        this.mapper = mapper;
        this.limits = limits;
        this.maxBodyBytes = maxBodyBytes;
    }

    IntakeOptions options(Context ctx) {
        String missing = ctx.queryParam("missing");
        MissingValues policy = missing == null ? MissingValues.REFUSE : MissingValues.fromName(missing)
                .orElseThrow(() -> new BadRequestException("missing", "missing must be 'refuse' or 'gap', got '"
                        + missing + "'."));
        String delimiterName = ctx.queryParam("delimiter");
        Character delimiter = delimiterName == null ? null : Delimiters.fromName(delimiterName);
        if (delimiterName != null && delimiter == null) {
            throw new BadRequestException("delimiter", "delimiter must be comma, semicolon or tab, got '"
                    + delimiterName + "'.");
        }
        return new IntakeOptions(policy, limits, delimiter, ctx.queryParam("name"));
    }

    /** Every series of a create request. */
    List<SeriesInput> readMany(Context ctx) {
        return readMany(ctx, bytes -> { }, rows -> { });
    }

    /**
     * Every series of a create request; a CSV body (raw or the multipart file) is read as a stream,
     * telling {@code bytesRead} and {@code rowsRead} how far it got.
     */
    List<SeriesInput> readMany(Context ctx, LongConsumer bytesRead, LongConsumer rowsRead) {
        IntakeOptions options = options(ctx);
        return switch (kind(ctx)) {
            case JSON -> JsonIntake.readMany(json(ctx), options);
            case CSV -> readCsv(body(ctx), bytesRead, rowsRead, options);
            case MULTIPART -> readCsv(filePart(ctx), bytesRead, rowsRead, options);
        };
    }

    private List<SeriesInput> readCsv(InputStream body, LongConsumer bytesRead, LongConsumer rowsRead,
                                      IntakeOptions options) {
        LimitedBody limited = new LimitedBody(body, maxBodyBytes, bytesRead);
        try {
            return CsvIntake.read(limited, options, rowsRead);
        } catch (RuntimeException e) {
            drain(body, 2 * maxBodyBytes - limited.count);
            throw e;
        }
    }

    /**
     * Reads and drops up to {@code budget} more bytes of a refused body, so that a client still
     * sending it gets the answer instead of a broken connection; Jetty closes the connection on
     * whatever is left beyond that.
     */
    private static void drain(InputStream body, long budget) {
        byte[] buffer = new byte[8192];
        try {
            for (long left = budget; left > 0; ) {
                int n = body.read(buffer, 0, (int) Math.min(buffer.length, left));
                if (n < 0) {
                    return;
                }
                left -= n;
            }
        } catch (IOException | RuntimeException e) {
            // The client went away or the stream is closed: nothing left to be polite to.
        }
    }

    /**
     * The raw body as a stream. Javalin checks its body limit only when it reads the whole body,
     * so the limit is checked here: at once against Content-Length, and while reading by
     * {@link LimitedBody} (a chunked body has no length).
     */
    private InputStream body(Context ctx) {
        long length = ctx.req().getContentLengthLong();
        if (length > maxBodyBytes) {
            drain(ctx.bodyInputStream(), 2 * maxBodyBytes);
            throw tooLarge();
        }
        return ctx.bodyInputStream();
    }

    private ContentTooLargeResponse tooLarge() {
        return new ContentTooLargeResponse("The request body is larger than the configured limit of " + maxBodyBytes
                + " bytes (setting max-body-bytes); split the upload.");
    }

    /** Counts the bytes read, refuses to read past the limit, and reports read failures as the client's. */
    private final class LimitedBody extends FilterInputStream {
        private final long limit;
        private final LongConsumer bytesRead;
        private long count;

        LimitedBody(InputStream in, long limit, LongConsumer bytesRead) {
            super(in);
            this.limit = limit;
            this.bytesRead = bytesRead;
        }

        @Override
        public int read() throws IOException {
            byte[] one = new byte[1];
            return read(one, 0, 1) < 0 ? -1 : one[0] & 0xff;
        }

        @Override
        public int read(byte[] buffer, int from, int length) {
            int n;
            try {
                n = in.read(buffer, from, length);
            } catch (IOException e) {
                throw new BadRequestException(null, "The request body could not be read: " + e.getMessage());
            }
            if (n > 0) {
                count += n;
                if (count > limit) {
                    throw tooLarge();
                }
                bytesRead.accept(count);
            }
            return n;
        }
    }

    /** Every series of a CSV body (the preview reads a body it has edited). */
    List<SeriesInput> readCsv(byte[] body, IntakeOptions options) {
        return CsvIntake.read(body, options);
    }

    /** The one series of a revision request. */
    SeriesInput readOne(Context ctx) {
        IntakeOptions options = options(ctx);
        List<SeriesInput> inputs = switch (kind(ctx)) {
            case JSON -> List.of(JsonIntake.readOne(json(ctx), "", false));
            case CSV -> readCsv(body(ctx), bytes -> { }, rows -> { }, options);
            case MULTIPART -> readCsv(filePart(ctx), bytes -> { }, rows -> { }, options);
        };
        if (inputs.size() != 1) {
            throw new BadRequestException(422, "invalid-upload", null, "A new version takes one series, but the"
                    + " upload holds " + inputs.size() + ": " + inputs.stream().map(SeriesInput::name)
                    .collect(Collectors.joining(", ")) + ".");
        }
        return inputs.get(0);
    }

    JsonNode json(Context ctx) {
        try {
            // Trailing tokens are refused: a second document after the first would otherwise be ignored.
            return mapper.reader().with(DeserializationFeature.FAIL_ON_TRAILING_TOKENS).readTree(ctx.bodyAsBytes());
        } catch (JsonProcessingException e) {
            throw unreadableJson(e);
        } catch (IOException e) {
            throw new BadRequestException(null, "The request body could not be read: " + e.getMessage());
        }
    }

    /** Reads the body as a record of type {@code type}. */
    <T> T body(Context ctx, Class<T> type) {
        requireJson(ctx);
        try {
            return mapper.readerFor(type).with(DeserializationFeature.FAIL_ON_TRAILING_TOKENS)
                    .readValue(ctx.bodyAsBytes());
        } catch (JsonProcessingException e) {
            throw unreadableJson(e);
        } catch (IOException e) {
            throw new BadRequestException(null, "The request body could not be read: " + e.getMessage());
        }
    }

    static BadRequestException unreadableJson(JsonProcessingException e) {
        String field = e instanceof JsonMappingException m && !m.getPath().isEmpty() ? path(m) : null;
        String where = e.getLocation() == null ? "" : " at line " + e.getLocation().getLineNr() + ", column "
                + e.getLocation().getColumnNr();
        String what = e.getOriginalMessage().split("\n")[0];
        return new BadRequestException(field, "The JSON body could not be read" + where
                + (field == null ? "" : " (field " + field + ")") + ": " + what);
    }

    private static String path(JsonMappingException e) {
        StringBuilder path = new StringBuilder();
        for (JsonMappingException.Reference ref : e.getPath()) {
            if (ref.getFieldName() != null) {
                path.append(path.length() == 0 ? "" : ".").append(ref.getFieldName());
            } else if (ref.getIndex() >= 0) {
                path.append('[').append(ref.getIndex()).append(']');
            }
        }
        return path.toString();
    }

    private enum Kind { JSON, CSV, MULTIPART }

    private static Kind kind(Context ctx) {
        String type = ctx.contentType() == null ? "" : ctx.contentType().toLowerCase(Locale.ROOT);
        if (type.startsWith("application/json")) {
            return Kind.JSON;
        }
        if (type.startsWith("text/csv") || type.startsWith("text/plain") || type.startsWith("application/csv")
                || type.startsWith("text/tab-separated-values")) {
            return Kind.CSV;
        }
        if (type.startsWith("multipart/form-data")) {
            return Kind.MULTIPART;
        }
        throw unsupported(type);
    }

    private static void requireJson(Context ctx) {
        String type = ctx.contentType() == null ? "" : ctx.contentType().toLowerCase(Locale.ROOT);
        if (!type.startsWith("application/json")) {
            throw unsupported(type);
        }
    }

    private static BadRequestException unsupported(String type) {
        return new BadRequestException(415, "unsupported-media-type", "Content-Type", "Content type '" + type
                + "' is not accepted here; send application/json, text/csv or multipart/form-data as documented"
                + " in /api/openapi.json.");
    }

    /** The part named file as a stream (Jetty holds the parts, within the multipart size limits). */
    private static InputStream filePart(Context ctx) {
        UploadedFile file = uploadedFile(ctx);
        if (file == null) {
            throw new BadRequestException("file", "A multipart upload needs the CSV file in a part named 'file'.");
        }
        return file.content();
    }

    /** The part named file; a body Jetty cannot split into parts is the client's error, not the server's. */
    private static UploadedFile uploadedFile(Context ctx) {
        try {
            return ctx.uploadedFile("file");
        } catch (Exception e) {
            for (Throwable t = e; t != null; t = t.getCause()) {
                if (t instanceof BadMessageException bad) {
                    throw new BadRequestException(bad.getCode() == 413 ? 413 : 400, bad.getCode() == 413
                            ? "payload-too-large" : "bad-request", "file", "The multipart body could not be read ("
                            + bad.getReason() + "); send the CSV as a part named 'file' with the boundary named in"
                            + " the Content-Type header.");
                }
            }
            throw e;
        }
    }
}
