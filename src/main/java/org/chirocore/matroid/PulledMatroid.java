package org.chirocore.matroid;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.BitSet;
import java.util.List;
import java.util.Optional;

/**
 * The matroid M' obtained from a matroid M of rank r by pulling a point O to a hyperplane H
 * (O ∉ H): the bases of M' are the bases of M not contained in H ∪ {O}, so H ∪ {O} becomes a
 * hyperplane of M'. Its rank function equals M's except that a set S ⊆ H ∪ {O} with
 * rank_M(S) = r gets rank r − 1. This family is a matroid when (H, O) are in general position:
 * for every hyperline L ⊆ H (flat of M of rank r − 2), cl(L ∪ {O}) = L ∪ {O} (docs/mathematics.md §7).
 * {@link #pull} checks that and refuses otherwise.
 *
 * <p>A rank query costs one rank query of M plus O(|S|). Checking general position costs up to
 * C(|H|, r − 2) rank queries to enumerate the hyperlines inside H, plus |H| per hyperline found
 * (its closure) and one closure test of the |E − H| other elements per hyperline
 * ({@link Matroid#inClosure}: a dot product each when M is a matrix matroid). Immutable when M is.
 */
public final class PulledMatroid implements Matroid {
    private final Matroid original;
    private final int[] hyperplane;
    private final int point;
    /** Membership in H ∪ {O}, the new hyperplane. */
    private final boolean[] inPulledHyperplane;

    private PulledMatroid(Matroid original, int[] hyperplane, int point) {
        this.original = original;
        this.hyperplane = hyperplane.clone();
        this.point = point;
        this.inPulledHyperplane = new boolean[original.size()];
        for (int e : hyperplane) {
            inPulledHyperplane[e] = true;
        }
        inPulledHyperplane[point] = true;
    }

    /**
     * Pulls {@code point} to {@code hyperplane} in {@code m}.
     *
     * @param hyperplane strictly increasing element indices of a hyperplane of {@code m}
     * @param point an element outside the hyperplane
     * @throws InvalidHyperplaneException when {@code hyperplane} is not a hyperplane of {@code m}
     * @throws IllegalArgumentException when {@code point} is out of range or lies in the
     *     hyperplane, or when H ∪ {O} is the whole ground set (no basis would remain)
     * @throws GeneralPositionException when (H, O) are not in general position
     */
    public static PulledMatroid pull(Matroid m, int[] hyperplane, int point) {
        Optional<GeneralPositionViolation> violation = generalPositionViolation(m, hyperplane, point);
        if (violation.isPresent()) {
            throw new GeneralPositionException(violation.get());
        }
        return new PulledMatroid(m, hyperplane, point);
    }

    /**
     * Whether {@code hyperplane} and {@code point} are in general position in {@code m}: empty
     * when they are, otherwise a hyperline L ⊆ H and an element of cl(L ∪ {O}) − (L ∪ {O}), the
     * first found in lexicographic order of L's first spanning subset and then of the element.
     *
     * @throws InvalidHyperplaneException when {@code hyperplane} is not a hyperplane of {@code m}
     * @throws IllegalArgumentException as {@link #pull} for a point out of range or inside H, or
     *     H ∪ {O} = E
     */
    public static Optional<GeneralPositionViolation> generalPositionViolation(Matroid m, int[] hyperplane,
            int point) {
        checkInput(m, hyperplane, point);
        int k = m.rank() - 2;
        if (k < 0) {
            // Rank 1: a hyperline would have rank −1, so there is nothing to check.
            return Optional.empty();
        }
        // Only elements y outside H ∪ {O} can violate. For y in H − L: L is a flat of rank r − 2
        // and y ∉ L, so L ∪ {y} has rank r − 1 and spans the flat H; with O ∉ H the set
        // L ∪ {O, y} then has rank r, so y is not in cl(L ∪ {O}), which has rank r − 1.
        int[] candidates = complementOfPulled(m.size(), hyperplane, point);
        int[] comb = ElementSets.range(k);
        int[] chosen = new int[k];
        // Hyperlines found so far, as sets of positions in H, filed under each of their positions.
        List<List<BitSet>> byPosition = new ArrayList<>();
        for (int i = 0; i < hyperplane.length; i++) {
            byPosition.add(new ArrayList<>());
        }
        do {
            for (int i = 0; i < k; i++) {
                chosen[i] = hyperplane[comb[i]];
            }
            if (m.rank(chosen) != k || (k > 0 && inFoundHyperline(comb, byPosition.get(comb[0])))) {
                continue;
            }
            BitSet hyperline = closureWithin(m, hyperplane, chosen, comb);
            hyperline.stream().forEach(i -> byPosition.get(i).add(hyperline));
            // cl(L ∪ {O}) = cl(chosen ∪ {O}), of rank k + 1 since O ∉ cl(L) ⊆ H.
            int[] extra = m.inClosure(ElementSets.with(chosen, point), candidates);
            if (extra.length > 0) {
                return Optional.of(violation(m, hyperplane, hyperline, point, extra[0]));
            }
        } while (ElementSets.nextCombination(comb, hyperplane.length));
        return Optional.empty();
    }

