package org.chirocore.check;

import static org.chirocore.check.CertificateVerifierTest.assertRejected;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.stream.Stream;

import org.chirocore.cert.Certificate;
import org.chirocore.cert.CertificateForms;
import org.chirocore.cert.WitnessForms;
import org.chirocore.io.Json;
import org.chirocore.io.MatroidFileException;
import org.chirocore.io.MatroidFiles;
import org.chirocore.matroid.CubeConstruction;
import org.chirocore.matroid.ExplicitMatroid;
import org.chirocore.orient.Budget;
import org.chirocore.pipeline.CertifiedReduction;
import org.chirocore.pipeline.Subject;
import org.chirocore.search.Progress;
import org.chirocore.search.Strategy;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Witnesses by symmetry (docs/certificate-format.md, {@code minimality}): certificates written with
 * {@link WitnessForms#ORBITS} verify, state one explicit entry per orbit of the core's automorphism
 * group (counted here by brute force over all permutations, independently of the producer), their
 * transported witnesses are chirotopes (checked here by the full relation scan the verifier skips),
 * and each way of stating a wrong automorphism or reference is rejected.
 */
class OrbitWitnessTest {
    private static final CertifiedReduction ORBITS = new CertifiedReduction(
            new CertifiedReduction.Settings(0, Strategy.CONTRACT_FIRST, Budget.UNLIMITED, CertificateForms.of(WitnessForms.ORBITS)), Progress.SILENT);

    @TempDir
    static Path dir;

    /** F7 reduced and certified with orbit witnesses, and its written file. */
    static CertifiedReduction.Verified fano;
    static Json.Obj fanoJson;

    @BeforeAll
    static void build() throws IOException, MatroidFileException {
        fano = given("fano");
        fanoJson = Json.parseUtf8(Files.readAllBytes(fano.written().certificate())).asObject("certificate");
    }

    private static CertifiedReduction.Verified given(String name) throws IOException, MatroidFileException {
        MatroidFiles.Hashed read = MatroidFiles.readHashed(input(name));
        return assertInstanceOf(CertifiedReduction.Verified.class,
                ORBITS.run(Subject.given(read.matroid(), read.sha256()), dir.resolve(name + ".cert.json")));
    }

    private static Path input(String name) {
        return Path.of("certificates/inputs/" + name + ".json");
    }

    /** Every permutation of the elements mapping bases to bases: all n! tried (independent of the producer's search). */
    static List<int[]> bruteForceAutomorphisms(ExplicitMatroid m) {
        List<int[]> out = new ArrayList<>();
        permutations(m, new int[m.size()], new boolean[m.size()], 0, out);
        return out;
    }

    private static void permutations(ExplicitMatroid m, int[] p, boolean[] used, int next, List<int[]> out) {
        if (next == p.length) {
            for (int[] basis : m.bases()) {
                int[] image = new int[basis.length];
                for (int i = 0; i < basis.length; i++) {
                    image[i] = p[basis[i]];
                }
                if (!m.isBasis(java.util.Arrays.stream(image).sorted().toArray())) {
                    return;
                }
            }
            out.add(p.clone());
            return;
        }
        for (int v = 0; v < p.length; v++) {
            if (!used[v]) {
                used[v] = true;
                p[next] = v;
                permutations(m, p, used, next + 1, out);
                used[v] = false;
            }
        }
    }

    /** The number of orbits of the group {@code g} on n elements. */
    static int orbits(List<int[]> g, int n) {
        int count = 0;
        for (int e = 0; e < n; e++) {
            int least = e;
            for (int[] p : g) {
                least = Math.min(least, p[e]);
            }
            count += least == e ? 1 : 0;
        }
        return count;
    }

    @Test
    void theFanoPlanesGroupHasOrder168AndOneOrbit() {
        // Aut(F7) = PGL(3, 2), of order 168, transitive on the seven points (common practice; Oxley, Matroid Theory,
        // 2nd ed., the Fano plane, from memory): recomputed here by brute force over all 5040 permutations
        List<int[]> group = bruteForceAutomorphisms(fano.certificate().core());
        assertEquals(168, group.size());
        assertEquals(1, orbits(group, 7));
    }

    static Stream<Arguments> transitiveCores() {
        // F7 and F7* (Oxley, Matroid Theory, 2nd ed., Appendix): their automorphism group PGL(3, 2) is transitive; the core
        // of AG(3, 2) is one of them, since AG(3, 2)/e = F7 and AG(3, 2)\e = F7* (Oxley, 2nd ed., Appendix, AG(3, 2); from memory)
        // AG(2, 3)\e: the stabiliser of a point in AGL(2, 3) is GL(2, 3), of order 48, transitive on the eight other points
        // (common practice; Oxley, Matroid Theory, 2nd ed., Appendix, AG(2, 3); from memory)
        return Stream.of(Arguments.of("fano", 168), Arguments.of("fano-dual", 168), Arguments.of("ag32", 168),
                Arguments.of("ag23-minus-point", 48));
    }

    @ParameterizedTest(name = "certificates/inputs/{0}.json")
    @MethodSource("transitiveCores")
    void aTransitiveCoreHasOneExplicitDeletionAndOneExplicitContraction(String name, int order)
            throws IOException, MatroidFileException {
        CertifiedReduction.Verified v = given(name);
        Certificate c = v.certificate();
        List<int[]> group = bruteForceAutomorphisms(c.core());
        assertEquals(order, group.size());
        assertEquals(1, orbits(group, c.core().size()));
        assertEquals(2 * (c.core().size() - 1), c.witnessCount("transported"));
        Json.Arr entries = (Json.Arr) TestCertificates.get(json(v), "content", "minimality");
        long explicitDeletions = entries.elements().stream().filter(e -> ((Json.Obj) e).require("deletion") instanceof Json.Str).count();
        long explicitContractions = entries.elements().stream().filter(e -> ((Json.Obj) e).require("contraction") instanceof Json.Str).count();
        assertEquals(1, explicitDeletions);
        assertEquals(1, explicitContractions);
        VerificationReport report = CertificateVerifier.verify(v.written().certificate(), Optional.of(input(name)));
        assertTrue(report.passed() && report.complete(), report::toString);
    }

    static Stream<Arguments> corners() {
        return Stream.of(3, 4, 5, 6).map(Arguments::of);
    }

    @ParameterizedTest(name = "corner n = {0}")
    @MethodSource("corners")
    void aCornerCoreWithOrbitWitnessesVerifiesAndItsTransportsAreChirotopes(int n) throws IOException {
        CertifiedReduction.Verified v = assertInstanceOf(CertifiedReduction.Verified.class,
                ORBITS.run(Subject.of(CubeConstruction.corner(n)), dir.resolve("corner-" + n + ".cert.json")));
        assertTrue(CertificateVerifier.verify(v.written().certificate()).complete());
        List<int[]> group = v.certificate().core().size() <= 9 ? bruteForceAutomorphisms(v.certificate().core()) : null;
        if (group != null) {
            assertEquals(2 * orbits(group, v.certificate().core().size()), v.certificate().witnessCount("signs"));
        }
        assertTransportsAreChirotopes(v);
    }

    static Stream<Arguments> largeCorners() {
        return Stream.of(7, 8).map(Arguments::of);
    }

    @Tag("slow")
    @ParameterizedTest(name = "corner n = {0}")
    @MethodSource("largeCorners")
    void aLargeCornerCoreWithOrbitWitnessesVerifies(int n) throws IOException {
        aCornerCoreWithOrbitWitnessesVerifiesAndItsTransportsAreChirotopes(n);
    }

    @Test
    void fanosTransportedWitnessesAreChirotopes() {
        assertTransportsAreChirotopes(fano);
    }

    /**
     * The theorem the verifier relies on instead of scanning (docs/mathematics.md §8): each transported
     * witness, regenerated by the verifier's code, satisfies every 3-term relation of its minor.
     */
    private static void assertTransportsAreChirotopes(CertifiedReduction.Verified v) {
        ParsedCertificate parsed = ParsedCertificate.read(JsonTree.parse(TestCertificates.bytes(json(v))));
        BasisTable core = table(parsed);
        int transported = 0;
        for (int e = 0; e < parsed.labels().size(); e++) {
            ParsedCertificate.Witness w = parsed.witnesses().get(e);
            for (boolean contraction : new boolean[] {false, true}) {
                JsonTree.Value side = contraction ? w.contraction() : w.deletion();
                if (!TransportedWitness.isTransported(side)) {
                    continue;
                }
                TransportedWitness.Stated t = TransportedWitness.Stated.read((JsonTree.Obj) side, "test");
                int f = parsed.labels().indexOf(t.image());
                ParsedCertificate.Witness source = parsed.witnesses().get(f);
                String signs = ((JsonTree.Str) (contraction ? source.contraction() : source.deletion())).value();
                BasisTable from = contraction ? core.contraction(f) : core.deletion(f);
                BasisTable to = contraction ? core.contraction(e) : core.deletion(e);
                int[] values;
                try {
                    values = TransportedWitness.transport(from, f, values(signs), to, e, t.under(), "test");
                } catch (CertificateVerifier.Failure x) {
                    throw new AssertionError(x.getMessage(), x);
                }
                assertEquals(Optional.empty(), Relations.violated(to, values), "element " + e + (contraction ? " contraction" : " deletion"));
                transported++;
            }
        }
        assertEquals(v.certificate().witnessCount("transported"), transported);
    }

    private static BasisTable table(ParsedCertificate parsed) {
        return new BasisTable(parsed.labels().size(), parsed.rank(), parsed.bases());
    }

    private static int[] values(String signs) {
        return signs.chars().map(ch -> ch == '+' ? 1 : -1).toArray();
    }

    private static Json.Obj json(CertifiedReduction.Verified v) {
        try {
            return Json.parseUtf8(Files.readAllBytes(v.written().certificate())).asObject("certificate");
        } catch (IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    /** Fano's entry {@code e} with both witnesses replaced by {@code value}. */
    private static Json.Obj withEntry(int e, Json value) {
        Json.Obj entry = Json.Obj.builder().put("element", fano.certificate().core().labels().get(e))
                .put("deletion", value).put("contraction", value).build();
        return TestCertificates.tamper(fanoJson, entry, "minimality", String.valueOf(e));
    }

    private static Json transport(String image, int... under) {
        return Json.Obj.builder().put("image", image).put("under", Json.Arr.ofInts(under)).build();
    }

    private static VerificationReport verify(Json.Obj cert) {
        return CertificateVerifier.verify(TestCertificates.bytes(cert), dir, Optional.empty());
    }

    @Test
    void theWrittenFanoCertificateStatesTransportsAndPasses() {
        assertInstanceOf(Json.Obj.class, TestCertificates.get(fanoJson, "content", "minimality", "1", "deletion"));
        assertEquals(VerificationReport.Status.PASS, verify(fanoJson).check(CertificateVerifier.MINIMALITY).status());
    }

    @Test
    void aPermutationThatIsNotAnAutomorphismIsRejectedNamingABasis() {
        // the transposition of a and b maps a to b but fixes five points of F7: not a collineation
        VerificationReport r = verify(withEntry(1, transport("a", 1, 0, 2, 3, 4, 5, 6)));
        assertRejected(r, CertificateVerifier.MINIMALITY, "is not an automorphism of the core: it maps the basis [");
        String detail = r.check(CertificateVerifier.MINIMALITY).detail();
        // the named image is one of F7's seven lines (the three-element non-bases)
        String image = detail.substring(detail.indexOf(" to [") + 4, detail.indexOf("], which") + 1);
        int[] set = java.util.Arrays.stream(image.substring(1, image.length() - 1).split(", ")).mapToInt(Integer::parseInt).toArray();
        assertTrue(!fano.certificate().core().isBasis(set) && set.length == 3, detail);
    }

    @Test
    void aPermutationNotMappingTheImageToTheElementIsRejected() {
        // entry c's own automorphism (a to c) stated for entry b
        Json cs = TestCertificates.get(fanoJson, "content", "minimality", "2", "deletion");
        VerificationReport r = verify(withEntry(1, cs));
        assertRejected(r, CertificateVerifier.MINIMALITY, "maps its image 0 (\"a\") to 2, not to 1");
    }

    @Test
    void aChainOfTransportsIsRejected() {
        // entry b is itself transported: c may not refer to it
        Json bs = TestCertificates.get(fanoJson, "content", "minimality", "1", "deletion");
        int[] under = ((Json.Arr) ((Json.Obj) TestCertificates.get(fanoJson, "content", "minimality", "2", "deletion")).require("under"))
                .elements().stream().mapToInt(x -> Integer.parseInt(x.toText())).toArray();
        assertInstanceOf(Json.Obj.class, bs);
        VerificationReport r = verify(withEntry(2, transport("b", under)));
        assertRejected(r, CertificateVerifier.MINIMALITY, "which is not given by its signs (a transported witness must refer to an explicit one)");
    }

    @Test
    void aReferenceToAMissingElementIsRejected() {
        assertRejected(verify(withEntry(1, transport("z", 1, 0, 2, 3, 5, 4, 6))), CertificateVerifier.MINIMALITY,
                "is transported from \"z\", which is not a core element");
    }

    @Test
    void aNonBijectionIsRejected() {
        assertRejected(verify(withEntry(1, transport("a", 1, 1, 2, 3, 5, 4, 6))), CertificateVerifier.MINIMALITY,
                "is not a bijection of the elements 0..6 (entry 1 is 1)");
        assertRejected(verify(withEntry(1, transport("a", 1, 0, 2))), CertificateVerifier.MINIMALITY, "has 3 entries; the core has 7 elements");
    }

    @Test
    void anUnknownMemberOrAnUnknownObjectIsRejected() {
        Json.Obj odd = Json.Obj.builder().put("image", "a").put("under", Json.Arr.ofInts(new int[] {1, 0, 2, 3, 5, 4, 6}))
                .put("by", "magic").build();
        assertRejected(verify(withEntry(1, odd)), CertificateVerifier.MINIMALITY, "unknown field \"by\"");
        assertRejected(verify(withEntry(1, Json.Obj.builder().put("under", "a").build())), CertificateVerifier.MINIMALITY,
                "is an object without \"image\"");
        assertRejected(verify(withEntry(1, Json.Num.of(5))), CertificateVerifier.FORMAT, "must be a sign string or an object");
    }
}
