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
     * there is y ∈ B2 − B1 with B1 − x + y a basis), or empty. Cost O(|family|² · r² · log |family|).
     */
    Optional<String> exchangeDefect() {
        if (canonical.length == 0) {
            return Optional.of("there are no bases; a matroid has at least one");
        }
        for (long b1 : canonical) {
            for (long b2 : canonical) {
                for (long xs = b1 & ~b2; xs != 0; xs &= xs - 1) {
                    long x = Long.lowestOneBit(xs);
                    if (!someExchange(b1 & ~x, b2 & ~b1)) {
                        return Optional.of("no y in " + set(b2 & ~b1) + " makes " + set(b1) + " - "
                                + Long.numberOfTrailingZeros(x) + " + y a basis (B2 = " + set(b2) + ")");
                    }
                }
            }
        }
        return Optional.empty();
    }

    private boolean someExchange(long rest, long candidates) {
        for (long ys = candidates; ys != 0; ys &= ys - 1) {
            if (positionOf(rest | Long.lowestOneBit(ys)) >= 0) {
                return true;
            }
        }
        return false;
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
