package org.chirocore.check;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.BitSet;
import java.util.List;
import java.util.Optional;

/**
 * A family of r-subsets of {0..n−1} as sorted element arrays (the certificate's own form), in
 * canonical (lexicographic) order, with lookup of a set's position by binary search:
 * O(r log |family|) per lookup. Also the few operations on sorted element arrays the checks need.
 * Immutable; the arrays it hands out must not be changed.
 */
final class BasisTable {
    final int size;
    final int rank;
    /** The sets in canonical order; position k is SAT variable k + 1. */
    private final int[][] canonical;

    /** @param canonical distinct sorted sets in canonical order (the caller has checked this) */
    BasisTable(int size, int rank, List<int[]> canonical) {
        this.size = size;
        this.rank = rank;
        this.canonical = canonical.toArray(new int[0][]);
    }

    int count() {
        return canonical.length;
    }

    int[] basis(int position) {
        return canonical[position];
    }

    /** The canonical position of the sorted set {@code set}, or −1 when it is not in the family. */
    int positionOf(int[] set) {
        int k = Arrays.binarySearch(canonical, set, Arrays::compare);
        return k < 0 ? -1 : k;
    }

    /** Whether the sorted set {@code set} contains {@code e}. */
    static boolean contains(int[] set, int e) {
        return Arrays.binarySearch(set, e) >= 0;
    }

    /** The sorted set X ∪ {p, q} for a sorted X not containing p ≠ q. */
    static int[] with(int[] x, int p, int q) {
        int[] out = Arrays.copyOf(x, x.length + 2);
        out[x.length] = p;
        out[x.length + 1] = q;
        Arrays.sort(out);
        return out;
    }

    /** The sorted set without the elements at positions i and j (j = −1 for one position only). */
    static int[] without(int[] set, int i, int j) {
        int[] out = new int[set.length - (j < 0 ? 1 : 2)];
        int k = 0;
        for (int a = 0; a < set.length; a++) {
            if (a != i && a != j) {
                out[k++] = set[a];
            }
        }
        return out;
    }

    /** A sorted set in JSON style, for messages: {@code [0, 3, 5]}. */
    static String set(int[] set) {
        return Arrays.toString(set);
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
     * non-isolated vertices (non-adjacency is transitive there). Cost O(b · r³ · log(b r²)) for b
     * bases, in sorted arrays of b · C(r, 2) entries (a long and an (r − 2)-element array each).
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
     * (the basis position for k = 1, the two elements p < q of T as p·n + q for k = 2, below 2^20
     * for n ≤ 1024). Returned as the distinct X in lexicographic order and the entries
     * {@code group << 24 | payload}, sorted, so that each group's entries are consecutive.
     */
    private record Groups(int[][] xs, long[] entries) {
        int[] x(int entry) {
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
        int[][] xs = new int[canonical.length * perBasis][];
        long[] entries = new long[xs.length];
        int at = 0;
        for (int i = 0; i < canonical.length; i++) {
            int[] b = canonical[i];
            for (int p = 0; p < rank; p++) {
                if (k == 1) {
                    xs[at] = without(b, p, -1);
                    entries[at++] = i;
                    continue;
                }
                for (int q = p + 1; q < rank; q++) {
                    xs[at] = without(b, p, q);
                    entries[at++] = (long) b[p] * size + b[q];
                }
            }
        }
        int[][] sorted = xs.clone();
        Arrays.sort(sorted, Arrays::compare);
        int distinct = 0;
        for (int i = 0; i < sorted.length; i++) {
            if (i == 0 || !Arrays.equals(sorted[i], sorted[i - 1])) {
                sorted[distinct++] = sorted[i];
            }
        }
        int[][] unique = Arrays.copyOf(sorted, distinct);
        for (int i = 0; i < entries.length; i++) {
            entries[i] |= (long) Arrays.binarySearch(unique, xs[i], Arrays::compare) << PAYLOAD;
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
        BitSet[] adjacent = new BitSet[size];
        Arrays.setAll(adjacent, v -> new BitSet(size));
        for (int i = 0; i < g.entries().length;) {
            int j = i;
            BitSet vertices = new BitSet(size);
            for (; j < g.entries().length && g.sameGroup(i, j); j++) {
                int p = g.payload(j) / size;
                int q = g.payload(j) % size;
                adjacent[p].set(q);
                adjacent[q].set(p);
                vertices.set(p);
                vertices.set(q);
            }
            Optional<String> defect = multipartiteDefect(adjacent, vertices, g.x(i));
            vertices.stream().forEach(v -> adjacent[v].clear());
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
     * leaves no y ∈ {a, c} with X ∪ {b, y} a basis. Cost O(|V|² · n / 64) for the vertex set V.
     */
    private static Optional<String> multipartiteDefect(BitSet[] adjacent, BitSet vertices, int[] x) {
        for (int v = vertices.nextSetBit(0); v >= 0; v = vertices.nextSetBit(v + 1)) {
            BitSet others = (BitSet) vertices.clone();
            others.andNot(adjacent[v]);
            others.clear(v);
            for (int u = others.nextSetBit(0); u >= 0; u = others.nextSetBit(u + 1)) {
                BitSet differ = (BitSet) adjacent[u].clone();
                differ.xor(adjacent[v]);
                if (differ.isEmpty()) {
                    continue;
                }
                int w = differ.nextSetBit(0);
                // the middle vertex b is non-adjacent to both others, which are adjacent
                int b = adjacent[u].get(w) ? v : u;
                int a = b == v ? u : v;
                int z = adjacent[b].nextSetBit(0);
                return Optional.of("no y in " + set(with(new int[0], a, w)) + " makes " + set(with(x, b, z)) + " - " + z
                        + " + y a basis (B2 = " + set(with(x, a, w)) + ")");
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

    /** The size, rank and number of bases of a matroid. */
    record Shape(int size, int rank, long bases) {
    }

    /** The shape of core\e ({@code contract} false) or core/e, counted without building the minor: O(bases). */
    Shape minorShape(int e, boolean contract) {
        long containing = 0;
        for (int[] b : canonical) {
            containing += contains(b, e) ? 1 : 0;
        }
        boolean wantContaining = contract ? containing != 0 : containing == canonical.length;
        return new Shape(size - 1, rank - (wantContaining ? 1 : 0), wantContaining ? containing : canonical.length - containing);
    }

    private BasisTable minor(int e, boolean contract) {
        int containing = 0;
        for (int[] b : canonical) {
            containing += contains(b, e) ? 1 : 0;
        }
        boolean coloop = containing == canonical.length;
        boolean loop = containing == 0;
        boolean wantContaining = contract ? !loop : coloop;
        List<int[]> kept = new ArrayList<>();
        for (int[] b : canonical) {
            if (contains(b, e) == wantContaining) {
                kept.add(removeElement(b, e));
            }
        }
        kept.sort(Arrays::compare);
        return new BasisTable(size - 1, rank - (wantContaining ? 1 : 0), kept);
    }

    /** The sorted set with element e taken out and the elements above it moved down by one. */
    static int[] removeElement(int[] set, int e) {
        int[] out = new int[set.length - (contains(set, e) ? 1 : 0)];
        int k = 0;
        for (int a : set) {
            if (a != e) {
                out[k++] = a > e ? a - 1 : a;
            }
        }
        return out;
    }
}
