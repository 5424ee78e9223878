package org.chirocore.family;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.OptionalInt;

import org.chirocore.fixtures.NamedMatroids;
import org.chirocore.matroid.HyperplaneIsomorphismInspector;
import org.chirocore.orient.Budget;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Following one core shape across n through an exploration of the corner family. */
class ShapeFollowTest {
    private static final FamilyDefinition CORNER = FamilyDefinition.read(Path.of("families/corner.json"));

    @TempDir
    Path dir;

    @Test
    void theFanoShapeIsFoundAtOddNAndMissedAtEvenN() throws IOException {
        FamilyExploration.Settings settings = new FamilyExploration.Settings(0, 4, Budget.UNLIMITED, List.of(),
                OptionalInt.empty());
        FamilyExploration.Findings report = new FamilyExploration(CORNER, dir, settings, FamilyRun.Listener.SILENT)
                .run(3, 5);
        ShapeFollow.Shape shape = ShapeFollow.Shape.parse("elements=7,rank=3");
        List<ShapeFollow.Row> rows = ShapeFollow.follow(report, shape);
        assertEquals(3, rows.size());
        // Observed with seeds 0..3: the Fano plane at n = 3 and 5, no 7-element core at n = 4 (whose
        // cores have 8 elements); F7 is the unique 7-point rank-3 matroid with 7 three-point lines
        // (Oxley, Matroid Theory, 2nd ed., Appendix), checked here by isomorphism.
        for (int i : new int[] {0, 2}) {
            ShapeFollow.Row row = rows.get(i);
            assertTrue(row.chosen().isPresent(), "n = " + row.n());
            assertTrue(new HyperplaneIsomorphismInspector(row.chosen().get().core(), NamedMatroids.fano()).find()
                    .isPresent());
            assertTrue(row.chosen().get().certificate().isPresent());
        }
        assertTrue(rows.get(1).chosen().isEmpty());
        assertEquals(0, rows.get(1).frequency());
        ShapeFollow.write(dir, shape, rows);
        String md = Files.readString(dir.resolve(ShapeFollow.FOLLOW_MD));
        assertTrue(md.contains("| 4 | no core of this shape among 4 runs |"), md);
    }

    @Test
    void badShapesAreRejectedWithTheirPart() {
        FamilyException e = assertThrows(FamilyException.class, () -> ShapeFollow.Shape.parse("size=7,rank=3"));
        assertTrue(e.getMessage().contains("\"size=7\" is not of that form"), e.getMessage());
        e = assertThrows(FamilyException.class, () -> ShapeFollow.Shape.parse("elements=7"));
        assertTrue(e.getMessage().contains("must give both elements and rank"), e.getMessage());
        e = assertThrows(FamilyException.class, () -> ShapeFollow.Shape.parse("elements=2*,rank=3"));
        assertTrue(e.getMessage().startsWith("The shape \"elements=2*,rank=3\": elements: "), e.getMessage());
    }

    @Test
    void shapesAreExpressionsInN() {
        ShapeFollow.Shape shape = ShapeFollow.Shape.parse("rank=3, elements=n+4");
        assertEquals(8, shape.elements().value(4, 0));
        assertEquals(3, shape.rank().value(9, 0));
    }
}
