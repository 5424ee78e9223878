package org.chirocore.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;

import org.chirocore.orient.Orientability;
import org.chirocore.orient.SolveStats;
import org.chirocore.search.SearchResult;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

class CubeAndBenchCommandTest {
    /** Hyperplanes spanned by vertices of the n-cube: OEIS A007847 (2, 6, 20, 140, 3254 for n = 1..5). */
    @ParameterizedTest
    @CsvSource({"2, 6", "3, 20", "4, 140"})
    void countsHyperplanes(int n, int hyperplanes) {
        CliRun run = CliRun.of("cube", String.valueOf(n));
        assertEquals(0, run.exit(), run.err());
        assertTrue(run.out().contains("\nhyperplanes: " + hyperplanes + "\n"), run.out());
    }

    @Test
    void threeCubeFacts() {
        CliRun run = CliRun.of("cube", "3");
        assertEquals("""
                3-cube over Q: 8 elements, rank 4
                facets: 6
                skew facets: 6
                rectangles: 12
                hyperplanes: 20
                """, run.out());
    }

    @Test
    void hyperplanesOverGfTwoAreNotEnumerated() {
        CliRun run = CliRun.of("cube", "3", "--field", "2");
        assertEquals(0, run.exit(), run.err());
        assertTrue(run.out().startsWith("3-cube over GF(2): 8 elements, rank 4"), run.out());
        assertTrue(run.out().contains("hyperplanes: not enumerated"), run.out());
    }

    @Test
    void reportsHyperplaneAndGeneralPosition() {
        CliRun good = CliRun.of("cube", "3", "--hyperplane", "100,010,001", "--pull", "111");
        assertEquals(0, good.exit(), good.err());
        assertTrue(good.out().contains("H: x1 + x2 + x3 = 1\nH vertices: 001 010 100\nH is a hyperplane: yes\n"
                + "pulling 111 to H: in general position\n"), good.out());

        CliRun facet = CliRun.of("cube", "3", "--hyperplane", "1,0,0=0", "--pull", "100");
        assertEquals(0, facet.exit(), facet.err());
        assertTrue(facet.out().contains("pulling 100 to H: not possible: The point 100 and the hyperplane "
                + "{000, 001, 010, 011} are not in general position: the closure of the hyperline {000, 001} "
                + "together with 100 also contains 101."), facet.out());

        CliRun notFlat = CliRun.of("cube", "3", "--hyperplane", "000,100,010");
        assertEquals(0, notFlat.exit(), notFlat.err());
        assertTrue(notFlat.out().contains("H is a hyperplane: no: The vertex set {000, 010, 100} is not a flat"),
                notFlat.out());
    }

    @Test
    void pullWithoutHyperplaneIsBadUsage() {
        CliRun run = CliRun.of("cube", "3", "--pull", "111");
        assertEquals(2, run.exit());
        assertTrue(run.err().contains("--pull needs --hyperplane"), run.err());
    }

    @Test
    void benchPrintsOneRowPerDimension() {
        CliRun run = CliRun.of("bench", "--max-n", "3");
        assertEquals(0, run.exit(), run.err());
        String[] lines = run.out().split("\n");
        assertEquals(2, lines.length, run.out());
        assertTrue(lines[0].trim().startsWith("n  elements  rank  decide ms  reduce ms  core elements"), lines[0]);
        // n = 3: 7 elements of rank 3 reduce to the Fano plane itself (7 elements, rank 3, 28 bases).
        assertTrue(lines[1].matches(" 3\\s+7\\s+3\\s+\\d+\\s+\\d+\\s+7\\s+3\\s+28\\s+\\d+"), lines[1]);
    }

