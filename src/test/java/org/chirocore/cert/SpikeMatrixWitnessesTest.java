package org.chirocore.cert;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.chirocore.check.CertificateVerifier;
import org.chirocore.check.VerificationReport;
import org.chirocore.family.FamilyDefinition;
import org.chirocore.family.FamilyPrediction;
import org.chirocore.family.RankNFamilyTest;
import org.chirocore.matroid.CubeConstruction;
import org.chirocore.matroid.ExplicitMatroid;
import org.chirocore.matroid.HyperplaneIsomorphismInspector;
import org.chirocore.matroid.Matroid;
import org.chirocore.matroid.Minor;
import org.chirocore.matroid.Realisation;
import org.chirocore.orient.Budget;
import org.chirocore.orient.RealisationCheck;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Matrix witnesses for the tipless rank-n spike S(n) of {@code families/corner-spike.rule.json}
 * (docs/families.md, "The rank-n spike family"; docs/realisations.md, "The spike"): every one of
 * its 4n single-element deletions and contractions gets a matrix from the pulled cube's candidate
 * realisations, within the limits on matrix work, and the certificate written with them verifies
 * with the independent verifier. The core is first compared, up to isomorphism, with the spike
 * built by {@link RankNFamilyTest#spike} from its combinatorial description alone (no cube).
 * Each matrix is accepted only when its non-zero maximal minors are exactly the minor's bases
 * (the chirotope of a real vector configuration: Björner, Las Vergnas, Sturmfels, White, Ziegler,
 * Oriented Matroids, 2nd ed., §3.5, from memory).
 */
class SpikeMatrixWitnessesTest {
    private static final FamilyDefinition CORNER = FamilyDefinition.read(Path.of("families/corner.json"));
    private static final Path RULE = Path.of("families/corner-spike.rule.json");

    @TempDir
    Path dir;

    /** S(n) as the corner construction's restriction to the unit vectors and the vertices of weight n − 1, with its path. */
    private static CoreFinding spikeOfTheCube(int n) {
        CubeConstruction corner = CubeConstruction.corner(n);
        Matroid whole = corner.build();
        List<Integer> kept = new ArrayList<>();
        List<String> deleted = new ArrayList<>();
        for (int v = 0; v < whole.size(); v++) {
            String label = whole.labels().get(v);
            long ones = label.chars().filter(ch -> ch == '1').count();
            if (ones == 1 || ones == n - 1) {
                kept.add(v);
            } else {
                deleted.add(label);
            }
        }
        ExplicitMatroid core = ExplicitMatroid.of(Minor.restriction(whole, kept.stream().mapToInt(Integer::intValue).toArray()));
        return new CoreFinding(core, new Provenance(new Source.Constructed(corner), List.of(), deleted), List.of(),
                new Discovery.Predicted(0, 0));
    }

    @ParameterizedTest(name = "n = {0}")
    @ValueSource(ints = {4, 5, 6, 7})
    void everySingleElementMinorOfTheSpikeGetsAMatrix(int n) {
        CoreFinding found = spikeOfTheCube(n);
        ExplicitMatroid core = found.core();
        assertEquals(2 * n, core.size());
        assertTrue(new HyperplaneIsomorphismInspector(core, RankNFamilyTest.spike(n)).find().isPresent(),
                "the cube's core at n = " + n + " is not the spike of the description");
        MatrixWitnesses matrices = MatrixWitnesses.of(found);
        for (int e = 0; e < core.size(); e++) {
            for (boolean contraction : new boolean[] {false, true}) {
                int[] single = {e};
                Matroid minor = contraction ? new Minor(core, single, new int[0]) : new Minor(core, new int[0], single);
                String what = (contraction ? "S(" + n + ")/" : "S(" + n + ")\\") + core.labels().get(e);
                Optional<Realisation> w = matrices.find(e, contraction, minor);
                assertTrue(w.isPresent(), what + " got no matrix");
                assertEquals(minor.labels(), w.get().labels(), what);
                assertEquals(Optional.empty(), RealisationCheck.defect(minor, w.get()), what);
            }
        }
    }

    @ParameterizedTest(name = "n = {0}")
    @ValueSource(ints = {8, 9, 10})
    @Tag("slow")
    void everySingleElementMinorOfTheLargerSpikesGetsAMatrix(int n) {
        everySingleElementMinorOfTheSpikeGetsAMatrix(n);
    }

    @ParameterizedTest(name = "n = {0}")
    @ValueSource(ints = {4, 5})
    void theSpikeCertificateWithMatricesVerifies(int n) throws IOException {
        FamilyPrediction.Outcome o = new FamilyPrediction(CORNER, FamilyPrediction.Prediction.read(RULE), dir, Budget.UNLIMITED,
                CertificateForms.of(WitnessForms.MATRICES)).run(n, n).get(0);
        FamilyPrediction.Confirmed c = assertInstanceOf(FamilyPrediction.Confirmed.class, o, o.toString());
        assertTrue(new HyperplaneIsomorphismInspector(c.facts().core(), RankNFamilyTest.spike(n)).find().isPresent());
        VerificationReport r = CertificateVerifier.verify(dir.resolve(c.certificate()));
        assertTrue(r.passed(), r::toString);
        assertTrue(r.check(CertificateVerifier.MINIMALITY).detail().endsWith("(0 by signs, 0 transported, " + 4 * n + " by matrices)"),
                r::toString);
    }

    @ParameterizedTest(name = "n = {0}")
    @ValueSource(ints = {6, 7, 8})
    @Tag("slow")
    void theLargerSpikeCertificatesWithMatricesVerify(int n) throws IOException {
        theSpikeCertificateWithMatricesVerifies(n);
    }
}
