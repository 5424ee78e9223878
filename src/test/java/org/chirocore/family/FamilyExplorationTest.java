package org.chirocore.family;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.OptionalInt;

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

    private FamilyExploration.Findings explore(int from, int to, int runs, List<String> keep, OptionalInt rank)
            throws IOException {
        FamilyExploration.Settings settings = new FamilyExploration.Settings(0, runs, Budget.UNLIMITED,
                keep.stream().map(VertexRule::parse).toList(), rank);
        return new FamilyExploration(CORNER, dir, settings, FamilyRun.Listener.SILENT).run(from, to);
    }

    @Test
    void fourRunsAtThreeAndFourGiveVerifiedClassesWhoseFrequenciesAddUp() throws IOException {
        FamilyExploration.Findings report = explore(3, 4, 4, List.of(), OptionalInt.empty());
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

    @Test
    void everyCoreAtThreeIsTheFanoPlane() throws IOException {
        // F7, the Fano plane PG(2, 2): Oxley, Matroid Theory, 2nd ed., Example 1.5.7 and Appendix.
        // The corner member at n = 3 is the Fano plane itself (7 elements, rank 3), so every run ends there.
        FamilyExploration.MemberFindings m = explore(3, 3, 4, List.of(), OptionalInt.empty()).members().get(0);
        assertEquals(1, m.classes().size());
        assertEquals(4, m.classes().get(0).attempts().size());
        assertTrue(new HyperplaneIsomorphismInspector(m.classes().get(0).core(), NamedMatroids.fano()).find()
                .isPresent());
    }

    @Test
    void constraintsFilterRunsAndAreCounted() throws IOException {
        // no core of the corner family has rank 4 at n = 4 (every core found so far has rank 3)
        FamilyExploration.MemberFindings m = explore(4, 4, 2, List.of(), OptionalInt.of(4)).members().get(0);
        assertTrue(m.classes().isEmpty());
        assertEquals(2, m.rejected().size());
        assertTrue(m.rejected().get(0).reason().startsWith("filtered: the core has rank 3, not 4"),
                m.rejected().get(0).reason());
        // the zero vertex is in every accepted core when it is kept
        FamilyExploration.MemberFindings kept = explore(4, 4, 4, List.of("all zeros"), OptionalInt.empty()).members().get(0);
        assertEquals(4, kept.rejected().size() + kept.classes().stream().mapToInt(c -> c.attempts().size()).sum());
        kept.classes().forEach(c -> assertTrue(c.core().labels().contains("0000")));
    }

    @Test
    void aKeptVertexThatIsContractedIsRejected() {
        // the corner family contracts the all-ones vertex
        FamilyException e = assertThrows(FamilyException.class,
                () -> explore(3, 3, 1, List.of("all ones"), OptionalInt.empty()));
        assertTrue(e.getMessage().contains("--keep \"all ones\" at n = 3 is the vertex 111"), e.getMessage());
    }
}
