package org.chirocore.cert;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.zip.GZIPInputStream;

import org.chirocore.io.AtomicFiles;
import org.chirocore.io.Json;
import org.chirocore.io.JsonValueException;
import org.chirocore.matroid.ElementSets;
import org.chirocore.matroid.ExplicitMatroid;
import org.chirocore.orient.BasisIndex;
import org.chirocore.orient.ClauseEncoding;
import org.chirocore.orient.GpRelation;

/**
 * Exports a certificate's unsatisfiability claim for external tools: {@code <name>.cnf} in DIMACS
 * and {@code <name>.drat} as standard DRAT text, so that e.g. drat-trim can check it. The CNF is
 * regenerated from the certificate's content alone (core bases, normalised bases, relations)
 * through the canonical encoding of {@link ClauseEncoding}, never taken from the solver. The
 * content digest is checked first, so a tampered certificate is refused. Cost: linear in the
 * certificate plus the clauses written.
 */
public final class CertificateExport {
    private CertificateExport() {
    }

    /**
     * What {@link #export} wrote.
     *
     * @param cnf the DIMACS file
     * @param drat the proof file
     * @param variables the number of variables (bases of the core)
     * @param clauses the number of clauses in the CNF
     * @param lrat the LRAT file, when asked for
     */
    public record Exported(Path cnf, Path drat, int variables, int clauses, Optional<Path> lrat) {
    }

    /**
     * Writes {@code outDir/<name>.cnf} and {@code outDir/<name>.drat} for {@code certificate},
     * {@code <name>} being its file name without {@code .json}; with {@code lrat}, also
     * {@code outDir/<name>.lrat}, the proof with the unit-propagation hints the independent
     * checker finds for each step (so that formally verified LRAT checkers can consume it).
     *
     * @throws IOException when a file cannot be read or written
     * @throws JsonValueException when the certificate is not of this format, its digest does not
     *     match its content, or its proof file does not match {@code dratSha256}
     * @throws org.chirocore.matroid.InvalidMatroidException when its bases are not a matroid's
     * @throws IllegalArgumentException when a relation is malformed, or (with {@code lrat}) when
     *     the proof does not check
     */
    public static Exported export(Path certificate, Path outDir, boolean lrat) throws IOException {
        Json.Obj content = readChecked(certificate).requireObject("content");
        Json.Obj proof = content.requireObject("nonOrientability");
        Claim claim = claim(content);
        BasisIndex index = claim.index();
        List<int[]> cnf = ClauseEncoding.cnf(index, claim.normalised(), claim.relations());
        StringBuilder dimacs = new StringBuilder("p cnf " + index.basisCount() + " " + cnf.size() + "\n");
        for (int[] clause : cnf) {
            for (int lit : clause) {
                dimacs.append(lit).append(' ');
            }
            dimacs.append("0\n");
        }
        String name = CertificateWriter.baseName(certificate);
        Path cnfFile = outDir.resolve(name + ".cnf");
        Path dratFile = outDir.resolve(name + ".drat");
        byte[] dratBytes = drat(proof, certificate);
        AtomicFiles.writeString(cnfFile, dimacs.toString());
        AtomicFiles.write(dratFile, dratBytes);
        Optional<Path> lratFile = Optional.empty();
        if (lrat) {
            String hinted = LratConversion.convert(index.basisCount(), cnf, new String(dratBytes, StandardCharsets.UTF_8));
            lratFile = Optional.of(outDir.resolve(name + ".lrat"));
            AtomicFiles.writeString(lratFile.get(), hinted);
        }
        return new Exported(cnfFile, dratFile, index.basisCount(), cnf.size(), lratFile);
    }

    /**
     * The non-orientability claim of a certificate's content, on the core's bases.
     *
     * @param index the core's bases as variables
     * @param normalised the variables of the normalised bases, in listed order
     * @param relations the listed relations, in order
     */
    record Claim(BasisIndex index, List<Integer> normalised, List<GpRelation> relations) {
        Claim {
            normalised = List.copyOf(normalised);
            relations = List.copyOf(relations);
        }
    }

