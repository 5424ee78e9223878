package org.chirocore.matroid;

import java.util.Arrays;
import java.util.List;

/**
 * An element bijection between two matroids on n elements: element i of the first goes to
 * element {@code image().get(i)} of the second. It is a matroid isomorphism when it maps the
 * bases of the first onto the bases of the second; {@link #isIsomorphism} checks that, so an
 * isomorphism carries its own proof. Immutable.
 *
 * @param image the image of each element, a permutation of 0, …, n − 1
 */
public record Isomorphism(List<Integer> image) {
    public Isomorphism {
        image = List.copyOf(image);
        boolean[] hit = new boolean[image.size()];
        for (int e : image) {
            if (e < 0 || e >= image.size() || hit[e]) {
                throw new IllegalArgumentException("An element bijection must be a permutation of 0.."
                        + (image.size() - 1) + ", but " + image + " is not.");
            }
            hit[e] = true;
        }
    }

    /** The image of element {@code e} of the first matroid. */
    public int apply(int e) {
        return image.get(e);
    }

    /** The image of a set, strictly increasing. */
    public int[] apply(int[] set) {
        int[] out = new int[set.length];
        for (int i = 0; i < set.length; i++) {
            out[i] = image.get(set[i]);
        }
        Arrays.sort(out);
        return out;
    }

    /**
     * Whether this bijection is an isomorphism from {@code first} to {@code second}: equal sizes
     * (matching this bijection), equal ranks, equal basis counts and every basis of {@code first}
     * mapped to a basis of {@code second} (an injective map between families of the same size
     * is onto). Costs the materialisation of both matroids (C(n, r) rank queries each, none for
     * explicit matroids) plus O(|bases| · r).
     *
     * @throws InvalidMatroidException when a matroid has more than {@link Limits#ELEMENTS} elements
     */
    public boolean isIsomorphism(Matroid first, Matroid second) {
        if (first.size() != image.size() || second.size() != image.size() || first.rank() != second.rank()) {
            return false;
        }
        ExplicitMatroid a = ExplicitMatroid.of(first);
        ExplicitMatroid b = ExplicitMatroid.of(second);
        if (a.basisCount() != b.basisCount()) {
            return false;
        }
        for (int[] basis : a.bases()) {
            if (!b.isBasis(apply(basis))) {
                return false;
            }
        }
        return true;
    }
}
