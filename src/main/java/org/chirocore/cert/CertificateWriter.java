package org.chirocore.cert;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import java.util.zip.GZIPOutputStream;

import org.chirocore.io.AtomicFiles;
import org.chirocore.io.Json;
import org.chirocore.io.Sha256;
import org.chirocore.matroid.Construction;
import org.chirocore.matroid.Matroid;
import org.chirocore.orient.BasisIndex;
import org.chirocore.orient.GpRelation;
import org.chirocore.orient.Refutation;
import org.chirocore.orient.SolveStats;

/**
 * Writes a {@link Certificate} in the format of {@code docs/certificate-format.md}: the canonical
 * {@code content}, its SHA-256, and the unhashed {@code run} figures. The proof is the
 * certificate's LRAT when it has one, else the refutation's DRAT; a proof of more than
 * {@value #INLINE_PROOF_LIMIT} bytes goes gzip-compressed to {@code <name>.drat.gz} or
 * {@code <name>.lrat.gz} beside the certificate, named in {@code dratFile} or {@code lratFile} with
 * the digest of its uncompressed bytes. Both files are
 * written atomically, the proof first, so a certificate never names a missing proof. Equal
 * certificates give byte-identical content. Cost: linear in the core's bases, the relations,
 * the witnesses and the proof.
 */
public final class CertificateWriter {
    /** The value of the {@code format} member. */
    public static final String FORMAT = "chirocore-certificate";
    /** The value of the {@code version} member. */
    public static final int VERSION = 1;
    /** The value of the {@code tool} member; kept equal to the version in pom.xml. */
    public static final String TOOL = "chirocore 0.1.0";
    /** Proofs up to this many bytes are written inline. */
    public static final int INLINE_PROOF_LIMIT = 1 << 20;

    private CertificateWriter() {
    }

    /**
     * What {@link #write} wrote.
     *
     * @param certificate the certificate file
     * @param proofFile the compressed proof beside it, when the proof was too large to inline
     * @param sha256 the content digest
     */
    public record Written(Path certificate, Optional<Path> proofFile, String sha256) {
    }

    /**
     * Writes {@code c} to {@code target}, and its proof beside it when large.
     *
     * @throws IOException when a file cannot be written; the certificate is then not replaced
     */
    public static Written write(Certificate c, Path target) throws IOException {
        return write(c, target, INLINE_PROOF_LIMIT);
    }

    /** As {@link #write(Certificate, Path)}, with proofs longer than {@code inlineLimit} bytes written beside. */
    static Written write(Certificate c, Path target, int inlineLimit) throws IOException {
        byte[] proof = c.proofText().getBytes(StandardCharsets.US_ASCII);
        Optional<Path> proofFile = Optional.empty();
        if (proof.length > inlineLimit) {
            Path file = proofFile(target, c.lrat().isPresent());
            AtomicFiles.write(file, gzip(proof));
            proofFile = Optional.of(file);
        }
        Json.Obj content = content(c, proofFile.map(p -> p.getFileName().toString()));
        Json.Obj document = document(c, content);
        AtomicFiles.writeJson(target, document);
        return new Written(target, proofFile, sha256(content));
    }

    /** Where a proof too long to inline goes beside {@code certificate}: "c5.json" gives "c5.drat.gz" or "c5.lrat.gz". */
    public static Path proofFile(Path certificate, boolean lrat) {
        return certificate.resolveSibling(baseName(certificate) + (lrat ? ".lrat.gz" : ".drat.gz"));
    }

    /** Both files a proof of {@code certificate} may be written to, DRAT first. */
    public static List<Path> proofFiles(Path certificate) {
        return List.of(proofFile(certificate, false), proofFile(certificate, true));
    }

    /** The file name without a final {@code .json}: "c5.json" gives "c5". */
    public static String baseName(Path file) {
        String name = file.getFileName().toString();
        return name.endsWith(".json") ? name.substring(0, name.length() - ".json".length()) : name;
    }

