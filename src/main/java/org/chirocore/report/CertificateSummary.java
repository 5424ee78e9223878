package org.chirocore.report;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;

import org.chirocore.io.InputFiles;
import org.chirocore.cert.CertificateReader;
import org.chirocore.cert.StatedProof;
import org.chirocore.io.Json;
import org.chirocore.io.Sha256;
import org.chirocore.matroid.ExplicitMatroid;

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
     * Reads the certificate in {@code file}; a proof file ({@code dratFile}, {@code lratFile}) is
     * read from beside it and checked against its digest.
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
                    proof(content.requireObject("nonOrientability"), file));
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

    private static ProofSize proof(Json.Obj proof, Path certificate) throws IOException {
        StatedProof stated = StatedProof.read(proof, certificate);
        return new ProofSize(proof.requireArray("relations").size(), stated.lrat() ? "LRAT" : "DRAT", stated.steps(),
                stated.text().getBytes(StandardCharsets.US_ASCII).length);
    }

    private static List<String> strings(Json.Arr array, String what) {
        return array.elements().stream().map(e -> e.asString("an item of " + what)).toList();
    }
}
