package org.chirocore.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import org.chirocore.check.TestCertificatesAccess;
import org.chirocore.io.Json;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code chirocore verify}: exit 0 only when every check of every file ran and passed, 1 when one
 * fails, 2 on bad usage, 4 when nothing failed but a part was not checked.
 */
class VerifyCommandTest {
    @TempDir
    static Path dir;

    static Path good;
    static Path bad;

    @BeforeAll
    static void write() throws IOException {
        // the n = 3 corner construction gives F7 (docs/mathematics.md §7)
        good = dir.resolve("good.json");
        Files.writeString(good, TestCertificatesAccess.corner());
        bad = dir.resolve("bad.json");
        Files.writeString(bad, TestCertificatesAccess.cornerWithAFlippedWitnessSign());
    }

    @Test
    void aGoodCertificatePassesEveryCheck() {
        CliRun run = CliRun.of("verify", good.toString());
        assertEquals(0, run.exit(), run.out() + run.err());
        assertTrue(run.out().contains("PASS     basis exchange: "), run.out());
        assertTrue(run.out().contains("PASS     clausal proof: the empty clause is derived"), run.out());
        assertTrue(run.out().contains("good.json: verified (checked in "), run.out());
        // named after the check passed: the corner construction at n = 3 is the Fano plane
        assertTrue(run.out().contains("good.json: isomorphism class of the core: the Fano plane F7 (J. Oxley"), run.out());
        assertEquals(8, run.out().lines().filter(l -> l.startsWith("PASS")).count(), run.out());
    }

    @Test
    void aBadCertificateExitsWithOne() {
        CliRun run = CliRun.of("verify", good.toString(), bad.toString());
        assertEquals(1, run.exit(), run.out() + run.err());
        assertTrue(run.out().contains("FAIL     minimality witnesses: the deletion witness of 000: relation"), run.out());
        assertTrue(run.out().contains("bad.json: REJECTED ("), run.out());
        assertFalse(run.out().contains("bad.json: isomorphism class"), "a rejected certificate is not named");
    }

    @Test
    void jsonOutputIsAnArrayOfReports() {
        CliRun run = CliRun.of("verify", "--json", good.toString(), bad.toString());
        assertEquals(1, run.exit());
        Json.Arr reports = Json.parse(run.out()).asArray("output");
        assertEquals(2, reports.size());
        assertTrue(reports.get(0).asObject("report").requireBoolean("passed"));
        assertEquals("FAIL", reports.get(1).asObject("r").requireArray("checks").get(6).asObject("c").requireString("status"));
    }

    @Test
    void aGivenMatroidWithoutItsInputFileIsNotReportedAsVerified() {
        CliRun run = CliRun.of("verify", "certificates/fano.cert.json");
        assertEquals(4, run.exit(), run.out() + run.err());
        assertTrue(run.out().contains("NOT_RUN  provenance: the provenance is well formed, but a given matroid can only be rebuilt"),
                run.out());
        assertTrue(run.out().contains("fano.cert.json: verified except provenance (checked in "), run.out());
        CliRun json = CliRun.of("verify", "--json", "certificates/fano.cert.json");
        assertEquals(4, json.exit());
        Json.Obj verdict = Json.parse(json.out()).asArray("output").get(0).asObject("verdict");
        assertTrue(verdict.requireBoolean("passed"));
        assertEquals(false, verdict.requireBoolean("complete"));
        assertEquals("verified except provenance", verdict.requireString("verdict"));
        CliRun full = CliRun.of("verify", "certificates/fano.cert.json", "--input", "certificates/inputs/fano.json");
        assertEquals(0, full.exit(), full.out());
        // a failure anywhere outweighs an unchecked part
        assertEquals(1, CliRun.of("verify", "certificates/fano.cert.json", bad.toString()).exit());
    }

    @Test
    void helpAndBadUsage() {
        assertEquals(0, CliRun.of("verify", "--help").exit());
        assertEquals(2, CliRun.of("verify").exit());
        assertEquals(2, CliRun.of("verify", "--frobnicate", good.toString()).exit());
    }

    @Test
    void aMissingFileIsAFailedCheckNotAStackTrace() {
        CliRun run = CliRun.of("verify", dir.resolve("absent.json").toString());
        assertEquals(1, run.exit());
        assertTrue(run.out().contains("FAIL     format: cannot read the file"), run.out());
        assertEquals("", run.err());
    }
}
