package org.trendwright.api;

import com.fasterxml.jackson.annotation.JsonInclude;

/**
 * An RFC 9457 problem detail, sent as application/problem+json. The extension members name the
 * place of the problem when there is one. Immutable and thread-safe.
 *
 * @param type     a URI naming the kind of problem, e.g. "urn:trendwright:problem:invalid-upload"
 * @param title    a short summary of that kind
 * @param status   the HTTP status code
 * @param detail   what went wrong in this request and what to do
 * @param instance the request path
 * @param line     the 1-based CSV line, when the problem sits in one
 * @param column   the 1-based CSV column, when the problem sits in one
 * @param field    the JSON path or request parameter, when the problem sits in one
 * @param errorId  for a 500, the id under which the failure was logged
 */
@JsonInclude(JsonInclude.Include.NON_NULL)
public record Problem(String type, String title, int status, String detail, String instance, Integer line,
                      Integer column, String field, String errorId) {

    /** The media type of problem details. */
    public static final String MEDIA_TYPE = "application/problem+json";

    /** The URI prefix of every problem type. */
    public static final String TYPE_PREFIX = "urn:trendwright:problem:";
}
