package org.chirocore.check;

import static org.chirocore.check.CertificateVerifierTest.assertRejected;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.UnaryOperator;
import java.util.zip.GZIPOutputStream;

import org.chirocore.cert.CertificateExport;
import org.chirocore.cert.CertificateWriter;
import org.chirocore.io.Json;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A certificate may carry its proof as LRAT (every step with its unit-propagation hints, the form
 * formally verified checkers consume), inline or gzip-compressed in a file beside it; the verifier
 * then follows the hints instead of searching. The LRAT text is the producer's conversion
 * ({@code export --lrat}) of the stored n = 4 certificate's DRAT proof.
 */
class LratCertificateTest {
    @TempDir
    Path dir;

    private static final Path STORED = Path.of("certificates/corner-n4.cert.json");

    /** The LRAT text of the stored n = 4 certificate's proof, as {@code export --lrat} writes it. */
    private String lrat() throws IOException {
        Path exported = Files.createDirectories(dir.resolve("export"));
        return Files.readString(CertificateExport.export(STORED, exported, true).lrat().orElseThrow());
    }

    /** The stored n = 4 certificate with its DRAT proof replaced by {@code lrat}, re-hashed. */
    private Path withLrat(UnaryOperator<String> edit) throws IOException {
        Path stored = STORED;
        String lrat = lrat();
        Json.Obj doc = (Json.Obj) Json.parse(Files.readString(stored));
        Json.Obj content = (Json.Obj) doc.members().get("content");
        Json.Obj non = (Json.Obj) content.members().get("nonOrientability");
        Json.Obj.Builder proof = Json.Obj.builder();
        for (Map.Entry<String, Json> m : non.members().entrySet()) {
            if (!m.getKey().equals("drat")) {
                proof.put(m.getKey(), m.getValue());
            }
        }
        proof.put("lrat", edit.apply(lrat));
        Json.Obj.Builder newContent = Json.Obj.builder();
        for (Map.Entry<String, Json> m : content.members().entrySet()) {
            newContent.put(m.getKey(), m.getKey().equals("nonOrientability") ? proof.build() : m.getValue());
        }
        Json.Obj c = newContent.build();
        Json.Obj.Builder newDoc = Json.Obj.builder();
        for (Map.Entry<String, Json> m : doc.members().entrySet()) {
            newDoc.put(m.getKey(), switch (m.getKey()) {
                case "sha256" -> new Json.Str(CertificateWriter.sha256(c));
                case "content" -> c;
                default -> m.getValue();
            });
        }
        Path file = dir.resolve("lrat.cert.json");
        Files.writeString(file, newDoc.build().toText(), StandardCharsets.UTF_8);
        return file;
    }

    @Test
    void anLratProofIsCheckedByItsHints() throws IOException {
        VerificationReport report = CertificateVerifier.verify(withLrat(UnaryOperator.identity()), Optional.empty());
        assertTrue(report.passed(), report.toString());
        assertTrue(report.check(CertificateVerifier.PROOF).detail().contains("LRAT"));
    }

    @Test
    void aWrongHintIsRejected() throws IOException {
        // Drop the last hint of the first lemma: it no longer propagates to a conflict.
        VerificationReport report = CertificateVerifier.verify(withLrat(lrat -> {
            String first = lrat.lines().filter(l -> !l.contains(" d ")).findFirst().orElseThrow();
            String[] parts = first.trim().split("\\s+");
            StringBuilder shorter = new StringBuilder();
            int zeros = 0;
            for (int i = 0; i < parts.length; i++) {
                if (parts[i].equals("0")) {
                    zeros++;
                }
                boolean lastHint = zeros == 1 && i + 2 == parts.length;
                if (!lastHint) {
                    shorter.append(parts[i]).append(' ');
                }
            }
            return lrat.replaceFirst(java.util.regex.Pattern.quote(first), shorter.toString().trim());
        }), Optional.empty());
        assertEquals(VerificationReport.Status.FAIL, report.check(CertificateVerifier.PROOF).status(), report.toString());
    }

