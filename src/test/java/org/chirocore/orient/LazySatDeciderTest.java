package org.chirocore.orient;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.chirocore.matroid.Matroid;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/** {@link LazySatDecider} under the decider contract, and its budget. */
class LazySatDeciderTest extends OrientabilityDeciderContract {

    @Override
    OrientabilityDecider decider() {
        return new LazySatDecider(Budget.UNLIMITED);
    }

    @ParameterizedTest(name = "{0}: a budget of one round gives unknown or a witness, never non-orientable")
    @MethodSource("orientable")
    void anExhaustedBudgetIsUnknown(String name, Matroid m) {
        Orientability answer = new LazySatDecider(new Budget(0, 1, 0)).decide(m);
        // One round can only succeed when the first model already satisfies every relation.
        if (!(answer instanceof Orientability.Orientable)) {
            assertEquals("unknown", answer.verdict(), name);
        }
    }
}
