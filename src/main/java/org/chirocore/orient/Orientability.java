package org.chirocore.orient;

/**
 * The answer to "is this matroid orientable?": proved orientable (with a checked witness),
 * proved non-orientable, or unknown because a budget ran out. An unknown answer is never a
 * verdict.
 */
public sealed interface Orientability {

    /** The verdict word used in JSON output: "orientable", "non-orientable" or "unknown". */
    String verdict();

    /** Orientable, with a chirotope that passed every 3-term Grassmann–Plücker relation. */
    record Orientable(Chirotope witness, SolveStats stats) implements Orientability {
        @Override
        public String verdict() {
            return "orientable";
        }
    }

    /**
     * Non-orientable: the clauses of the listed relations, with the normalisation, are
     * unsatisfiable.
     */
    record NonOrientable(SolveStats stats) implements Orientability {
        @Override
        public String verdict() {
            return "non-orientable";
        }
    }

    /** No verdict: the solver's budget ran out first. */
    record Unknown(String reason, SolveStats stats) implements Orientability {
        @Override
        public String verdict() {
            return "unknown";
        }
    }

    /** Figures of one decision. */
    SolveStats stats();
}
