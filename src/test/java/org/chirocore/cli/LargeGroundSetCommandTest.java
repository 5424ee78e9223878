package org.chirocore.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import org.chirocore.matroid.Limits;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Matroids on more than 64 elements (element sets of several 64-bit words) through the command
 * line, and the refusal beyond {@link Limits#ELEMENTS}.
 */
class LargeGroundSetCommandTest {
    @TempDir
    Path dir;

    /** U(2, 70) is orientable (n points on a line; common practice): C(70, 2) = 2415 bases. */
    @Test
    void theUniformMatroidOfRankTwoOnSeventyElementsIsOrientable() throws IOException {
        Path file = Files.writeString(dir.resolve("u2-70.json"), "{\"rank\": 2, \"elements\": 70, \"nonbases\": []}");
        CliRun run = CliRun.of("orient", file.toString());
        assertEquals(0, run.exit(), run.err());
        assertTrue(run.out().startsWith("orientable: rank 2 on 70 elements, 2415 bases ("), run.out());
    }

    /**
     * The stored input: F7 on the elements 3, 17, 40, 63, 64, 65, 69 (across the word boundary),
     * three free elements and 60 loops; non-orientable as it has F7 as a restriction ([Ox, §6.6]:
     * F7 is not orientable; BLSWZ, §6.6, from memory). C(10, 3) − 7 = 113 bases.
     */
    @Test
    void theFanoPlaneAmongSeventyElementsIsNonOrientable() {
        CliRun run = CliRun.of("orient", "certificates/inputs/fano-in-70.json");
        assertEquals(0, run.exit(), run.err());
        assertTrue(run.out().startsWith("non-orientable: rank 3 on 70 elements, 113 bases ("), run.out());
    }

    @Test
    void moreElementsThanTheLimitAreRefusedInOneLine() throws IOException {
        int n = Limits.ELEMENTS + 1;
        Path file = Files.writeString(dir.resolve("big.json"), "{\"rank\": 1, \"elements\": " + n + ", \"nonbases\": []}");
        CliRun run = CliRun.of("orient", file.toString());
        assertEquals(2, run.exit(), run.out() + run.err());
        assertTrue(run.err().contains("big.json: a matroid given by \"nonbases\" has at most " + Limits.ELEMENTS
                + " elements, but there are " + n), run.err());
        assertEquals(1, run.err().strip().lines().count(), "one line, no stack trace: " + run.err());
    }

    @Test
    void theEnumerationRefusesMoreThanItsOwnLimit() throws IOException {
        Path file = Files.writeString(dir.resolve("u2-70.json"), "{\"rank\": 2, \"elements\": 70, \"nonbases\": []}");
        CliRun run = CliRun.of("enumerate", file.toString(), "--out", dir.resolve("out").toString());
        assertEquals(2, run.exit(), run.out() + run.err());
        assertTrue(run.err().contains("too large to enumerate: at most " + Limits.ENUMERATED_ELEMENTS + " elements"), run.err());
        assertEquals(1, run.err().strip().lines().count(), "one line, no stack trace: " + run.err());
    }
}
