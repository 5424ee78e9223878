package org.chirocore.orient;

/**
 * How much work an orientability decision may spend before it answers unknown.
 *
 * @param conflictsPerCall conflicts allowed in one solver call (deterministic); 0 for no limit
 * @param rounds solve-and-check rounds of the lazy relation loop allowed in one solve
 *     (deterministic); 0 for no limit
 * @param millis wall-clock limit of the whole decision, checked between solver calls and
 *     passed to the solver as its own time-out; 0 for no limit
 * @param deadline the moment (epoch milliseconds) after which no solver call may start and a
 *     time-limited one stops: an enclosing search's total time limit, carried into every call it
 *     makes; 0 for none
 */
public record Budget(int conflictsPerCall, int rounds, long millis, long deadline) {
    /** No limit at all. */
    public static final Budget UNLIMITED = new Budget(0, 0, 0);

    public Budget {
        if (conflictsPerCall < 0 || rounds < 0 || millis < 0 || deadline < 0) {
            throw new IllegalArgumentException("Budget limits must not be negative: conflicts " + conflictsPerCall
                    + ", rounds " + rounds + ", milliseconds " + millis + ", deadline " + deadline + ".");
        }
    }

    /** A budget without a deadline. */
    public Budget(int conflictsPerCall, int rounds, long millis) {
        this(conflictsPerCall, rounds, millis, 0);
    }

    /** This budget, also ending at {@code deadline} (epoch milliseconds; 0 keeps the present one). */
    public Budget until(long deadline) {
        if (deadline == 0) {
            return this;
        }
        return new Budget(conflictsPerCall, rounds, millis, this.deadline == 0 ? deadline : Math.min(this.deadline, deadline));
    }

    /**
     * Milliseconds a call starting now may run: the smaller of what remains of {@code millis}
     * counted from {@code started} and what remains before the deadline; 0 when neither limit is
     * set, negative when one has passed.
     */
    public long remaining(long started) {
        long now = System.currentTimeMillis();
        long left = millis == 0 ? Long.MAX_VALUE : millis - (now - started);
        if (deadline > 0) {
            left = Math.min(left, deadline - now);
        }
        return left == Long.MAX_VALUE ? 0 : (left <= 0 ? -1 : left);
    }

    /** Why a call may not start or stopped: which time limit ran out. */
    public String timeReason() {
        return deadline > 0 && System.currentTimeMillis() >= deadline ? "the total time limit ran out"
                : "the time limit of " + millis + " ms ran out";
    }
}
