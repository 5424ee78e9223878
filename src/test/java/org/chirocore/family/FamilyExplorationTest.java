package org.chirocore.family;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.stream.Stream;

import org.chirocore.cert.CertificateForms;
import org.chirocore.cert.WitnessForms;
import org.chirocore.check.CertificateVerifier;
import org.chirocore.fixtures.NamedMatroids;
import org.chirocore.io.Json;
import org.chirocore.matroid.HyperplaneIsomorphismInspector;
import org.chirocore.orient.Budget;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Explorations of the corner family (families/corner.json): several seeded reductions per n. */
class FamilyExplorationTest {
    private static final FamilyDefinition CORNER = FamilyDefinition.read(Path.of("families/corner.json"));

    @TempDir
    Path dir;

    private FamilyExploration.Findings explore(int from, int to, int runs, List<String> keep, List<String> avoid,
            String rank) throws IOException {
        FamilyExploration.Settings settings = new FamilyExploration.Settings(0, runs, Budget.UNLIMITED,
                keep.stream().map(VertexRule::parse).toList(), avoid.stream().map(VertexRule::parse).toList(),
                Optional.ofNullable(rank).map(FamilyExploration.RankRule::parse), 0);
        return new FamilyExploration(CORNER, dir, settings, FamilyRun.Listener.SILENT).run(from, to);
    }

    @Test
    void eachMemberIsHandedToTheListenerAsSoonAsItIsExplored() throws IOException {
        // A batch job's log must hold every finished member even when the job is stopped later.
        List<Integer> seen = new ArrayList<>();
        List<Boolean> reportWritten = new ArrayList<>();
        FamilyRun.Listener listener = new FamilyRun.Listener() {
            @Override
            public void stage(int n, String stage) {
            }

            @Override
            public void explored(FamilyExploration.MemberFindings member) {
                seen.add(member.n());
                reportWritten.add(Files.exists(dir.resolve(FamilyExploration.EXPLORE_JSON)));
            }
        };
        FamilyExploration.Settings settings = FamilyExploration.Settings.unconstrained(0, 1, Budget.UNLIMITED);
        new FamilyExploration(CORNER, dir, settings, listener).run(3, 4);
        assertEquals(List.of(3, 4), seen);
        assertEquals(List.of(false, false), reportWritten, "members are handed over before the report is written");
    }

    @Test
    void fourRunsAtThreeAndFourGiveVerifiedClassesWhoseFrequenciesAddUp() throws IOException {
        FamilyExploration.Findings report = explore(3, 4, 4, List.of(), List.of(), null);
        assertEquals(2, report.members().size());
        for (FamilyExploration.MemberFindings m : report.members()) {
            assertFalse(m.classes().isEmpty(), "n = " + m.n());
            int frequencies = m.classes().stream().mapToInt(c -> c.attempts().size()).sum();
            assertEquals(4, frequencies + m.rejected().size(), "n = " + m.n());
            for (int j = 0; j < m.classes().size(); j++) {
                FamilyExploration.CoreClass c = m.classes().get(j);
                String name = FamilyExploration.certificateName(m.n(), j + 1);
                assertEquals(name, c.certificate().orElseThrow().file());
                assertTrue(CertificateVerifier.verify(dir.resolve(name)).passed(), name);
                assertEquals(c.core(), c.certificate().get().facts().core());
                // classes are pairwise non-isomorphic
                for (int k = 0; k < j; k++) {
                    assertTrue(new HyperplaneIsomorphismInspector(m.classes().get(k).core(), c.core()).find().isEmpty());
                }
            }
        }
        Json.Obj json = Json.parse(Files.readString(dir.resolve(FamilyExploration.EXPLORE_JSON))).asObject("explore");
        assertEquals(2, json.requireArray("members").size());
        String md = Files.readString(dir.resolve(FamilyExploration.EXPLORE_MD));
        assertTrue(md.contains("## n = 4"));
        // the class at n = 3 is the Fano plane (the corner member itself, see everyCoreAtThreeIsTheFanoPlane)
        assertTrue(md.contains("| 1 (F7) | 7 | 3 | 28 |"), md);
    }

    /**
     * With matrix witnesses and trimmed relations the exploration finds the same classes (the forms
     * change how a proof is written, not the search), and each class certificate verifies, states
     * some witnesses as matrices and lists no more relations than the default's. At n = 3 the class
     * is F7, which gets 7 matrices of its 14 witnesses (docs/realisations.md: the real 3-cube with
     * 111 moved onto H or not realises those minors); the Fano plane is not orientable (Oxley,
     * Matroid Theory, 2nd ed., §6.6), so the certificate exists at all.
     */
    @Test
    void matrixWitnessesAndTrimmedRelationsReachEveryClassCertificate() throws IOException {
        Path plain = dir.resolve("plain");
        Path forms = dir.resolve("forms");
        FamilyExploration.Findings a = new FamilyExploration(CORNER, plain, FamilyExploration.Settings.unconstrained(0, 2,
                Budget.UNLIMITED), FamilyRun.Listener.SILENT).run(3, 4);
        FamilyExploration.Findings b = new FamilyExploration(CORNER, forms, new FamilyExploration.Settings(0, 2,
                Budget.UNLIMITED, List.of(), List.of(), Optional.empty(), 0,
                new CertificateForms(WitnessForms.MATRICES, true)), FamilyRun.Listener.SILENT).run(3, 4);
        for (int k = 0; k < 2; k++) {
            List<FamilyExploration.CoreClass> before = a.members().get(k).classes();
            List<FamilyExploration.CoreClass> after = b.members().get(k).classes();
            assertEquals(before.size(), after.size());
            for (int j = 0; j < after.size(); j++) {
                assertEquals(before.get(j).core(), after.get(j).core());
                String name = after.get(j).certificate().orElseThrow().file();
                assertTrue(CertificateVerifier.verify(forms.resolve(name)).passed(), name);
                Json.Obj withForms = content(forms.resolve(name));
                Json.Obj without = content(plain.resolve(name));
                long matrices = matrices(withForms);
                assertTrue(k == 0 ? matrices == 7 : matrices > 0, name + ": " + matrices + " matrices");
                assertEquals(0, matrices(without), name);
                int trimmed = relations(withForms);
                int all = relations(without);
                assertTrue(0 < trimmed && trimmed <= all, name + ": " + trimmed + " of " + all);
            }
        }
    }

