package org.chirocore.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;

import org.chirocore.check.CertificateVerifier;
import org.chirocore.io.Json;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code enumerate}: summary files and one verified certificate per class. */
class EnumerateCommandTest {
    @TempDir
    Path dir;

    /**
     * The 3-cube's corner construction is the Fano plane (docs/mathematics.md §7; F7 is minimal
     * non-orientable, Oxley, Matroid Theory, 2nd ed., §6.6): one class, itself, counted once; its
     * symmetry group fixing H and O is S3 (computed).
     */
    @Test
    void cornerOfTheThreeCubeHasOneClass() throws IOException {
        CliRun r = CliRun.of("enumerate", "--cube", "3", "--hyperplane", "100,010,001", "--pull", "111", "--out",
                dir.toString());
        assertEquals(0, r.exit(), r.err() + r.out());
        Json.Obj summary = Json.parse(Files.readString(dir.resolve("summary.json"))).asObject("summary");
        assertTrue(summary.requireBoolean("complete"));
        assertEquals(6, summary.requireObject("symmetry").requireInt("order"));
        assertEquals(1, summary.requireArray("classes").size());
        Json.Obj c = summary.requireArray("classes").get(0).asObject("class");
        assertEquals(7, c.requireInt("elements"));
        assertEquals(1, c.requireInt("count"));
        assertEquals("class-1.cert.json", c.requireString("certificate"));
        assertTrue(CertificateVerifier.verify(dir.resolve("class-1.cert.json"), Optional.empty()).passed());
        assertTrue(Files.readString(dir.resolve("summary.md")).contains("**complete**"));
    }

    /** The same class, its certificate written with matrix witnesses and an LRAT proof. */
    @Test
    void theClassCertificateTakesTheProofForms() throws IOException {
        CliRun r = CliRun.of("enumerate", "--cube", "3", "--hyperplane", "100,010,001", "--pull", "111", "--out",
                dir.toString(), "--matrix-witnesses", "--lrat-proof");
        assertEquals(0, r.exit(), r.err() + r.out());
        Json.Obj content = Json.parse(Files.readString(dir.resolve("class-1.cert.json"))).asObject("certificate")
                .requireObject("content");
        assertTrue(content.requireObject("nonOrientability").has("lrat"));
        // F7's single-element minors are realised by the real 3-cube (docs/realisations.md)
        assertTrue(content.requireArray("minimality").elements().stream().map(e -> e.asObject("entry").require("deletion"))
                .anyMatch(w -> w instanceof Json.Obj o && o.has("matrix")), content.requireArray("minimality").toString());
        assertTrue(CertificateVerifier.verify(dir.resolve("class-1.cert.json"), Optional.empty()).passed());
    }

    @Test
    void badOptionsAreBadInput() {
        assertEquals(2, CliRun.of("enumerate", "--cube", "3", "--hyperplane", "100,010,001", "--pull", "111",
                "--symmetry", "all", "--out", dir.toString()).exit());
        assertEquals(2, CliRun.of("enumerate", "--cube", "3", "--hyperplane", "100,010,001", "--pull", "111",
                "--rank", "2", "--out", dir.toString()).exit());
    }

    @Test
    void aNegativeTotalTimeIsRefusedBeforeTheOutputDirectoryIsMade() {
        Path fresh = dir.resolve("not-made");
        assertEquals(2, CliRun.of("enumerate", "--cube", "3", "--hyperplane", "100,010,001", "--pull", "111",
                "--total-time", "-5", "--out", fresh.toString()).exit());
        assertFalse(Files.exists(fresh), "a refused command leaves nothing behind");
    }
}