    /**
     * An unknown decision or reduction is shown as "unknown", never as a time or a verdict
     * (common practice: a run out of budget decides nothing); the cells follow the result's type.
     */
    @Test
    void benchCellsFollowTheResultType() {
        SolveStats stats = new SolveStats(1, 2, 3, 4, 5, 42);
        assertEquals("unknown", BenchCommand.decideColumn(new Orientability.Unknown("time limit", stats)));
        assertEquals("42", BenchCommand.decideColumn(new Orientability.NonOrientable(stats)));
        assertEquals("unknown", BenchCommand.reductionColumn(new SearchResult.Unknown("time limit")));
    }

    /**
     * The orientable table: the real cubes are realisable, hence orientable (Björner et al.,
     * <i>Oriented Matroids</i>, 2nd ed., §3.5, from memory), and so is the Vámos matroid (ibid.,
     * non-realisable but orientable); the searched 5-cube may run out of its one second, and is
     * then unknown, never non-orientable.
     */
    @Test
    void benchOrientablePrintsTheOrientableInstances() {
        CliRun run = CliRun.of("bench", "--orientable", "--time-limit", "1");
        assertEquals(0, run.exit(), run.err());
        String[] lines = run.out().split("\n");
        assertEquals(5, lines.length, run.out());
        assertTrue(lines[1].matches("real 4-cube\\s+16\\s+5\\s+realisation\\s+orientable\\s+\\d+\\s+0\\s+\\d+"), lines[1]);
        assertTrue(lines[2].matches("real 5-cube\\s+32\\s+6\\s+realisation\\s+orientable\\s+\\d+\\s+0\\s+\\d+"), lines[2]);
        assertTrue(lines[3].matches("Vamos V8\\s+8\\s+4\\s+search\\s+orientable\\s+65\\s+.*"), lines[3]);
        assertTrue(lines[4].matches("real 5-cube\\s+32\\s+6\\s+search\\s+(orientable|unknown)\\s+.*"), lines[4]);
    }

    /** The verification table: a stored certificate verifies, a one-byte change to it does not (its digest). */
    @Test
    void benchCertificatesTimesTheVerifier() throws java.io.IOException {
        java.nio.file.Path good = java.nio.file.Path.of("families/rank-n/n=4.predicted.cert.json");
        java.nio.file.Path bad = java.nio.file.Files.createTempFile("bench", ".cert.json");
        try {
            java.nio.file.Files.writeString(bad, java.nio.file.Files.readString(good).replaceFirst("\\[1,", "[2,"));
            CliRun run = CliRun.of("bench", "--certificates", good.toString(), bad.toString());
            assertEquals(0, run.exit(), run.err());
            String[] lines = run.out().split("\n");
            assertEquals(3, lines.length, run.out());
            assertTrue(lines[1].matches(".*n=4.predicted.cert.json\\s+\\d+\\s+verified\\s+\\d+\\s+\\d+"), lines[1]);
            assertTrue(lines[2].contains("REJECTED"), lines[2]);
        } finally {
            java.nio.file.Files.delete(bad);
        }
    }

    @ParameterizedTest
    @ValueSource(strings = {"", "orient", "reduce", "cube", "bench"})
    void helpAndVersionWorkOnEveryCommand(String command) {
        String[] prefix = command.isEmpty() ? new String[0] : new String[] {command};
        CliRun help = CliRun.of(concat(prefix, "--help"));
        assertEquals(0, help.exit(), help.err());
        assertTrue(help.out().startsWith("Usage: chirocore" + (command.isEmpty() ? "" : " " + command)), help.out());
        CliRun version = CliRun.of(concat(prefix, "--version"));
        assertEquals(0, version.exit(), version.err());
        assertEquals(VersionProvider.VERSION, version.out().strip());
    }

    @Test
    void unknownOptionIsBadUsage() {
        CliRun run = CliRun.of("cube", "3", "--colour");
        assertEquals(2, run.exit());
        assertTrue(run.err().contains("Unknown option: '--colour'"), run.err());
    }

    private static String[] concat(String[] prefix, String last) {
        String[] out = Arrays.copyOf(prefix, prefix.length + 1);
        out[prefix.length] = last;
        return out;
    }
}
