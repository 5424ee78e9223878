package org.chirocore.sweep;

import java.util.ArrayList;
import java.util.List;

import org.chirocore.matroid.CubeHyperplane;

/**
 * One orbit of hyperplanes spanned by vertices of the real n-cube under the cube's symmetry
 * group B_n, given by its canonical representative a·x = b: a a primitive integer vector with
 * 0 ≤ a_1 ≤ … ≤ a_n and 2b ≤ a_1 + … + a_n (see {@link HyperplaneOrbits#canonical}).
 *
 * @param normal the canonical normal a, non-negative and ascending
 * @param offset the canonical offset b
 * @param stabiliser the order of the stabiliser of the hyperplane in B_n
 * @param orbitSize the number of hyperplanes in the orbit, 2^n·n! / stabiliser
 */
public record HyperplaneOrbit(List<Integer> normal, int offset, long stabiliser, long orbitSize) {
    public HyperplaneOrbit {
        normal = List.copyOf(normal);
    }

    /** The dimension n of the cube. */
    public int dimension() {
        return normal.size();
    }

    /** The representative as a hyperplane of the n-cube, with its vertex set. Costs O(n·2^n). */
    public CubeHyperplane representative() {
        return CubeHyperplane.of(normal.stream().mapToInt(Integer::intValue).toArray(), offset);
    }

    /** The canonical form (a_1, …, a_n, b), the orbit's complete invariant. */
    public List<Integer> canonicalForm() {
        List<Integer> form = new ArrayList<>(normal);
        form.add(offset);
        return List.copyOf(form);
    }

    /** The representative's normal as an array. */
    int[] normalArray() {
        return normal.stream().mapToInt(Integer::intValue).toArray();
    }
}
