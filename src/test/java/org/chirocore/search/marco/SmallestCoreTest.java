package org.chirocore.search.marco;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.stream.IntStream;

import org.chirocore.fixtures.NamedMatroids;
import org.chirocore.matroid.ExplicitMatroid;
import org.chirocore.matroid.HyperplaneIsomorphismInspector;
import org.chirocore.matroid.Minor;
import org.chirocore.orient.Budget;
import org.chirocore.orient.LazySatDecider;
import org.chirocore.orient.Orientability;
import org.chirocore.search.Progress;
import org.chirocore.search.SearchSettings;
import org.chirocore.search.Strategy;
import org.junit.jupiter.api.Test;

/**
 * {@link SmallestCore} against a brute force written here: the fewest elements of a non-orientable
 * minor (M/C)|S over every independent C and every S, by increasing size.
 */
class SmallestCoreTest {
    private static SmallestCore.Result search(ExplicitMatroid m, Symmetry g) {
        return new SmallestCore(new SearchSettings(0, Strategy.CONTRACT_FIRST, Budget.UNLIMITED), g, 0, Progress.SILENT)
                .search(m);
    }

    /** The size of a smallest non-orientable minor, or -1 when every minor is orientable. */
    private static int bruteForce(ExplicitMatroid m) {
        int n = m.size();
        for (int size = 1; size <= n; size++) {
            for (long c = 0; c < 1L << n; c++) {
                int[] cs = elements(c);
                if (m.rank(cs) < cs.length) {
                    continue;
                }
                for (long s = 0; s < 1L << n; s++) {
                    if ((s & c) != 0 || Long.bitCount(s) != size) {
                        continue;
                    }
                    ExplicitMatroid minor = ExplicitMatroid.of(new Minor(m, cs, elements(~(s | c) & ((1L << n) - 1))));
                    if (minor.rank() >= 3
                            && new LazySatDecider(Budget.UNLIMITED).decide(minor) instanceof Orientability.NonOrientable) {
                        return size;
                    }
                }
            }
        }
        return -1;
    }

    private static int[] elements(long mask) {
        return IntStream.range(0, 64).filter(i -> (mask >> i & 1) != 0).toArray();
    }

    private static void assertAgrees(ExplicitMatroid m, Symmetry g) {
        SmallestCore.Result r = search(m, g);
        int expected = bruteForce(m);
        if (expected < 0) {
            assertInstanceOf(SmallestCore.NoneExists.class, r);
            return;
        }
        SmallestCore.Found f = assertInstanceOf(SmallestCore.Found.class, r);
        assertEquals(expected, f.core().core().size());
        int independentSets = 0;
        for (SmallestCore.Exhausted e : f.searched()) {
            assertTrue(e.exhaustedBelow() >= expected, e.toString());
            independentSets += e.orbit();
        }
        assertEquals(contractionSets(m), independentSets, "every contraction set of rank(M) - 3 elements or fewer");
    }

    /** The independent sets of at most rank(M) − 3 elements, counted directly. */
    private static int contractionSets(ExplicitMatroid m) {
        int count = 0;
        for (long c = 0; c < 1L << m.size(); c++) {
            int[] cs = elements(c);
            if (cs.length <= m.rank() - 3 && m.rank(cs) == cs.length) {
                count++;
            }
        }
        return count;
    }

    /**
     * AG(3,2): AG(3,2)/e is F7 and AG(3,2)\e is F7* (Oxley, Matroid Theory, 2nd ed., Appendix,
     * AG(3,2); from memory), both non-orientable (binary and not regular: Bland and Las Vergnas
     * 1978; F7, F7* are excluded minors for regularity, Tutte, Oxley §6.6), and every minor on 6
     * elements or fewer is orientable (brute force below). So the smallest cores have 7 elements
     * and are copies of F7 or F7*.
     */
    @Test
    void binaryAffineCubeSmallestCoreIsAFanoPlaneOrItsDual() {
        ExplicitMatroid ag = ExplicitMatroid.of(NamedMatroids.binaryAffineCube());
        for (Symmetry g : new Symmetry[] {Symmetry.automorphisms(ag), Symmetry.none(ag.size())}) {
            SmallestCore.Found f = assertInstanceOf(SmallestCore.Found.class, search(ag, g));
            ExplicitMatroid core = f.core().core();
            assertEquals(7, core.size());
            boolean fano = new HyperplaneIsomorphismInspector(ExplicitMatroid.of(NamedMatroids.fano()), core).find()
                    .isPresent();
            boolean dual = new HyperplaneIsomorphismInspector(NamedMatroids.fanoDual(), core).find().isPresent();
            assertTrue(fano || dual, core.toString());
            assertEquals(2 * 7, f.core().witnesses().size(), "a witness per single-element deletion and contraction");
            assertAgrees(ag, g);
        }
    }

    /** AG(2,3) (with its automorphism group) and F7 (with none) against the brute force. */
    @Test
    void ternaryAffinePlaneAndFanoAgreeWithBruteForce() {
        ExplicitMatroid ag = ExplicitMatroid.of(NamedMatroids.ternaryAffinePlane());
        assertAgrees(ag, Symmetry.automorphisms(ag));
        ExplicitMatroid fano = ExplicitMatroid.of(NamedMatroids.fano());
        assertAgrees(fano, Symmetry.none(fano.size()));
    }

    /** M(K4) is graphic, hence orientable (common practice): no core, every contraction set searched. */
    @Test
    void graphicMatroidHasNone() {
        ExplicitMatroid k4 = ExplicitMatroid.of(NamedMatroids.completeGraphK4());
        assertEquals(-1, bruteForce(k4));
        assertInstanceOf(SmallestCore.NoneExists.class, search(k4, Symmetry.automorphisms(k4)));
    }
}
