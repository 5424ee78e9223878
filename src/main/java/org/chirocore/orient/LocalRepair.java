package org.chirocore.orient;

import java.util.Optional;

/**
 * Chirotope-aware local repair of a sign assignment that is close to a chirotope: each pass
 * counts, for every basis, the 3-term Grassmann–Plücker relations its sign takes part in and
 * how many of them are violated, and flips every basis that violates more than half of its
 * relations; it stops when nothing is violated (the signs are then a chirotope) or when a pass
 * flips nothing. Deterministic; each pass costs one full relation scan,
 * C(n, r−2)·C(n−r+2, 4) term evaluations.
 *
 * <p>Measured on the real 5-cube (docs/realisations.md): from its determinant signs with 1 % or
 * 10 % of the bases flipped at random, two and four passes give a chirotope; from random signs,
 * or with every basis through one element wrong, no basis violates a majority and nothing moves.
 * So it is a way to finish from a good start, never a search.
 */
public final class LocalRepair {
    /** Passes tried at most; the measured repairs needed at most four. */
    public static final int MAX_PASSES = 12;

    private LocalRepair() {
    }

    /**
     * The outcome of a repair.
     *
     * @param signs the repaired signs when they are a chirotope, else empty
     * @param passes the passes run
     * @param violated violated relations left after the last pass (0 when repaired)
     */
    public record Outcome(Optional<byte[]> signs, int passes, long violated) {
    }

    /**
     * Repairs {@code start} (one sign per variable of {@code index}, index v − 1; not changed).
     * The answer's signs, when present, violate no 3-term relation of the whole matroid.
     */
    public static Outcome repair(BasisIndex index, byte[] start) {
        byte[] signs = start.clone();
        int[] involved = new int[signs.length];
        int[] violated = new int[signs.length];
        RelationScan scan = new RelationScan(index);
        long left = 0;
        for (int pass = 1; pass <= MAX_PASSES; pass++) {
            left = scan.tally(signs, involved, violated);
            if (left == 0) {
                return new Outcome(Optional.of(signs), pass, 0);
            }
            int flips = 0;
            for (int i = 0; i < signs.length; i++) {
                if (2 * violated[i] > involved[i]) {
                    signs[i] = (byte) -signs[i];
                    flips++;
                }
            }
            if (flips == 0) {
                return new Outcome(Optional.empty(), pass, left);
            }
        }
        return new Outcome(Optional.empty(), MAX_PASSES, left);
    }
}
