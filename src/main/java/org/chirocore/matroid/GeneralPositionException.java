package org.chirocore.matroid;

/**
 * Thrown when a point cannot be pulled to a hyperplane because the two are not in general
 * position; carries the {@link GeneralPositionViolation} (a hyperline and an extra element of
 * its closure with the point), whose sentence is the message.
 */
public final class GeneralPositionException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    private final transient GeneralPositionViolation violation;

    public GeneralPositionException(GeneralPositionViolation violation) {
        super(violation.message());
        this.violation = violation;
    }

    /** The hyperline and element that violate general position. */
    public GeneralPositionViolation violation() {
        return violation;
    }
}
