package org.chirocore.io;

/**
 * Thrown when well-formed JSON does not have the shape a reader expects: a missing or unknown
 * field, a value of the wrong type, a number out of range. The message is a sentence naming the
 * item, e.g. {@code field "rank" must be an integer, found a string}.
 */
public final class JsonValueException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    public JsonValueException(String message) {
        super(message);
    }
}
