package org.chirocore.orient;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Optional;
import java.util.SplittableRandom;

import org.chirocore.fixtures.NamedMatroids;
import org.chirocore.matroid.AffineCube;
import org.chirocore.matroid.ElementSet;
import org.chirocore.matroid.ElementSets;
import org.chirocore.matroid.ExplicitMatroid;
import org.chirocore.matroid.MatrixMatroid;
import org.chirocore.matroid.Matroid;
import org.chirocore.matroid.Realisation;
import org.chirocore.pipeline.IndependentCheck;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Local repair against outside facts: the determinant signs of a real matrix are a chirotope
 * (Björner et al., <i>Oriented Matroids</i>, 2nd ed., §3.5, from memory), so a start that differs
 * from them in one basis is close to a chirotope; a non-orientable matroid (the Fano plane:
 * binary and not regular, [Ox, §6.6]) has none, so no repair may ever claim one. Every repaired
 * assignment goes through the independent checker.
 */
class LocalRepairTest {

    static byte[] determinantSigns(BasisIndex index, Realisation r) {
        return RepairingDecider.of(r).signs(index);
    }

    /**
     * The real 4-cube (rank 5, 16 elements) has many vanishing minors, so most of its relations
     * have two non-zero terms and a wrong sign violates most of its relations: 1 % of the signs
     * flipped at random are found and flipped back.
     */
    @ParameterizedTest
    @CsvSource({"1", "2", "3"})
    void scatteredWrongSignsOfTheCubeAreRepaired(long seed) {
        MatrixMatroid cube = AffineCube.real(4).matrixMatroid();
        BasisIndex index = BasisIndex.of(cube);
        byte[] start = determinantSigns(index, Realisation.of(cube).orElseThrow());
        SplittableRandom random = new SplittableRandom(seed);
        for (int i = 0; i < start.length; i++) {
            if (random.nextInt(100) == 0) {
                start[i] = (byte) -start[i];
            }
        }
        LocalRepair.Outcome o = LocalRepair.repair(index, start);
        byte[] signs = o.signs().orElseThrow(() -> new AssertionError("not repaired: " + o));
        IndependentCheck.assertOrients(cube, index.chirotope(signs, ElementSet.range(cube.size())));
    }

    /**
     * In a matrix in general position most relations have three non-zero terms, and one wrong
     * sign may violate fewer than half of them; then the repair gives up. Whatever it answers, a
     * repaired assignment must be a chirotope.
     */
    @ParameterizedTest
    @CsvSource({"11, 3, 8", "12, 4, 9", "13, 3, 9", "14, 4, 8"})
    void aRepairIsAChirotopeOrNothing(long seed, int rows, int cols) {
        MatrixMatroid m = NamedMatroids.randomRational(seed, rows, cols, 3);
        BasisIndex index = BasisIndex.of(m);
        byte[] start = determinantSigns(index, Realisation.of(m).orElseThrow());
        int flipped = new SplittableRandom(seed).nextInt(start.length);
        start[flipped] = (byte) -start[flipped];
        LocalRepair.Outcome o = LocalRepair.repair(index, start);
        if (o.signs().isPresent()) {
            Chirotope chi = index.chirotope(o.signs().get(), ElementSet.range(m.size()));
            assertEquals(Optional.empty(), WitnessCheck.defect(m, chi));
            IndependentCheck.assertOrients(m, chi);
        } else {
            assertTrue(o.violated() > 0, o.toString());
        }
    }

    @Test
    void nonOrientableMatroidIsNeverRepaired() {
        ExplicitMatroid fano = ExplicitMatroid.of(NamedMatroids.fano());
        BasisIndex index = BasisIndex.of(fano);
        byte[] start = determinantSigns(index, Realisation.of(NamedMatroids.nonFano()).orElseThrow());
        LocalRepair.Outcome o = LocalRepair.repair(index, start);
        assertTrue(o.signs().isEmpty());
        assertTrue(o.violated() > 0);
    }

    /**
     * The non-Fano matroid given by its bases, started from its own matrix: orientable by the
     * repair alone, in one pass; started from the Fano plane's input the fallback answers.
     */
    @Test
    void repairingDeciderFinishesFromARealisationAndFallsBackOtherwise() {
        Matroid nonFano = ExplicitMatroid.of(NamedMatroids.nonFano());
        Realisation start = Realisation.of(NamedMatroids.nonFano()).orElseThrow();
        Orientability o = new RepairingDecider(RepairingDecider.of(start), new LazySatDecider(Budget.UNLIMITED))
                .decide(nonFano);
        Orientability.Orientable orientable = assertInstanceOf(Orientability.Orientable.class, o);
        assertEquals(1, orientable.stats().rounds());
        assertEquals(0, orientable.stats().relations());
        IndependentCheck.assertOrients(nonFano, orientable.witness());

        Orientability fano = new RepairingDecider(RepairingDecider.of(start), new LazySatDecider(Budget.UNLIMITED))
                .decide(ExplicitMatroid.of(NamedMatroids.fano()));
        assertInstanceOf(Orientability.NonOrientable.class, fano);
    }
}
