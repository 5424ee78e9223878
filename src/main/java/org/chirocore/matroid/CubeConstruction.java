package org.chirocore.matroid;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * The pulled-cube construction as data: the affine n-cube over a field, a hyperplane H of it,
 * and a vertex O outside H pulled to H; optionally O is then contracted. {@link #build()}
 * validates every part and returns the resulting matroid as a rank oracle; the focus is H's
 * vertices, where the obstruction sits.
 *
 * <p>Building costs resolving H (2^n rank queries) plus the general-position check of
 * {@link PulledMatroid#pull}; the cube itself is built once per (n, field) and shared
 * ({@link AffineCube#of}). Immutable.
 *
 * @param n the cube dimension, 1..{@link AffineCube#MAX_DIMENSION}
 * @param field the field of the cube's representation
 * @param hyperplane the description of H
 * @param pulledVertex the label of O, a 0/1 string of length n
 * @param contractPulled whether O is contracted after pulling
 */
public record CubeConstruction(int n, Field field, HyperplaneSpec hyperplane, String pulledVertex,
        boolean contractPulled) implements Construction {
    public CubeConstruction {
        Objects.requireNonNull(field, "A cube construction needs a field.");
        Objects.requireNonNull(hyperplane, "A cube construction needs a hyperplane.");
        Objects.requireNonNull(pulledVertex, "A cube construction needs a vertex to pull.");
    }

    /**
     * The corner construction over the rationals: H spanned by the n unit vectors (the
     * hyperplane x1 + … + xn = 1), O the all-ones vertex, contracted.
     */
    public static CubeConstruction corner(int n) {
        if (n < 1 || n > AffineCube.MAX_DIMENSION) {
            throw new IllegalArgumentException("The cube dimension must be between 1 and " + AffineCube.MAX_DIMENSION
                    + ", not " + n + ".");
        }
        List<String> units = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            units.add("0".repeat(i) + "1" + "0".repeat(n - 1 - i));
        }
        return new CubeConstruction(n, Field.RATIONALS, new HyperplaneSpec.ByVertices(units), "1".repeat(n), true);
    }

    /**
     * The affine cube of this construction.
     *
     * @throws IllegalArgumentException when n is out of range
     */
    public AffineCube cube() {
        return AffineCube.of(n, field);
    }

    /**
     * The pulled cube, and with {@link #contractPulled} its contraction by O (a {@link Minor}
     * whose labels are the cube's minus O's).
     *
     * @throws IllegalArgumentException when n is out of range or the pulled vertex's label is
     *     malformed or lies in H, or H together with O is the whole cube
     * @throws InvalidHyperplaneException when H does not fit the cube or is not a hyperplane
     * @throws GeneralPositionException when (H, O) are not in general position, naming the
     *     hyperline and the extra point of its closure
     */
    @Override
    public Matroid build() {
        AffineCube cube = cube();
        int[] h = hyperplane.resolve(cube);
        int o = cube.indexOf(pulledVertex);
        PulledMatroid pulled = PulledMatroid.pull(cube, h, o);
        return contractPulled ? new Minor(pulled, new int[] {o}, new int[0]) : pulled;
    }

    /**
     * The labels of H's vertices in element order.
     *
     * @throws InvalidHyperplaneException when the description does not fit the cube
     */
    public List<String> hyperplaneVertices() {
        AffineCube cube = cube();
        return labels(cube, hyperplane.vertices(cube));
    }

    /** H's vertices: contracting them first reaches the obstruction of a large pulled cube. */
    @Override
    public List<String> focus() {
        return hyperplaneVertices();
    }

    /**
     * The cube dimension, the field's name, H's vertices, O's label and whether O is contracted,
     * as {@code cube}, {@code field}, {@code hyperplane}, {@code pulled}, {@code contractPulled}.
     */
    @Override
    public List<Part> provenance() {
        return List.of(new Part("cube", n), new Part("field", field.name()), new Part("hyperplane", hyperplaneVertices()),
                new Part("pulled", pulledVertex), new Part("contractPulled", contractPulled));
    }

    /**
     * The equation of H as text ("x1 + x2 + x3 = 1"), when H is the vertex set of a real
     * hyperplane.
     *
     * @throws InvalidHyperplaneException when the description does not fit the cube
     */
    public Optional<String> hyperplaneEquation() {
        return hyperplane.equation(cube()).map(CubeHyperplane::equation);
    }

    static List<String> labels(Matroid m, int[] set) {
        return Arrays.stream(set).mapToObj(m.labels()::get).toList();
    }
}
