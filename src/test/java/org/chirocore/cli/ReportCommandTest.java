package org.chirocore.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code chirocore report}: writes reports, and refuses bad formats and unverifiable certificates with exit 2. */
class ReportCommandTest {
    @TempDir
    Path dir;

    @Test
    void writesAnHtmlReport() throws IOException {
        Path out = dir.resolve("fano.html");
        CliRun run = CliRun.of("report", "certificates/fano.cert.json", "--format", "html", "--out", out.toString());
        assertEquals(0, run.exit(), run.err());
        assertTrue(Files.readString(out).startsWith("<!DOCTYPE html>"));
        assertTrue(run.out().contains("wrote " + out), run.out());
    }

    @Test
    void writesAFamilyReport() {
        CliRun run = CliRun.of("report", "--family", "families/corner", "--out", dir.resolve("corner.md").toString());
        assertEquals(0, run.exit(), run.err());
        assertTrue(Files.exists(dir.resolve("corner-time.svg")));
    }

    @Test
    void writesARunDirectoryWithAnIndex() {
        Path out = dir.resolve("corner");
        CliRun run = CliRun.of("report", "--run", "families/corner", "--index", "--format", "html", "--out", out.toString());
        assertEquals(0, run.exit(), run.err());
        assertTrue(Files.exists(out.resolve("index.html")) && Files.exists(out.resolve("run.html"))
                && Files.exists(out.resolve("n=10.html")), run.out());
    }

    @Test
    void aPictureFileThatExistsIsNotReplacedWithoutForce() throws IOException {
        Path picture = Files.writeString(dir.resolve("fano-configuration.svg"), "someone else's picture");
        Path out = dir.resolve("fano.md");
        CliRun run = CliRun.of("report", "certificates/fano.cert.json", "--out", out.toString());
        assertEquals(ExitCodes.BAD_INPUT, run.exit());
        assertTrue(run.err().contains(picture + ": the file already exists; give --force"), run.err());
        assertEquals("someone else's picture", Files.readString(picture));
        assertFalse(Files.exists(out), "nothing written");
        assertEquals(0, CliRun.of("report", "certificates/fano.cert.json", "--out", out.toString(), "--force").exit());
        assertTrue(Files.readString(picture).startsWith("<svg"));
    }

    @Test
    void anIndexDoesNotReplaceACertificateReportWithoutForce() throws IOException {
        Path out = Files.createDirectory(dir.resolve("corner"));
        Path report = Files.writeString(out.resolve("n=4.html"), "kept");
        CliRun run = CliRun.of("report", "--run", "families/corner", "--index", "--format", "html", "--out", out.toString());
        assertEquals(ExitCodes.BAD_INPUT, run.exit());
        assertTrue(run.err().contains(report + ": the file already exists"), run.err());
        assertEquals("kept", Files.readString(report));
        try (var files = Files.list(out)) {
            assertEquals(1, files.count(), "nothing written beside the existing file");
        }
    }

    @Test
    void aMissingCertificateIsNamedAsMissing() {
        CliRun run = CliRun.of("report", dir.resolve("none.cert.json").toString(), "--out", dir.resolve("r.md").toString());
        assertEquals(ExitCodes.BAD_INPUT, run.exit());
        assertTrue(run.err().contains("none.cert.json: cannot read the file: no such file"), run.err());
        CliRun input = CliRun.of("report", "certificates/fano.cert.json", "--input", dir.toString(), "--out",
                dir.resolve("r.md").toString());
        assertEquals(ExitCodes.BAD_INPUT, input.exit());
        assertTrue(input.err().contains(dir + ": cannot read the file: not a regular file"), input.err());
    }

    @Test
    void indexNeedsARunDirectory() {
        CliRun run = CliRun.of("report", "certificates/fano.cert.json", "--index", "--out", dir.toString());
        assertEquals(ExitCodes.BAD_INPUT, run.exit());
        assertTrue(run.err().contains("--index applies to --run DIR"), run.err());
    }

    @Test
    void unknownFormatIsBadUsage() {
        CliRun run = CliRun.of("report", "certificates/fano.cert.json", "--format", "pdf", "--out", dir.resolve("x").toString());
        assertEquals(ExitCodes.BAD_INPUT, run.exit());
        assertTrue(run.err().contains("unknown format \"pdf\""), run.err());
    }

    @Test
    void unverifiableCertificateIsRefused() throws IOException {
        Path bad = dir.resolve("bad.cert.json");
        Files.writeString(bad, Files.readString(Path.of("certificates/fano.cert.json")).replace("\"3057a6", "\"4057a6"));
        CliRun run = CliRun.of("report", bad.toString(), "--out", dir.resolve("bad.md").toString());
        assertEquals(ExitCodes.BAD_INPUT, run.exit());
        assertTrue(run.err().contains("does not verify"), run.err());
        assertTrue(Files.notExists(dir.resolve("bad.md")));
    }

    @Test
    void certificateAndFamilyAreExclusive() {
        CliRun run = CliRun.of("report", "certificates/fano.cert.json", "--family", "families/corner", "--out", "x.md");
        assertEquals(ExitCodes.BAD_INPUT, run.exit());
    }
}
