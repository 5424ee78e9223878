package org.chirocore.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;

import org.chirocore.io.Json;
import org.chirocore.io.MatroidFiles;
import org.chirocore.io.ResultJson;
import org.chirocore.matroid.Matroid;
import org.chirocore.matroid.Realisation;
import org.chirocore.orient.Chirotope;
import org.chirocore.orient.RealisationCheck;
import org.chirocore.orient.WitnessCheck;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class OrientCommandTest {
    /** The 7 nonzero vectors of GF(2)^3 as columns: over GF(2) the Fano plane, over Q the non-Fano matroid. */
    static final String SEVEN_VECTORS = "[[1,0,0],[0,1,0],[0,0,1],[1,1,0],[1,0,1],[0,1,1],[1,1,1]]";

    @TempDir
    Path dir;

    static Path matrixFile(Path dir, String name, String field) throws IOException {
        return Files.writeString(dir.resolve(name),
                "{\"rank\": 3, \"matrix\": {\"field\": \"" + field + "\", \"columns\": " + SEVEN_VECTORS + "}}");
    }

    /**
     * F7 is binary and not regular, hence non-orientable; the non-Fano matroid is
     * real-representable, hence orientable ([Ox, §6.6]; F7 has 28 bases, the non-Fano 29).
     */
    @ParameterizedTest
    @CsvSource({"GF(2), non-orientable, 28", "Q, orientable, 29"})
    void decidesTheSevenVectors(String field, String verdict, int bases) throws IOException {
        Path file = matrixFile(dir, "m.json", field);
        CliRun run = CliRun.of("orient", file.toString());
        assertEquals(0, run.exit(), run.err());
        assertTrue(run.out().startsWith(verdict + ": rank 3 on 7 elements, " + bases + " bases ("), run.out());
        assertEquals("", run.err());
    }

    @Test
    void jsonHasVerdictAndFigures() throws IOException {
        CliRun run = CliRun.of("orient", matrixFile(dir, "f7.json", "GF(2)").toString(), "--json");
        assertEquals(0, run.exit(), run.err());
        Json.Obj o = Json.parse(run.out()).asObject("output");
        assertEquals("non-orientable", o.requireString("verdict"));
        assertEquals(7, o.requireInt("elements"));
        assertEquals(3, o.requireInt("rank"));
        assertEquals(28, o.requireInt("bases"));
    }

    @Test
    void exhaustedBudgetIsUnknown() throws IOException {
        CliRun run = CliRun.of("orient", matrixFile(dir, "f7.json", "GF(2)").toString(), "--conflicts", "1");
        assertEquals(3, run.exit(), run.out() + run.err());
        assertTrue(run.out().startsWith("unknown: "), run.out());
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
            // Basis exchange fails: {0,1} and {2,3} have no exchange of 0 into {2,3}.
            "{\"rank\": 2, \"elements\": 4, \"bases\": [[0, 1], [2, 3]]}|bad.json: the bases do not form a matroid",
            "{\"rank\": 3,|bad.json: not valid JSON: line 1",
            "{\"rank\": 2, \"elements\": 3, \"bases\": [[0, 9]]}|bad.json: bases[0] names element 9, but there are "
                    + "only 3 elements"})
    void badFilesExitTwoNamingTheProblem(String content, String message) throws IOException {
        Path file = Files.writeString(dir.resolve("bad.json"), content);
        CliRun run = CliRun.of("orient", file.toString());
        assertEquals(2, run.exit());
        assertTrue(run.err().contains(message), run.err());
        assertEquals(1, run.err().strip().lines().count(), "one line, no stack trace: " + run.err());
        assertEquals("", run.out());
    }

    @Test
    void missingFileExitsTwo() {
        CliRun run = CliRun.of("orient", dir.resolve("absent.json").toString());
        assertEquals(2, run.exit());
        assertTrue(run.err().contains("absent.json: cannot read the file"), run.err());
    }

    /** The non-Fano matrix over Q is its own witness: the witness file is that matrix, and it realises the input. */
    @Test
    void matrixOverQWritesItselfAsTheWitness() throws Exception {
        Path file = matrixFile(dir, "nf.json", "Q");
        Path witness = dir.resolve("w.json");
        CliRun run = CliRun.of("orient", file.toString(), "--witness-out", witness.toString());
        assertEquals(0, run.exit(), run.err());
        assertTrue(run.out().contains("realised over Q"), run.out());
        Realisation w = ResultJson.readRealisation(Json.parse(Files.readString(witness)), "w.json");
        Matroid input = MatroidFiles.read(file);
        assertEquals(Optional.empty(), RealisationCheck.defect(input, w));
    }

    @Test
    void witnessSignsOnRequestFormAChirotope() throws Exception {
        Path file = matrixFile(dir, "nf.json", "Q");
        Path witness = dir.resolve("signs.json");
        CliRun run = CliRun.of("orient", file.toString(), "--witness-out", witness.toString(), "--witness-signs");
        assertEquals(0, run.exit(), run.err());
        Chirotope chi = ResultJson.readChirotope(Json.parse(Files.readString(witness)));
        assertEquals(29, chi.size());
        assertEquals(Optional.empty(), WitnessCheck.defect(MatroidFiles.read(file), chi));
    }

    @Test
    void noRealisationRunsTheSearch() throws IOException {
        CliRun run = CliRun.of("orient", matrixFile(dir, "nf.json", "Q").toString(), "--no-realisation", "--json");
        assertEquals(0, run.exit(), run.err());
        Json.Obj o = Json.parse(run.out()).asObject("output");
        assertEquals("orientable", o.requireString("verdict"));
        assertTrue(o.has("signs") && !o.has("realisation"), run.out());
    }

    /** The real 6-cube: C(64, 7) = 621,216,192 7-subsets, over the limit; refused at once with exit 2. */
    @Test
    void sixCubeMatrixIsRefusedNamingTheLimit() throws IOException {
        StringBuilder columns = new StringBuilder();
        for (int v = 0; v < 64; v++) {
            columns.append(v == 0 ? "[" : ", [").append(1);
            for (int k = 5; k >= 0; k--) {
                columns.append(", ").append((v >> k) & 1);
            }
            columns.append(']');
        }
        Path file = Files.writeString(dir.resolve("cube6.json"),
                "{\"rank\": 7, \"matrix\": {\"field\": \"Q\", \"columns\": [" + columns + "]}}");
        CliRun run = CliRun.of("orient", file.toString(), "--witness-out", dir.resolve("w.json").toString());
        assertEquals(2, run.exit(), run.out() + run.err());
        assertTrue(run.err().contains("cube6.json: ") && run.err().contains("621,216,192 7-subsets"), run.err());
        assertEquals(1, run.err().strip().lines().count(), "one line, no stack trace: " + run.err());
        assertTrue(Files.notExists(dir.resolve("w.json")));
    }

    /**
     * The non-Fano matroid given by its six lines (the seven vectors over Q: every line of the
     * Fano plane but {3, 4, 5} [Ox, Appendix, F7^-]) has no matrix, so it goes to the search; with
     * the matrix as a start, the local repair finishes in one pass and no relation is needed.
     */
    @Test
    void startFromARealisationSkipsTheSearch() throws IOException {
        Path file = Files.writeString(dir.resolve("nf-bases.json"), "{\"rank\": 3, \"elements\": 7, \"nonbases\": "
                + "[[0, 1, 3], [0, 2, 4], [1, 2, 5], [0, 5, 6], [1, 4, 6], [2, 3, 6]]}");
        Path start = matrixFile(dir, "nf.json", "Q");
        CliRun run = CliRun.of("orient", file.toString(), "--start", start.toString(), "--json");
        assertEquals(0, run.exit(), run.err());
        Json.Obj o = Json.parse(run.out()).asObject("output");
        assertEquals("orientable", o.requireString("verdict"));
        assertEquals(29, o.requireInt("bases"));
        assertEquals(0, o.requireObject("stats").requireInt("relations"));
        assertEquals(1, o.requireObject("stats").requireInt("rounds"));
    }

    @Test
    void startOnOtherElementsIsBadInput() throws IOException {
        Path file = Files.writeString(dir.resolve("u24.json"), "{\"rank\": 2, \"elements\": 4, \"nonbases\": []}");
        CliRun run = CliRun.of("orient", file.toString(), "--start", matrixFile(dir, "nf.json", "Q").toString());
        assertEquals(2, run.exit(), run.out() + run.err());
        assertTrue(run.err().contains("nf.json: the start has rank 3"), run.err());
    }
}
