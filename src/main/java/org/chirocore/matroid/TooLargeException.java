package org.chirocore.matroid;

/**
 * Thrown before any work when an input exceeds an entry of {@link Limits}: the message is a full
 * sentence naming the item, its size and the limit. The command line reports it as bad input
 * (exit code 2), never as memory exhaustion.
 */
public class TooLargeException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    public TooLargeException(String message) {
        super(message);
    }
}
