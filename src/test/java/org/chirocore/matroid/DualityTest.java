package org.chirocore.matroid;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.function.Supplier;
import java.util.stream.Stream;

import org.chirocore.fixtures.NamedMatroids;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/** Matroid duality [Ox, §2.1]: an involution, and the basis-complement and rank-formula routes agree. */
class DualityTest {

    static Stream<Supplier<Matroid>> fixtures() {
        return Stream.of(NamedMatroids::fano, NamedMatroids::binaryAffineCube, NamedMatroids::completeGraphK4,
                NamedMatroids::uniformThreeSix, NamedMatroids::vamos, NamedMatroids::r10,
                () -> NamedMatroids.randomRational(5L, 3, 7, 1));
    }

    @ParameterizedTest
    @MethodSource("fixtures")
    void dualOfTheDualIsTheMatroid(Supplier<Matroid> fixture) {
        ExplicitMatroid m = ExplicitMatroid.of(fixture.get());
        assertEquals(m, Duality.dual(Duality.dual(m)));
    }

    /** Rank r*(S) = |S| − r(E) + r(E − S) through a non-explicit oracle gives the same bases. */
    @ParameterizedTest
    @MethodSource("fixtures")
    void rankOracleDualMatchesTheBasisComplements(Supplier<Matroid> fixture) {
        Matroid m = fixture.get();
        ExplicitMatroid viaOracle = ExplicitMatroid.of(Duality.dualOracle(m));
        assertEquals(Duality.dual(ExplicitMatroid.of(m)), viaOracle);
        assertEquals(m.size() - m.rank(), viaOracle.rank());
    }
}
