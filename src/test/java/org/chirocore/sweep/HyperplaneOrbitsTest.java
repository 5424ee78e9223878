package org.chirocore.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HashMap;
import java.util.List;
import java.util.Map;

import org.chirocore.matroid.AffineCube;
import org.chirocore.matroid.CubeGeometry;
import org.chirocore.matroid.CubeHyperplane;
import org.chirocore.matroid.HyperplaneSpec;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

class HyperplaneOrbitsTest {

    /** Orbit counts: OEIS A363505; orbit sizes summed: OEIS A007847 (hyperplanes spanned by cube vertices). */
    @ParameterizedTest(name = "n = {0}: {1} orbits, {2} hyperplanes")
    @CsvSource({"1, 1, 2", "2, 2, 6", "3, 3, 20", "4, 6, 140", "5, 15, 3254", "6, 63, 252434"})
    void countsMatchOeis(int n, int orbits, long hyperplanes) {
        List<HyperplaneOrbit> found = HyperplaneOrbits.of(n);
        assertEquals(orbits, found.size(), "OEIS A363505");
        assertEquals(hyperplanes, found.stream().mapToLong(HyperplaneOrbit::orbitSize).sum(), "OEIS A007847");
    }

    /** n = 7: OEIS A363505 (623 orbits) and A007847 (71343208 hyperplanes). */
    @Test
    @Tag("slow")
    void countsMatchOeisAtSeven() {
        List<HyperplaneOrbit> found = HyperplaneOrbits.of(7);
        assertEquals(623, found.size(), "OEIS A363505");
        assertEquals(71_343_208L, found.stream().mapToLong(HyperplaneOrbit::orbitSize).sum(), "OEIS A007847");
    }

    /**
     * Against brute force: every hyperplane of the n-cube listed by {@link CubeGeometry#realHyperplanes}
     * has its canonical form among the representatives, and each orbit has as many members as its
     * stated size.
     */
    @ParameterizedTest(name = "n = {0}")
    @ValueSource(ints = {1, 2, 3, 4, 5})
    void orbitSizesMatchListing(int n) {
        Map<List<Integer>, Long> listed = new HashMap<>();
        for (CubeHyperplane h : CubeGeometry.realHyperplanes(n)) {
            int[] a = h.normal().stream().mapToInt(Integer::intValue).toArray();
            listed.merge(HyperplaneOrbits.canonical(a, h.offset()), 1L, Long::sum);
        }
        Map<List<Integer>, Long> stated = new HashMap<>();
        for (HyperplaneOrbit o : HyperplaneOrbits.of(n)) {
            int[] a = o.normalArray();
            assertEquals(HyperplaneOrbits.canonical(a, o.offset()), o.canonicalForm(), "representatives are canonical");
            stated.put(o.canonicalForm(), o.orbitSize());
            int[] vertices = o.representative().elements();
            // the representative spans a hyperplane of the cube's matroid (rank n, a flat)
            HyperplaneSpec.ByEquation spec = new HyperplaneSpec.ByEquation(o.normal(), o.offset());
            assertEquals(vertices.length, spec.resolve(AffineCube.real(n)).length);
        }
        assertEquals(listed, stated);
    }

    /**
     * Progress inside each m-cube: with a report after every prefix, the reports count the prefixes
     * 1, 2, … up to the total, which is the number of multisets of size m − 2 of the A003432(m)
     * possible entries (stars and bars, common practice), and the search, which counts for itself,
     * ends each m-cube on exactly that total; the orbits found grow to the whole list, in every part.
     */
    @ParameterizedTest(name = "part {0} of 3")
    @ValueSource(ints = {0, 1, 2})
    void progressCountsThePrefixesOfEachCube(int part) {
        List<long[]> reports = new java.util.ArrayList<>();
        List<HyperplaneOrbit> found = HyperplaneOrbits.part(6, part, 3,
                (m, done, total, orbits, candidates) -> reports.add(new long[] {m, done, total, orbits, candidates}), 1);
        long[] multisets = {0, 1, 1, 2, 6, 35, 495}; // C(D + m - 3, m - 2) for D = 1, 1, 2, 3, 5, 9
        int i = 0;
        long orbits = 0;
        for (int m = 1; m <= 6; m++) {
            for (long done = 1; done <= multisets[m]; done++) {
                long[] r = reports.get(i++);
                assertEquals(List.of((long) m, done, multisets[m]), List.of(r[0], r[1], r[2]));
                assertTrue(r[3] >= orbits, "orbits found never decrease");
                orbits = r[3];
            }
        }
        assertEquals(i, reports.size());
        assertEquals(found.size(), orbits);
    }

    /** The parts of a split enumeration are disjoint and together give the whole, in order. */
    @ParameterizedTest(name = "n = {0}")
    @ValueSource(ints = {2, 5, 6})
    void partsMakeTheWhole(int n) {
        List<HyperplaneOrbit> joined = new java.util.ArrayList<>();
        for (int i = 0; i < 3; i++) {
            joined.addAll(HyperplaneOrbits.part(n, i, 3, HyperplaneOrbits.Listener.SILENT));
        }
        java.util.Comparator<HyperplaneOrbit> order = java.util.Comparator.comparing(o -> o.canonicalForm().toString());
        List<HyperplaneOrbit> whole = new java.util.ArrayList<>(HyperplaneOrbits.of(n));
        joined.sort(order);
        whole.sort(order);
        assertEquals(whole, joined);
    }

    /** The canonical form is invariant under a reflection and a permutation (common practice: check on an example). */
    @Test
    void canonicalFormIsInvariant() {
        // x1 + x2 + 2·x3 = 2; reflect x2 (−x2 and b − 1), then swap x1 and x3
        assertEquals(List.of(1, 1, 2, 2), HyperplaneOrbits.canonical(new int[] {1, 1, 2}, 2));
        assertEquals(List.of(1, 1, 2, 2), HyperplaneOrbits.canonical(new int[] {2, -1, 1}, 1));
        // the sign of the equation does not matter, and b goes to Σa − b under the full reflection
        assertEquals(List.of(1, 1, 1, 1), HyperplaneOrbits.canonical(new int[] {-1, -1, -1}, -2));
        assertTrue(HyperplaneOrbits.stabiliser(new int[] {0, 1, 1}, 1) == 8);
    }
}
