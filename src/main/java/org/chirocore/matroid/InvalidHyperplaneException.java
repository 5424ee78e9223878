package org.chirocore.matroid;

/**
 * Thrown when a set offered as a hyperplane (a flat of rank r − 1) is not one: it is not closed,
 * or its rank is wrong, or its description is malformed. The message is a full sentence naming
 * the offending set and, when the set is not closed, an element of its closure outside it.
 */
public final class InvalidHyperplaneException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    public InvalidHyperplaneException(String message) {
        super(message);
    }
}