    /** The whole certificate document around {@code content}. */
    public static Json.Obj document(Certificate c, Json.Obj content) {
        return Json.Obj.builder()
                .put("format", FORMAT)
                .put("version", VERSION)
                .put("tool", TOOL)
                .put("sha256", sha256(content))
                .put("content", content)
                .put("run", run(c))
                .build();
    }

    /**
     * The hashed content; the proof inline, or named by {@code proofFile} with its digest.
     */
    public static Json.Obj content(Certificate c, Optional<String> proofFile) {
        return Json.Obj.builder()
                .put("statement", "minor-minimal non-orientable")
                .put("core", Json.Obj.builder()
                        .put("rank", c.core().rank())
                        .put("labels", Json.Arr.ofStrings(c.core().labels()))
                        .put("bases", new Json.Arr(c.core().bases().stream().<Json>map(Json.Arr::ofInts).toList()))
                        .build())
                .put("provenance", provenance(c.provenance()))
                .put("nonOrientability", nonOrientability(c, proofFile))
                .put("minimality", new Json.Arr(c.minimality().stream().<Json>map(w -> Json.Obj.builder()
                        .put("element", w.element())
                        .put("deletion", witness(w.deletion()))
                        .put("contraction", witness(w.contraction()))
                        .build()).toList()))
                .build();
    }

    /**
     * A witness as the certificate writes it: a sign string, {@code {"image": label, "under": [...]}}
     * or {@code {"matrix": [[column], ...]}}.
     */
    static Json witness(MinimalityWitness.Form form) {
        if (form instanceof MinimalityWitness.Transported t) {
            return Json.Obj.builder()
                    .put("image", t.image())
                    .put("under", Json.Arr.ofInts(t.under().stream().mapToInt(Integer::intValue).toArray()))
                    .build();
        }
        if (form instanceof MinimalityWitness.Matrix m) {
            List<Json> columns = new ArrayList<>();
            for (long[] column : m.columns()) {
                columns.add(new Json.Arr(Arrays.stream(column).<Json>mapToObj(Json.Num::of).toList()));
            }
            return Json.Obj.builder().put("matrix", new Json.Arr(columns)).build();
        }
        return new Json.Str(((MinimalityWitness.Signs) form).signs());
    }

    /** The content digest: SHA-256, lower-case hex, of the UTF-8 bytes of {@code value}'s canonical text. */
    public static String sha256(Json value) {
        return Sha256.hex(value);
    }

    /** The {@code provenance.construction} member describing {@code c}: its parts, in order. */
    public static Json.Obj construction(Construction c) {
        Json.Obj.Builder b = Json.Obj.builder();
        for (Construction.Part part : c.provenance()) {
            b.put(part.name(), json(part.value()));
        }
        return b.build();
    }

    private static Json json(Object value) {
        if (value instanceof Integer i) {
            return Json.Num.of(i);
        }
        if (value instanceof Boolean z) {
            return new Json.Bool(z);
        }
        if (value instanceof String t) {
            return new Json.Str(t);
        }
        return Json.Arr.ofStrings(((List<?>) value).stream().map(String.class::cast).toList());
    }

    private static Json.Obj provenance(Provenance p) {
        Json.Obj.Builder b = Json.Obj.builder();
        if (p.source() instanceof Source.Constructed k) {
            b.put("construction", construction(k.construction()));
        } else {
            Source.Given g = (Source.Given) p.source();
            b.put("given", Json.Obj.builder()
                    .put("sha256", g.sha256())
                    .put("elements", g.elements())
                    .put("rank", g.rank())
                    .build());
        }
        return b.put("path", Json.Obj.builder()
                .put("contracted", Json.Arr.ofStrings(p.contracted()))
                .put("deleted", Json.Arr.ofStrings(p.deleted()))
                .build()).build();
    }

