package org.chirocore.orient;

import static org.junit.jupiter.api.Assertions.assertInstanceOf;

import java.util.stream.Stream;

import org.chirocore.fixtures.NamedMatroids;
import org.chirocore.matroid.Matroid;
import org.chirocore.pipeline.IndependentCheck;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The contract of every {@link OrientabilityDecider}: its verdicts on the named fixtures agree
 * with published facts (named beside each), and every orientable verdict's witness passes the
 * independent checker. One subclass per implementation supplies the decider.
 */
abstract class OrientabilityDeciderContract {

    /** The decider under test, with a budget large enough for every fixture. */
    abstract OrientabilityDecider decider();

    static Stream<Arguments> nonOrientable() {
        return Stream.of(
                // Binary matroids are orientable iff regular (Bland & Las Vergnas 1978; Oxley, Matroid
                // Theory, 2nd ed., §6.6): F7, F7* and AG(3,2) are binary and not regular.
                Arguments.of("F7", NamedMatroids.fano()),
                Arguments.of("F7*", NamedMatroids.fanoDual()),
                Arguments.of("AG(3,2)", NamedMatroids.binaryAffineCube()),
                // Every rank-3 oriented matroid on at most 8 elements is realisable (BLSWZ, Oriented
                // Matroids, §8.3, from memory), and AG(2,3) minus a point is not real-representable
                // (it needs a cube root of unity): so it is not orientable. Our tool finds the same.
                Arguments.of("AG(2,3)\\e", NamedMatroids.ternaryAffinePlaneMinusPoint()),
                // It is a minor of AG(2,3), which is then non-orientable too.
                Arguments.of("AG(2,3)", NamedMatroids.ternaryAffinePlane()));
    }

    static Stream<Arguments> orientable() {
        return Stream.of(
                // Real-representable matroids are orientable (BLSWZ §1.2, common practice).
                Arguments.of("F7-", NamedMatroids.nonFano()),
                Arguments.of("M(K4)", NamedMatroids.completeGraphK4()),
                Arguments.of("M(K3,3)", NamedMatroids.completeBipartiteK33()),
                Arguments.of("U(3,6)", NamedMatroids.uniformThreeSix()),
                Arguments.of("Pappus", NamedMatroids.pappus()),
                // Regular, hence orientable (Oxley §6.6).
                Arguments.of("R10", NamedMatroids.r10()),
                // Orientable but not representable (BLSWZ, Oriented Matroids, §6.6 / §8.3).
                Arguments.of("Vamos", NamedMatroids.vamos()),
                Arguments.of("non-Pappus", NamedMatroids.nonPappus()),
                Arguments.of("random 3x8", NamedMatroids.randomRational(7, 3, 8, 3)),
                Arguments.of("random 4x9", NamedMatroids.randomRational(8, 4, 9, 3)));
    }

    @ParameterizedTest(name = "{0} is non-orientable")
    @MethodSource("nonOrientable")
    void nonOrientableMatroids(String name, Matroid m) {
        assertInstanceOf(Orientability.NonOrientable.class, decider().decide(m), name);
    }

    @ParameterizedTest(name = "{0} is orientable, with a witness the checker accepts")
    @MethodSource("orientable")
    void orientableMatroidsComeWithAnIndependentlyCheckedWitness(String name, Matroid m) {
        Orientability answer = decider().decide(m);
        Chirotope witness = assertInstanceOf(Orientability.Orientable.class, answer, name).witness();
        IndependentCheck.assertOrients(m, witness);
    }
}
