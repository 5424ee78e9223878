package org.chirocore.search.marco;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Set;

import org.chirocore.matroid.CubeConstruction;
import org.chirocore.matroid.ElementSet;
import org.chirocore.matroid.ElementSets;
import org.chirocore.matroid.ExplicitMatroid;

/**
 * A group of automorphisms of a matroid M, listed element by element: each permutation maps
 * element e to {@code permutation[e]}. Used to enumerate contraction sets up to symmetry and to
 * count the minors in a class. Every listed permutation is checked to map bases of M to bases.
 *
 * @param kind "cube" (the cube symmetries fixing H and O), "automorphisms" or "none"
 * @param permutations the group's elements, the identity first
 */
public record Symmetry(String kind, List<int[]> permutations) {
    /** Most automorphisms listed for a matroid file; beyond it, use {@code --symmetry none}. */
    public static final int MAX_AUTOMORPHISMS = 100_000;

    public Symmetry {
        permutations = permutations.stream().map(int[]::clone).toList();
    }

    /** The trivial group on {@code size} elements. */
    public static Symmetry none(int size) {
        return new Symmetry("none", List.of(ElementSets.range(size)));
    }

    /**
     * The symmetries of the n-cube (coordinate permutations composed with reflections
     * x_i → 1 − x_i) that fix H setwise and the pulled vertex O, acting on the elements of the
     * built matroid {@code m} (whose labels are vertex labels). Computed by trying all n!·2^n
     * symmetries, then checked on the bases of m.
     *
     * @throws IllegalStateException when a symmetry fixing H and O fails to be an automorphism (a bug)
     */
    public static Symmetry ofCube(CubeConstruction construction, ExplicitMatroid m) {
        int n = construction.n();
        Set<String> h = Set.copyOf(construction.hyperplaneVertices());
        String o = construction.pulledVertex();
        List<int[]> found = new ArrayList<>();
        int[] perm = ElementSets.range(n);
        do {
            for (int reflect = 0; reflect < 1 << n; reflect++) {
                if (!image(o, perm, reflect).equals(o)) {
                    continue;
                }
                boolean fixesH = true;
                for (String v : h) {
                    fixesH &= h.contains(image(v, perm, reflect));
                }
                if (!fixesH) {
                    continue;
                }
                int[] p = new int[m.size()];
                for (int e = 0; e < m.size(); e++) {
                    p[e] = m.labels().indexOf(image(m.labels().get(e), perm, reflect));
                }
                found.add(p);
            }
        } while (nextPermutation(perm));
        found.sort(Symmetry::compare);
        return checked(new Symmetry("cube", found), m);
    }

    /** The vertex label v with coordinate i moved to position perm[i] and flipped where reflect has a bit. */
    private static String image(String v, int[] perm, int reflect) {
        char[] out = new char[v.length()];
        for (int i = 0; i < v.length(); i++) {
            out[perm[i]] = (char) (v.charAt(i) ^ ((reflect >> i) & 1));
        }
        return new String(out);
    }

    /**
     * Every automorphism of {@code m}: a backtracking search that extends a partial element map
     * one element at a time and keeps it only while every r-subset of the mapped elements keeps
     * its basis status.
     *
     * @throws IllegalArgumentException when there are more than {@link #MAX_AUTOMORPHISMS}
     */
    public static Symmetry automorphisms(ExplicitMatroid m) {
        List<int[]> found = new ArrayList<>();
        extend(m, new int[m.size()], new boolean[m.size()], 0, found);
        found.sort(Symmetry::compare);
        return checked(new Symmetry("automorphisms", found), m);
    }

    private static void extend(ExplicitMatroid m, int[] map, boolean[] used, int next, List<int[]> found) {
        if (next == m.size()) {
            if (found.size() >= MAX_AUTOMORPHISMS) {
                throw new IllegalArgumentException("The matroid has more than " + MAX_AUTOMORPHISMS
                        + " automorphisms; enumerate it with --symmetry none.");
            }
            found.add(map.clone());
            return;
        }
        for (int image = 0; image < m.size(); image++) {
            if (used[image]) {
                continue;
            }
            map[next] = image;
            if (consistent(m, map, next)) {
                used[image] = true;
                extend(m, map, used, next + 1, found);
                used[image] = false;
            }
        }
    }

    /** Whether every r-subset of {0..last} containing {@code last} is a basis exactly when its image is. */
    private static boolean consistent(ExplicitMatroid m, int[] map, int last) {
        int r = m.rank();
        if (r == 0 || last + 1 < r) {
            return true;
        }
        int[] comb = ElementSets.range(r - 1);
        do {
            long set = 1L << last;
            long image = 1L << map[last];
            for (int i = 0; i < r - 1; i++) {
                set |= 1L << comb[i];
                image |= 1L << map[comb[i]];
            }
            if (m.isBasis(ElementSet.ofMask(set)) != m.isBasis(ElementSet.ofMask(image))) {
                return false;
            }
        } while (r > 1 && ElementSets.nextCombination(comb, last));
        return true;
    }

    private static Symmetry checked(Symmetry g, ExplicitMatroid m) {
        for (int[] p : g.permutations()) {
            for (long b : m.basisSets().stream().mapToLong(ElementSet::toMask).toArray()) {
                if (!m.isBasis(ElementSet.ofMask(g.apply(p, b)))) {
                    throw new IllegalStateException("The symmetry " + Arrays.toString(p) + " does not map bases to bases.");
                }
            }
        }
        return g;
    }

    /** The image of the element set {@code set} under {@code p}. */
    public long apply(int[] p, long set) {
        long out = 0;
        for (long s = set; s != 0; s &= s - 1) {
            out |= 1L << p[Long.numberOfTrailingZeros(s)];
        }
        return out;
    }

    /** The group's order. */
    public int order() {
        return permutations.size();
    }

    /** Whether {@code set} is the smallest mask in its orbit (the orbit's representative). */
    public boolean isRepresentative(long set) {
        for (int[] p : permutations) {
            if (Long.compareUnsigned(apply(p, set), set) < 0) {
                return false;
            }
        }
        return true;
    }

    /**
     * The independent sets of {@code k} elements of m that are the representatives of their
     * orbits, in the order of {@link ElementSets#nextCombination}: the contraction sets of the
     * minors of rank rank(m) − k, one per orbit.
     */
    public List<int[]> independentRepresentatives(ExplicitMatroid m, int k) {
        List<int[]> out = new ArrayList<>();
        int[] c = ElementSets.range(k);
        do {
            if (m.rank(c) == k && isRepresentative(ElementSets.mask(c))) {
                out.add(c.clone());
            }
        } while (ElementSets.nextCombination(c, m.size()));
        return out;
    }

    /** How many sets the group maps {@code set} to ({@code set} included). */
    public int orbitSize(long set) {
        return (int) permutations.stream().map(p -> apply(p, set)).distinct().count();
    }

    private static int compare(int[] a, int[] b) {
        return Arrays.compare(a, b);
    }

    /** The next permutation in lexicographic order, in place; false after the last. */
    private static boolean nextPermutation(int[] a) {
        int i = a.length - 2;
        while (i >= 0 && a[i] >= a[i + 1]) {
            i--;
        }
        if (i < 0) {
            return false;
        }
        int j = a.length - 1;
        while (a[j] <= a[i]) {
            j--;
        }
        int t = a[i];
        a[i] = a[j];
        a[j] = t;
        for (int l = i + 1, r = a.length - 1; l < r; l++, r--) {
            t = a[l];
            a[l] = a[r];
            a[r] = t;
        }
        return true;
    }
}
