package org.trendwright.api;

import io.javalin.http.Context;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.trendwright.series.VersionConflictException;

/**
 * Entity tags of series versions: {@code "s<id>-v<version>"} (strong). A series' ETag changes with
 * each new version. Updates must send {@code If-Match} with the ETag of the version they build on:
 * a missing header is answered 428 Precondition Required, a stale one 412 Precondition Failed;
 * {@code If-Match: *} matches whatever version is current. Stateless and thread-safe.
 */
public final class ETags {

    private static final Pattern TAG = Pattern.compile("\"s(\\d+)-v(\\d+)\"");

    private ETags() {
    }

    public static String of(long id, int version) {
        return "\"s" + id + "-v" + version + "\"";
    }

    /**
     * Checks the request's If-Match against the series' current version and returns that version
     * for the optimistic write.
     */
    public static int requireMatch(Context ctx, long id, int currentVersion) {
        String header = ctx.header("If-Match");
        if (header == null || header.isBlank()) {
            throw new BadRequestException(428, "precondition-required", "If-Match", "Updating series " + id
                    + " needs an If-Match header with its current ETag (" + of(id, currentVersion)
                    + "), so that a change made meanwhile by someone else is not overwritten.");
        }
        if (header.trim().equals("*")) {
            return currentVersion;
        }
        Matcher m = TAG.matcher(header);
        int named = -1;
        while (m.find()) {
            if (Long.parseLong(m.group(1)) == id) {
                named = Integer.parseInt(m.group(2));
                if (named == currentVersion) {
                    return currentVersion;
                }
            }
        }
        throw new VersionConflictException(id, named, currentVersion);
    }

    /** True when the request's If-None-Match names this ETag (or is *). */
    public static boolean noneMatch(Context ctx, String etag) {
        String header = ctx.header("If-None-Match");
        return header != null && (header.trim().equals("*") || header.contains(etag));
    }
}
