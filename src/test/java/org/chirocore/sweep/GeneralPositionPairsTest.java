package org.chirocore.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;

import org.chirocore.matroid.AffineCube;
import org.chirocore.matroid.CubeGeometry;
import org.chirocore.matroid.CubeHyperplane;
import org.chirocore.matroid.PulledMatroid;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class GeneralPositionPairsTest {

    /**
     * Against brute force over every hyperplane and every vertex: the pair orbits cover each pair
     * (H, O) with O ∉ H exactly once, and the general-position ones as often as the direct test
     * finds them.
     */
    @ParameterizedTest(name = "n = {0}")
    @ValueSource(ints = {2, 3, 4})
    void orbitSizesMatchBruteForce(int n) {
        AffineCube cube = AffineCube.real(n);
        long pairs = 0;
        long general = 0;
        for (CubeHyperplane h : CubeGeometry.realHyperplanes(n)) {
            int[] set = h.elements();
            for (int o = 0; o < cube.size(); o++) {
                if (!h.vertices().contains(o)) {
                    pairs++;
                    general += PulledMatroid.generalPositionViolation(cube, set, o).isEmpty() ? 1 : 0;
                }
            }
        }
        long statedPairs = 0;
        long statedGeneral = 0;
        for (HyperplaneOrbit h : HyperplaneOrbits.of(n)) {
            for (PullCandidate c : GeneralPositionPairs.of(h)) {
                statedPairs += c.orbitSize();
                statedGeneral += c.inGeneralPosition() ? c.orbitSize() : 0;
            }
        }
        assertEquals(pairs, statedPairs);
        assertEquals(general, statedGeneral);
    }

    /**
     * n = 3: the only general-position pull up to symmetry is the corner triangle x1 + x2 + x3 = 1
     * with the opposite vertex 111 (the corner construction of docs/mathematics.md §7, giving the Fano plane; the 8 corner
     * triangles each have one such vertex, from memory and re-derived by the brute-force test above).
     */
    @Test
    void threeCubeHasOnePull() {
        List<PullCandidate> pulls = HyperplaneOrbits.of(3).stream()
                .flatMap(h -> GeneralPositionPairs.of(h).stream())
                .filter(PullCandidate::inGeneralPosition)
                .toList();
        assertEquals(1, pulls.size());
        assertEquals(List.of(1, 1, 1, 1), pulls.get(0).hyperplane().canonicalForm());
        assertEquals("111", pulls.get(0).vertex());
        assertEquals(8, pulls.get(0).orbitSize());
    }
}
