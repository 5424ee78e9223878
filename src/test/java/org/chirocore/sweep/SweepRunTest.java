package org.chirocore.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.chirocore.check.CertificateVerifier;
import org.chirocore.family.Shard;
import org.chirocore.io.Json;
import org.chirocore.io.ResultJson;
import org.chirocore.matroid.Matroid;
import org.chirocore.orient.Budget;
import org.chirocore.orient.Chirotope;
import org.chirocore.pipeline.IndependentCheck;
import org.chirocore.search.Strategy;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Sweeps of the 3-cube (one pair) and of the 4-cube in two shards (two pairs), each certificate
 * passed through the independent verifier; resuming, and the merge's refusals.
 */
class SweepRunTest {
    @TempDir
    static Path shared;

    private static Path shard0;
    private static Path shard1;

    @BeforeAll
    static void runShards() throws IOException {
        shard0 = shared.resolve("s0");
        shard1 = shared.resolve("s1");
        new SweepRun(shard0, settings(new Shard(0, 2)), SweepRun.Listener.SILENT).run(4, 4);
        new SweepRun(shard1, settings(new Shard(1, 2)), SweepRun.Listener.SILENT).run(4, 4);
    }

    private static SweepRun.Settings settings(Shard shard) {
        return new SweepRun.Settings(0, Strategy.CONTRACT_FIRST, Budget.UNLIMITED, 1, shard);
    }

    /**
     * n = 2: every pull is a matroid of rank 3 on 4 elements (or rank 2 on 3 with O contracted),
     * and every such matroid is realisable over the reals, so orientable (from memory). That makes
     * n = 2 the test of the discovery path: both pairs (the facet x2 = 0 with O = 01 and the
     * diagonal x1 + x2 = 1 with O = 00, as {@code cube 2 --orbits} lists) are reported orientable
     * in sweep.json, at the top of sweep.md and in the progress lines, and each written witness
     * passes the independent checker against the pair's matroid.
     */
    @Test
    void orientablePullsAreMarkedAndTheirWitnessesCheck(@TempDir Path dir) throws IOException {
        List<String> lines = new ArrayList<>();
        SweepResult r = new SweepRun(dir, settings(Shard.ALL), lines::add).run(2, 2);
        assertEquals(List.of("n2_a0-1_b0_o01", "n2_a1-1_b1_o00"), r.discoveries().stream().map(PairResult::id).toList());
        String json = Files.readString(dir.resolve(SweepRun.SWEEP_JSON));
        assertEquals(r, SweepResult.fromJson(Json.parseUtf8(json.getBytes()).asObject("sweep.json")));
        assertTrue(json.contains("orientablePulls") && json.contains("\"n2_a1-1_b1_o00\""), json);
        assertTrue(Files.readString(dir.resolve(SweepRun.SWEEP_MD)).contains("ORIENTABLE PULLS FOUND"));
        assertTrue(lines.stream().anyMatch(l -> l.contains("!!! ORIENTABLE PULL n2_a1-1_b1_o00")), lines.toString());
        for (PairResult p : r.discoveries()) {
            for (boolean contract : new boolean[] {false, true}) {
                Verdict.Orientable v = assertInstanceOf(Verdict.Orientable.class,
                        contract ? p.contractedVerdict() : p.pulledVerdict());
                Chirotope witness = ResultJson.readChirotope(
                        Json.parseUtf8(Files.readAllBytes(dir.resolve("n=2").resolve(v.file()))));
                Matroid m = SweepRun.construction(2, p.normal(), p.offset(), p.pulled(), contract).build();
                IndependentCheck.assertOrients(m, witness);
            }
        }
    }

