package org.trendwright.api;

/**
 * A request the API cannot read: a malformed parameter or body. Answered with a 400 (or the
 * given 4xx status) that names the field.
 */
public final class BadRequestException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    private final int status;
    private final String problem;
    private final String field;

    public BadRequestException(String field, String message) {
        this(400, "bad-request", field, message);
    }

    public BadRequestException(int status, String problem, String field, String message) {
        super(message);
        this.status = status;
        this.problem = problem;
        this.field = field;
    }

    public int status() {
        return status;
    }

    /** The last part of the problem type URI. */
    public String problem() {
        return problem;
    }

    public String field() {
        return field;
    }
}
