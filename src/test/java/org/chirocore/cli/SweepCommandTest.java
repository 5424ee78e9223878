package org.chirocore.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class SweepCommandTest {
    @TempDir
    Path dir;

    @Test
    void sweepsTheThreeCubeWithProgressLinesAndMerges() throws IOException {
        Path out = dir.resolve("s");
        CliRun run = CliRun.of("sweep", "--n", "3", "--out", out.toString());
        assertEquals(0, run.exit(), run.err());
        assertTrue(run.out().contains("n = 3: 3 hyperplane orbits, 20 hyperplanes, 1 general-position pairs"), run.out());
        // progress: whole lines on standard error, even when it is not a terminal
        // progress inside the hyperplane-orbit enumeration: the 3-cube's two search prefixes (a_1 = 1, 2)
        assertTrue(run.err().contains("n = 3: hyperplane orbits, 3-cube: 2 of 2 search prefixes, 3 orbits so far"),
                run.err());
        assertTrue(run.err().contains("n = 3: pair 1 of 1 n3_a1-1-1_b1_o111: pulled non-orientable, contracted "
                + "non-orientable, core 7 elements rank 3 (F7)"), run.err());
        assertTrue(Files.exists(out.resolve("sweep.json")) && Files.exists(out.resolve("sweep.md")));
        // with the core of rank n: the 3-cube's M'/O is the Fano plane itself (docs/sweep.md)
        CliRun rank = CliRun.of("sweep", "--n", "3", "--rank-n-cores", "--out", dir.resolve("r").toString());
        assertEquals(0, rank.exit(), rank.err());
        assertTrue(rank.out().contains("n = 3: cores of rank 3: 1 found (certified and verified), 0 none exists, 0 unknown "
                + "(limit: 120 s per pair)"), rank.out());
        assertTrue(Files.exists(dir.resolve("r/n=3/n3_a1-1-1_b1_o111.rank-n.cert.json")));
        CliRun merged = CliRun.of("sweep-merge", out.toString(), "--out", dir.resolve("m").toString());
        assertEquals(0, merged.exit(), merged.err());
        assertTrue(Files.exists(dir.resolve("m/n=3/n3_a1-1-1_b1_o111.pulled.cert.json")));

        // The merged directory may not be a shard: that would overwrite the shard's own sweep.json.
        CliRun onto = CliRun.of("sweep-merge", out.toString(), "--out", out.toString());
        assertEquals(2, onto.exit());
        assertTrue(onto.err().contains("is also an input"), onto.err());
        // A certificate that fails the verifier is refused before anything is copied.
        Path cert = out.resolve("n=3/n3_a1-1-1_b1_o111.pulled.cert.json");
        Files.writeString(cert, Files.readString(cert).replace("\"rank\": 3", "\"rank\": 4"));
        CliRun tampered = CliRun.of("sweep-merge", out.toString(), "--out", dir.resolve("t").toString());
        assertEquals(2, tampered.exit());
        assertTrue(tampered.err().contains("fails the verifier"), tampered.err());
        assertTrue(Files.notExists(dir.resolve("t")), "a refused merge writes nothing");
    }

    /**
     * The proof-form options reach the sweep's certificates: with --matrix-witnesses the Fano core of
     * the 3-cube's one pair gets 7 matrix witnesses in its certificates from M'/O and from M', and in
     * its rank-n core's (docs/realisations.md); the pipeline verified each before the exit code 0.
     * The witness forms are exclusive (picocli's message), refused before any output.
     */
    @Test
    void proofFormOptionsReachEveryCertificate() throws IOException {
        Path out = dir.resolve("m");
        CliRun run = CliRun.of("sweep", "--n", "3", "--rank-n-cores", "--matrix-witnesses", "--trim-relations", "--out",
                out.toString());
        assertEquals(0, run.exit(), run.err());
        for (String kind : List.of("contracted", "pulled", "rank-n")) {
            assertEquals(7, FamilyCommandTest.matrices(out.resolve("n=3/n3_a1-1-1_b1_o111." + kind + ".cert.json")), kind);
        }
        CliRun both = CliRun.of("sweep", "--n", "3", "--orbit-witnesses", "--matrix-witnesses", "--out",
                dir.resolve("b").toString());
        assertEquals(2, both.exit());
        assertTrue(both.err().contains("mutually exclusive"), both.err());
        assertTrue(Files.notExists(dir.resolve("b")), "refused before any output");
    }

    @Test
    void badRangesAndShardsAreBadUsage() {
        CliRun low = CliRun.of("sweep", "--n", "1..3", "--out", dir.toString());
        assertEquals(2, low.exit());
        assertTrue(low.err().contains("--n must lie within 2.."), low.err());
        assertEquals(2, CliRun.of("sweep", "--n", "3", "--shard", "2/2", "--out", dir.toString()).exit());
        CliRun alone = CliRun.of("sweep", "--n", "3", "--rank-n-time", "5", "--out", dir.resolve("a").toString());
        assertEquals(2, alone.exit());
        assertTrue(alone.err().contains("--rank-n-time applies only with --rank-n-cores"), alone.err());
        CliRun negative = CliRun.of("sweep", "--n", "3", "--rank-n-cores", "--rank-n-time", "-1", "--out",
                dir.resolve("b").toString());
        assertEquals(2, negative.exit());
        assertTrue(negative.err().contains("--rank-n-time must be"), negative.err());
        assertTrue(Files.notExists(dir.resolve("a")) && Files.notExists(dir.resolve("b")), "refused before any output");
        CliRun missing = CliRun.of("sweep-merge", dir.resolve("nothing").toString(), "--out", dir.toString());
        assertEquals(2, missing.exit());
        assertTrue(missing.err().contains("sweep.json: is missing"), missing.err());
    }

    /** OEIS A363505 (6 orbits) and A007847 (140 hyperplanes) at n = 4; the pairs as in docs/sweep.md. */
    @Test
    void cubeListsOrbitsAndPairs() {
        CliRun run = CliRun.of("cube", "4", "--orbits");
        assertEquals(0, run.exit(), run.err());
        assertTrue(run.out().contains("hyperplane orbits: 6 (140 hyperplanes; "), run.out());
        assertTrue(run.out().contains("general-position pairs up to symmetry: 2 (80 pairs)"), run.out());
        assertTrue(run.out().contains("x1 + x2 + x3 + 2·x4 = 2, O = 1111: orbit size 64"), run.out());
    }

    /** Bad --orbits usage is refused before anything is printed (no partial output on standard output). */
    @Test
    void badOrbitsUsageIsRefusedBeforeOutput() {
        for (String[] args : new String[][] {{"cube", "1", "--orbits"}, {"cube", "10", "--orbits"},
                {"cube", "3", "--orbits", "--field", "5"}, {"cube", "3", "--orbits", "--save", dir.resolve("m.json").toString()},
                {"cube", "3", "--orbits", "--part", "x"}, {"cube", "3", "--part", "0/2"}}) {
            CliRun run = CliRun.of(args);
            assertEquals(2, run.exit(), String.join(" ", args));
            assertEquals("", run.out(), String.join(" ", args));
        }
        assertTrue(CliRun.of("cube", "3", "--orbits", "--field", "5").err().contains("real cube"));
        assertTrue(Files.notExists(dir.resolve("m.json")));
    }

    /** The two parts of the 5-cube's enumeration hold its 15 orbits (OEIS A363505) between them. */
    @Test
    void cubeSplitsTheEnumeration() {
        CliRun first = CliRun.of("cube", "5", "--orbits", "--part", "0/2");
        CliRun second = CliRun.of("cube", "5", "--orbits", "--part", "1/2");
        assertEquals(0, first.exit(), first.err());
        int a = Integer.parseInt(first.out().replaceAll("(?s).*hyperplane orbits in part 0/2: (\\d+) .*", "$1"));
        int b = Integer.parseInt(second.out().replaceAll("(?s).*hyperplane orbits in part 1/2: (\\d+) .*", "$1"));
        assertEquals(15, a + b);
        assertEquals(2, CliRun.of("cube", "5", "--part", "0/2").exit());
    }
}