    private static Json.Obj content(Path certificate) throws IOException {
        return Json.parse(Files.readString(certificate)).asObject("certificate").requireObject("content");
    }

    private static long matrices(Json.Obj content) {
        return content.requireArray("minimality").elements().stream()
                .flatMap(e -> Stream.of(((Json.Obj) e).require("deletion"), ((Json.Obj) e).require("contraction")))
                .filter(w -> w instanceof Json.Obj o && o.has("matrix")).count();
    }

    private static int relations(Json.Obj content) {
        return content.requireObject("nonOrientability").requireArray("relations").size();
    }

    @Test
    void everyCoreAtThreeIsTheFanoPlane() throws IOException {
        // F7, the Fano plane PG(2, 2): Oxley, Matroid Theory, 2nd ed., Example 1.5.7 and Appendix.
        // The corner member at n = 3 is the Fano plane itself (7 elements, rank 3), so every run ends there.
        FamilyExploration.MemberFindings m = explore(3, 3, 4, List.of(), List.of(), null).members().get(0);
        assertEquals(1, m.classes().size());
        assertEquals(4, m.classes().get(0).attempts().size());
        assertTrue(new HyperplaneIsomorphismInspector(m.classes().get(0).core(), NamedMatroids.fano()).find()
                .isPresent());
    }

    @Test
    void rankNSteersToTheFanoPlaneAtThreeAndAnEightElementRankFourCoreAtFour() throws IOException {
        FamilyExploration.Findings report = explore(3, 4, 1, List.of(), List.of(), "n");
        // n = 3: the member is the Fano plane (rank 3 = n); Oxley, Matroid Theory, 2nd ed., Example 1.5.7
        FamilyExploration.MemberFindings three = report.members().get(0);
        assertEquals(1, three.classes().size());
        assertTrue(new HyperplaneIsomorphismInspector(three.classes().get(0).core(), NamedMatroids.fano()).find()
                .isPresent());
        // n = 4: every rank-4 core of the corner member has 8 elements (the complete enumeration in
        // docs/enumerations/corner-n4/summary.md, classes 1 and 2), so the steered run finds one of them
        FamilyExploration.MemberFindings four = report.members().get(1);
        assertEquals(1, four.classes().size(), four.rejected().toString());
        FamilyExploration.CoreClass c = four.classes().get(0);
        assertEquals(4, c.core().rank());
        assertEquals(8, c.core().size());
        assertTrue(c.core().basisCount() == 59 || c.core().basisCount() == 56, "bases " + c.core().basisCount());
        String name = c.certificate().orElseThrow().file();
        assertTrue(CertificateVerifier.verify(dir.resolve(name)).passed(), name);
        String json = Files.readString(dir.resolve(FamilyExploration.EXPLORE_JSON));
        assertTrue(json.contains("\"rank\": \"n\""), json);
    }

    @Test
    void aRankOutOfReachOrAnAvoidedFanoPointIsProvedAbsent() throws IOException {
        // the corner member at n has rank n (docs/families.md), so no minor has rank n + 1
        FamilyExploration.MemberFindings high = explore(3, 3, 3, List.of(), List.of(), "n+1").members().get(0);
        assertTrue(high.classes().isEmpty());
        assertTrue(high.noneExists().isPresent());
        assertEquals(1, high.rejected().size(), "the remaining runs are skipped");
        // every single-element deletion of F7 is M(K4), graphic hence orientable (Oxley, Matroid Theory,
        // 2nd ed., Proposition 6.4.8 and Section 5.1), so with one vertex avoided nothing is left to find:
        // the steered search enumerates and answers "none exists", not a core
        FamilyExploration.MemberFindings avoided = explore(3, 3, 2, List.of(), List.of("all zeros"), "3").members()
                .get(0);
        assertTrue(avoided.classes().isEmpty());
        assertTrue(avoided.noneExists().orElseThrow().reason().startsWith("none exists: "),
                avoided.rejected().toString());
    }

    @Test
    void aKeptVertexIsInEverySteeredCore() throws IOException {
        FamilyExploration.MemberFindings kept = explore(4, 4, 2, List.of("all zeros"), List.of(), null).members()
                .get(0);
        assertFalse(kept.classes().isEmpty());
        kept.classes().forEach(c -> assertTrue(c.core().labels().contains("0000"), c.core().labels().toString()));
    }

    @Test
    void aKeptVertexThatIsContractedIsRejected() {
        // the corner family contracts the all-ones vertex
        FamilyException e = assertThrows(FamilyException.class,
                () -> explore(3, 3, 1, List.of("all ones"), List.of(), null));
        assertTrue(e.getMessage().contains("--keep \"all ones\" at n = 3 is the vertex 111"), e.getMessage());
    }
}
