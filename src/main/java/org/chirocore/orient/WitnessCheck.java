package org.chirocore.orient;

import java.util.List;
import java.util.Optional;

import org.chirocore.matroid.ElementSet;
import org.chirocore.matroid.Matroid;

/**
 * Checks an orientation witness: a sign per basis is a chirotope of the matroid when its support
 * is exactly the set of bases and it satisfies every 3-term Grassmann–Plücker relation
 * ([BLSWZ, Thm. 3.6.2]). The bases are recomputed from the matroid's rank oracle, so a witness
 * that was renumbered or cut down to a minor is checked against the minor itself. Costs one
 * basis enumeration and one full relation scan.
 */
public final class WitnessCheck {
    private WitnessCheck() {
    }

    /** The first defect found, or empty when {@code witness} is a chirotope of {@code m}. */
    public static Optional<String> defect(Matroid m, Chirotope witness) {
        if (!witness.labels().equals(m.labels()) || witness.rank() != m.rank()) {
            return Optional.of("The witness is for rank " + witness.rank() + " on " + witness.labels()
                    + ", but the matroid has rank " + m.rank() + " on " + m.labels() + ".");
        }
        BasisIndex index = BasisIndex.of(m);
        if (index.basisCount() != witness.size()) {
            return Optional.of("The witness signs " + witness.size() + " sets, but the matroid has "
                    + index.basisCount() + " bases.");
        }
        byte[] signs = new byte[index.basisCount()];
        for (int i = 0; i < witness.size(); i++) {
            if (!witness.basis(i).equals(index.basis(i + 1))) {
                return Optional.of("Signed set " + witness.basis(i) + " is not basis number " + (i + 1)
                        + " in canonical order, " + index.basis(i + 1) + ".");
            }
            signs[i] = (byte) witness.sign(i);
        }
        ElementSet all = ElementSet.range(m.size());
        List<GpRelation> violated = new RelationScan(index).violated(signs, all, 1, 1);
        return violated.isEmpty() ? Optional.empty()
                : Optional.of("The signs violate the 3-term Grassmann-Pluecker relation " + violated.get(0) + ".");
    }

    /**
     * Returns {@code witness} after checking it.
     *
     * @throws IllegalStateException naming the defect when it is not a chirotope of {@code m}
     */
    public static Chirotope checked(Matroid m, Chirotope witness) {
        defect(m, witness).ifPresent(d -> {
            throw new IllegalStateException("An orientation witness failed its re-check: " + d);
        });
        return witness;
    }
}
