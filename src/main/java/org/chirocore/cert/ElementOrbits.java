package org.chirocore.cert;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;

import org.chirocore.matroid.ElementSet;
import org.chirocore.matroid.ExplicitMatroid;
import org.chirocore.orient.Chirotope;
import org.chirocore.search.marco.Symmetry;

/**
 * The orbits of the automorphism group Aut(M) of a core M on its elements, with, for each element
 * e, one automorphism σ_e carrying its orbit's representative to e. The representative is the
 * orbit's smallest element, and σ_e the first automorphism in lexicographic order of its image
 * list with that property, so the choice is deterministic. The group is listed by
 * {@link Symmetry#automorphisms} (a backtracking search; every listed permutation is checked to
 * map bases to bases). Immutable.
 *
 * <p>Cost: that search, then O(|Aut(M)| · n).
 *
 * @param representative for each element, the representative of its orbit
 * @param carrier for each element e, σ_e as its image list ({@code carrier.get(e)[i]} = σ_e(i)); the
 *     identity for a representative
 */
record ElementOrbits(int[] representative, List<int[]> carrier) {
    ElementOrbits {
        representative = representative.clone();
        carrier = carrier.stream().map(int[]::clone).toList();
    }

    /**
     * The orbits of {@code m}'s automorphism group, or empty when the group has more than
     * {@link Symmetry#MAX_AUTOMORPHISMS} elements (then it is not listed).
     */
    static Optional<ElementOrbits> of(ExplicitMatroid m) {
        Symmetry group;
        try {
            group = Symmetry.automorphisms(m);
        } catch (IllegalArgumentException tooMany) {
            // Symmetry refuses to list more than MAX_AUTOMORPHISMS; the certificate then states every witness
            return Optional.empty();
        }
        int[] representative = new int[m.size()];
        int[][] carrier = new int[m.size()][];
        for (int e = 0; e < m.size(); e++) {
            if (carrier[e] != null) {
                continue;
            }
            // e is the smallest element of its orbit: the permutations are listed in lexicographic order
            for (int[] p : group.permutations()) {
                if (carrier[p[e]] == null) {
                    representative[p[e]] = e;
                    carrier[p[e]] = p;
                }
            }
        }
        return Optional.of(new ElementOrbits(representative, Arrays.asList(carrier)));
    }

    /** The number of orbits. */
    int count() {
        int count = 0;
        for (int e = 0; e < representative.length; e++) {
            count += representative[e] == e ? 1 : 0;
        }
        return count;
    }

    /** How the certificate states e's witnesses: its representative's, carried by σ_e ({@code labels} the core's). */
    MinimalityWitness.Transported transported(List<String> labels, int e) {
        return new MinimalityWitness.Transported(labels.get(representative[e]), Arrays.stream(carrier.get(e)).boxed().toList());
    }

    /**
     * The chirotope {@code source} of the minor at f = representative(e), relabelled by σ = σ_e
     * onto the minor of the same kind at e (docs/mathematics.md §8): for a basis B' of the image,
     * χ_e(B') = sign(π)·χ_f(sort(σ⁻¹(B'))), π the permutation sorting σ⁻¹(b'_1), …, σ⁻¹(b'_k) for
     * B' = {b'_1 < … < b'_k}. The minors number their elements as the core does with f
     * (respectively e) taken out. Computed forwards: each basis B of the source goes to the sorted
     * image of σ(B) with the sign of the sort, which is the same sign.
     *
     * @param labels the labels of the minor at e
     */
    Chirotope relabelled(Chirotope source, int e, List<String> labels) {
        int f = representative[e];
        int[] sigma = carrier.get(e);
        record Signed(int[] basis, byte sign) {
        }
        List<Signed> image = new ArrayList<>();
        List<int[]> bases = source.bases();
        for (int i = 0; i < bases.size(); i++) {
            int[] b = bases.get(i);
            int[] t = new int[b.length];
            for (int j = 0; j < b.length; j++) {
                int y = sigma[b[j] >= f ? b[j] + 1 : b[j]];
                t[j] = y > e ? y - 1 : y;
            }
            image.add(new Signed(t, (byte) (sortWithSign(t) * source.sign(i))));
        }
        image.sort((a, b) -> Arrays.compare(a.basis(), b.basis()));
        List<ElementSet> sets = new ArrayList<>(image.size());
        byte[] signs = new byte[image.size()];
        for (int i = 0; i < signs.length; i++) {
            sets.add(ElementSet.of(image.get(i).basis()));
            signs[i] = image.get(i).sign();
        }
        return new Chirotope(labels, source.rank(), sets, signs);
    }

    /** Sorts {@code a} (distinct entries) in place; returns the sign of the sorting permutation. */
    private static int sortWithSign(int[] a) {
        int sign = 1;
        for (int i = 1; i < a.length; i++) {
            for (int j = i; j > 0 && a[j - 1] > a[j]; j--) {
                int t = a[j];
                a[j] = a[j - 1];
                a[j - 1] = t;
                sign = -sign;
            }
        }
        return sign;
    }
}