    /**
     * The certificate document in {@code certificate}, after checking its format, version and digest.
     *
     * @throws IOException when the file cannot be read
     * @throws JsonValueException when it is not of this format or its digest does not match
     */
    static Json.Obj readChecked(Path certificate) throws IOException {
        Json.Obj doc = Json.parse(Files.readString(certificate, StandardCharsets.UTF_8)).asObject("the certificate");
        if (!CertificateWriter.FORMAT.equals(doc.requireString("format"))
                || doc.requireInt("version") != CertificateWriter.VERSION) {
            throw new JsonValueException("the file is not a " + CertificateWriter.FORMAT + " of version "
                    + CertificateWriter.VERSION);
        }
        Json.Obj content = doc.requireObject("content");
        String digest = CertificateWriter.sha256(content);
        if (!digest.equals(doc.requireString("sha256"))) {
            throw new JsonValueException("field \"sha256\" is " + doc.requireString("sha256")
                    + ", but the content's digest is " + digest);
        }
        return doc;
    }

    /**
     * The claim of {@code content}.
     *
     * @throws JsonValueException when a member is missing or malformed, or a normalised set is no basis
     * @throws org.chirocore.matroid.InvalidMatroidException when the bases are not a matroid's
     * @throws IllegalArgumentException when a relation is malformed
     */
    static Claim claim(Json.Obj content) {
        BasisIndex index = BasisIndex.of(core(content.requireObject("core")));
        Json.Obj proof = content.requireObject("nonOrientability");
        List<Integer> normalised = new ArrayList<>();
        Json.Arr normalisedBases = proof.requireArray("normalised");
        for (int i = 0; i < normalisedBases.size(); i++) {
            long mask = ElementSets.mask(ints(normalisedBases.get(i), "normalised[" + i + "]"));
            int v = index.variable(mask);
            if (v == 0) {
                throw new JsonValueException("normalised[" + i + "] is not a basis of the core");
            }
            normalised.add(v);
        }
        List<GpRelation> relations = new ArrayList<>();
        Json.Arr relationArray = proof.requireArray("relations");
        for (int i = 0; i < relationArray.size(); i++) {
            String where = "relations[" + i + "]";
            Json.Arr r = relationArray.get(i).asArray(where);
            if (r.size() != 5) {
                throw new JsonValueException(where + " must be [[X...], a, b, c, d]");
            }
            relations.add(new GpRelation(ElementSets.mask(ints(r.get(0), where + "[0]")), r.get(1).asInt(where),
                    r.get(2).asInt(where), r.get(3).asInt(where), r.get(4).asInt(where)));
        }
        return new Claim(index, normalised, relations);
    }

    private static ExplicitMatroid core(Json.Obj core) {
        Json.Arr labelArray = core.requireArray("labels");
        List<String> labels = new ArrayList<>();
        for (int i = 0; i < labelArray.size(); i++) {
            labels.add(labelArray.get(i).asString("labels[" + i + "]"));
        }
        Json.Arr basisArray = core.requireArray("bases");
        List<int[]> bases = new ArrayList<>();
        for (int i = 0; i < basisArray.size(); i++) {
            bases.add(ints(basisArray.get(i), "bases[" + i + "]"));
        }
        return ExplicitMatroid.fromBases(labels, core.requireInt("rank"), bases);
    }

    private static int[] ints(Json json, String where) {
        Json.Arr a = json.asArray(where);
        int[] out = new int[a.size()];
        for (int i = 0; i < out.length; i++) {
            out[i] = a.get(i).asInt(where + "[" + i + "]");
            if (out[i] < 0 || out[i] >= 64) {
                throw new JsonValueException(where + "[" + i + "] must be an element index in 0..63, found " + out[i]);
            }
        }
        return out;
    }

    /** The proof's bytes: inline, or read from the file beside the certificate and checked against its digest. */
    private static byte[] drat(Json.Obj proof, Path certificate) throws IOException {
        if (proof.has("drat")) {
            return proof.requireString("drat").getBytes(StandardCharsets.UTF_8);
        }
        String fileName = proof.requireString("dratFile");
        Path file = certificate.toAbsolutePath().resolveSibling(fileName);
        if (!file.getParent().equals(certificate.toAbsolutePath().getParent())) {
            throw new JsonValueException("field \"dratFile\" must name a file beside the certificate, not " + fileName);
        }
        byte[] bytes;
        try (InputStream in = fileName.endsWith(".gz") ? new GZIPInputStream(Files.newInputStream(file))
                : Files.newInputStream(file)) {
            bytes = in.readAllBytes();
        }
        String digest = CertificateWriter.sha256(bytes);
        if (!digest.equals(proof.requireString("dratSha256"))) {
            throw new JsonValueException("the proof file " + fileName + " has digest " + digest
                    + ", but field \"dratSha256\" says " + proof.requireString("dratSha256"));
        }
        return bytes;
    }
}
