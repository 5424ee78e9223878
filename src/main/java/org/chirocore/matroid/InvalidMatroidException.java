package org.chirocore.matroid;

/**
 * Thrown when data offered as a matroid is not one (a failing basis exchange, a wrong basis size,
 * an element index out of range, …). The message is a full sentence that names the offending item.
 */
public final class InvalidMatroidException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    public InvalidMatroidException(String message) {
        super(message);
    }
}
