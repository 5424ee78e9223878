package org.chirocore.io;

/**
 * An output path refused before any work by {@link OutputCheck}: the message is a full sentence
 * naming the path and what to do instead.
 */
public final class OutputRefusedException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    public OutputRefusedException(String message) {
        super(message);
    }

    public OutputRefusedException(String message, Throwable cause) {
        super(message, cause);
    }
}
