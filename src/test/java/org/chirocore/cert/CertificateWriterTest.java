package org.chirocore.cert;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.stream.Stream;

import org.chirocore.check.CertificateVerifier;
import org.chirocore.check.VerificationReport;
import org.chirocore.fixtures.NamedMatroids;
import org.chirocore.io.Json;
import org.chirocore.io.Sha256;
import org.chirocore.matroid.CubeConstruction;
import org.chirocore.matroid.ElementSet;
import org.chirocore.matroid.ElementSets;
import org.chirocore.matroid.Matroid;
import org.chirocore.orient.BasisIndex;
import org.chirocore.orient.Budget;
import org.chirocore.orient.ClauseEncoding;
import org.chirocore.orient.GpRelation;
import org.chirocore.search.MinimalCore;
import org.chirocore.search.Progress;
import org.chirocore.search.SearchResult;
import org.chirocore.search.SearchSettings;
import org.chirocore.search.Strategy;
import org.chirocore.search.UnsatCoreSearch;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/** Certificates of known minimal non-orientable cores, checked against the format's rules. */
class CertificateWriterTest {
    @TempDir
    Path dir;

    private static final String GIVEN_DIGEST = "0".repeat(64);

    static Stream<Arguments> inputs() {
        return Stream.of(
                // F7 is minimal non-orientable (Oxley, Matroid Theory, 2nd ed., §6.6).
                Arguments.of("F7", NamedMatroids.fano(), null),
                // AG(3,2)/e is F7 (Oxley, Matroid Theory, 2nd ed., Appendix, "Some interesting matroids").
                Arguments.of("AG32", NamedMatroids.binaryAffineCube(), null),
                Arguments.of("corner3", null, CubeConstruction.corner(3)),
                Arguments.of("corner4", null, CubeConstruction.corner(4)));
    }

    static Certificate certify(Matroid given, CubeConstruction construction) {
        Matroid m = construction == null ? given : construction.build();
        Source source = construction == null ? new Source.Given(GIVEN_DIGEST, m.size(), m.rank())
                : new Source.Constructed(construction);
        List<String> focus = construction == null ? List.of() : construction.hyperplaneVertices();
        SearchSettings settings = new SearchSettings(3, Strategy.CONTRACT_FIRST, Budget.UNLIMITED, focus);
        MinimalCore core = assertInstanceOf(SearchResult.Found.class,
                new UnsatCoreSearch(settings, Progress.SILENT).reduce(m)).core();
        return assertInstanceOf(Certification.Certified.class, Certification.of(core, source, Budget.UNLIMITED))
                .certificate();
    }

