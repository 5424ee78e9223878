package org.chirocore.sweep;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * The hyperplanes spanned by vertices of the real n-cube up to the cube's symmetry group B_n
 * (coordinate permutations and reflections x_i → 1 − x_i, order 2^n·n!), one canonical
 * representative per orbit with the orbit's size, without listing the hyperplanes themselves.
 *
 * <p><b>Canonical form.</b> A hyperplane spanned by vertices has a primitive integer equation
 * a·x = b, unique up to the sign of (a, b). Reflecting x_i turns a_i into −a_i and b into b − a_i;
 * a permutation permutes a. So every orbit contains an equation with a ≥ 0 sorted ascending. The
 * elements of B_n that keep a non-negative and ascending either reflect only coordinates with
 * a_i = 0 (b is kept) or reflect every coordinate with a_i ≠ 0 and change the sign of the
 * equation (b becomes Σa − b), and permute coordinates with equal a_i. Hence
 * (ascending |a|, min(b, Σa − b)) is a complete invariant of the orbit ({@link #canonical}), and
 * the stabiliser of the hyperplane has order 2^z·Π c_v!·(2 if 2b = Σa else 1), where z is the
 * number of zero entries and c_v the number of entries equal to v (zero included).
 *
 * <p><b>Enumeration.</b> If a has zero entries, the hyperplane is a cylinder H'×{0,1}^z over a
 * hyperplane H' of the (n − z)-cube with an all-positive normal, and H is spanned by vertices
 * exactly when H' is. So the orbits of the n-cube are the all-positive canonical equations of the
 * m-cubes, m = 1..n, padded with n − m zeros. For the m-cube the search visits every ascending
 * positive primitive a with a_m ≤ {@link #MAX_ENTRY}[m] (each entry of the cofactor normal of m
 * vertices is an m×m determinant of a 0/1 matrix; OEIS A003432) and, for m ≥ 2,
 * a_m ≤ a_1 + … + a_{m−1} (otherwise a·x = b forces x_m and the hyperplane would be the facet
 * x_m = const, whose normal is not all-positive). For each a, the vertices are bucketed by a·v
 * (the values for a prefix of a are shared along the search), and each b with 0 ≤ b ≤ Σa − b
 * whose bucket has at least m vertices, not all agreeing on a coordinate, is tested for spanning:
 * the rank of the rows (1, v) over GF(p), p = 2^31 − 1, must be m. That rank is the exact rank:
 * every m×m minor of a 0/1 matrix is at most A003432(m) &lt; p in absolute value, so a nonzero
 * minor stays nonzero mod p.
 *
 * <p>Cost: for the m-cube, one step of 2^(m−1) additions per candidate a (C(D + m − 1, m) of them
 * with D = A003432(m); 3003 for m = 6, 12.6 million for m = 7, 3.9 billion for m = 8) plus a
 * rank test of the large buckets. Exact integer arithmetic throughout.
 */
public final class HyperplaneOrbits {
    /** Largest dimension enumerated (the table {@link #MAX_ENTRY} ends there). */
    public static final int MAX_DIMENSION = 9;

    /**
     * MAX_ENTRY[m]: the largest determinant of an m×m 0/1 matrix, OEIS A003432 (1, 1, 2, 3, 5,
     * 9, 32, 56, 144 for m = 1..9), bounding every entry of a primitive normal in the m-cube.
     */
    static final int[] MAX_ENTRY = {1, 1, 1, 2, 3, 5, 9, 32, 56, 144};

    private static final long PRIME = 2_147_483_647L;

    /**
     * Search prefixes between two progress reports inside one m-cube: 211 reports over the
     * 8-cube's 55.5 million prefixes (several seconds apart), which otherwise pass in silence for
     * minutes; the 7-cube (377 thousand prefixes, seconds) gets one.
     */
    static final long REPORT_PREFIXES = 1L << 18;

    /** Receives the progress of an enumeration. */
    @FunctionalInterface
    public interface Listener {
        /** A listener that ignores everything. */
        Listener SILENT = (m, done, total, orbits, candidates) -> { };

        /**
         * Progress inside the m-cube's search, every {@value #REPORT_PREFIXES} search prefixes
         * and once when the m-cube is done ({@code done == total}).
         *
         * @param m the dimension of the m-cube being searched
         * @param done search prefixes (a_1, …, a_{m−2}) passed so far, counting those a part skips
         * @param total the m-cube's number of search prefixes
         * @param orbits orbits found so far, in this and the smaller m-cubes
         * @param candidates normals visited so far in this m-cube
         */
        void searched(int m, long done, long total, int orbits, long candidates);
    }

    private HyperplaneOrbits() {
    }

    /**
     * The orbits of hyperplanes of the real n-cube, in order of the number of nonzero entries of
     * the normal and then lexicographically by (a, b).
     *
     * @param listener receives the progress (for long runs)
     * @throws IllegalArgumentException when n is not between 1 and {@link #MAX_DIMENSION}
     */
    public static List<HyperplaneOrbit> of(int n, Listener listener) {
        return part(n, 0, 1, listener);
    }

    /** The orbits of hyperplanes of the real n-cube (see {@link #of(int, Listener)}). */
    public static List<HyperplaneOrbit> of(int n) {
        return of(n, Listener.SILENT);
    }

    /**
     * Part {@code index} of {@code count} of the enumeration, for splitting it over machines: in
     * each m-cube the search's prefixes (a_1, …, a_{m−2}) are dealt out round-robin, prefix j to
     * part j mod count (every prefix has about as many completions, so the parts cost about the
     * same); for m ≤ 2 everything falls to part 0. The parts are disjoint and together give
     * {@link #of(int)}, each in the same order.
     *
     * @throws IllegalArgumentException when n is out of range or not 0 ≤ index &lt; count
     */
    public static List<HyperplaneOrbit> part(int n, int index, int count, Listener listener) {
        return part(n, index, count, listener, REPORT_PREFIXES);
    }

    /** As {@link #part(int, int, int, Listener)}, reporting every {@code every} search prefixes. */
    static List<HyperplaneOrbit> part(int n, int index, int count, Listener listener, long every) {
        checkDimension(n);
        if (count < 1 || index < 0 || index >= count) {
            throw new IllegalArgumentException("A part i of k needs k >= 1 and 0 <= i < k, not " + index + " of "
                    + count + ".");
        }
        List<HyperplaneOrbit> out = new ArrayList<>();
        for (int m = 1; m <= n; m++) {
            Search s = new Search(n, m, out, index, count, listener, every);
            s.extend(0, 0);
            listener.searched(m, s.prefixes, s.totalPrefixes, out.size(), s.visited);
        }
        return List.copyOf(out);
    }

    /**
     * The number of search prefixes of the m-cube: the ascending (a_1, …, a_{m−2}) with entries in
     * 1..D, D = {@link #MAX_ENTRY}[m], that is the multisets of size m − 2 of D values, C(D + m − 3, m − 2)
     * (common practice); one (empty) prefix for m ≤ 2.
     */
    static long prefixCount(int m) {
        long k = Math.max(m - 2, 0);
        long top = MAX_ENTRY[m] + k - 1;
        long c = 1;
        for (long i = 0; i < k; i++) {
            c = c * (top - i) / (i + 1); // exact: a product of i + 1 consecutive integers is divisible by (i + 1)!
        }
        return c;
    }

    /**
     * The canonical form (ascending |a| made primitive, min(b, Σ|a| − b) after reflecting the
     * negative coordinates) of the hyperplane a·x = b, as the list (a_1, …, a_n, b). Two
     * hyperplanes lie in one orbit of B_n exactly when their canonical forms are equal.
     *
     * @throws IllegalArgumentException when a is zero
     */
    public static List<Integer> canonical(int[] a, int b) {
        long g = 0;
        int[] abs = new int[a.length];
        long shifted = b;
        for (int i = 0; i < a.length; i++) {
            // reflecting x_i when a_i < 0: a_i x_i = a_i − a_i (1 − x_i), so b becomes b − a_i
            abs[i] = Math.abs(a[i]);
            if (a[i] < 0) {
                shifted -= a[i];
            }
            g = gcd(g, abs[i]);
        }
        if (g == 0) {
            throw new IllegalArgumentException("The normal vector " + Arrays.toString(a) + " is zero.");
        }
        Arrays.sort(abs);
        long sum = 0;
        List<Integer> form = new ArrayList<>(a.length + 1);
        for (int x : abs) {
            form.add((int) (x / g));
            sum += x / g;
        }
        if (shifted % g != 0) {
            throw new IllegalArgumentException("The equation " + Arrays.toString(a) + "·x = " + b
                    + " has no integer solution, so it contains no vertex.");
        }
        long c = shifted / g;
        form.add((int) Math.min(c, sum - c));
        return form;
    }

    /** The order of the stabiliser in B_n of the canonical hyperplane a·x = b (see the class comment). */
    static long stabiliser(int[] a, int b) {
        long order = 1;
        long sum = 0;
        int run = 0;
        for (int i = 0; i < a.length; i++) {
            run = i > 0 && a[i] == a[i - 1] ? run + 1 : 1;
            order *= run;
            if (a[i] == 0) {
                order *= 2;
            }
            sum += a[i];
        }
        return 2L * b == sum ? 2 * order : order;
    }

    /** 2^n·n!, the order of B_n. */
    static long groupOrder(int n) {
        long order = 1;
        for (int i = 1; i <= n; i++) {
            order *= 2L * i;
        }
        return order;
    }

    static void checkDimension(int n) {
        if (n < 1 || n > MAX_DIMENSION) {
            throw new IllegalArgumentException("Hyperplane orbits are enumerated for cube dimensions 1.."
                    + MAX_DIMENSION + ", not " + n + ".");
        }
    }

    private static long gcd(long x, long y) {
        return y == 0 ? x : gcd(y, x % y);
    }

    /** The depth-first search over ascending positive normals of the m-cube. */
    private static final class Search {
        private final int n;
        private final int m;
        private final List<HyperplaneOrbit> out;
        private final int[] a;
        /** values[p][v] = a_1 v_1 + … + a_p v_p for the vertices v of the p-cube (bit i−1 is v_i). */
        private final int[][] values;
        private final int[] count;
        private final int[] start;
        private final int[] sorted;
        private final long[][] echelon;
        private final int part;
        private final int parts;
        private final Listener listener;
        private final long every;
        private final long totalPrefixes;
        /** The number of prefixes of length m − 2 met so far, which decides their part. */
        private long prefixes;
        private long visited;

        Search(int n, int m, List<HyperplaneOrbit> out, int part, int parts, Listener listener, long every) {
            this.n = n;
            this.m = m;
            this.out = out;
            this.part = part;
            this.parts = parts;
            this.listener = listener;
            this.every = every;
            this.totalPrefixes = prefixCount(m);
            this.a = new int[m];
            this.values = new int[m + 1][];
            for (int p = 0; p <= m; p++) {
                values[p] = new int[1 << p];
            }
            int maxSum = m * MAX_ENTRY[m];
            this.count = new int[maxSum + 2];
            this.start = new int[maxSum + 2];
            this.sorted = new int[1 << m];
            this.echelon = new long[m + 1][m + 1];
        }

        /** Chooses a_{p+1} ≥ a_p given the first p entries with sum {@code sum}. */
        void extend(int p, int sum) {
            if (p == Math.max(m - 2, 0)) {
                long index = prefixes++;
                if (index > 0 && index % every == 0) {
                    // the prefixes before this one are done
                    listener.searched(m, index, totalPrefixes, out.size(), visited);
                }
                if (index % parts != part) {
                    return;
                }
            }
            if (p == m) {
                visited++;
                if ((m == 1 || a[m - 1] <= sum - a[m - 1]) && primitive()) {
                    levels(sum);
                }
                return;
            }
            int lo = p == 0 ? 1 : a[p - 1];
            int hi = MAX_ENTRY[m];
            if (p == m - 1 && m > 1) {
                hi = Math.min(hi, sum);
            }
            for (int x = lo; x <= hi; x++) {
                a[p] = x;
                int half = 1 << p;
                int[] prev = values[p];
                int[] next = values[p + 1];
                for (int v = 0; v < half; v++) {
                    next[v] = prev[v];
                    next[v | half] = prev[v] + x;
                }
                extend(p + 1, sum + x);
            }
        }

        private boolean primitive() {
            long g = 0;
            for (int x : a) {
                g = gcd(g, x);
            }
            return g == 1;
        }

        /** Buckets the vertices by a·v and tests each admissible offset b. */
        private void levels(int sum) {
            int[] val = values[m];
            Arrays.fill(count, 0, sum + 2, 0);
            for (int x : val) {
                count[x + 1]++;
            }
            for (int s = 1; s <= sum + 1; s++) {
                start[s] = start[s - 1] + count[s];
            }
            int[] fill = Arrays.copyOf(start, sum + 1);
            for (int v = 0; v < val.length; v++) {
                sorted[fill[val[v]]++] = v;
            }
            int full = (1 << m) - 1;
            for (int b = 0; 2 * b <= sum; b++) {
                int from = start[b];
                int to = start[b + 1];
                if (to - from < m) {
                    continue;
                }
                int or = 0;
                int and = full;
                for (int i = from; i < to; i++) {
                    or |= sorted[i];
                    and &= sorted[i];
                }
                // for m ≥ 2 a bucket on which some coordinate is constant lies in a facet, so it spans at
                // most that facet, whose normal is not all-positive; for m = 1 the facet is the answer
                if ((m == 1 || (or == full && and == 0)) && spans(from, to)) {
                    record(b, sum);
                }
            }
        }

        /** Whether the rows (1, v) of the bucket have rank m over GF(p) (equal to the exact rank). */
        private boolean spans(int from, int to) {
            int rank = 0;
            long[] row = new long[m + 1];
            for (int i = from; i < to && rank < m; i++) {
                row[0] = 1;
                for (int k = 0; k < m; k++) {
                    row[k + 1] = (sorted[i] >> k) & 1;
                }
                // reduce by the pivots found so far; pivot j of echelon row j sits in column piv(j)
                for (int j = 0; j < rank; j++) {
                    int c = pivotColumn(echelon[j]);
                    long f = row[c];
                    if (f != 0) {
                        for (int k = c; k <= m; k++) {
                            row[k] = Math.floorMod(row[k] - f * echelon[j][k], PRIME);
                        }
                    }
                }
                int c = pivotColumn(row);
                if (c <= m) {
                    long inv = inverse(row[c]);
                    for (int k = 0; k <= m; k++) {
                        echelon[rank][k] = row[k] * inv % PRIME;
                    }
                    rank++;
                }
            }
            return rank == m;
        }

        private int pivotColumn(long[] row) {
            int c = 0;
            while (c <= m && row[c] == 0) {
                c++;
            }
            return c;
        }

        private static long inverse(long x) {
            long result = 1;
            long base = x;
            for (long e = PRIME - 2; e > 0; e >>= 1) {
                if ((e & 1) == 1) {
                    result = result * base % PRIME;
                }
                base = base * base % PRIME;
            }
            return result;
        }

        private void record(int b, int sum) {
            int[] normal = new int[n];
            System.arraycopy(a, 0, normal, n - m, m);
            long stab = stabiliser(normal, b);
            out.add(new HyperplaneOrbit(Arrays.stream(normal).boxed().toList(), b, stab, groupOrder(n) / stab));
        }
    }
}
