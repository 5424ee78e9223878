package org.chirocore.matroid;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.Arrays;
import java.util.BitSet;
import java.util.Random;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * {@link ElementSet} against {@link java.util.BitSet} as the reference, on fixed-seed random sets
 * whose elements straddle the 64-bit word boundaries (checking a set type against the JDK's bit
 * set is common practice). The lexicographic order is checked against {@link Arrays#compare} of
 * the sorted element arrays, which orders int arrays lexicographically with a proper prefix first.
 */
class ElementSetTest {
    private static BitSet randomBits(Random random, int universe) {
        BitSet b = new BitSet();
        int density = 1 + random.nextInt(8);
        for (int e = 0; e < universe; e++) {
            if (random.nextInt(density * 4) == 0) {
                b.set(e);
            }
        }
        return b;
    }

    private static ElementSet of(BitSet b) {
        return ElementSet.of(b.stream().toArray());
    }

    @ParameterizedTest(name = "elements below {0}")
    @ValueSource(ints = {1, 7, 63, 64, 65, 130, 300, 1024})
    void everyOperationAgreesWithBitSet(int universe) {
        Random random = new Random(20261202L + universe);
        for (int round = 0; round < 400; round++) {
            BitSet a = randomBits(random, universe);
            BitSet b = randomBits(random, universe);
            ElementSet x = of(a);
            ElementSet y = of(b);
            assertArrayEquals(a.stream().toArray(), x.elements());
            assertEquals(a.cardinality(), x.size());
            assertEquals(a.isEmpty(), x.isEmpty());
            assertEquals(a, x.toBitSet());
            assertEquals(x, ElementSet.of(a), "built from the BitSet");
            int e = random.nextInt(universe + 2);
            assertEquals(a.get(e), x.contains(e));
            BitSet withE = (BitSet) a.clone();
            withE.set(e);
            assertEquals(of(withE), x.with(e));
            BitSet withoutE = (BitSet) a.clone();
            withoutE.clear(e);
            assertEquals(of(withoutE), x.without(e));
            assertEquals(a.nextSetBit(e), x.next(e));
            assertEquals(a.get(e + 1, Math.max(e + 1, a.length())).cardinality(), x.countAbove(e));
            BitSet or = (BitSet) a.clone();
            or.or(b);
            assertEquals(of(or), x.union(y));
            BitSet and = (BitSet) a.clone();
            and.and(b);
            assertEquals(of(and), x.intersection(y));
            assertEquals(and.cardinality(), x.intersectionSize(y));
            BitSet andNot = (BitSet) a.clone();
            andNot.andNot(b);
            assertEquals(of(andNot), x.minus(y));
            assertEquals(andNot.isEmpty(), x.isSubsetOf(y));
            assertEquals(Integer.signum(Arrays.compare(x.elements(), y.elements())), Integer.signum(x.compareLex(y)),
                    () -> x + " vs " + y);
            assertEquals(a.equals(b), x.equals(y));
            if (x.equals(y)) {
                assertEquals(x.hashCode(), y.hashCode());
            }
        }
    }

    @Test
    void equalSetsAreEqualWhateverTheirHistory() {
        ElementSet direct = ElementSet.of(5, 70);
        ElementSet viaLarge = ElementSet.of(5, 70, 200).without(200);
        assertEquals(direct, viaLarge);
        assertEquals(direct.hashCode(), viaLarge.hashCode());
        assertEquals(ElementSet.EMPTY, ElementSet.of(130).without(130));
        assertEquals("[5, 70]", direct.toString());
    }

    @Test
    void rangesAndMasks() {
        for (int n : new int[] {0, 1, 63, 64, 65, 128, 1024}) {
            BitSet b = new BitSet();
            b.set(0, n);
            assertEquals(of(b), ElementSet.range(n));
        }
        assertEquals(ElementSet.of(0, 5, 63), ElementSet.ofMask(1L | 1L << 5 | 1L << 63));
        assertEquals(1L << 63 | 1L, ElementSet.of(0, 63).toMask());
        assertThrows(IllegalStateException.class, () -> ElementSet.of(0, 64).toMask());
        assertThrows(IllegalArgumentException.class, () -> ElementSet.of(-1));
    }

    @Test
    void lexicographicOrderPutsAPrefixFirst() {
        // [1, 2] < [1, 2, 3] < [1, 3] < [2]: tuples compared position by position
        ElementSet[] sorted = {ElementSet.of(1, 2), ElementSet.of(1, 2, 3), ElementSet.of(1, 3), ElementSet.of(2)};
        for (int i = 0; i < sorted.length; i++) {
            for (int j = 0; j < sorted.length; j++) {
                assertEquals(Integer.signum(Integer.compare(i, j)), Integer.signum(sorted[i].compareLex(sorted[j])));
            }
        }
    }
}