    private static void checkInput(Matroid m, int[] hyperplane, int point) {
        for (int i = 0; i < hyperplane.length; i++) {
            if (hyperplane[i] < 0 || hyperplane[i] >= m.size() || (i > 0 && hyperplane[i] <= hyperplane[i - 1])) {
                throw new IllegalArgumentException("The hyperplane " + Arrays.toString(hyperplane)
                        + " is not a strictly increasing list of element indices in 0.." + (m.size() - 1) + ".");
            }
        }
        if (point < 0 || point >= m.size()) {
            throw new IllegalArgumentException("The point index " + point + " is outside 0.." + (m.size() - 1) + ".");
        }
        String h = ElementSets.format(m.labels(), hyperplane);
        HyperplaneSpec.requireHyperplane(m, hyperplane, "The set " + h);
        if (ElementSets.contains(hyperplane, point)) {
            throw new IllegalArgumentException("The point " + m.labels().get(point) + " lies in the hyperplane " + h
                    + "; a pulled point must lie outside it.");
        }
        if (hyperplane.length + 1 == m.size()) {
            throw new IllegalArgumentException("The hyperplane " + h + " together with the point "
                    + m.labels().get(point) + " is the whole ground set, so pulling would leave no basis.");
        }
    }

    private static int[] complementOfPulled(int size, int[] hyperplane, int point) {
        int[] out = new int[size];
        int n = 0;
        for (int e = 0; e < size; e++) {
            if (e != point && !ElementSets.contains(hyperplane, e)) {
                out[n++] = e;
            }
        }
        return Arrays.copyOf(out, n);
    }

    /** Whether the positions {@code comb} all lie in one of the hyperlines {@code candidates}. */
    private static boolean inFoundHyperline(int[] comb, List<BitSet> candidates) {
        for (BitSet hyperline : candidates) {
            if (Arrays.stream(comb).allMatch(hyperline::get)) {
                return true;
            }
        }
        return false;
    }

    /**
     * The closure of the independent set {@code chosen} (at positions {@code comb} of H), as
     * positions in H. Elements outside H need no test: cl(chosen) ⊆ cl(H) = H.
     */
    private static BitSet closureWithin(Matroid m, int[] hyperplane, int[] chosen, int[] comb) {
        BitSet out = new BitSet(hyperplane.length);
        for (int i : comb) {
            out.set(i);
        }
        for (int i = 0; i < hyperplane.length; i++) {
            if (!out.get(i) && m.rank(ElementSets.with(chosen, hyperplane[i])) == chosen.length) {
                out.set(i);
            }
        }
        return out;
    }

    private static GeneralPositionViolation violation(Matroid m, int[] hyperplane, BitSet positions, int point,
            int witness) {
        int[] hyperline = positions.stream().map(i -> hyperplane[i]).toArray();
        List<String> labels = m.labels();
        String message = "The point " + labels.get(point) + " and the hyperplane "
                + ElementSets.format(labels, hyperplane) + " are not in general position: the closure of the hyperline "
                + ElementSets.format(labels, hyperline) + " together with " + labels.get(point) + " also contains "
                + labels.get(witness) + ".";
        return new GeneralPositionViolation(Arrays.stream(hyperline).boxed().toList(), point, witness, message);
    }

    /** The matroid M that was pulled. */
    public Matroid original() {
        return original;
    }

    /** The hyperplane H of M, strictly increasing. */
    public int[] hyperplane() {
        return hyperplane.clone();
    }

    /** The pulled point O. */
    public int point() {
        return point;
    }

    /** H ∪ {O}, a hyperplane of this matroid, strictly increasing. */
    public int[] pulledHyperplane() {
        return ElementSets.with(hyperplane, point);
    }

    @Override
    public List<String> labels() {
        return original.labels();
    }

    @Override
    public int rank() {
        return original.rank();
    }

    @Override
    public int rank(int[] set) {
        int k = original.rank(set);
        if (k < original.rank()) {
            return k;
        }
        for (int e : set) {
            if (!inPulledHyperplane[e]) {
                return k;
            }
        }
        return k - 1;
    }

    /**
     * Below rank r − 1 nothing is pulled: for rank_M(S) ≤ r − 2 both S and S ∪ {e} have rank below
     * r, so their ranks are M's and so is the closure. Otherwise by the definition.
     */
    @Override
    public int[] inClosure(int[] set, int[] candidates) {
        return original.rank(set) <= original.rank() - 2 ? original.inClosure(set, candidates)
                : Matroid.super.inClosure(set, candidates);
    }

    @Override
    public String toString() {
        return "PulledMatroid[" + labels().get(point) + " pulled to " + ElementSets.format(labels(), hyperplane)
                + "]";
    }
}
