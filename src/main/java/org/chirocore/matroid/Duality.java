package org.chirocore.matroid;

import java.util.List;

/**
 * Matroid duality. The dual M* of a matroid M on E has as bases the complements E − B of the
 * bases B of M, and rank function r*(S) = |S| − r(E) + r(E − S) ([Ox, §2.1, Prop. 2.1.9]).
 * Labels and element order are kept. Duality is an involution: (M*)* = M.
 */
public final class Duality {
    private Duality() {
    }

    /**
     * The dual of an explicit matroid, materialised. Costs C(n, n − r) constant-time basis
     * tests; the basis axioms are not re-checked, since the complements of a basis family
     * always form one ([Ox, Thm. 2.1.1]).
     */
    public static ExplicitMatroid dual(ExplicitMatroid m) {
        return ExplicitMatroid.of(new DualOracle(m));
    }

    /**
     * The dual of any matroid as a rank oracle; each rank query costs one rank query of
     * {@code m}. Useful for matroids too large to list their bases.
     */
    public static Matroid dualOracle(Matroid m) {
        return new DualOracle(m);
    }

    /** r*(S) = |S| − r(E) + r(E − S); a basis test on an explicit matroid is a complement look-up. */
    private static final class DualOracle implements Matroid {
        private final Matroid primal;

        DualOracle(Matroid primal) {
            this.primal = primal;
        }

        @Override
        public List<String> labels() {
            return primal.labels();
        }

        @Override
        public int rank() {
            return primal.size() - primal.rank();
        }

        @Override
        public int rank(int[] set) {
            return set.length - primal.rank() + primal.rank(complement(set));
        }

        @Override
        public boolean isBasis(int[] set) {
            if (set.length != rank()) {
                return false;
            }
            if (primal instanceof ExplicitMatroid explicit) {
                return explicit.isBasis(ElementSet.range(primal.size()).minus(ElementSet.of(set)));
            }
            return primal.isBasis(complement(set));
        }

        private int[] complement(int[] set) {
            int[] out = new int[primal.size() - set.length];
            int k = 0;
            for (int e = 0; e < primal.size(); e++) {
                if (!ElementSets.contains(set, e)) {
                    out[k++] = e;
                }
            }
            return out;
        }
    }
}
