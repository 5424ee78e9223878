package org.chirocore.orient;

/**
 * Figures of one orientability decision.
 *
 * @param bases number of bases (SAT variables)
 * @param relations number of 3-term relations whose clauses were given to the solver
 * @param clauses number of clauses given to the solver
 * @param rounds number of solve-and-check rounds of the lazy loop
 * @param conflicts conflicts the solver reported, summed over rounds
 * @param millis wall-clock time of the decision
 */
public record SolveStats(int bases, long relations, long clauses, int rounds, long conflicts, long millis) {
}
