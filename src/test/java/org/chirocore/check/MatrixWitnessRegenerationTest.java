package org.chirocore.check;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.math.BigInteger;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.stream.Stream;

import org.chirocore.cert.CertificateForms;
import org.chirocore.cert.WitnessForms;
import org.chirocore.family.FamilyDefinition;
import org.chirocore.io.Json;
import org.chirocore.matroid.CubeConstruction;
import org.chirocore.orient.Budget;
import org.chirocore.pipeline.CertifiedReduction;
import org.chirocore.pipeline.Subject;
import org.chirocore.search.Progress;
import org.chirocore.search.Strategy;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The stored certificates that come from constructions, regenerated with matrix witnesses (the
 * settings they record: seed 0, contract-first): the same core, provenance and refutation as the
 * stored file, at least one witness a matrix, and both files verify. Each matrix is also turned
 * into signs by the test's own determinants: those signs, put in place of the matrix, pass the
 * verifier's scan of every 3-term relation of the minor, as the theorem that the determinant
 * signs of a real matrix form a chirotope says they must ([BLSWZ, §3.5], docs/mathematics.md §5).
 * The small ones run by default, n = 7.. under the {@code slow} tag.
 */
class MatrixWitnessRegenerationTest {
    private static final CertifiedReduction PIPELINE = new CertifiedReduction(new CertifiedReduction.Settings(0,
            Strategy.CONTRACT_FIRST, Budget.UNLIMITED, CertificateForms.of(WitnessForms.MATRICES)), Progress.SILENT);

    @TempDir
    Path dir;

    static Stream<Integer> small() {
        return Stream.of(3, 4, 5, 6);
    }

    static Stream<Integer> largeCorners() {
        return Stream.of(7, 8);
    }

    static Stream<Integer> largeFamilyMembers() {
        return Stream.of(7, 8, 9, 10);
    }

    @ParameterizedTest(name = "certificates/corner-n{0}.cert.json")
    @MethodSource("small")
    void cornerCertificateWithMatrices(int n) throws IOException {
        assertAgrees(Subject.of(CubeConstruction.corner(n)), Path.of("certificates/corner-n" + n + ".cert.json"));
    }

    @Tag("slow")
    @ParameterizedTest(name = "certificates/corner-n{0}.cert.json")
    @MethodSource("largeCorners")
    void largeCornerCertificateWithMatrices(int n) throws IOException {
        cornerCertificateWithMatrices(n);
    }

    @ParameterizedTest(name = "families/corner/n={0}.cert.json")
    @MethodSource("small")
    void familyMemberWithMatrices(int n) throws IOException {
        FamilyDefinition corner = FamilyDefinition.read(Path.of("families/corner.json"));
        assertAgrees(corner.build(n).subject(), Path.of("families/corner/n=" + n + ".cert.json"));
    }

    @Tag("slow")
    @ParameterizedTest(name = "families/corner/n={0}.cert.json")
    @MethodSource("largeFamilyMembers")
    void largeFamilyMemberWithMatrices(int n) throws IOException {
        familyMemberWithMatrices(n);
    }

    @Tag("slow")
    @ParameterizedTest(name = "certificates/corner-n{0}-matrices.cert.json")
    @MethodSource("storedWithMatrices")
    void storedCertificateWithMatricesIsReproduced(int n) throws IOException {
        Path stored = Path.of("certificates/corner-n" + n + "-matrices.cert.json");
        CertifiedReduction.Outcome o = PIPELINE.run(Subject.of(CubeConstruction.corner(n)), dir.resolve("again.json"));
        Json.Obj old = (Json.Obj) Json.parseUtf8(Files.readAllBytes(stored));
        assertEquals(old.requireString("sha256"), assertInstanceOf(CertifiedReduction.Verified.class, o).written().sha256(),
                stored + ": regenerated content differs");
        assertAgrees(Subject.of(CubeConstruction.corner(n)), stored);
    }

    static Stream<Integer> storedWithMatrices() {
        return Stream.of(9);
    }

    private void assertAgrees(Subject subject, Path stored) throws IOException {
        Path file = dir.resolve("with-matrices.json");
        assertInstanceOf(CertifiedReduction.Verified.class, PIPELINE.run(subject, file));
        Json.Obj regenerated = (Json.Obj) Json.parseUtf8(Files.readAllBytes(file));
        Json.Obj old = (Json.Obj) Json.parseUtf8(Files.readAllBytes(stored));
        for (String member : List.of("core", "provenance", "nonOrientability")) {
            assertEquals(TestCertificates.get(old, "content", member), TestCertificates.get(regenerated, "content", member),
                    stored + ": " + member + " differs");
        }
        assertTrue(CertificateVerifier.verify(stored).passed(), stored + " (sign witnesses) does not verify");
        assertTrue(CertificateVerifier.verify(file).passed(), "the regenerated " + stored + " does not verify");

        Json.Arr entries = (Json.Arr) TestCertificates.get(regenerated, "content", "minimality");
        Json.Obj asSigns = regenerated;
        int matrices = 0;
        for (int i = 0; i < entries.size(); i++) {
            for (String side : List.of("deletion", "contraction")) {
                Json w = TestCertificates.get(entries.get(i), side);
                if (w instanceof Json.Obj o) {
                    matrices++;
                    asSigns = TestCertificates.tamper(asSigns, new Json.Str(signs(MatrixWitnessTest.columns(o))),
                            "minimality", Integer.toString(i), side);
                }
            }
        }
        assertTrue(matrices > 0, stored + ": no witness is a matrix");
        VerificationReport r = CertificateVerifier.verify(TestCertificates.bytes(asSigns), dir, Optional.empty());
        assertTrue(r.passed(), r::toString);
        assertTrue(r.check(CertificateVerifier.MINIMALITY).detail().contains(" by signs, 0 transported, 0 by matrices)"), r::toString);
    }

    /** sign det of every r-subset with non-zero determinant, in lexicographic order of the subsets. */
    static String signs(List<BigInteger[]> columns) {
        int r = columns.get(0).length;
        StringBuilder out = new StringBuilder();
        int[] s = new int[r];
        for (int i = 0; i < r; i++) {
            s[i] = i;
        }
        while (true) {
            List<BigInteger[]> picked = new ArrayList<>();
            for (int e : s) {
                picked.add(columns.get(e));
            }
            int sign = MatrixWitnessTest.det(picked).signum();
            if (sign != 0) {
                out.append(sign > 0 ? '+' : '-');
            }
            int i = r - 1;
            while (i >= 0 && s[i] == columns.size() - r + i) {
                i--;
            }
            if (i < 0) {
                return out.toString();
            }
            s[i]++;
            for (int k = i + 1; k < r; k++) {
                s[k] = s[k - 1] + 1;
            }
        }
    }
}
