package org.chirocore.orient;

/**
 * How much work an orientability decision may spend before it answers unknown.
 *
 * @param conflictsPerCall conflicts allowed in one solver call (deterministic); 0 for no limit
 * @param millis wall-clock limit of the whole decision, checked between solver calls and
 *     passed to the solver as its own time-out; 0 for no limit
 */
public record Budget(int conflictsPerCall, long millis) {
    /** No limit at all. */
    public static final Budget UNLIMITED = new Budget(0, 0);

    public Budget {
        if (conflictsPerCall < 0 || millis < 0) {
            throw new IllegalArgumentException("Budget limits must not be negative: conflicts " + conflictsPerCall
                    + ", milliseconds " + millis + ".");
        }
    }
}
