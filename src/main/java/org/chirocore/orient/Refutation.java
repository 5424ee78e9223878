package org.chirocore.orient;

import java.util.List;

/**
 * A checkable proof that a matroid has no chirotope: the CNF made of one unit clause per
 * normalised basis and the clauses ({@link ClauseEncoding}) of the listed 3-term relations is
 * unsatisfiable, as the DRAT proof shows by reverse unit propagation. Immutable.
 *
 * @param normalised the variables (bases) fixed to +1, in the order of their unit clauses
 * @param relations the relations whose clauses make up the rest of the CNF, in order
 * @param drat the proof as DRAT text, one step per line, ending with the empty clause {@code 0}
 * @param stats figures of the search that produced it
 */
public record Refutation(List<Integer> normalised, List<GpRelation> relations, String drat, Stats stats) {
    public Refutation {
        normalised = List.copyOf(normalised);
        relations = List.copyOf(relations);
        if (!drat.equals("0\n") && !drat.endsWith("\n0\n")) {
            throw new IllegalArgumentException("A DRAT refutation must end with the empty clause \"0\".");
        }
    }

    /**
     * Figures of a refutation.
     *
     * @param solve the lazy loop's figures (relations, clauses, rounds, conflicts, time)
     * @param lemmas clauses added by the proof, the final empty clause included
     * @param deletions clause deletions in the proof
     */
    public record Stats(SolveStats solve, long lemmas, long deletions) {
    }

    /** The CNF this proof refutes, as {@link ClauseEncoding#cnf} builds it over {@code index}. */
    public List<int[]> cnf(BasisIndex index) {
        return ClauseEncoding.cnf(index, normalised, relations);
    }
}
