package org.chirocore.pipeline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.IntStream;

import org.chirocore.fixtures.NamedMatroids;
import org.chirocore.io.MatroidFileException;
import org.chirocore.io.MatroidFiles;
import org.chirocore.matroid.ExplicitMatroid;
import org.chirocore.matroid.HyperplaneIsomorphismInspector;
import org.chirocore.orient.Budget;
import org.chirocore.orient.LazySatDecider;
import org.chirocore.orient.Orientability;
import org.chirocore.search.Progress;
import org.chirocore.search.Strategy;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Matroids on more than 64 elements decided, reduced and certified; every answer passes the
 * independent checker (orientations through {@code check.ChirotopeCheck}, cores through the
 * verifier the pipeline runs).
 */
class LargeGroundSetTest {
    private static final CertifiedReduction PIPELINE = new CertifiedReduction(
            new CertifiedReduction.Settings(0, Strategy.CONTRACT_FIRST, Budget.UNLIMITED), Progress.SILENT);

    @TempDir
    Path dir;

    private static List<String> labels(int n) {
        return IntStream.range(0, n).mapToObj(i -> "e" + i).toList();
    }

    /** U(2, 70) is orientable (70 points on a line; common practice). */
    @Test
    void uniformRankTwoOnSeventyElementsIsOrientedAndTheCheckerAgrees() {
        ExplicitMatroid u = ExplicitMatroid.fromNonBases(labels(70), 2, List.of());
        Orientability.Orientable o = assertInstanceOf(Orientability.Orientable.class,
                new LazySatDecider(Budget.UNLIMITED).decide(u));
        assertEquals(2415, o.witness().size(), "C(70, 2) bases");
        IndependentCheck.assertOrients(u, o.witness());
    }

    /**
     * The stored input: F7 on the elements 3, 17, 40, 63, 64, 65, 69 (across the word boundary),
     * three free elements and 60 loops. F7 is minor-minimal non-orientable ([Ox, §6.6]; BLSWZ,
     * §6.6, from memory), so the certified core must be F7; read as {@code reduce} reads it, and
     * the verifier rebuilds the core from the 70 elements.
     */
    @Test
    void theStoredSeventyElementInputGivesAVerifiedCertificate() throws IOException, MatroidFileException {
        Path input = Path.of("certificates/inputs/fano-in-70.json");
        MatroidFiles.Hashed read = MatroidFiles.readHashed(input);
        CertifiedReduction.Verified v = assertInstanceOf(CertifiedReduction.Verified.class,
                PIPELINE.run(Subject.read(read.matroid(), read.sha256(), input), dir.resolve("f70.cert.json")));
        assertEquals(List.of(), v.verification().notChecked(), "the verifier rebuilt the core from the 70 elements");
        assertEquals(List.of("3", "17", "40", "63", "64", "65", "69"), v.certificate().core().labels());
        assertTrue(new HyperplaneIsomorphismInspector(v.certificate().core(), NamedMatroids.fano()).find().isPresent());
    }
}
