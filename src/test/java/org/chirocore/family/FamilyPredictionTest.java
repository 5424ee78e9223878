package org.chirocore.family;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.chirocore.check.CertificateVerifier;
import org.chirocore.fixtures.NamedMatroids;
import org.chirocore.matroid.HyperplaneIsomorphismInspector;
import org.chirocore.orient.Budget;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Predicted cores of the corner family, taken from the stored certificates in families/corner/. */
class FamilyPredictionTest {
    private static final FamilyDefinition CORNER = FamilyDefinition.read(Path.of("families/corner.json"));

    @TempDir
    Path dir;

    private List<FamilyPrediction.Outcome> check(Path prediction, int from, int to) throws IOException {
        return new FamilyPrediction(CORNER, FamilyPrediction.Prediction.read(prediction), dir, Budget.UNLIMITED)
                .run(from, to);
    }

    private Path write(String json) throws IOException {
        Path f = dir.resolve("p.json");
        Files.writeString(f, json);
        return f;
    }

    @Test
    void theKnownCoresAtThreeAndFiveAreConfirmedAndVerified() throws IOException {
        Path prediction = Path.of("families/corner.predict.json");
        for (int n : new int[] {3, 5}) {
            FamilyPrediction.Confirmed c = assertInstanceOf(FamilyPrediction.Confirmed.class,
                    check(prediction, n, n).get(0));
            assertEquals(FamilyPrediction.certificateName(n), c.certificate());
            assertTrue(CertificateVerifier.verify(dir.resolve(c.certificate())).passed());
            // the same core as the stored certificate of the search
            CertificateFacts stored = CertificateFacts.read(Path.of("families/corner/" + FamilyRun.certificateName(n)));
            assertEquals(stored.core(), c.facts().core());
        }
    }

    @Test
    void anOrientableOrNonMinimalPredictionIsRefuted() throws IOException {
        // the Fano plane minus a point is orientable
        FamilyPrediction.Refuted orientable = assertInstanceOf(FamilyPrediction.Refuted.class, check(write(
                "{\"family\": \"corner\", \"members\": [{\"n\": 3, \"core\": [\"000\", \"001\", \"010\", \"011\", "
                + "\"100\", \"101\"], \"contract\": []}]}"), 3, 3).get(0));
        assertEquals("the predicted minor is orientable", orientable.reason());
        // the whole member at n = 4 is non-orientable but not minimal
        FamilyPrediction.Refuted whole = assertInstanceOf(FamilyPrediction.Refuted.class, check(write(
                "{\"family\": \"corner\", \"members\": [{\"n\": 4, \"core\": [\"0000\", \"0001\", \"0010\", \"0011\", "
                + "\"0100\", \"0101\", \"0110\", \"0111\", \"1000\", \"1001\", \"1010\", \"1011\", \"1100\", \"1101\", "
                + "\"1110\"], \"contract\": []}]}"), 4, 4).get(0));
        assertTrue(whole.reason().startsWith("not minimal: "), whole.reason());
        assertTrue(Files.notExists(dir.resolve(FamilyPrediction.certificateName(4))));
    }

    @Test
    void badPredictionsNameTheFileAndN() throws IOException {
        Path missing = Path.of("families/corner.predict.json");
        FamilyException e = assertThrows(FamilyException.class, () -> check(missing, 3, 4));
        assertTrue(e.getMessage().contains("predicts no core at n = 4"), e.getMessage());
        Path twice = write("{\"family\": \"corner\", \"members\": [{\"n\": 3, \"core\": [\"000\", \"001\"], "
                + "\"contract\": [\"001\"]}]}");
        e = assertThrows(FamilyException.class, () -> check(twice, 3, 3));
        assertTrue(e.getMessage().contains("the vertex 001 is both in the core and contracted"), e.getMessage());
        Path foreign = write("{\"family\": \"other\", \"members\": []}");
        assertThrows(FamilyException.class, () -> check(foreign, 3, 3));
    }

    @Test
    void theConfirmedCoreAtThreeIsTheFanoPlane() throws IOException {
        // F7: Oxley, Matroid Theory, 2nd ed., Example 1.5.7
        FamilyPrediction.Confirmed c = (FamilyPrediction.Confirmed) check(Path.of("families/corner.predict.json"), 3, 3)
                .get(0);
        assertTrue(new HyperplaneIsomorphismInspector(c.facts().core(),
                NamedMatroids.fano()).find().isPresent());
    }

