package org.chirocore.matroid;

import java.util.Arrays;
import java.util.List;
import java.util.Optional;

/**
 * A user's description of a hyperplane H of an affine cube — by an integer equation a·x = b
 * (H = the vertices on it) or by a list of vertex labels — and its validation: {@link #resolve}
 * returns H as element indices only when H is a flat of rank n of the cube's matroid (a
 * hyperplane of the matroid, rank r − 1 for r = n + 1), and otherwise throws an
 * {@link InvalidHyperplaneException} naming the rank found or a vertex of the closure outside H.
 * Resolving costs 2^n rank queries.
 */
public sealed interface HyperplaneSpec {

    /**
     * The hyperplane as strictly increasing element indices of {@code cube}.
     *
     * @throws InvalidHyperplaneException when the description does not fit the cube or the set is
     *     not a hyperplane of the cube's matroid
     */
    int[] resolve(AffineCube cube);

    /**
     * The described vertex set as strictly increasing element indices of {@code cube}, without
     * asking whether it is a hyperplane. Costs O(n·2^n).
     *
     * @throws InvalidHyperplaneException when the description does not fit the cube (wrong
     *     number of coefficients, a malformed or repeated label)
     */
    int[] vertices(AffineCube cube);

    /**
     * The real affine hyperplane a·x = b described, normalised: the given equation, or for a
     * vertex list the hyperplane whose cube vertices are exactly the listed ones; empty when the
     * listed vertices are not the vertex set of any real hyperplane (possible over GF(p), or
     * for a set that is not a flat). Costs O(n³ + n·2^n).
     *
     * @throws InvalidHyperplaneException as {@link #vertices}
     */
    Optional<CubeHyperplane> equation(AffineCube cube);

    /** H = the vertices v with a·v = b (integer arithmetic, whatever the cube's field). */
    record ByEquation(List<Integer> normal, int offset) implements HyperplaneSpec {
        public ByEquation {
            normal = List.copyOf(normal);
            if (normal.stream().allMatch(a -> a == 0)) {
                throw new InvalidHyperplaneException("The normal vector " + normal
                        + " is zero, so it defines no hyperplane.");
            }
        }

        @Override
        public int[] resolve(AffineCube cube) {
            CubeHyperplane h = hyperplane(cube);
            int[] set = h.elements();
            return requireHyperplane(cube, set, "The vertex set " + ElementSets.format(cube.labels(), set)
                    + " of the equation " + h.equation());
        }

        @Override
        public int[] vertices(AffineCube cube) {
            return hyperplane(cube).elements();
        }

        @Override
        public Optional<CubeHyperplane> equation(AffineCube cube) {
            return Optional.of(hyperplane(cube));
        }

        private CubeHyperplane hyperplane(AffineCube cube) {
            if (normal.size() != cube.dimension()) {
                throw new InvalidHyperplaneException("The normal vector " + normal + " has " + normal.size()
                        + " coefficients, but the cube has dimension " + cube.dimension() + ".");
            }
            return CubeHyperplane.of(normal.stream().mapToInt(Integer::intValue).toArray(), offset);
        }
    }

    /** H = the listed vertices, given by their 0/1 labels. */
    record ByVertices(List<String> vertices) implements HyperplaneSpec {
        public ByVertices {
            vertices = List.copyOf(vertices);
        }

        @Override
        public int[] resolve(AffineCube cube) {
            int[] set = vertices(cube);
            return requireHyperplane(cube, set, "The vertex set " + ElementSets.format(cube.labels(), set));
        }

        @Override
        public int[] vertices(AffineCube cube) {
            try {
                return cube.indicesOf(vertices);
            } catch (IllegalArgumentException badLabel) {
                throw new InvalidHyperplaneException(badLabel.getMessage());
            }
        }

        @Override
        public Optional<CubeHyperplane> equation(AffineCube cube) {
            return CubeHyperplane.withVertices(cube.dimension(), vertices(cube));
        }
    }

    /**
     * Parses "a1,…,an=b" (an equation, e.g. "1,1,1=1" for x1 + x2 + x3 = 1) or a list of vertex
     * labels separated by commas or spaces (e.g. "100,010,001"). Whether the result fits a cube
     * is checked by {@link #resolve}.
     *
     * @throws InvalidHyperplaneException naming the text when a coefficient is not an integer
     */
    static HyperplaneSpec parse(String text) {
        String t = text.trim();
        int eq = t.indexOf('=');
        if (eq < 0) {
            return new ByVertices(Arrays.asList(t.split("[,\\s]+")));
        }
        try {
            List<Integer> normal = Arrays.stream(t.substring(0, eq).trim().split("[,\\s]+"))
                    .map(Integer::valueOf)
                    .toList();
            return new ByEquation(normal, Integer.parseInt(t.substring(eq + 1).trim()));
        } catch (NumberFormatException e) {
            throw new InvalidHyperplaneException("The hyperplane \"" + text
                    + "\" is neither \"a1,...,an=b\" with integer coefficients nor a list of vertex labels.");
        }
    }

    /**
     * Returns {@code set} when it is a hyperplane of {@code m} (a flat of rank rank(m) − 1).
     * Costs size() rank queries.
     *
     * @param what the set as the message's subject, e.g. "The vertex set {000, 100, 010}"
     * @throws InvalidHyperplaneException naming the rank found, or an element outside {@code set}
     *     in its closure
     */
    static int[] requireHyperplane(Matroid m, int[] set, String what) {
        int k = m.rank(set);
        int wanted = m.rank() - 1;
        if (k > wanted) {
            throw wrongRank(what, k, wanted);
        }
        int outside = Flats.firstOutsideInClosure(m, set);
        if (outside >= 0) {
            throw new InvalidHyperplaneException(what + " is not a flat: " + m.labels().get(outside)
                    + " lies in its closure but not in the set.");
        }
        if (k < wanted) {
            throw wrongRank(what, k, wanted);
        }
        return set;
    }

    private static InvalidHyperplaneException wrongRank(String what, int rank, int wanted) {
        return new InvalidHyperplaneException(what + " has rank " + rank + ", but a hyperplane has rank " + wanted
                + ".");
    }
}
