package org.chirocore.pipeline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.chirocore.fixtures.NamedMatroids;
import org.chirocore.io.Json;
import org.chirocore.io.MatroidFileException;
import org.chirocore.io.MatroidFiles;
import org.chirocore.matroid.CubeConstruction;
import org.chirocore.matroid.HyperplaneIsomorphismInspector;
import org.chirocore.orient.Budget;
import org.chirocore.search.Progress;
import org.chirocore.search.Strategy;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The certified pipeline: success means a written file that the independent verifier accepted. */
class CertifiedReductionTest {
    private static final CertifiedReduction PIPELINE = new CertifiedReduction(
            new CertifiedReduction.Settings(0, Strategy.CONTRACT_FIRST, Budget.UNLIMITED), Progress.SILENT);

    @TempDir
    Path dir;

    @Test
    void theThreeCubeCornerGivesAVerifiedFanoCertificate() throws IOException {
        // H = {100, 010, 001}, O = 111 pulled and contracted gives the Fano plane (the project's
        // README states it; F7 in Oxley, Matroid Theory, 2nd ed., Appendix), which is minor-minimal
        // non-orientable (Oxley §6.6).
        Path out = dir.resolve("c3.json");
        CertifiedReduction.Verified v = assertInstanceOf(CertifiedReduction.Verified.class,
                PIPELINE.run(Subject.of(CubeConstruction.corner(3)), out));
        assertTrue(Files.exists(out));
        assertEquals(List.of(), v.verification().notChecked(), "a construction's provenance is rebuilt and checked");
        assertTrue(new HyperplaneIsomorphismInspector(v.certificate().core(), NamedMatroids.fano()).find().isPresent());
    }

    @Test
    void aGivenMatroidsProvenanceIsNamedAsNotChecked() throws IOException {
        Path out = dir.resolve("f7.json");
        CertifiedReduction.Verified v = assertInstanceOf(CertifiedReduction.Verified.class,
                PIPELINE.run(Subject.given(NamedMatroids.fano(), "0".repeat(64)), out));
        assertEquals(List.of("provenance"), v.verification().notChecked());
    }

    @Test
    void aMatroidReadFromAFileHasItsProvenanceChecked() throws IOException, MatroidFileException {
        // The documented Fano matrix example (docs/matroid-format.md), read as reduce reads it.
        Path input = Path.of("certificates/inputs/fano.json");
        MatroidFiles.Hashed read = MatroidFiles.readHashed(input);
        Path out = dir.resolve("f7-read.json");
        CertifiedReduction.Verified v = assertInstanceOf(CertifiedReduction.Verified.class,
                PIPELINE.run(Subject.read(read.matroid(), read.sha256(), input), out));
        assertEquals(List.of(), v.verification().notChecked(), "the verifier checked the digest and the path");
    }

    @Test
    void anOrientableSubjectWritesNothingAndItsWitnessPassesTheChecker() throws IOException {
        // The non-Fano matroid is real-representable, hence orientable (common practice).
        Path out = dir.resolve("nf.json");
        CertifiedReduction.Orientable o = assertInstanceOf(CertifiedReduction.Orientable.class,
                PIPELINE.run(Subject.given(NamedMatroids.nonFano(), "0".repeat(64)), out));
        IndependentCheck.assertOrients(NamedMatroids.nonFano(), o.witness());
        assertFalse(Files.exists(out));
    }

    @Test
    void anExhaustedBudgetIsUnknownAndWritesNothing() throws IOException {
        Path out = dir.resolve("u.json");
        CertifiedReduction starved = new CertifiedReduction(
                new CertifiedReduction.Settings(0, Strategy.CONTRACT_FIRST, new Budget(1, 1, 0)), Progress.SILENT);
        assertInstanceOf(CertifiedReduction.Unknown.class, starved.run(Subject.of(CubeConstruction.corner(4)), out));
        assertFalse(Files.exists(out));
    }

    @Test
    void aCertificateTheVerifierRejectsIsRemovedAndNeverReportedAsSuccess() throws IOException {
        Path good = dir.resolve("good.json");
        PIPELINE.run(Subject.of(CubeConstruction.corner(3)), good);
        Json.Obj document = Json.parseUtf8(Files.readAllBytes(good)).asObject("certificate");
        Map<String, Json> members = new LinkedHashMap<>(document.members());
        members.put("sha256", new Json.Str("0".repeat(64)));
        Path bad = dir.resolve("bad.json");
        IllegalStateException e = assertThrows(IllegalStateException.class,
                () -> CertifiedReduction.writeVerified(new Json.Obj(members), bad));
        assertTrue(e.getMessage().contains("rejected"), e.getMessage());
        assertFalse(Files.exists(bad));
    }
}