    /**
     * The stored n = 4 certificate with its DRAT proof replaced by {@code lratFile} naming
     * corner-n4.lrat.gz in {@link #dir} (the LRAT text after {@code edit}, gzip-compressed) and
     * {@code lratSha256} its uncompressed bytes' hash; re-hashed.
     */
    private Json.Obj withLratFile(UnaryOperator<String> edit) throws IOException {
        byte[] lrat = edit.apply(lrat()).getBytes(StandardCharsets.US_ASCII);
        try (OutputStream out = new GZIPOutputStream(Files.newOutputStream(dir.resolve("corner-n4.lrat.gz")))) {
            out.write(lrat);
        }
        Json.Obj cert = TrustTest.read(STORED);
        Json.Obj non = (Json.Obj) TestCertificates.get(cert, "content", "nonOrientability");
        Json.Obj moved = Json.Obj.builder().put("normalised", non.require("normalised")).put("relations", non.require("relations"))
                .put("lratFile", "corner-n4.lrat.gz").put("lratSha256", CertificateVerifier.sha256(lrat)).build();
        return TestCertificates.tamper(cert, moved, "nonOrientability");
    }

    private VerificationReport verify(Json.Obj cert) {
        return CertificateVerifier.verify(TestCertificates.bytes(cert), dir, Optional.empty());
    }

    @Test
    void anLratProofFileBesideTheCertificateIsCheckedByItsHints() throws IOException {
        VerificationReport report = verify(withLratFile(UnaryOperator.identity()));
        assertTrue(report.passed(), report.toString());
        String detail = report.check(CertificateVerifier.PROOF).detail();
        assertTrue(detail.matches("the empty clause is derived \\(LRAT hints checked: [1-9]\\d* lemmas, [1-9]\\d* hints, [1-9]\\d* "
                + "propagation steps\\)"), detail);
    }

    @Test
    void anLratProofFileWithAnotherHashIsRejectedNamingTheFile() throws IOException {
        assertRejected(verify(TestCertificates.tamper(withLratFile(UnaryOperator.identity()), new Json.Str("0".repeat(64)),
                "nonOrientability", "lratSha256")), CertificateVerifier.PROOF, "the uncompressed corner-n4.lrat.gz hashes to ");
    }

    @Test
    void aMissingOrLinkedLratProofFileIsRefused() throws IOException {
        Json.Obj cert = withLratFile(UnaryOperator.identity());
        assertRejected(verify(TestCertificates.tamper(cert, new Json.Str("absent.lrat.gz"), "nonOrientability", "lratFile")),
                CertificateVerifier.PROOF, "the proof file absent.lrat.gz does not exist");
        assertRejected(verify(TestCertificates.tamper(cert, new Json.Str("../corner-n4.lrat.gz"), "nonOrientability", "lratFile")),
                CertificateVerifier.PROOF, "lratFile \"../corner-n4.lrat.gz\" must be a plain file name beside the certificate");
        Files.move(dir.resolve("corner-n4.lrat.gz"), dir.resolve("real.lrat.gz"));
        Files.createSymbolicLink(dir.resolve("corner-n4.lrat.gz"), dir.resolve("real.lrat.gz"));
        assertRejected(verify(cert), CertificateVerifier.PROOF,
                "the proof file corner-n4.lrat.gz is a symbolic link; it must be a regular file beside the certificate");
    }

    @Test
    void anLratProofFileNeedsItsHashAndNoOtherProof() throws IOException {
        Json.Obj cert = withLratFile(UnaryOperator.identity());
        assertRejected(verify(TestCertificates.tamper(cert, new Json.Str("0\n"), "nonOrientability", "drat")), CertificateVerifier.FORMAT,
                "nonOrientability must have exactly one of \"drat\", \"lrat\", \"dratFile\" (with \"dratSha256\") and \"lratFile\" "
                        + "(with \"lratSha256\"), found 2");
        assertRejected(verify(TestCertificates.tamper(cert, null, "nonOrientability", "lratSha256")), CertificateVerifier.FORMAT,
                "nonOrientability has \"lratFile\" without \"lratSha256\"");
        assertRejected(verify(TestCertificates.tamper(cert, null, "nonOrientability", "lratFile")), CertificateVerifier.FORMAT,
                "nonOrientability has \"lratSha256\" without \"lratFile\"");
    }

    @Test
    void aCorruptedHintInAnLratProofFileIsRejectedNamingItsLine() throws IOException {
        int[] first = {0};
        Json.Obj cert = withLratFile(text -> {
            List<String> lines = new ArrayList<>(text.lines().toList());
            while (lines.get(first[0]).contains(" d ")) {
                first[0]++;
            }
            // the first lemma's last hint (before the closing 0) now names a clause that does not exist
            String line = lines.get(first[0]);
            lines.set(first[0], line.substring(0, line.lastIndexOf(' ', line.length() - 3)) + " 999999999 0");
            return String.join("\n", lines) + "\n";
        });
        assertRejected(verify(cert), CertificateVerifier.PROOF, "line " + (first[0] + 1) + ": hint 999999999 names no live clause");
    }
}
