package org.chirocore.orient;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;

import org.chirocore.matroid.ElementSet;
import org.chirocore.matroid.ElementSets;
import org.chirocore.matroid.Limits;
import org.chirocore.matroid.Matroid;
import org.chirocore.matroid.Realisation;

/**
 * Checks a realisation as an orientation witness of a matroid M of rank r: it must have M's labels
 * and rank, and for every r-subset B the determinant of the columns B must be non-zero exactly
 * when B is a basis of M (asked of M's own rank oracle). Then sign det is a chirotope with support
 * the bases of M (Björner et al., <i>Oriented Matroids</i>, 2nd ed., §3.5, from memory: the
 * chirotope of a real vector configuration), so M is orientable; no Grassmann–Plücker relation
 * needs to be scanned. Costs C(n, r) determinant signs (shared elimination, see
 * {@link Realisation#forEachSign}) and C(n, r) rank-oracle basis tests; refuses more than
 * {@link #MAX_SUBSETS} subsets.
 */
public final class RealisationCheck {
    /** Largest C(n, r) enumerated, the same bound as the basis index's. */
    public static final long MAX_SUBSETS = BasisIndex.MAX_SUBSETS;

    private RealisationCheck() {
    }

    /** The outcome of one enumeration: the first defect, or none and the number of bases. */
    private record Tally(String defect, long bases) {
    }

    /**
     * The first defect found, or empty when {@code witness} realises {@code m}.
     *
     * @throws EnumerationLimitException when C(n, r) exceeds {@link #MAX_SUBSETS}
     */
    public static Optional<String> defect(Matroid m, Realisation witness) {
        return Optional.ofNullable(tally(m, witness).defect());
    }

    /**
     * The number of bases of {@code m}, after checking that {@code witness} realises it.
     *
     * @throws IllegalStateException naming the defect when it does not
     * @throws EnumerationLimitException when C(n, r) exceeds {@link #MAX_SUBSETS}
     */
    public static long checkedBasisCount(Matroid m, Realisation witness) {
        Tally t = tally(m, witness);
        if (t.defect() != null) {
            throw new IllegalStateException("A realisation witness failed its check: " + t.defect());
        }
        return t.bases();
    }

    private static Tally tally(Matroid m, Realisation witness) {
        if (!witness.labels().equals(m.labels()) || witness.rank() != m.rank()) {
            return new Tally("The realisation is for rank " + witness.rank() + " on " + witness.labels()
                    + ", but the matroid has rank " + m.rank() + " on " + m.labels() + ".", 0);
        }
        requireEnumerable(m.size(), m.rank());
        String[] defect = new String[1];
        long[] bases = new long[1];
        witness.forEachSign((subset, sign) -> {
            boolean basis = m.isBasis(subset);
            if (basis != (sign != 0)) {
                defect[0] = "The columns " + ElementSets.format(m.labels(), subset) + " have determinant "
                        + (sign == 0 ? "zero, but they are a basis" : "non-zero, but they are not a basis")
                        + " of the matroid.";
                return false;
            }
            bases[0] += basis ? 1 : 0;
            return true;
        });
        return new Tally(defect[0], bases[0]);
    }

    /**
     * The determinant signs of a realisation as a chirotope (one sign per basis, canonical order):
     * the witness in sign form, for files that want it.
     *
     * @throws EnumerationLimitException over {@link #MAX_SUBSETS} subsets or {@link Limits#ELEMENTS} elements
     */
    public static Chirotope chirotope(Realisation witness) {
        requireEnumerable(witness.size(), witness.rank());
        List<ElementSet> bases = new ArrayList<>();
        byte[][] signs = {new byte[1024]};
        witness.forEachSign((subset, sign) -> {
            if (sign != 0) {
                if (bases.size() == signs[0].length) {
                    signs[0] = Arrays.copyOf(signs[0], 2 * bases.size());
                }
                signs[0][bases.size()] = (byte) sign;
                bases.add(ElementSet.of(subset));
            }
            return true;
        });
        return new Chirotope(witness.labels(), witness.rank(), bases, Arrays.copyOf(signs[0], bases.size()));
    }

    private static void requireEnumerable(int size, int rank) {
        long subsets = ElementSets.binomial(size, rank);
        if (subsets > MAX_SUBSETS || size > Limits.ELEMENTS) {
            throw new EnumerationLimitException("A realisation of rank " + rank + " on " + size + " elements has "
                    + (subsets == Long.MAX_VALUE ? "too many" : String.format("%,d", subsets)) + " " + rank
                    + "-subsets; checking it enumerates every one, and at most " + String.format("%,d", MAX_SUBSETS)
                    + " on at most " + Limits.ELEMENTS + " elements are enumerated.");
        }
    }
}
