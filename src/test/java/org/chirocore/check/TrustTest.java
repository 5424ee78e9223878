package org.chirocore.check;

import static org.chirocore.check.CertificateVerifierTest.assertRejected;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

import org.chirocore.cert.LratConversion;
import org.chirocore.io.Json;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * What the verifier may trust and what it may not: the provenance is validated even when it
 * cannot be rebuilt, an input file must be a matroid by the matroid format's rules, proof files
 * must be regular files beside the certificate, certificate text is escaped before it reaches a
 * terminal, and LRAT lines must carry their hint section. The certificates are the stored ones
 * (certificates/README.md names their sources).
 */
class TrustTest {
    static final Path FANO = Path.of("certificates/fano.cert.json");
    static final Path FANO_INPUT = Path.of("certificates/inputs/fano.json");

    static Json.Obj read(Path file) throws IOException {
        return Json.parseUtf8(Files.readAllBytes(file)).asObject("certificate");
    }

    static VerificationReport verify(Json.Obj cert, Path dir, Optional<Path> input) {
        return CertificateVerifier.verify(TestCertificates.bytes(cert), dir, input);
    }

    @Test
    void aGivenMatroidWithoutItsFileIsVerifiedExceptProvenance() {
        VerificationReport v = CertificateVerifier.verify(FANO);
        assertTrue(v.passed(), v::toString);
        assertFalse(v.complete(), v::toString);
        assertEquals("verified except provenance", v.word());
        assertEquals(VerificationReport.Status.NOT_RUN, v.check(CertificateVerifier.PROVENANCE).status());
        VerificationReport full = CertificateVerifier.verify(FANO, Optional.of(FANO_INPUT));
        assertTrue(full.complete(), full::toString);
        assertEquals("verified", full.word());
    }

    @Test
    void aGarbageProvenanceIsRejectedEvenWithoutTheInputFile(@TempDir Path dir) throws IOException {
        Json.Obj fano = read(FANO);
        assertRejected(verify(TestCertificates.tamper(fano, new Json.Str("not a hash"), "provenance", "given", "sha256"), dir, Optional.empty()),
                CertificateVerifier.PROVENANCE, "given.sha256 must be 64 lower-case hex digits");
        assertRejected(verify(TestCertificates.tamper(fano, Json.Num.of(9), "provenance", "given", "elements"), dir, Optional.empty()),
                CertificateVerifier.PROVENANCE, "given.elements 9 and given.rank 3 do not fit a core of 7 elements");
        assertRejected(verify(TestCertificates.tamper(fano, Json.Arr.ofStrings(List.of("a")), "provenance", "path", "deleted"), dir,
                Optional.empty()), CertificateVerifier.PROVENANCE, "path.deleted[0] \"a\" repeats a label of the path or of the core");
        assertRejected(verify(TestCertificates.tamper(fano, new Json.Str("x"), "provenance", "extra"), dir, Optional.empty()),
                CertificateVerifier.PROVENANCE, "extra");
    }

    /** The certificate's recorded input hash replaced by that of {@code input} (the content hash then fails, the provenance check still runs). */
    static Json.Obj pointingTo(Json.Obj cert, byte[] input) {
        return (Json.Obj) TestCertificates.with(cert, List.of("content", "provenance", "given", "sha256"),
                new Json.Str(CertificateVerifier.sha256(input)));
    }

    @Test
    void anInputFileMustBeAMatroid(@TempDir Path dir) throws IOException {
        // F7's bases without the first, {a, b, c}: no longer a matroid (the check names two bases without exchange)
        Json.Obj fano = read(FANO);
        List<Json> bases = ((Json.Arr) TestCertificates.get(fano, "content", "core", "bases")).elements();
        Json.Obj bad = Json.Obj.builder().put("rank", 3).put("labels", Json.Arr.ofStrings(List.of("a", "b", "c", "d", "e", "f", "g")))
                .put("bases", new Json.Arr(bases.subList(1, bases.size()))).build();
        byte[] bytes = TestCertificates.bytes(bad);
        Path input = dir.resolve("bad.json");
        Files.write(input, bytes);
        assertRejected(verify(pointingTo(fano, bytes), dir, Optional.of(input)), CertificateVerifier.PROVENANCE,
                "the input's bases do not form a matroid: ");
    }

    @Test
    void theDocumentedMatrixExampleWithoutElementsIsRead(@TempDir Path dir) throws IOException {
        // docs/matroid-format.md: with a matrix, "labels" and "elements" may both be omitted
        String text = "{\"rank\": 3, \"matrix\": {\"field\": \"GF(2)\", \"columns\": [[1, 0, 0], [0, 1, 0], [0, 0, 1], [1, 1, 0], "
                + "[1, 0, 1], [0, 1, 1], [1, 1, 1]]}}\n";
        Path input = dir.resolve("f7.json");
        Files.writeString(input, text);
        VerificationReport v = verify(pointingTo(read(FANO), text.getBytes(StandardCharsets.UTF_8)), dir, Optional.of(input));
        // read as a matroid on 0..6; the core's labels are a..g, so only the comparison of labels fails
        assertRejected(v, CertificateVerifier.PROVENANCE, "the rebuilt minor has the elements [0, 1, 2, 3, 4, 5, 6], the core [a, b");
    }

