package org.chirocore.check;

import static org.chirocore.check.CertificateVerifierTest.assertRejected;
import static org.chirocore.check.TestCertificates.bytes;
import static org.chirocore.check.TestCertificates.tamper;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.chirocore.cert.CertificateWriter;
import org.chirocore.cert.Certification;
import org.chirocore.cert.Source;
import org.chirocore.io.Json;
import org.chirocore.matroid.CubeConstruction;
import org.chirocore.orient.Budget;
import org.chirocore.search.MinimalCore;
import org.chirocore.search.Progress;
import org.chirocore.search.SearchResult;
import org.chirocore.search.SearchSettings;
import org.chirocore.search.Strategy;
import org.chirocore.search.UnsatCoreSearch;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The provenance of a cube with more than 64 vertices: the n = 7 corner construction (128
 * vertices, H = the unit vectors, 1111111 pulled and contracted, docs/mathematics.md §7), certified by the
 * library and written by {@link CertificateWriter}, is rebuilt by the verifier.
 */
class BigCubeProvenanceTest {
    @TempDir
    static Path dir;

    static Path file;
    static Json.Obj corner7;

    @BeforeAll
    static void build() throws IOException {
        CubeConstruction construction = CubeConstruction.corner(7);
        SearchSettings settings = new SearchSettings(0, Strategy.CONTRACT_FIRST, Budget.UNLIMITED, construction.hyperplaneVertices());
        MinimalCore core = assertInstanceOf(SearchResult.Found.class,
                new UnsatCoreSearch(settings, Progress.SILENT).reduce(construction.build())).core();
        Certification.Certified certified = assertInstanceOf(Certification.Certified.class,
                Certification.of(core, new Source.Constructed(construction), Budget.UNLIMITED));
        file = dir.resolve("corner-n7.cert.json");
        CertificateWriter.write(certified.certificate(), file);
        corner7 = Json.parse(Files.readString(file)).asObject("certificate");
    }

    static VerificationReport verify(Json.Obj cert) {
        return CertificateVerifier.verify(bytes(cert), dir, Optional.empty());
    }

    @Test
    void theSevenCubeCornerCertificateVerifies() {
        VerificationReport r = CertificateVerifier.verify(file);
        assertTrue(r.passed(), r::toString);
        assertTrue(r.checks().stream().allMatch(c -> c.status() == VerificationReport.Status.PASS), r::toString);
        assertTrue(r.check(CertificateVerifier.PROVENANCE).detail().startsWith("the pulled 7-cube over Q"), r::toString);
    }

    @Test
    void anotherPulledVertexIsRejected() {
        // with O = 1111110, the hyperline H − {0000001} and O span the facet x_7 = 0 of the cube
        assertRejected(verify(tamper(corner7, new Json.Str("1111110"), "provenance", "construction", "pulled")),
                CertificateVerifier.PROVENANCE, "(H, O) are not in general position");
    }

    @Test
    void theEightCubeCornerCertificateVerifies() {
        // written by `chirocore reduce --cube 8` (H = the unit vectors, 11111111 pulled and contracted)
        VerificationReport r = CertificateVerifier.verify(Path.of("src/test/resources/org/chirocore/check/corner-n8.cert.json"));
        assertTrue(r.checks().stream().allMatch(c -> c.status() == VerificationReport.Status.PASS), r::toString);
        assertTrue(r.check(CertificateVerifier.PROVENANCE).detail().startsWith("the pulled 8-cube over Q"), r::toString);
    }

    /** The 7-cube certificate with its construction replaced by the 16-cube, H = the unit vectors and {@code pulled}. */
    static Json.Obj sixteenCube(String pulled) {
        int n = 16;
        Json.Obj cert = tamper(corner7, Json.Num.of(n), "provenance", "construction", "cube");
        List<String> units = new ArrayList<>();
        for (int k = 0; k < n; k++) {
            units.add("0".repeat(k) + "1" + "0".repeat(n - 1 - k));
        }
        cert = tamper(cert, Json.Arr.ofStrings(units), "provenance", "construction", "hyperplane");
        return tamper(cert, new Json.Str(pulled), "provenance", "construction", "pulled");
    }

    /** The largest cube the producer builds (AffineCube.MAX_DIMENSION = 16) is rebuilt as far as the path. */
    @Test
    void aSixteenCubeIsRebuiltUpToThePath() {
        // the 16-cube (65 536 vertices) passes the flat and general-position tests; the 7-cube's path then names no vertex of it
        assertRejected(verify(sixteenCube("1".repeat(16))), CertificateVerifier.PROVENANCE, "path.contracted lists \"");
    }

    /** With O = 11...10 the hyperline H − {00...01} and O span the facet x_16 = 0, so (H, O) is refused at n = 16 too. */
    @Test
    void aSixteenCubeNotInGeneralPositionIsRefused() {
        assertRejected(verify(sixteenCube("1".repeat(15) + "0")), CertificateVerifier.PROVENANCE, "(H, O) are not in general position");
    }

    @Test
    void cubesAboveTheLimitAreRefused() {
        assertRejected(verify(tamper(corner7, Json.Num.of(17), "provenance", "construction", "cube")),
                CertificateVerifier.PROVENANCE, "construction.cube must be between 1 and 16 (at most 65536 vertices), found 17");
    }
}