    /**
     * n = 3: the corner pull gives the Fano plane F7 (docs/mathematics.md §7 construction; F7 non-orientable:
     * Bland and Las Vergnas 1978, binary and not regular), and both certificates verify.
     */
    @Test
    void threeCubeGivesTheFanoPlaneTwice(@TempDir Path dir) throws IOException {
        SweepResult r = new SweepRun(dir, settings(Shard.ALL), SweepRun.Listener.SILENT).run(3, 3);
        SweepLevel level = r.levels().get(0);
        assertEquals(3, level.orbits(), "OEIS A363505");
        assertEquals(20, level.hyperplanes(), "OEIS A007847");
        assertEquals(1, level.pairs().size());
        PairResult p = level.pairs().get(0);
        assertEquals(Optional.of("F7"), p.core().get().name());
        assertInstanceOf(Verdict.NonOrientable.class, p.pulledVerdict());
        assertInstanceOf(Verdict.NonOrientable.class, p.contractedVerdict());
        for (Verdict v : List.of(p.pulledVerdict(), p.contractedVerdict())) {
            assertTrue(CertificateVerifier.verify(dir.resolve("n=3").resolve(v.file())).passed(), v.file());
        }
        String json = Files.readString(dir.resolve(SweepRun.SWEEP_JSON));
        assertEquals(r, SweepResult.fromJson(Json.parseUtf8(json.getBytes()).asObject("sweep.json")));
        assertTrue(Files.readString(dir.resolve(SweepRun.SWEEP_MD)).contains("x1 + x2 + x3 = 1"));

        // Resuming: an intact pair is reused (its files untouched), a corrupted certificate is redone.
        Path pulled = dir.resolve("n=3").resolve(p.pulledVerdict().file());
        Path contracted = dir.resolve("n=3").resolve(p.contractedVerdict().file());
        Files.writeString(pulled, "{}");
        SweepResult again = new SweepRun(dir, settings(Shard.ALL), SweepRun.Listener.SILENT).run(3, 3);
        assertEquals(r, again);
        assertTrue(CertificateVerifier.verify(pulled).passed());
        FileTime intact = Files.getLastModifiedTime(contracted);
        new SweepRun(dir, settings(Shard.ALL), SweepRun.Listener.SILENT).run(3, 3);
        assertEquals(intact, Files.getLastModifiedTime(contracted));
    }

    @Test
    void shardsMergeIntoTheWholeSweep(@TempDir Path out) throws IOException {
        SweepResult merged = SweepMerge.merge(List.of(shard1, shard0), out);
        SweepLevel level = merged.levels().get(0);
        assertEquals(6, level.orbits(), "OEIS A363505");
        assertEquals(140, level.hyperplanes(), "OEIS A007847");
        assertEquals(2, level.generalPositionPairs());
        List<Integer> indices = new ArrayList<>();
        for (PairResult p : level.pairs()) {
            indices.add(p.index());
            for (Verdict v : List.of(p.pulledVerdict(), p.contractedVerdict())) {
                assertTrue(CertificateVerifier.verify(out.resolve("n=4").resolve(v.file())).passed());
            }
        }
        assertEquals(List.of(0, 1), indices);
        assertEquals(Shard.ALL, merged.shard());
    }

    @Test
    void mergeRefusesMissingAndRepeatedShards(@TempDir Path out) {
        SweepException missing = assertThrows(SweepException.class, () -> SweepMerge.merge(List.of(shard0), out));
        assertTrue(missing.getMessage().contains("shard 1/2 is missing"), missing.getMessage());
        SweepException twice = assertThrows(SweepException.class,
                () -> SweepMerge.merge(List.of(shard0, shard1, shard0), out));
        assertTrue(twice.getMessage().contains("given twice"), twice.getMessage());
    }

    @Test
    void mergeRefusesInconsistentShards(@TempDir Path tmp) throws IOException {
        // a shard whose sweep.json claims another seed
        Path other = copy(shard1, tmp.resolve("other"));
        Path json = other.resolve(SweepRun.SWEEP_JSON);
        Files.writeString(json, Files.readString(json).replace("\"seed\": 0", "\"seed\": 1"));
        SweepException seed = assertThrows(SweepException.class,
                () -> SweepMerge.merge(List.of(shard0, other), tmp.resolve("out1")));
        assertTrue(seed.getMessage().contains("seed 1"), seed.getMessage());
        // a shard whose certificate was replaced by the other shard's
        Path swapped = copy(shard1, tmp.resolve("swapped"));
        try (var files = Files.list(swapped.resolve("n=4"))) {
            Path cert = files.filter(f -> f.toString().endsWith(".contracted.cert.json")).findFirst().orElseThrow();
            try (var others = Files.list(shard0.resolve("n=4"))) {
                Files.copy(others.filter(f -> f.toString().endsWith(".contracted.cert.json")).findFirst().orElseThrow(),
                        cert, java.nio.file.StandardCopyOption.REPLACE_EXISTING);
            }
        }
        SweepException construction = assertThrows(SweepException.class,
                () -> SweepMerge.merge(List.of(shard0, swapped), tmp.resolve("out2")));
        assertTrue(construction.getMessage().contains("another construction"), construction.getMessage());
    }

    /** A copy of a sweep directory, to be tampered with. */
    static Path copy(Path from, Path to) throws IOException {
        try (var walk = Files.walk(from)) {
            for (Path p : walk.toList()) {
                Path target = to.resolve(from.relativize(p).toString());
                if (Files.isDirectory(p)) {
                    Files.createDirectories(target);
                } else {
                    Files.copy(p, target);
                }
            }
        }
        return to;
    }
}
