package org.chirocore.matroid;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.TreeSet;

/**
 * Real configurations near a pulled cube, as candidate realisations of its minors. The pulled
 * matroid itself is not realisable when it is non-orientable, but its single-element minors often
 * are, and the natural candidates come from the real cube: the vectors (1, v) with O's vector
 * replaced by a point O' of span(H) (O "pulled onto" H, so that H ∪ {O'} has rank n as in the
 * pulled matroid), or left in place. The points tried, in this order: the sum of H's vectors
 * (the centroid of H), then for each vertex X the core or the path mentions, in element order,
 * the point where the line through O and X meets span(H); finally the unmoved cube. Each is
 * turned into a matrix of the minor /C\D by {@link #minor} (exact quotient over Q). Nothing here
 * claims a candidate is right: the caller checks each one against the minor's bases
 * ({@code orient.RealisationCheck}).
 *
 * <p>Cost per candidate: one fraction-free elimination of n + 1 rows over |C| + |kept| columns.
 */
public final class PulledRealisations {
    private PulledRealisations() {
    }

    /**
     * The candidate realisations of (the pulled construction)/C restricted to {@code kept}: one
     * matrix with one column per kept label, in that order, per candidate point O' (duplicates,
     * and candidates whose rank is not the minor's, dropped). Empty when the field is not Q.
     *
     * @param kept the labels of the minor (e.g. a core's labels), in its element order
     * @param contracted the labels of C (O is added when the construction contracts it)
     * @param rank the rank of the minor
     */
    public static List<Realisation> candidates(CubeConstruction c, List<String> kept, List<String> contracted, int rank) {
        if (!c.field().isRational()) {
            return List.of();
        }
        AffineCube cube = c.cube();
        int o = cube.indexOf(c.pulledVertex());
        int[] h = c.hyperplane().resolve(cube);
        long[] vertexO = cube.matrixMatroid().column(o);
        List<long[]> points = new ArrayList<>();
        long[] centroid = new long[vertexO.length];
        for (int v : h) {
            long[] x = cube.matrixMatroid().column(v);
            for (int i = 0; i < x.length; i++) {
                centroid[i] += x[i];
            }
        }
        points.add(centroid);
        long[] normal = normal(cube, h);
        Set<Integer> seen = new TreeSet<>();
        for (String label : kept) {
            seen.add(cube.indexOf(label));
        }
        for (String label : contracted) {
            seen.add(cube.indexOf(label));
        }
        seen.remove(o);
        for (int x : seen) {
            // (ν·X)·O − (ν·O)·X lies on the line through O and X, and ν vanishes on it: a point of span(H)
            long[] vx = cube.matrixMatroid().column(x);
            BigInteger nx = dot(normal, vx);
            BigInteger no = dot(normal, vertexO);
            long[] p = new long[vx.length];
            for (int i = 0; i < p.length; i++) {
                p[i] = nx.multiply(BigInteger.valueOf(vertexO[i])).subtract(no.multiply(BigInteger.valueOf(vx[i]))).longValueExact();
            }
            points.add(p);
        }
        points.add(vertexO);
        Set<List<Long>> distinct = new LinkedHashSet<>();
        List<Realisation> out = new ArrayList<>();
        for (long[] point : points) {
            if (!distinct.add(primitive(point))) {
                continue;
            }
            Optional<Realisation> r = minor(cube, o, point, kept, contracted, c.contractPulled());
            if (r.isPresent() && r.get().rank() == rank) {
                out.add(r.get());
            }
        }
        return out;
    }

    private static Optional<Realisation> minor(AffineCube cube, int o, long[] point, List<String> kept, List<String> contracted,
            boolean contractPulled) {
        List<long[]> contract = new ArrayList<>();
        for (String label : contracted) {
            contract.add(column(cube, o, point, cube.indexOf(label)));
        }
        if (contractPulled) {
            contract.add(point);
        }
        List<long[]> keep = new ArrayList<>();
        for (String label : kept) {
            keep.add(column(cube, o, point, cube.indexOf(label)));
        }
        return minor(contract, keep, kept);
    }

    private static long[] column(AffineCube cube, int o, long[] point, int v) {
        return v == o ? point : cube.matrixMatroid().column(v);
    }

