package org.chirocore.report;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.zip.GZIPInputStream;

import org.chirocore.io.InputFiles;
import org.chirocore.cert.CertificateReader;
import org.chirocore.io.Json;
import org.chirocore.io.Sha256;
import org.chirocore.matroid.ExplicitMatroid;
import org.chirocore.matroid.Limits;

/**
 * What a report says about a certificate, read from its JSON (docs/certificate-format.md). It
 * trusts the file's structure only as far as a verified certificate has it: {@link
 * CertificateReport} reads it after {@code CertificateVerifier} passed.
 *
 * @param file the certificate's file name
 * @param contentSha256 the {@code sha256} member: the hash of the canonical content
 * @param fileSha256 the SHA-256 of the file's bytes
 * @param core the core, as a matroid given by its bases
 * @param origin its provenance
 * @param proof the size of the non-orientability proof
 */
public record CertificateSummary(String file, String contentSha256, String fileSha256, ExplicitMatroid core, Origin origin,
        ProofSize proof) {

    /**
     * The size of the unsatisfiability proof.
     *
     * @param relations the 3-term relations listed
     * @param kind {@code "DRAT"} or {@code "LRAT"}
     * @param lemmas the added clauses (lines that are not deletions)
     * @param bytes the proof text's size in bytes (uncompressed)
     */
    public record ProofSize(int relations, String kind, long lemmas, long bytes) {
    }

    /**
     * Reads the certificate in {@code file}; a {@code dratFile} is read from beside it.
     * Cost: linear in the certificate's and the proof's size.
     *
     * @throws ReportException when the file cannot be read or lacks a member
     */
    public static CertificateSummary read(Path file) {
        try {
            byte[] bytes = InputFiles.read(file);
            Json.Obj cert = CertificateReader.parseChecked(bytes);
            Json.Obj content = cert.requireObject("content");
            return new CertificateSummary(file.getFileName().toString(), cert.requireString("sha256"), Sha256.hex(bytes),
                    CertificateReader.core(content.requireObject("core")), origin(content.requireObject("provenance")),
                    proof(content.requireObject("nonOrientability"), file.toAbsolutePath().getParent()));
        } catch (IOException | IllegalArgumentException e) {
            throw new ReportException(file + ": cannot be read as a certificate: " + e.getMessage(), e);
        }
    }

    private static Origin origin(Json.Obj provenance) {
        Json.Obj path = provenance.requireObject("path");
        List<String> contracted = strings(path.requireArray("contracted"), "path.contracted");
        List<String> deleted = strings(path.requireArray("deleted"), "path.deleted");
        if (provenance.has("construction")) {
            Json.Obj c = provenance.requireObject("construction");
            return new Origin.Construction(c.requireInt("cube"), c.requireString("field"),
                    strings(c.requireArray("hyperplane"), "hyperplane"), c.requireString("pulled"),
                    c.requireBoolean("contractPulled"), contracted, deleted);
        }
        Json.Obj g = provenance.requireObject("given");
        return new Origin.Given(g.requireString("sha256"), g.requireInt("elements"), g.requireInt("rank"), contracted, deleted);
    }

    private static ProofSize proof(Json.Obj proof, Path dir) throws IOException {
        int relations = proof.requireArray("relations").size();
        if (proof.has("lrat")) {
            return size(relations, "LRAT", proof.requireString("lrat"));
        }
        if (proof.has("drat")) {
            return size(relations, "DRAT", proof.requireString("drat"));
        }
        String name = proof.requireString("dratFile");
        try (InputStream raw = Files.newInputStream(dir.resolve(name));
                InputStream in = name.endsWith(".gz") ? new GZIPInputStream(raw) : raw) {
            byte[] text = InputFiles.readUpTo(in, Limits.PROOF_BYTES, "the proof file " + name);
            return size(relations, "DRAT", new String(text, StandardCharsets.UTF_8));
        }
    }

    /** Counts the lines that add a clause; in LRAT a deletion line is {@code id d ...}. */
    private static ProofSize size(int relations, String kind, String text) {
        long lemmas = text.lines().map(String::trim)
                .filter(l -> !l.isEmpty() && !l.startsWith("c") && !l.startsWith("d") && !l.matches("\\d+\\s+d\\b.*"))
                .count();
        return new ProofSize(relations, kind, lemmas, text.getBytes(StandardCharsets.UTF_8).length);
    }

    private static List<String> strings(Json.Arr array, String what) {
        return array.elements().stream().map(e -> e.asString("an item of " + what)).toList();
    }
}
