package org.chirocore.check;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;

/**
 * A family of r-subsets of {0..n−1} (n ≤ 64) as bit masks, in canonical (lexicographic) order, with
 * lookup of a set's position by binary search: O(log |family|) per lookup, O(|family| log |family|)
 * to build. Immutable.
 */
final class BasisTable {
    final int size;
    final int rank;
    /** The sets in canonical order; position k is SAT variable k + 1. */
    private final long[] canonical;
    /** The same sets in numeric order of their masks, and each one's canonical position. */
    private final long[] numeric;
    private final int[] positionOfNumeric;

    /** @param canonical distinct masks in canonical order (the caller has checked this) */
    BasisTable(int size, int rank, long[] canonical) {
        this.size = size;
        this.rank = rank;
        this.canonical = canonical.clone();
        Integer[] order = new Integer[canonical.length];
        Arrays.setAll(order, i -> i);
        Arrays.sort(order, (i, j) -> Long.compare(canonical[i], canonical[j]));
        this.numeric = new long[canonical.length];
        this.positionOfNumeric = new int[canonical.length];
        for (int k = 0; k < order.length; k++) {
            numeric[k] = canonical[order[k]];
            positionOfNumeric[k] = order[k];
        }
    }

    int count() {
        return canonical.length;
    }

    long basis(int position) {
        return canonical[position];
    }

    /** The set at canonical position {@code position}, as its elements in increasing order. */
    int[] elements(int position) {
        long mask = canonical[position];
        int[] out = new int[Long.bitCount(mask)];
        for (int i = 0; i < out.length; i++, mask &= mask - 1) {
            out[i] = Long.numberOfTrailingZeros(mask);
        }
        return out;
    }

    /** The canonical position of the set with the increasing elements {@code sorted} (each below 64), or −1 when it is not in the family. */
    int positionOf(int[] sorted) {
        long mask = 0;
        for (int e : sorted) {
            mask |= 1L << e;
        }
        return positionOf(mask);
    }

    /** The canonical position of {@code mask}, or −1 when it is not in the family. */
    int positionOf(long mask) {
        int k = Arrays.binarySearch(numeric, mask);
        return k < 0 ? -1 : positionOfNumeric[k];
    }

    /**
     * Whether a precedes b in lexicographic order of their sorted tuples (sets of equal size): at the
     * first differing position the smaller element is the least element of the symmetric difference.
     */
    static boolean lexLess(long a, long b) {
        return a != b && (a & Long.lowestOneBit(a ^ b)) != 0;
    }

    /**
     * The first violation of the basis exchange axiom ([Ox, §1.2]: for bases B1, B2 and x ∈ B1 − B2
     * there is y ∈ B2 − B1 with B1 − x + y a basis), or empty.
     *
     * <p>It is decided locally (Maurer, "Matroid basis graphs I", J. Combin. Theory B 14 (1973),
     * from memory; see docs/mathematics.md): a non-empty family of r-sets is the set of bases of a
     * matroid iff (a) its basis graph (bases adjacent when they differ in one element) is connected
     * and (b) the exchange axiom holds for every two bases that differ in two elements. Two such
     * bases are X ∪ {p, q} and X ∪ {u, v} with |X| = r − 2; for fixed X, (b) says exactly that the
     * graph G_X with an edge pq for each basis X ∪ {p, q} is complete multipartite on its
     * non-isolated vertices (non-adjacency is transitive there). Cost O(b · r² · log(b r²)) for b
     * bases, in sorted arrays of b · C(r, 2) longs.
     */
    Optional<String> exchangeDefect() {
        if (canonical.length == 0) {
            return Optional.of("there are no bases; a matroid has at least one");
        }
        long pairs = (long) canonical.length * Math.max(rank, rank * (rank - 1) / 2);
        if (pairs > VerifierLimits.MAX_EXCHANGE_PAIRS) {
            return Optional.of(canonical.length + " bases of rank " + rank + " need " + pairs
                    + " entries for the exchange check, more than the verifier's limit of " + VerifierLimits.MAX_EXCHANGE_PAIRS);
        }
        Optional<String> disconnected = disconnection();
        return disconnected.isPresent() ? disconnected : nonMultipartite();
    }