    /** The normal vector ν of span(H): the one functional of the quotient of Q^{n+1} by H's vectors. */
    private static long[] normal(AffineCube cube, int[] h) {
        List<long[]> contract = new ArrayList<>();
        for (int v : h) {
            contract.add(cube.matrixMatroid().column(v));
        }
        int d = cube.dimension() + 1;
        List<long[]> units = new ArrayList<>();
        for (int i = 0; i < d; i++) {
            long[] u = new long[d];
            u[i] = 1;
            units.add(u);
        }
        long[][] rows = quotientRows(contract, units);
        if (rows.length != 1) {
            throw new IllegalStateException("H spans " + (d - rows.length) + " dimensions, not " + (d - 1) + ": not a hyperplane.");
        }
        return rows[0];
    }

    /**
     * A realisation of (vectors)/C restricted to {@code keep}: the columns of {@code keep} mapped
     * by a linear map over Q whose kernel is exactly span(contract), cut to its rank. The map is
     * the fraction-free (Bareiss) elimination of the matrix [contract | keep] on the contract
     * columns: it multiplies rows by non-zero numbers and adds multiples of rows, so it is
     * invertible, and the rows below the pivots vanish on every contracted vector and are
     * d − rank(contract) independent functionals. Each row is divided by the gcd of its entries.
     * Empty when an entry does not fit a long or nothing is left.
     *
     * @param contract the vectors of C (any length d, all equal)
     * @param keep the vectors of the minor's elements
     * @param labels the minor's labels, one per kept vector
     */
    public static Optional<Realisation> minor(List<long[]> contract, List<long[]> keep, List<String> labels) {
        if (keep.isEmpty()) {
            return Optional.empty();
        }
        long[][] rows = quotientRows(contract, keep);
        if (rows.length == 0) {
            return Optional.empty();
        }
        List<long[]> columns = new ArrayList<>();
        for (int j = 0; j < keep.size(); j++) {
            long[] column = new long[rows.length];
            for (int i = 0; i < rows.length; i++) {
                column[i] = rows[i][j];
            }
            columns.add(column);
        }
        return Realisation.of(new MatrixMatroid(Field.RATIONALS, columns, labels));
    }

    /**
     * The rows below the pivots of [contract | keep] after Bareiss elimination on the contract
     * columns, restricted to the keep columns and divided by their gcds; an empty array when an
     * entry does not fit a long.
     */
    private static long[][] quotientRows(List<long[]> contract, List<long[]> keep) {
        List<long[]> all = new ArrayList<>(contract);
        all.addAll(keep);
        int d = all.get(0).length;
        int width = all.size();
        BigInteger[][] a = new BigInteger[d][width];
        for (int j = 0; j < width; j++) {
            for (int i = 0; i < d; i++) {
                a[i][j] = BigInteger.valueOf(all.get(j)[i]);
            }
        }
        int rank = MatrixMatroid.eliminate(a, contract.size());
        long[][] out = new long[d - rank][keep.size()];
        for (int i = rank; i < d; i++) {
            BigInteger g = BigInteger.ZERO;
            for (int j = contract.size(); j < width; j++) {
                g = g.gcd(a[i][j]);
            }
            for (int j = contract.size(); j < width; j++) {
                BigInteger v = g.signum() == 0 ? BigInteger.ZERO : a[i][j].divide(g);
                if (v.bitLength() >= 63) {
                    return new long[0][];
                }
                out[i - rank][j - contract.size()] = v.longValue();
            }
        }
        return out;
    }

    private static BigInteger dot(long[] a, long[] b) {
        BigInteger s = BigInteger.ZERO;
        for (int i = 0; i < a.length; i++) {
            s = s.add(BigInteger.valueOf(a[i]).multiply(BigInteger.valueOf(b[i])));
        }
        return s;
    }

    /** The vector divided by the gcd of its entries, first non-zero entry positive: equal for parallel vectors. */
    private static List<Long> primitive(long[] v) {
        long g = 0;
        long sign = 0;
        for (long x : v) {
            g = BigInteger.valueOf(g).gcd(BigInteger.valueOf(x)).longValue();
            sign = sign == 0 ? Long.signum(x) : sign;
        }
        List<Long> out = new ArrayList<>();
        for (long x : v) {
            out.add(g == 0 ? 0 : sign * x / g);
        }
        return out;
    }
}
