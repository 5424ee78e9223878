package org.chirocore.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.chirocore.io.Json;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class FamilyCommandTest {
    @TempDir
    Path dir;

    @Test
    void runsAFamilyAndWritesTheTable() {
        Path out = dir.resolve("corner");
        CliRun run = CliRun.of("family", "run", "families/corner.json", "--n", "3..4", "--out", out.toString());
        assertEquals(0, run.exit(), run.err());
        assertTrue(run.out().contains("n = 3: core rank 3 on 7 elements, 28 bases (F7); verified"), run.out());
        assertTrue(Files.exists(out.resolve("table.md")) && Files.exists(out.resolve("n=4.cert.json")));
        CliRun again = CliRun.of("family", "run", "families/corner.json", "--n", "3..4", "--out", out.toString());
        assertTrue(again.out().contains("verified (reused)"), again.out());
    }

    @Test
    void aFailingMemberIsBadInputNamingFileAndN() throws IOException {
        Path f = dir.resolve("w3.json");
        Files.writeString(f, "{\"name\": \"w3\", \"description\": \"d\", \"field\": \"Q\", \"hyperplane\": "
                + "{\"vertices\": \"weight 3\"}, \"pulled\": \"all zeros\", \"contractPulled\": true, \"range\": [3, 5]}");
        CliRun run = CliRun.of("family", "run", f.toString(), "--n", "3..5", "--out", dir.resolve("o").toString());
        assertEquals(2, run.exit());
        assertTrue(run.err().contains(f + ": hyperplane at n = 3: "), run.err());
    }

    @Test
    void aBadRangeIsBadUsage() {
        CliRun run = CliRun.of("family", "run", "families/corner.json", "--n", "5..3", "--out", dir.toString());
        assertEquals(2, run.exit());
        assertTrue(run.err().contains("--n must be A..B"), run.err());
        assertEquals(2, CliRun.of("family", "run", "families/corner.json", "--n", "2..4", "--out", dir.toString())
                .exit());
    }

    @Test
    void exploresWithFiltersAndRejectsFiltersWithoutExplore() {
        Path out = dir.resolve("explore");
        CliRun run = CliRun.of("family", "explore", "families/corner.json", "--n", "3", "--runs", "2",
                "--keep", "000,001", "--out", out.toString());
        assertEquals(0, run.exit(), run.err());
        assertTrue(run.out().contains("n = 3: 1 class of cores, 0 of 2 runs"), run.out());
        assertTrue(run.out().contains("rank 3 on 7 elements, 28 bases (F7) x 2"), run.out());
        assertTrue(Files.exists(out.resolve("n=3.core-1.cert.json")) && Files.exists(out.resolve("explore.json")));
        assertEquals(2, CliRun.of("family", "run", "families/corner.json", "--n", "3", "--keep", "000", "--out",
                out.toString()).exit());
        assertEquals(2, CliRun.of("family", "explore", "families/corner.json", "--n", "3..4", "--runs", "1",
                "--keep", "000", "--out", out.toString()).exit());
        CliRun bare = CliRun.of("family", "families/corner.json", "--n", "3", "--out", out.toString());
        assertEquals(2, bare.exit());
    }

    @Test
    void exploresSteeredToRankNAndFollowsAShape() {
        Path out = dir.resolve("steered");
        CliRun run = CliRun.of("family", "explore", "families/corner.json", "--n", "3..4", "--runs", "1",
                "--rank", "n", "--avoid", "all ones", "--follow", "elements=2*n,rank=n", "--out", out.toString());
        // the corner family contracts the all-ones vertex, so it cannot be avoided
        assertEquals(2, run.exit(), run.out());
        assertTrue(run.err().contains("--avoid \"all ones\" at n = 3 is the vertex 111"), run.err());
        run = CliRun.of("family", "explore", "families/corner.json", "--n", "3..4", "--runs", "1", "--rank", "n",
                "--follow", "elements=2*n,rank=n", "--out", out.toString());
        assertEquals(0, run.exit(), run.err());
        // n = 4: both rank-4 classes of the corner member have 8 elements (docs/enumerations/corner-n4/summary.md)
        assertTrue(run.out().contains("shape elements=2*n,rank=n at n = 4: found"), run.out());
        assertTrue(run.out().contains("shape elements=2*n,rank=n at n = 3: unknown"), run.out());
        assertTrue(Files.exists(out.resolve("follow.md")) && Files.exists(out.resolve("n=4.core-1.cert.json")));
        CliRun bad = CliRun.of("family", "explore", "families/corner.json", "--n", "3", "--runs", "1", "--rank", "n+",
                "--out", dir.resolve("bad").toString());
        assertEquals(2, bad.exit());
        assertTrue(bad.err().contains("--rank: "), bad.err());
        assertFalse(Files.exists(dir.resolve("bad").resolve("explore.json")));
    }

    @Test
    void predictsTheKnownCores() {
        Path out = dir.resolve("predict");
        CliRun run = CliRun.of("family", "predict", "families/corner.json", "--n", "3", "--prediction",
                "families/corner.predict.json", "--out", out.toString());
        assertEquals(0, run.exit(), run.err());
        assertTrue(run.out().contains("n = 3: prediction confirmed: core rank 3 on 7 elements, 28 bases (F7); verified"),
                run.out());
        assertEquals(2, CliRun.of("family", "predict", "families/corner.json", "--n", "3..4", "--prediction",
                "families/corner.predict.json", "--out", out.toString()).exit());
        assertEquals(2, CliRun.of("family", "predict", "families/corner.json", "--n", "3", "--prediction",
                "families/corner.predict.json", "--threads", "2", "--out", out.toString()).exit());
    }

    /** The number of minimality witnesses written as matrices in a certificate file. */
    static long matrices(Path certificate) throws IOException {
        Json.Arr minimality = Json.parse(Files.readString(certificate)).asObject("certificate").requireObject("content")
                .requireArray("minimality");
        return minimality.elements().stream().flatMap(e -> java.util.stream.Stream.of(((Json.Obj) e).require("deletion"),
                ((Json.Obj) e).require("contraction"))).filter(w -> w instanceof Json.Obj).count();
    }

    @Test
    void runAndPredictWriteMatrixWitnessesWhenAsked() throws IOException {
        // the counts are those of docs/realisations.md: F7 gets 7 matrices of 14, the n = 4 core 15 of 16
        Path run = dir.resolve("run");
        assertEquals(0, CliRun.of("family", "run", "families/corner.json", "--n", "3..4", "--matrix-witnesses", "--out",
                run.toString()).exit());
        assertEquals(7, matrices(run.resolve("n=3.cert.json")));
        assertEquals(15, matrices(run.resolve("n=4.cert.json")));
        Path predict = dir.resolve("predict");
        CliRun p = CliRun.of("family", "predict", "families/corner.json", "--n", "3", "--prediction",
                "families/corner.predict.json", "--matrix-witnesses", "--out", predict.toString());
        assertEquals(0, p.exit(), p.err());
        assertEquals(7, matrices(predict.resolve("n=3.predicted.cert.json")));
        Path plain = dir.resolve("plain");
        assertEquals(0, CliRun.of("family", "run", "families/corner.json", "--n", "3", "--out", plain.toString()).exit());
        assertEquals(0, matrices(plain.resolve("n=3.cert.json")));
    }

    /** explore takes the same options: F7's class certificate gets its 7 matrices; the forms stay exclusive. */
    @Test
    void exploreWritesMatrixWitnessesWhenAsked() throws IOException {
        Path out = dir.resolve("explore");
        CliRun run = CliRun.of("family", "explore", "families/corner.json", "--n", "3", "--runs", "1",
                "--matrix-witnesses", "--trim-relations", "--out", out.toString());
        assertEquals(0, run.exit(), run.err());
        assertEquals(7, matrices(out.resolve("n=3.core-1.cert.json")));
        CliRun both = CliRun.of("family", "explore", "families/corner.json", "--n", "3", "--runs", "1",
                "--matrix-witnesses", "--orbit-witnesses", "--out", dir.resolve("b").toString());
        assertEquals(2, both.exit());
        assertTrue(both.err().contains("mutually exclusive"), both.err());
        assertFalse(Files.exists(dir.resolve("b")));
    }

    @Test
    void predictTrimsTheRelationsWhenAsked() throws IOException {
        Path plain = dir.resolve("plain");
        Path trimmed = dir.resolve("trimmed");
        for (Path out : List.of(plain, trimmed)) {
            List<String> args = new ArrayList<>(List.of("family", "predict", "families/corner.json", "--n", "5",
                    "--prediction", "families/corner-spike.rule.json", "--out", out.toString()));
            if (out == trimmed) {
                args.add("--trim-relations");
            }
            CliRun r = CliRun.of(args.toArray(String[]::new));
            assertEquals(0, r.exit(), r.err());
        }
        int all = relations(plain.resolve("n=5.predicted.cert.json"));
        int core = relations(trimmed.resolve("n=5.predicted.cert.json"));
        assertTrue(0 < core && core < all, core + " of " + all);
    }

    private static int relations(Path certificate) throws IOException {
        return Json.parse(Files.readString(certificate)).asObject("certificate").requireObject("content")
                .requireObject("nonOrientability").requireArray("relations").size();
    }

    @Test
    void shardsAndMerges() {
        for (int i = 0; i < 2; i++) {
            CliRun shard = CliRun.of("family", "run", "families/corner.json", "--n", "3..4", "--shard", i + "/2", "--out",
                    dir.resolve("s" + i).toString());
            assertEquals(0, shard.exit(), shard.err());
        }
        CliRun merge = CliRun.of("family-merge", "families/corner.json", dir.resolve("s0").toString(),
                dir.resolve("s1").toString(), "--out", dir.resolve("m").toString());
        assertEquals(0, merge.exit(), merge.err());
        assertTrue(merge.out().contains("merged 2 members from 2 shards"), merge.out());
        assertEquals(2, CliRun.of("family", "run", "families/corner.json", "--n", "3..4", "--shard", "2/2", "--out",
                dir.resolve("x").toString()).exit());
        assertEquals(2, CliRun.of("family-merge", "families/corner-uncontracted.json", dir.resolve("s0").toString(),
                "--out", dir.resolve("m2").toString()).exit());
    }
}
