package org.chirocore.cert;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.zip.GZIPInputStream;

import org.chirocore.io.InputFiles;
import org.chirocore.io.Json;
import org.chirocore.io.JsonValueException;
import org.chirocore.io.Sha256;
import org.chirocore.matroid.Limits;

/**
 * The clausal proof a certificate's {@code nonOrientability} states (docs/certificate-format.md):
 * DRAT or LRAT text, inline ({@code drat}, {@code lrat}) or in a file beside the certificate
 * ({@code dratFile}, {@code lratFile}, gzip-compressed when the name ends in .gz) whose
 * uncompressed bytes must match the recorded digest. Immutable.
 *
 * @param lrat whether the text is LRAT (hints included) rather than DRAT
 * @param text the proof text
 */
public record StatedProof(boolean lrat, String text) {
    /**
     * Reads the proof of {@code nonOrientability}, a member of the certificate in {@code certificate}.
     *
     * @throws IOException when the proof file cannot be read
     * @throws JsonValueException when no proof member is present, the file is not a plain name
     *     beside the certificate, or its digest does not match
     */
    public static StatedProof read(Json.Obj nonOrientability, Path certificate) throws IOException {
        for (String kind : List.of("drat", "lrat")) {
            boolean lrat = kind.equals("lrat");
            if (nonOrientability.has(kind)) {
                return new StatedProof(lrat, nonOrientability.requireString(kind));
            }
            if (nonOrientability.has(kind + "File")) {
                return new StatedProof(lrat, new String(file(nonOrientability, kind, certificate), StandardCharsets.US_ASCII));
            }
        }
        throw new JsonValueException("nonOrientability states no proof: one of \"drat\", \"lrat\", \"dratFile\" or "
                + "\"lratFile\" is needed");
    }

    private static byte[] file(Json.Obj proof, String kind, Path certificate) throws IOException {
        String fileName = proof.requireString(kind + "File");
        Path file = certificate.toAbsolutePath().resolveSibling(fileName);
        if (!file.getParent().equals(certificate.toAbsolutePath().getParent())) {
            throw new JsonValueException("field \"" + kind + "File\" must name a file beside the certificate, not " + fileName);
        }
        byte[] bytes;
        try (InputStream in = fileName.endsWith(".gz") ? new GZIPInputStream(Files.newInputStream(file))
                : Files.newInputStream(file)) {
            bytes = InputFiles.readUpTo(in, Limits.PROOF_BYTES, "the proof file " + fileName);
        }
        String digest = Sha256.hex(bytes);
        String recorded = proof.requireString(kind + "Sha256");
        if (!digest.equals(recorded)) {
            throw new JsonValueException("the proof file " + fileName + " has digest " + digest + ", but field \""
                    + kind + "Sha256\" says " + recorded);
        }
        return bytes;
    }

    /** The number of lines that add a clause (a deletion line is {@code d …} in DRAT, {@code id d …} in LRAT). */
    public long steps() {
        return text.lines().map(String::strip).filter(l -> !l.isEmpty() && !l.startsWith("c") && !l.startsWith("d")
                && !l.matches("\\d+\\s+d\\b.*")).count();
    }

    /**
     * The proof as DRAT: itself, or for LRAT its clause lines without ids and hints and its
     * deletions by their clauses' literals, {@code cnf} giving the literals of ids 1, 2, ….
     * Dropping hints keeps a valid proof, since every LRAT step is RUP or RAT.
     *
     * @throws IllegalArgumentException when an LRAT line is malformed or deletes an unknown id
     */
    public String drat(List<int[]> cnf) {
        if (!lrat) {
            return text;
        }
        Map<Long, int[]> clauses = new HashMap<>();
        for (int i = 0; i < cnf.size(); i++) {
            clauses.put(i + 1L, cnf.get(i));
        }
        StringBuilder out = new StringBuilder();
        for (String line : text.lines().map(String::strip).filter(l -> !l.isEmpty()).toList()) {
            String[] t = line.split("\\s+");
            if (t.length > 1 && t[1].equals("d")) {
                for (int i = 2; i < t.length - 1; i++) {
                    int[] deleted = clauses.get(Long.parseLong(t[i]));
                    if (deleted == null) {
                        throw new IllegalArgumentException("The LRAT line \"" + line + "\" deletes unknown clause " + t[i] + ".");
                    }
                    out.append("d");
                    for (int lit : deleted) {
                        out.append(' ').append(lit);
                    }
                    out.append(" 0\n");
                }
                continue;
            }
            int end = 1;
            while (end < t.length && !t[end].equals("0")) {
                end++;
            }
            int[] lits = new int[end - 1];
            for (int i = 1; i < end; i++) {
                lits[i - 1] = Integer.parseInt(t[i]);
            }
            clauses.put(Long.parseLong(t[0]), lits);
            out.append(String.join(" ", List.of(t).subList(1, end))).append(end > 1 ? " 0\n" : "0\n");
        }
        return out.toString();
    }
}
