package org.chirocore.matroid;

import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;

/**
 * Facts about an affine n-cube and, optionally, a candidate hyperplane H and a vertex O to pull:
 * counts of its special configurations, whether H is a hyperplane of the cube's matroid, and
 * whether (H, O) are in general position. Unlike {@link CubeConstruction#build()} it reports a
 * failed check as a fact instead of throwing.
 *
 * <p>Costs O(4^n) for the rectangles, {@link CubeGeometry#realHyperplanes} when that is counted
 * (real field and n ≤ {@link CubeGeometry#MAX_ENUMERATED_DIMENSION}), plus the checks of
 * {@link HyperplaneSpec#resolve} and {@link PulledMatroid#generalPositionViolation}.
 *
 * @param n the dimension
 * @param field the field
 * @param elements 2^n
 * @param rank n + 1 over any field
 * @param facets number of facets x_i = 0, 1
 * @param skewFacets number of skew facets x_i = x_j, x_i = 1 − x_j
 * @param rectangles number of rectangles (4-element circuits a + c = b + d)
 * @param hyperplanes number of hyperplanes of the real cube; empty when not enumerated
 * @param hyperplane the check of H, when one was given
 * @param pull the check of (H, O), when O was given and H is a hyperplane
 */
public record CubeReport(int n, Field field, int elements, int rank, int facets, int skewFacets, int rectangles,
        OptionalInt hyperplanes, Optional<HyperplaneCheck> hyperplane, Optional<PullCheck> pull) {

    /**
     * What a hyperplane description amounts to in the cube.
     *
     * @param vertices the labels of the described vertex set
     * @param equation its real equation, when it is the vertex set of a real hyperplane
     * @param problem why it is not a hyperplane of the cube's matroid; empty when it is one
     */
    public record HyperplaneCheck(List<String> vertices, Optional<String> equation, Optional<String> problem) {
        public HyperplaneCheck {
            vertices = List.copyOf(vertices);
        }

        /** Whether the set is a hyperplane of the cube's matroid. */
        public boolean isHyperplane() {
            return problem.isEmpty();
        }
    }

    /**
     * Whether a vertex can be pulled to the hyperplane.
     *
     * @param vertex the label of O
     * @param problem the violation of general position (or why O cannot be pulled, e.g. it lies
     *     in H); empty when (H, O) are in general position
     */
    public record PullCheck(String vertex, Optional<String> problem) {
    }

    /**
     * The facts about the n-cube over {@code field}, with H and O when given.
     *
     * @param pulledVertex the label of O; only looked at when {@code hyperplane} is present
     * @throws IllegalArgumentException when n is out of range
     * @throws InvalidHyperplaneException when the description of H does not fit the cube at
     *     all (wrong number of coefficients, malformed labels)
     */
    public static CubeReport of(int n, Field field, Optional<HyperplaneSpec> hyperplane,
            Optional<String> pulledVertex) {
        AffineCube cube = AffineCube.of(n, field);
        OptionalInt hyperplanes = field.isRational() && n <= CubeGeometry.MAX_ENUMERATED_DIMENSION
                ? OptionalInt.of(CubeGeometry.realHyperplanes(n).size())
                : OptionalInt.empty();
        Optional<HyperplaneCheck> hCheck = hyperplane.map(spec -> check(cube, spec));
        Optional<PullCheck> pCheck = Optional.empty();
        if (hyperplane.isPresent() && hCheck.get().isHyperplane() && pulledVertex.isPresent()) {
            pCheck = Optional.of(check(cube, hyperplane.get().resolve(cube), pulledVertex.get()));
        }
        return new CubeReport(n, field, cube.size(), cube.rank(), CubeGeometry.facets(n).size(),
                CubeGeometry.skewFacets(n).size(), CubeGeometry.rectangles(n).size(), hyperplanes, hCheck, pCheck);
    }

    private static HyperplaneCheck check(AffineCube cube, HyperplaneSpec spec) {
        List<String> vertices = CubeConstruction.labels(cube, spec.vertices(cube));
        Optional<String> equation = spec.equation(cube).map(CubeHyperplane::equation);
        try {
            spec.resolve(cube);
            return new HyperplaneCheck(vertices, equation, Optional.empty());
        } catch (InvalidHyperplaneException e) {
            return new HyperplaneCheck(vertices, equation, Optional.of(e.getMessage()));
        }
    }

    private static PullCheck check(AffineCube cube, int[] h, String vertex) {
        try {
            int o = cube.indexOf(vertex);
            return new PullCheck(vertex,
                    PulledMatroid.generalPositionViolation(cube, h, o).map(GeneralPositionViolation::message));
        } catch (IllegalArgumentException e) {
            // A malformed label, O inside H, or H ∪ {O} = E: each is a reason O cannot be pulled.
            return new PullCheck(vertex, Optional.of(e.getMessage()));
        }
    }
}
