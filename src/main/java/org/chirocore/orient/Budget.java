package org.chirocore.orient;

/**
 * How much work an orientability decision may spend before it answers unknown.
 *
 * @param conflictsPerCall conflicts allowed in one solver call (deterministic); 0 for no limit
 * @param rounds solve-and-check rounds of the lazy relation loop allowed in one solve
 *     (deterministic); 0 for no limit
 * @param millis wall-clock limit of the whole decision, checked between solver calls and
 *     passed to the solver as its own time-out; 0 for no limit
 */
public record Budget(int conflictsPerCall, int rounds, long millis) {
    /** No limit at all. */
    public static final Budget UNLIMITED = new Budget(0, 0, 0);

    public Budget {
        if (conflictsPerCall < 0 || rounds < 0 || millis < 0) {
            throw new IllegalArgumentException("Budget limits must not be negative: conflicts " + conflictsPerCall
                    + ", rounds " + rounds + ", milliseconds " + millis + ".");
        }
    }
}
