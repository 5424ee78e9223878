package org.chirocore.search;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;

import org.chirocore.fixtures.NamedMatroids;
import org.chirocore.matroid.ExplicitMatroid;
import org.chirocore.matroid.HyperplaneIsomorphismInspector;
import org.chirocore.matroid.Minor;
import org.chirocore.orient.Budget;
import org.chirocore.orient.WitnessCheck;
import org.junit.jupiter.api.Test;

class MinimalityProofTest {
    @Test
    void theFanoPlaneIsMinimalWithCheckedWitnesses() {
        // F7 is minor-minimal non-orientable: every single-element minor is regular (Oxley, Matroid
        // Theory, 2nd ed., Theorem 6.6.3 and Proposition 6.4.8)
        ExplicitMatroid fano = ExplicitMatroid.of(NamedMatroids.fano());
        MinimalityProof.Minimal minimal = assertInstanceOf(MinimalityProof.Minimal.class,
                MinimalityProof.check(fano, Budget.UNLIMITED));
        assertEquals(14, minimal.witnesses().size());
        for (int e = 0; e < fano.size(); e++) {
            int[] single = {e};
            // the witnesses are re-checked against the minors they claim to orient
            WitnessCheck.checked(new Minor(fano, new int[0], single), minimal.witnesses().get(2 * e).witness());
            WitnessCheck.checked(new Minor(fano, single, new int[0]), minimal.witnesses().get(2 * e + 1).witness());
        }
    }

    @Test
    void theBinaryAffineCubeIsNotMinimal() {
        // AG(3, 2)/e is the Fano plane for every e (Oxley, Matroid Theory, 2nd ed., Appendix)
        ExplicitMatroid ag32 = ExplicitMatroid.of(NamedMatroids.binaryAffineCube());
        MinimalityProof.NonOrientableContraction c = assertInstanceOf(MinimalityProof.NonOrientableContraction.class,
                MinimalityProof.check(ag32, Budget.UNLIMITED));
        assertEquals(0, c.element());
        assertEquals(true, new HyperplaneIsomorphismInspector(c.minor(), NamedMatroids.fano()).find().isPresent());
    }
}
