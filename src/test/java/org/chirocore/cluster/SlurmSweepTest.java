package org.chirocore.cluster;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;

import org.chirocore.check.CertificateVerifier;
import org.chirocore.io.Json;
import org.chirocore.sweep.GeneralPositionPairs;
import org.chirocore.sweep.HyperplaneOrbits;
import org.chirocore.sweep.PairResult;
import org.chirocore.sweep.PullCandidate;
import org.chirocore.sweep.SweepLevel;
import org.chirocore.sweep.SweepResult;
import org.chirocore.sweep.Verdict;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * End to end on a real Slurm cluster (cluster/slurm-localhost.sh: one node on this machine): the
 * sweep n = 3..6 as a job array of 4 shards and a merge job depending on it. The merged sweep
 * must hold exactly the pairs of a fresh enumeration, with counts from OEIS A363505 and A007847,
 * and every certificate must pass the independent verifier. Needs slurm-wlm and munge and the
 * built jar (target/chirocore.jar); `.ci/run` runs it where Slurm could be started.
 */
@Tag("cluster")
class SlurmSweepTest {
    @TempDir
    Path dir;

    @Test
    void sweepRunsAsJobArrayAndMerge() throws IOException, InterruptedException {
        assertTrue(Files.exists(Path.of("target/chirocore.jar")), "build the jar first: mvn -B package");
        assertEquals(0, script("start"), "cluster/slurm-localhost.sh start failed");
        assertEquals(0, script("sweep", "3..6", "4", dir.toString()), "the Slurm jobs failed; see " + dir);
        Path merged = dir.resolve("merged");
        SweepResult r = SweepResult.fromJson(Json.parseUtf8(Files.readAllBytes(merged.resolve("sweep.json")))
                .asObject("sweep.json"));
        assertEquals(List.of(3, 6, 15, 63), r.levels().stream().map(SweepLevel::orbits).toList(), "OEIS A363505");
        assertEquals(List.of(20L, 140L, 3254L, 252434L), r.levels().stream().map(SweepLevel::hyperplanes).toList(),
                "OEIS A007847");
        for (SweepLevel level : r.levels()) {
            List<String> fresh = HyperplaneOrbits.of(level.n()).stream()
                    .flatMap(h -> GeneralPositionPairs.of(h).stream())
                    .filter(PullCandidate::inGeneralPosition)
                    .map(c -> PairResult.id(level.n(), c.hyperplane().normal(), c.hyperplane().offset(), c.vertex()))
                    .toList();
            assertEquals(fresh, level.pairs().stream().map(PairResult::id).toList());
            for (PairResult p : level.pairs()) {
                for (Verdict v : List.of(p.pulledVerdict(), p.contractedVerdict())) {
                    assertInstanceOf(Verdict.NonOrientable.class, v, p.id());
                    assertTrue(CertificateVerifier.verify(merged.resolve("n=" + p.n()).resolve(v.file())).passed(),
                            v.file());
                }
            }
        }
    }

    private static int script(String... args) throws IOException, InterruptedException {
        List<String> command = new java.util.ArrayList<>(List.of("cluster/slurm-localhost.sh"));
        command.addAll(List.of(args));
        Process p = new ProcessBuilder(command).inheritIO().start();
        if (!p.waitFor(60, TimeUnit.MINUTES)) {
            p.destroyForcibly();
            throw new IllegalStateException("cluster/slurm-localhost.sh " + String.join(" ", args)
                    + " did not finish within an hour.");
        }
        return p.exitValue();
    }
}