    private static Json.Obj read(Path file) throws IOException {
        return Json.parse(Files.readString(file)).asObject("certificate");
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("inputs")
    void certificateFollowsTheFormat(String name, Matroid given, CubeConstruction construction) throws IOException {
        Certificate c = certify(given, construction);
        Path file = dir.resolve(name + ".json");
        CertificateWriter.Written written = CertificateWriter.write(c, file);
        assertEquals(Optional.empty(), written.proofFile(), "small proofs are inline");

        Json.Obj doc = read(file);
        assertEquals(List.of("format", "version", "tool", "sha256", "content", "run"),
                List.copyOf(doc.members().keySet()));
        assertEquals("chirocore-certificate", doc.requireString("format"));
        assertEquals(1, doc.requireInt("version"));
        assertEquals("chirocore 0.1.0", doc.requireString("tool"));
        Json.Obj content = doc.requireObject("content");
        assertEquals(List.of("statement", "core", "provenance", "nonOrientability", "minimality"),
                List.copyOf(content.members().keySet()));
        assertEquals(CertificateWriter.sha256(content), doc.requireString("sha256"));
        assertTrue(doc.requireString("sha256").matches("[0-9a-f]{64}"));

        Json.Obj core = content.requireObject("core");
        assertEquals(c.core().rank(), core.requireInt("rank"));
        assertEquals(Json.Arr.ofStrings(c.core().labels()), core.requireArray("labels"));
        BasisIndex index = BasisIndex.of(c.core());
        Json.Arr bases = core.requireArray("bases");
        assertEquals(index.basisCount(), bases.size());
        for (int v = 1; v <= index.basisCount(); v++) {
            assertEquals(Json.Arr.ofInts(index.basis(v).elements()), bases.get(v - 1), "canonical order");
        }

        Json.Obj provenance = content.requireObject("provenance");
        assertEquals(List.of(construction == null ? "given" : "construction", "path"),
                List.copyOf(provenance.members().keySet()));
        assertEquals(Json.Arr.ofStrings(c.provenance().contracted()),
                provenance.requireObject("path").requireArray("contracted"));

        Json.Obj proof = content.requireObject("nonOrientability");
        assertEquals(List.of("normalised", "relations", "drat"), List.copyOf(proof.members().keySet()));
        assertTrue(proof.requireString("drat").endsWith("\n0\n"));
        Json.Arr relations = proof.requireArray("relations");
        assertTrue(relations.size() > 0);
        for (int i = 0; i < relations.size(); i++) {
            Json.Arr r = relations.get(i).asArray("relation");
            GpRelation g = new GpRelation(ElementSet.of(ints(r.get(0))), r.get(1).asInt("a"), r.get(2).asInt("b"),
                    r.get(3).asInt("c"), r.get(4).asInt("d"));
            assertEquals(c.core().rank() - 2, r.get(0).asArray("X").size());
            assertFalse(ClauseEncoding.clauses(index, g).isEmpty(), g::toString);
        }

        Json.Arr minimality = content.requireArray("minimality");
        assertEquals(c.core().size(), minimality.size());
        for (int e = 0; e < c.core().size(); e++) {
            Json.Obj w = minimality.get(e).asObject("witness");
            assertEquals(c.core().labels().get(e), w.requireString("element"));
            assertTrue(w.requireString("deletion").matches("[+-]+"));
            assertTrue(w.requireString("contraction").matches("[+-]+"));
        }
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("inputs")
    void sameInputAndSeedGiveTheSameContent(String name, Matroid given, CubeConstruction construction)
            throws IOException {
        Path a = dir.resolve("a.json");
        Path b = dir.resolve("b.json");
        String digestA = CertificateWriter.write(certify(given, construction), a).sha256();
        String digestB = CertificateWriter.write(certify(given, construction), b).sha256();
        assertEquals(digestA, digestB);
        assertEquals(read(a).require("content").toText(), read(b).require("content").toText());
    }

    @Test
    void exportedCnfHeaderCountsTheClauses() throws IOException {
        Certificate c = certify(null, CubeConstruction.corner(4));
        Path file = dir.resolve("corner4.json");
        CertificateWriter.write(c, file);
        Path out = Files.createDirectory(dir.resolve("out"));
        CertificateExport.Exported e = CertificateExport.export(file, out, true);
        // The LRAT proof passes the independent linear-time hint check against the same CNF.
        List<int[]> clausesOfCnf = c.refutation().cnf(BasisIndex.of(c.core()));
        assertEquals(java.util.Optional.empty(), org.chirocore.check.LratChecker.check(
                new org.chirocore.check.Cnf(BasisIndex.of(c.core()).basisCount(), clausesOfCnf),
                Files.readString(e.lrat().orElseThrow())));
        List<String> lines = Files.readAllLines(e.cnf());
        int clauses = lines.size() - 1;
        assertEquals("p cnf " + BasisIndex.of(c.core()).basisCount() + " " + clauses, lines.get(0));
        assertEquals(e.clauses(), clauses);
        // The regenerated CNF is the one the proof was made for.
        List<String> expected = new ArrayList<>();
        for (int[] clause : c.refutation().cnf(BasisIndex.of(c.core()))) {
            StringBuilder sb = new StringBuilder();
            for (int lit : clause) {
                sb.append(lit).append(' ');
            }
            expected.add(sb.append('0').toString());
        }
        assertEquals(expected, lines.subList(1, lines.size()));
        assertEquals(c.refutation().drat(), Files.readString(e.drat()));
    }

    @Test
    void largeProofGoesCompressedBesideTheCertificate() throws IOException {
        Certificate c = certify(NamedMatroids.fano(), null);
        Path file = dir.resolve("fano.json");
        CertificateWriter.Written written = CertificateWriter.write(c, file, 0);
        assertEquals(Optional.of(dir.resolve("fano.drat.gz")), written.proofFile());
        Json.Obj proof = read(file).requireObject("content").requireObject("nonOrientability");
        assertEquals(List.of("normalised", "relations", "dratFile", "dratSha256"),
                List.copyOf(proof.members().keySet()));
        assertEquals("fano.drat.gz", proof.requireString("dratFile"));
        assertEquals(Sha256.hex(c.refutation().drat().getBytes(StandardCharsets.US_ASCII)),
                proof.requireString("dratSha256"));
        // export decompresses it and checks its digest
        Path out = Files.createDirectory(dir.resolve("out"));
        assertEquals(c.refutation().drat(), Files.readString(CertificateExport.export(file, out, false).drat()));
    }

    @Test
    void largeLratProofGoesCompressedBesideAndVerifies() throws IOException {
        Certificate c = certify(NamedMatroids.fano(), null).withLrat();
        Path file = dir.resolve("fano.json");
        CertificateWriter.Written written = CertificateWriter.write(c, file, 0);
        assertEquals(Optional.of(dir.resolve("fano.lrat.gz")), written.proofFile());
        Json.Obj proof = read(file).requireObject("content").requireObject("nonOrientability");
        assertEquals(List.of("normalised", "relations", "lratFile", "lratSha256"), List.copyOf(proof.members().keySet()));
        assertEquals(Sha256.hex(c.lrat().orElseThrow().getBytes(StandardCharsets.US_ASCII)), proof.requireString("lratSha256"));
        VerificationReport report = CertificateVerifier.verify(file);
        assertTrue(report.passed(), report::toString);
        Path out = Files.createDirectory(dir.resolve("out"));
        assertEquals(c.lrat().orElseThrow(), Files.readString(CertificateExport.export(file, out, true).lrat().orElseThrow()));
    }

    private static int[] ints(Json json) {
        Json.Arr a = json.asArray("ints");
        int[] out = new int[a.size()];
        for (int i = 0; i < out.length; i++) {
            out[i] = a.get(i).asInt("int");
        }
        return out;
    }
}