    private static Json.Obj nonOrientability(Certificate c, Optional<String> proofFile) {
        Json.Obj.Builder b = refutationCnf(c.core(), c.refutation());
        String kind = c.lrat().isPresent() ? "lrat" : "drat";
        if (proofFile.isPresent()) {
            b.put(kind + "File", proofFile.get())
                    .put(kind + "Sha256", Sha256.hex(c.proofText().getBytes(StandardCharsets.US_ASCII)));
        } else {
            b.put(kind, c.proofText());
        }
        return b.build();
    }

    /**
     * A refutation of {@code m} in the form of a certificate's {@code nonOrientability}
     * (docs/certificate-format.md) with the DRAT proof inline: the normalised bases, the relations
     * and the proof, over m's elements in order. The completeness evidence of {@code enumerate}
     * carries its dead ends' refutations in this form.
     */
    public static Json.Obj nonOrientability(Matroid m, Refutation r) {
        return refutationCnf(m, r).put("drat", r.drat()).build();
    }

    /** The normalised bases and the relations of a refutation of {@code m}, the proof not yet added. */
    private static Json.Obj.Builder refutationCnf(Matroid m, Refutation r) {
        BasisIndex index = BasisIndex.of(m);
        List<Json> normalised = new ArrayList<>();
        for (int v : r.normalised()) {
            normalised.add(Json.Arr.ofInts(index.basis(v).elements()));
        }
        List<Json> relations = new ArrayList<>();
        for (GpRelation g : r.relations()) {
            relations.add(relation(g));
        }
        return Json.Obj.builder()
                .put("normalised", new Json.Arr(normalised))
                .put("relations", new Json.Arr(relations));
    }

    /** A relation as the certificate lists it: {@code [[x1, ...], a, b, c, d]}. */
    static Json.Arr relation(GpRelation g) {
        return new Json.Arr(List.of(Json.Arr.ofInts(g.x().elements()), Json.Num.of(g.a()),
                Json.Num.of(g.b()), Json.Num.of(g.c()), Json.Num.of(g.d())));
    }

    private static Json.Obj run(Certificate c) {
        SolveStats s = c.refutation().stats().solve();
        Json.Obj.Builder run = Json.Obj.builder();
        if (c.discovery() instanceof Discovery.Searched d) {
            run.put("search", Json.Obj.builder()
                    .put("seed", d.seed())
                    .put("strategy", d.strategy().id())
                    .put("decisions", d.stats().decisions())
                    .put("grownTo", d.stats().grownTo())
                    .put("millis", d.stats().millis())
                    .build());
        } else {
            Discovery.Predicted p = (Discovery.Predicted) c.discovery();
            run.put("prediction", Json.Obj.builder()
                    .put("decisions", p.decisions())
                    .put("millis", p.millis())
                    .build());
        }
        run.put("refutation", Json.Obj.builder()
                        .put("bases", s.bases())
                        .put("relations", c.refutation().relations().size())
                        .put("clauses", s.clauses())
                        .put("rounds", s.rounds())
                        .put("conflicts", s.conflicts())
                        .put("lemmas", c.refutation().stats().lemmas())
                        .put("deletions", c.refutation().stats().deletions())
                        .put("dratBytes", c.refutation().drat().length())
                        .put("millis", s.millis())
                        .build());
        if (c.lrat().isPresent()) {
            StatedProof lrat = new StatedProof(true, c.lrat().get());
            run.put("lrat", Json.Obj.builder()
                    .put("steps", lrat.steps())
                    .put("bytes", lrat.text().length())
                    .build());
        }
        return run.build();
    }

    private static byte[] gzip(byte[] bytes) {
        ByteArrayOutputStream out = new ByteArrayOutputStream(bytes.length / 4 + 64);
        try (GZIPOutputStream z = new GZIPOutputStream(out)) {
            z.write(bytes);
        } catch (IOException e) {
            throw new UncheckedIOException("Compressing to memory cannot fail.", e);
        }
        return out.toByteArray();
    }
}
