package org.trendwright.core;

/** Too few observations for the number of parameters a model or test needs. */
public final class InsufficientDataException extends ModelException {
    private static final long serialVersionUID = 1L;

    public InsufficientDataException(String message) {
        super(message);
    }

    /**
     * The standard refusal: {@code what} needs {@code needed} usable observations but has
     * {@code available}.
     */
    public static InsufficientDataException forModel(String what, int needed, int available) {
        return new InsufficientDataException(what + " needs at least " + needed
                + " usable observations but the series has " + available
                + "; supply a longer series or choose a model with fewer parameters.");
    }
}
