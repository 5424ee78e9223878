package org.chirocore.check;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * The producer's limits ({@code matroid.Limits}) and the verifier's ({@code check.VerifierLimits}) are
 * declared apart, so that the verifier shares no code with the producer; this test keeps them in
 * agreement: whatever the producer accepts to build and certify, the verifier can rebuild and check.
 */
class LimitsAgreementTest {

    @Test
    void theVerifierRebuildsEveryCubeTheProducerBuilds() {
        assertEquals(org.chirocore.matroid.Limits.CUBE_DIMENSION, VerifierLimits.MAX_CUBE);
    }

    @Test
    void theVerifierHoldsEveryCoreTheProducerCertifies() {
        assertEquals(org.chirocore.matroid.Limits.ELEMENTS, VerifierLimits.MAX_ELEMENTS);
        assertEquals(org.chirocore.matroid.Limits.ENUMERATED_ELEMENTS, VerifierLimits.MAX_ENUMERATED_ELEMENTS,
                "the verifier checks the completeness of every enumeration the producer runs");
        assertTrue(VerifierLimits.MAX_CANDIDATES >= org.chirocore.matroid.Limits.EXPLICIT_SUBSETS,
                "a core the producer holds as its bases must be rebuildable by the verifier");
        assertTrue(VerifierLimits.MAX_BASES >= org.chirocore.matroid.Limits.EXPLICIT_SUBSETS,
                "a core has at most as many bases as r-subsets");
    }

    @Test
    void theVerifierChecksEveryMatrixWitnessTheProducerWrites() {
        // the producer's entries are longs, of at most 19 decimal digits
        assertTrue(VerifierLimits.MAX_MATRIX_DIGITS >= Long.toString(Long.MIN_VALUE).length() - 1);
        assertTrue(VerifierLimits.MAX_DETERMINANT_STEPS >= org.chirocore.matroid.Limits.MATRIX_WITNESS_STEPS,
                "the determinant work the producer allows itself must be within the verifier's");
    }

    @Test
    void theProducerListsNoMoreRelationsThanTheVerifierHolds() {
        assertEquals(org.chirocore.matroid.Limits.CERTIFIED_RELATIONS, VerifierLimits.MAX_RELATIONS);
    }

    @Test
    void theVerifierReadsEveryMatroidFileTheProducerReads() {
        assertTrue(VerifierLimits.MAX_CERTIFICATE_BYTES >= org.chirocore.matroid.Limits.INPUT_BYTES,
                "verify --input reads the same files as the producer");
    }
}
