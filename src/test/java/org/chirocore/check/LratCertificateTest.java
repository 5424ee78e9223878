package org.chirocore.check;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import java.util.Optional;
import java.util.function.UnaryOperator;

import org.chirocore.cert.CertificateExport;
import org.chirocore.cert.CertificateWriter;
import org.chirocore.io.Json;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A certificate may carry its proof as LRAT (every step with its unit-propagation hints, the form
 * formally verified checkers consume); the verifier then follows the hints instead of searching.
 */
class LratCertificateTest {
    @TempDir
    Path dir;

    /** The stored n = 4 certificate with its DRAT proof replaced by {@code lrat}, re-hashed. */
    private Path withLrat(UnaryOperator<String> edit) throws IOException {
        Path stored = Path.of("certificates/corner-n4.cert.json");
        Path exported = Files.createDirectories(dir.resolve("export"));
        String lrat = Files.readString(CertificateExport.export(stored, exported, true).lrat().orElseThrow());
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
        assertTrue(report.check(CertificateVerifier.DRAT).detail().contains("LRAT"));
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
        assertEquals(VerificationReport.Status.FAIL, report.check(CertificateVerifier.DRAT).status(), report.toString());
    }
}