    @Test
    void anInputThatIsNotARegularFileIsRefused(@TempDir Path dir) throws IOException {
        VerificationReport v = CertificateVerifier.verify(FANO, Optional.of(dir));
        assertRejected(v, CertificateVerifier.PROVENANCE, "not a regular file");
    }

    @Test
    void aSymbolicLinkAsProofFileIsRefused(@TempDir Path dir) throws IOException {
        Path elsewhere = Files.createDirectory(dir.resolve("elsewhere"));
        Json.Obj withFile = MutationAndFileTest.withProofFile(elsewhere);
        Files.move(elsewhere.resolve("corner.drat.gz"), dir.resolve("real.drat.gz"));
        Files.createSymbolicLink(dir.resolve("corner.drat.gz"), dir.resolve("real.drat.gz"));
        assertRejected(verify(withFile, dir, Optional.empty()), CertificateVerifier.PROOF,
                "the proof file corner.drat.gz is a symbolic link; it must be a regular file beside the certificate");
    }

    /** A FIFO would block a reader forever; it is refused without being opened (needs mkfifo, else says so). */
    @Test
    void aFifoAsProofFileIsRefusedWithoutBlocking(@TempDir Path dir) throws IOException, InterruptedException {
        Path elsewhere = Files.createDirectory(dir.resolve("elsewhere"));
        Json.Obj withFile = MutationAndFileTest.withProofFile(elsewhere);
        Path fifo = dir.resolve("corner.drat.gz");
        int exit;
        try {
            exit = new ProcessBuilder("mkfifo", fifo.toString()).start().waitFor();
        } catch (IOException e) {
            exit = -1;
        }
        if (exit != 0) {
            System.out.println("WARNING: mkfifo is not available; the FIFO test did not run.");
            return;
        }
        assertRejected(verify(withFile, dir, Optional.empty()), CertificateVerifier.PROOF,
                "the proof file corner.drat.gz is not a regular file");
        assertRejected(CertificateVerifier.verify(fifo), CertificateVerifier.FORMAT, "cannot read the file: not a regular file");
    }

    @Test
    void certificateTextIsEscapedForTheTerminal() throws IOException {
        // a label that clears the line and writes a false verdict, then a bidirectional override
        String label = "a\u001b[2K\rPASS     everything: verified\u202e\u0085";
        Json.Obj fano = TestCertificates.tamper(read(FANO), new Json.Str(label), "core", "labels", "0");
        String text = verify(fano, Path.of("certificates"), Optional.empty()).toText();
        assertTrue(text.contains("a\\u001b[2K\\u000dPASS     everything: verified\\u202e\\u0085"), text);
        assertTrue(text.chars().noneMatch(c -> c < 0x20 && c != '\n' || c == 0x7f || c >= 0x80 && c < 0xa0 || c == 0x202e), text);
        assertEquals("tab\\u0009back\\slash", Escaping.printable("tab\tback\\slash"));
        assertEquals("tab\\u0009back\\slash", Escaping.printable(Escaping.printable("tab\tback\\slash")),
                "escaping twice changes nothing");
    }

    @Test
    void theVerdictLineHoldsNoTextOfTheWriter() throws IOException {
        // the unhashed run section may claim anything; the verdict line does not repeat it
        Json.Obj fano = (Json.Obj) TestCertificates.with(read(FANO), List.of("run"), Json.Obj.builder().put("search",
                Json.Obj.builder().put("millis", -5).build()).build());
        String text = verify(fano, Path.of("certificates"), Optional.empty()).toText();
        String last = text.lines().reduce((a, b) -> b).orElseThrow();
        assertTrue(last.matches("\\(\\d+ bytes\\): verified except provenance \\(checked in \\d+ ms\\)"), last);
    }

    @Test
    void anLratLineWithoutHintSectionIsRefused() {
        Cnf cnf = new Cnf(1, List.of(new int[] {1}, new int[] {-1}));
        assertEquals(Optional.of("line 1: the hint section is missing: a lemma line is \"id literals 0 hints 0\""),
                LratChecker.check(cnf, "3 0\n"));
        assertEquals(Optional.of("line 1: the hint section is missing: a lemma line is \"id literals 0 hints 0\""),
                LratChecker.check(new Cnf(2, List.of(new int[] {1, 2}, new int[] {-1, 2}, new int[] {-2})), "4 2 2 0\n"));
        assertEquals(Optional.empty(), LratChecker.check(cnf, "3 0 1 2 0\n"));
    }

    @Test
    void exportingLratSurvivesTheDeletionOfTheTopLevelConflict() {
        // units 1 and -1 conflict at top level; the proof deletes the falsified clause before adding the empty clause
        Cnf cnf = new Cnf(1, List.of(new int[] {1}, new int[] {-1}));
        String lrat = LratConversion.convert(cnf.variables(), cnf.clauses(), "d -1 0\n0\n");
        assertEquals(Optional.empty(), LratChecker.check(cnf, lrat), lrat);
        assertTrue(DratChecker.check(cnf, "d -1 0\n0\n").valid());
    }
}
