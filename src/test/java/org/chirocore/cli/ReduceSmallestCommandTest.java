package org.chirocore.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import org.chirocore.io.Json;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code reduce --smallest}: a verified smallest core with its record, unknown on a spent budget, bad combinations. */
class ReduceSmallestCommandTest {
    @TempDir
    Path dir;

    private static final String[] CORNER3 = {"reduce", "--cube", "3", "--hyperplane", "100,010,001", "--pull", "111"};
    private static final String[] CORNER4 = {"reduce", "--cube", "4", "--hyperplane", "0001,0010,0100,1000",
        "--pull", "1111"};

    private static CliRun run(String[] input, String... more) {
        String[] args = new String[input.length + more.length];
        System.arraycopy(input, 0, args, 0, input.length);
        System.arraycopy(more, 0, args, input.length, more.length);
        return CliRun.of(args);
    }

    /** The 3-cube's corner construction is the Fano plane (docs/mathematics.md §7), its own smallest core. */
    @Test
    void fanoIsItsOwnSmallestCore() throws IOException {
        Path out = dir.resolve("f.json");
        CliRun r = run(CORNER3, "--smallest", "--out", out.toString());
        assertEquals(0, r.exit(), r.err() + r.out());
        assertTrue(r.out().startsWith("non-orientable core: rank 3 on 7 elements, 28 bases"), r.out());
        assertTrue(r.out().contains("verified by the independent checker"), r.out());
        assertTrue(r.out().contains("smallest: no non-orientable minor has fewer than 7 elements"), r.out());
        Json.Obj record = Json.parse(Files.readString(ReduceCommand.smallestRecord(out))).asObject("record");
        assertEquals(7, record.requireInt("elements"));
        Json.Obj only = record.requireArray("contractionSets").get(0).asObject("set");
        assertEquals(7, only.requireInt("noNonOrientableRestrictionBelow"));
    }

    /**
     * On the n = 4 corner the smallest core has as many elements as the smallest class of the
     * stored complete enumeration (docs/enumerations/corner-n4, whose cores are checked against a
     * brute force in CoreEnumerationTest).
     */
    @Test
    void cornerOfTheFourCubeAgreesWithTheStoredEnumeration() throws IOException {
        Json.Obj summary = Json.parse(Files.readString(Path.of("docs/enumerations/corner-n4/summary.json")))
                .asObject("summary");
        assertTrue(summary.requireBoolean("complete"));
        Json.Arr classes = summary.requireArray("classes");
        int smallest = Integer.MAX_VALUE;
        for (int k = 0; k < classes.size(); k++) {
            smallest = Math.min(smallest, classes.get(k).asObject("class").requireInt("elements"));
        }
        Path out = dir.resolve("c.json");
        CliRun r = run(CORNER4, "--smallest", "--out", out.toString());
        assertEquals(0, r.exit(), r.err() + r.out());
        assertTrue(r.out().contains(" on " + smallest + " elements"), r.out());
        assertTrue(r.out().contains("fewer than " + smallest + " elements: 5 contraction sets up to symmetry (16 in all"),
                r.out());
    }

    @Test
    void aSpentBudgetIsUnknownAndWritesNothing() {
        Path out = dir.resolve("u.json");
        CliRun r = run(CORNER4, "--smallest", "--conflicts", "1", "--out", out.toString());
        assertEquals(ExitCodes.UNKNOWN, r.exit(), r.err() + r.out());
        assertTrue(r.out().startsWith("unknown:"), r.out());
        assertFalse(Files.exists(out));
        assertFalse(Files.exists(ReduceCommand.smallestRecord(out)));
        CliRun late = run(CORNER4, "--smallest", "--total-time", "0.001", "--out", out.toString());
        assertEquals(ExitCodes.UNKNOWN, late.exit(), late.err() + late.out());
        assertFalse(Files.exists(out));
    }

    @Test
    void smallestWithConstraintsIsBadInput() {
        CliRun r = run(CORNER3, "--smallest", "--rank", "3", "--out", dir.resolve("x.json").toString());
        assertEquals(2, r.exit());
        assertTrue(r.err().contains("--smallest does not combine"), r.err());
    }
}
