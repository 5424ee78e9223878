package org.chirocore.sweep;

/** A sweep directory or shard set that cannot be used: the message names the file and what is wrong. */
public final class SweepException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    /** With a message naming the file or shard and what was expected. */
    public SweepException(String message) {
        super(message);
    }

    /** With a message and the underlying cause. */
    public SweepException(String message, Throwable cause) {
        super(message, cause);
    }
}