    /** Bits of a grouped entry below its group number. */
    private static final int PAYLOAD = 24;

    /**
     * For every basis B and every k-subset T of B (k = 1 or 2): the group X = B − T and a payload
     * (the basis position for k = 1, the two elements of T for k = 2). Returned as the distinct
     * X in numeric order and the entries {@code group << 24 | payload}, sorted, so that each
     * group's entries are consecutive.
     */
    private record Groups(long[] xs, long[] entries) {
        long x(int entry) {
            return xs[(int) (entries[entry] >>> PAYLOAD)];
        }

        boolean sameGroup(int i, int j) {
            return entries[i] >>> PAYLOAD == entries[j] >>> PAYLOAD;
        }

        int payload(int entry) {
            return (int) (entries[entry] & ((1 << PAYLOAD) - 1));
        }
    }

    private Groups grouped(int k) {
        int perBasis = k == 1 ? rank : rank * (rank - 1) / 2;
        long[] xs = new long[canonical.length * perBasis];
        long[] entries = new long[xs.length];
        int at = 0;
        for (int i = 0; i < canonical.length; i++) {
            long b = canonical[i];
            for (long ps = b; ps != 0; ps &= ps - 1) {
                long p = Long.lowestOneBit(ps);
                if (k == 1) {
                    xs[at] = b & ~p;
                    entries[at++] = i;
                    continue;
                }
                for (long qs = ps & (ps - 1); qs != 0; qs &= qs - 1) {
                    long q = Long.lowestOneBit(qs);
                    xs[at] = b & ~p & ~q;
                    entries[at++] = Long.numberOfTrailingZeros(p) << 6 | Long.numberOfTrailingZeros(q);
                }
            }
        }
        long[] sorted = xs.clone();
        Arrays.sort(sorted);
        int distinct = 0;
        for (int i = 0; i < sorted.length; i++) {
            if (i == 0 || sorted[i] != sorted[i - 1]) {
                sorted[distinct++] = sorted[i];
            }
        }
        long[] unique = Arrays.copyOf(sorted, distinct);
        for (int i = 0; i < entries.length; i++) {
            entries[i] |= (long) Arrays.binarySearch(unique, xs[i]) << PAYLOAD;
        }
        Arrays.sort(entries);
        return new Groups(unique, entries);
    }

    /** (a): union-find over the bases, joining the bases that share an (r − 1)-subset. */
    private Optional<String> disconnection() {
        int[] parent = new int[canonical.length];
        Arrays.setAll(parent, i -> i);
        if (rank > 0) {
            Groups g = grouped(1);
            for (int i = 1; i < g.entries().length; i++) {
                if (g.sameGroup(i - 1, i)) {
                    parent[root(parent, g.payload(i))] = root(parent, g.payload(i - 1));
                }
            }
        }
        for (int k = 1; k < canonical.length; k++) {
            if (root(parent, k) != root(parent, 0)) {
                return Optional.of("the bases " + set(canonical[0]) + " and " + set(canonical[k])
                        + " are not joined by a chain of bases each differing from the next in one element");
            }
        }
        return Optional.empty();
    }

    private static int root(int[] parent, int i) {
        int r = i;
        while (parent[r] != r) {
            parent[r] = parent[parent[r]];
            r = parent[r];
        }
        return r;
    }