    @Test
    void theShippedRuleIsConfirmedAtFiveAndSevenAndRefutedAtSix() throws IOException {
        List<FamilyPrediction.Outcome> outcomes = check(Path.of("families/corner.rule.json"), 5, 7);
        for (int k : new int[] {0, 2}) {
            FamilyPrediction.Confirmed c = assertInstanceOf(FamilyPrediction.Confirmed.class, outcomes.get(k));
            assertTrue(CertificateVerifier.verify(dir.resolve(c.certificate())).passed());
            assertEquals(7, c.facts().core().size());
        }
        FamilyPrediction.Refuted six = assertInstanceOf(FamilyPrediction.Refuted.class, outcomes.get(1));
        assertEquals("the predicted minor is orientable", six.reason());
    }

    /**
     * The shipped rule at the top of its range: at n = 15 its candidate is a core isomorphic to F7
     * (Oxley, Matroid Theory, 2nd ed., Example 1.5.7), certified and verified, with the verifier
     * rebuilding the pulled 15-cube; at n = 16 the candidate is orientable.
     */
    @Tag("slow")
    @Test
    void theShippedRuleIsConfirmedAtFifteenAndRefutedAtSixteen() throws IOException {
        List<FamilyPrediction.Outcome> outcomes = check(Path.of("families/corner.rule.json"), 15, 16);
        FamilyPrediction.Confirmed fifteen = assertInstanceOf(FamilyPrediction.Confirmed.class, outcomes.get(0));
        assertTrue(CertificateVerifier.verify(dir.resolve(fifteen.certificate())).passed());
        assertTrue(new HyperplaneIsomorphismInspector(fifteen.facts().core(), NamedMatroids.fano()).find().isPresent());
        FamilyPrediction.Refuted sixteen = assertInstanceOf(FamilyPrediction.Refuted.class, outcomes.get(1));
        assertEquals("the predicted minor is orientable", sixteen.reason());
    }

    @Test
    void badRulesNameTheFileTheRuleAndN() throws IOException {
        Path outside = write("{\"family\": \"corner\", \"rule\": {\"range\": [3, 4], "
                + "\"core\": [\"unit k for k in 1..4\"], \"contract\": []}}");
        FamilyException e = assertThrows(FamilyException.class, () -> check(outside, 3, 3));
        assertTrue(e.getMessage().startsWith(outside + ": core \"unit k for k in 1..4\" at n = 3: at k = 4: "),
                e.getMessage());
        Path contracted = write("{\"family\": \"corner\", \"rule\": {\"range\": [3, 4], "
                + "\"core\": [\"all ones\"], \"contract\": []}}");
        e = assertThrows(FamilyException.class, () -> check(contracted, 3, 3));
        assertEquals(contracted + ": core \"all ones\" at n = 3: the vertex 111 is not an element of the member.",
                e.getMessage());
        Path twice = write("{\"family\": \"corner\", \"rule\": {\"range\": [3, 4], "
                + "\"core\": [\"all of weight 1\", \"unit 1\"], \"contract\": []}}");
        e = assertThrows(FamilyException.class, () -> check(twice, 3, 3));
        assertEquals(twice + ": core \"unit 1\" at n = 3: the vertex 100 is named twice.", e.getMessage());
        Path both = write("{\"family\": \"corner\", \"rule\": {\"range\": [3, 4], "
                + "\"core\": [\"all zeros\", \"unit n\"], \"contract\": [\"unit k for k in 2..n\"]}}");
        e = assertThrows(FamilyException.class, () -> check(both, 4, 4));
        assertEquals(both + ": contract \"unit k for k in 2..n\" at n = 4: the vertex 0001 is both in the core and "
                + "contracted.", e.getMessage());
        Path outOfRange = write("{\"family\": \"corner\", \"rule\": {\"range\": [3, 4], "
                + "\"core\": [], \"contract\": []}}");
        e = assertThrows(FamilyException.class, () -> check(outOfRange, 3, 5));
        assertTrue(e.getMessage().contains("predicts no core at n = 5"), e.getMessage());
    }
}
