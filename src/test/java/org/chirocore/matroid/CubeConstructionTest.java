package org.chirocore.matroid;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class CubeConstructionTest {
    /** Pulling 111 to x1 + x2 + x3 = 1 and contracting it gives the Fano plane, 28 bases (docs/mathematics.md §7). */
    @Test
    void cornerOfTheThreeCube() {
        CubeConstruction c = CubeConstruction.corner(3);
        assertEquals(List.of("100", "010", "001"), ((HyperplaneSpec.ByVertices) c.hyperplane()).vertices());
        Matroid m = c.build();
        assertEquals(7, m.size());
        assertEquals(3, m.rank());
        assertEquals(28, ExplicitMatroid.of(m).basisCount());
        assertEquals(Optional.of("x1 + x2 + x3 = 1"), c.hyperplaneEquation());
        assertEquals(List.of("001", "010", "100"), c.hyperplaneVertices());
    }

    @Test
    void withoutContractionThePulledCubeKeepsAllVertices() {
        CubeConstruction c = new CubeConstruction(3, Field.RATIONALS, HyperplaneSpec.parse("1,1,1=1"), "111", false);
        Matroid m = c.build();
        assertEquals(8, m.size());
        assertEquals(4, m.rank());
    }

    @Test
    void invalidPartsAreReported() {
        assertThrows(InvalidHyperplaneException.class, () -> new CubeConstruction(3, Field.RATIONALS,
                HyperplaneSpec.parse("000,100,010"), "111", true).build());
        assertThrows(GeneralPositionException.class, () -> new CubeConstruction(3, Field.RATIONALS,
                HyperplaneSpec.parse("1,0,0=0"), "100", true).build());
        IllegalArgumentException inside = assertThrows(IllegalArgumentException.class, () -> new CubeConstruction(3,
                Field.RATIONALS, HyperplaneSpec.parse("1,1,1=1"), "100", true).build());
        assertTrue(inside.getMessage().contains("lies in the hyperplane"), inside.getMessage());
    }

    /** Every real hyperplane is recovered from its vertex set alone. */
    @ParameterizedTest
    @ValueSource(ints = {2, 3, 4})
    void equationsAreRecoveredFromVertexSets(int n) {
        for (CubeHyperplane h : CubeGeometry.realHyperplanes(n)) {
            assertEquals(Optional.of(h), CubeHyperplane.withVertices(n, h.elements()), h.equation());
        }
    }

    @Test
    void aSetThatIsNotAHyperplaneHasNoEquation() {
        AffineCube cube = AffineCube.real(3);
        assertEquals(Optional.empty(), HyperplaneSpec.parse("000,100,010").equation(cube));
        assertEquals(Optional.empty(), HyperplaneSpec.parse("000,111").equation(cube));
    }
}