    /** (b): for each X, the graph G_X is complete multipartite on its non-isolated vertices. */
    private Optional<String> nonMultipartite() {
        if (rank < 2) {
            return Optional.empty();
        }
        Groups g = grouped(2);
        long[] adjacent = new long[64];
        for (int i = 0; i < g.entries().length;) {
            int j = i;
            long vertices = 0;
            for (; j < g.entries().length && g.sameGroup(i, j); j++) {
                int p = g.payload(j) >>> 6;
                int q = g.payload(j) & 63;
                adjacent[p] |= 1L << q;
                adjacent[q] |= 1L << p;
                vertices |= 1L << p | 1L << q;
            }
            Optional<String> defect = multipartiteDefect(adjacent, vertices, g.x(i));
            for (long vs = vertices; vs != 0; vs &= vs - 1) {
                adjacent[Long.numberOfTrailingZeros(vs)] = 0;
            }
            if (defect.isPresent()) {
                return defect;
            }
            i = j;
        }
        return Optional.empty();
    }

    /**
     * A pair of bases X ∪ {a, c}, X ∪ {b, z} without exchange, when non-adjacency in G_X is not
     * transitive: a ≁ b, b ≁ c but a ~ c, and z a neighbour of b. Then removing z from X ∪ {b, z}
     * leaves no y ∈ {a, c} with X ∪ {b, y} a basis. Cost O(|V|²) bit operations for the vertex set V.
     */
    private static Optional<String> multipartiteDefect(long[] adjacent, long vertices, long x) {
        for (long vs = vertices; vs != 0; vs &= vs - 1) {
            int v = Long.numberOfTrailingZeros(vs);
            for (long us = vertices & ~adjacent[v] & ~(1L << v); us != 0; us &= us - 1) {
                int u = Long.numberOfTrailingZeros(us);
                long differ = adjacent[u] ^ adjacent[v];
                if (differ == 0) {
                    continue;
                }
                int w = Long.numberOfTrailingZeros(differ);
                // the middle vertex b is non-adjacent to both others, which are adjacent
                int b = (adjacent[u] & 1L << w) != 0 ? v : u;
                int a = b == v ? u : v;
                int z = Long.numberOfTrailingZeros(adjacent[b]);
                return Optional.of("no y in " + set(1L << a | 1L << w) + " makes " + set(x | 1L << b | 1L << z) + " - " + z
                        + " + y a basis (B2 = " + set(x | 1L << a | 1L << w) + ")");
            }
        }
        return Optional.empty();
    }

    /** core\e ([Ox, §3.1]): the bases avoiding e, or all bases minus e when e is a coloop; e removed and later elements renumbered. */
    BasisTable deletion(int e) {
        return minor(e, false);
    }

    /** core/e: B − e for the bases B containing e, or all bases when e is a loop; renumbered as {@link #deletion}. */
    BasisTable contraction(int e) {
        return minor(e, true);
    }

    private BasisTable minor(int e, boolean contract) {
        long bit = 1L << e;
        int containing = 0;
        for (long b : canonical) {
            containing += (b & bit) != 0 ? 1 : 0;
        }
        boolean coloop = containing == canonical.length;
        boolean loop = containing == 0;
        boolean wantContaining = contract ? !loop : coloop;
        List<Long> kept = new ArrayList<>();
        for (long b : canonical) {
            if (((b & bit) != 0) == wantContaining) {
                kept.add(removeElement(b, e));
            }
        }
        kept.sort((a, b) -> a.equals(b) ? 0 : lexLess(a, b) ? -1 : 1);
        long[] masks = kept.stream().mapToLong(Long::longValue).toArray();
        return new BasisTable(size - 1, rank - (wantContaining ? 1 : 0), masks);
    }

    /** The mask with element e taken out and the elements above it moved down by one. */
    static long removeElement(long mask, int e) {
        long below = mask & ((1L << e) - 1);
        return below | ((mask >>> e >>> 1) << e);
    }

    /** A mask as a sorted index array in JSON style, for messages: {@code [0, 3, 5]}. */
    static String set(long mask) {
        StringBuilder s = new StringBuilder("[");
        for (long m = mask; m != 0; m &= m - 1) {
            s.append(s.length() > 1 ? ", " : "").append(Long.numberOfTrailingZeros(m));
        }
        return s.append(']').toString();
    }
}
