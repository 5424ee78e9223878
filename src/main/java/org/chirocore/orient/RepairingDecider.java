package org.chirocore.orient;

import java.util.Arrays;

import org.chirocore.matroid.ElementSet;
import org.chirocore.matroid.Matroid;
import org.chirocore.matroid.Realisation;

/**
 * Decides orientability from a start: sign assignments near a chirotope are finished by
 * {@link LocalRepair}, and only when that does not reach a chirotope is the question handed to
 * a fallback decider. A start is, for example, the determinant signs of a realisation of a
 * nearby matroid on the same elements: where its support and the matroid's bases agree and the
 * two differ only locally, a few repair passes give a chirotope, which no lazy SAT loop reaches
 * on large inputs (docs/realisations.md). An orientable answer's witness is re-checked against
 * every relation ({@link WitnessCheck}); a non-orientable or unknown answer is the fallback's.
 */
public final class RepairingDecider implements OrientabilityDecider {

    /** A start: one sign (+1 or −1) per variable of the matroid's basis index, index v − 1. */
    @FunctionalInterface
    public interface Start {
        byte[] signs(BasisIndex index);
    }

    private final Start start;
    private final OrientabilityDecider fallback;

    public RepairingDecider(Start start, OrientabilityDecider fallback) {
        this.start = start;
        this.fallback = fallback;
    }

    /**
     * The determinant signs of {@code r} on the bases of the matroid decided; a basis whose
     * determinant is zero starts at +1. The realisation must have the matroid's labels and rank;
     * otherwise the start throws an IllegalArgumentException naming the mismatch when it is used.
     */
    public static Start of(Realisation r) {
        return index -> {
            if (!r.labels().equals(index.labels()) || r.rank() != index.rank()) {
                throw new IllegalArgumentException("The start realisation has rank " + r.rank() + " on " + r.labels()
                        + ", but the matroid has rank " + index.rank() + " on " + index.labels() + ".");
            }
            byte[] signs = new byte[index.basisCount()];
            Arrays.fill(signs, (byte) 1);
            r.forEachSign((subset, sign) -> {
                int v = index.variable(subset);
                if (v != 0 && sign != 0) {
                    signs[v - 1] = (byte) sign;
                }
                return true;
            });
            return signs;
        };
    }

    @Override
    public Orientability decide(Matroid m) {
        long started = System.currentTimeMillis();
        BasisIndex index = BasisIndex.of(m);
        LocalRepair.Outcome repaired = LocalRepair.repair(index, start.signs(index));
        if (repaired.signs().isPresent()) {
            Chirotope witness = WitnessCheck.checked(m,
                    index.chirotope(repaired.signs().get(), ElementSet.range(m.size())));
            return new Orientability.Orientable(witness, new SolveStats(index.basisCount(), 0, 0, repaired.passes(), 0,
                    System.currentTimeMillis() - started));
        }
        return fallback.decide(m);
    }
}
