package org.chirocore.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code chirocore explain}: the readable proof, the step limit, and the certificate variant checked by {@code verify}. */
class ExplainCommandTest {
    private static final String FANO = "certificates/fano.cert.json";

    /** F7 is not orientable (Bland & Las Vergnas 1978; Oxley, Matroid Theory, 2nd ed., §6.6). */
    @Test
    void printsTheFanoProofAndWritesAVariantThatVerifies(@TempDir Path dir) throws IOException {
        Path text = dir.resolve("fano.txt");
        Path variant = dir.resolve("fano-readable.cert.json");
        CliRun run = CliRun.of("explain", FANO, "--out", text.toString(), "--certificate-out", variant.toString());
        assertEquals(ExitCodes.OK, run.exit(), run.err());
        assertTrue(run.out().contains("1. Relation (c; a, b, d, f)"), run.out());
        assertTrue(run.out().contains("the matroid is not orientable"), run.out());
        assertTrue(Files.readString(text).startsWith("Normalisation"));
        CliRun verify = CliRun.of("verify", variant.toString());
        // the variant keeps the given-matroid provenance, which verify cannot rebuild without --input
        assertEquals(ExitCodes.INCOMPLETE, verify.exit(), verify.out());
        assertTrue(verify.out().contains(": verified except provenance"), verify.out());
    }

    @Test
    void reportsACoreTooLargeForTheLimit() {
        CliRun run = CliRun.of("explain", "certificates/corner-n4.cert.json", "--max-steps", "40");
        assertEquals(ExitCodes.OK, run.exit(), run.err());
        assertTrue(run.out().contains("too large for a readable proof: the derivation reached 41 steps, more than the "
                + "limit of 40."), run.out());
    }

    @Test
    void badLimitAndMissingFileAreBadInput(@TempDir Path dir) {
        assertEquals(ExitCodes.BAD_INPUT, CliRun.of("explain", FANO, "--max-steps", "0").exit());
        assertEquals(ExitCodes.BAD_INPUT, CliRun.of("explain", FANO, "--out", dir.resolve("no/such/dir.txt").toString())
                .exit());
    }

    @Test
    void aTamperedCertificateIsNotExplained(@TempDir Path dir) throws IOException {
        Path bad = dir.resolve("bad.cert.json");
        Files.writeString(bad, Files.readString(Path.of(FANO)).replaceFirst("\"sha256\": \"[0-9a-f]", "\"sha256\": \"x"));
        CliRun run = CliRun.of("explain", bad.toString());
        assertEquals(ExitCodes.CHECK_FAILED, run.exit(), run.out());
        assertTrue(run.out().contains("REJECTED"), run.out());
    }
}
