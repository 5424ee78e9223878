package org.chirocore.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.attribute.FileTime;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.stream.IntStream;
import java.util.stream.Stream;

import org.chirocore.cert.CertificateReader;
import org.chirocore.cert.CertificateWriter;
import org.chirocore.check.CertificateVerifier;
import org.chirocore.family.Shard;
import org.chirocore.io.AtomicFiles;
import org.chirocore.io.Json;
import org.chirocore.matroid.ExplicitMatroid;
import org.chirocore.orient.Budget;
import org.chirocore.search.Strategy;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The sweep's core of rank n per pair ({@link RankCoreSearch}): what it finds at n = 3, 4 against
 * facts from outside the sweep, that resuming keeps recorded outcomes, and that the merge carries
 * the new fields and refuses shards run with other rank-n settings.
 */
class RankCoreSweepTest {
    /** No time limit: n = 3, 4 are small enough to enumerate completely, so the answers do not depend on timing. */
    private static final Optional<RankCoreSearch> UNLIMITED = Optional.of(new RankCoreSearch(0));

    @TempDir
    static Path shared;

    private static Path shard0;
    private static Path shard1;

    @BeforeAll
    static void runShards() throws IOException {
        shard0 = shared.resolve("s0");
        shard1 = shared.resolve("s1");
        new SweepRun(shard0, settings(new Shard(0, 2), UNLIMITED), SweepRun.Listener.SILENT).run(4, 4);
        new SweepRun(shard1, settings(new Shard(1, 2), UNLIMITED), SweepRun.Listener.SILENT).run(4, 4);
    }

    private static SweepRun.Settings settings(Shard shard, Optional<RankCoreSearch> rankCores) {
        return new SweepRun.Settings(0, Strategy.CONTRACT_FIRST, Budget.UNLIMITED, 1, shard, rankCores);
    }

    /**
     * n = 3: the corner pull with O contracted is the Fano plane (docs/mathematics.md), which is
     * minor-minimal non-orientable (Oxley, Matroid Theory, 2nd ed., the Fano plane is binary and
     * not regular, every proper minor regular; Bland and Las Vergnas 1978: an orientable binary
     * matroid is regular). So its only core of rank 3 is M'/O itself. Checked by brute force here:
     * 7 elements, rank 3, and the 7 non-bases are triples any two of which meet in exactly one
     * element, a projective plane of order 2, which is the Fano plane (common practice).
     */
    @Test
    void threeCubeRankCoreIsTheFanoPlane(@TempDir Path dir) throws IOException {
        PairResult p = new SweepRun(dir, settings(Shard.ALL, UNLIMITED), SweepRun.Listener.SILENT).run(3, 3)
                .levels().get(0).pairs().get(0);
        RankCore.Found f = assertInstanceOf(RankCore.Found.class, p.rankCore().orElseThrow());
        Path file = dir.resolve("n=3").resolve(f.certificate());
        assertTrue(CertificateVerifier.verify(file).passed(), file.toString());
        assertEquals(CertificateWriter.construction(SweepRun.construction(3, p.normal(), p.offset(), p.pulled(), true)),
                RecordedCertificate.read(file).construction(), "certified from M'/O");
        ExplicitMatroid core = RecordedCertificate.read(file).core();
        assertEquals(List.of(7, 3, 28L), List.of(f.elements(), f.rank(), f.bases()));
        assertEquals(List.of(core.size(), core.rank(), (long) core.basisCount()), List.of(f.elements(), f.rank(), f.bases()));
        assertEquals(Optional.of("F7"), f.name());
        List<Integer> lines = new ArrayList<>();
        for (int mask = 0; mask < 1 << 7; mask++) {
            if (Integer.bitCount(mask) == 3 && !core.isBasis(elements(mask))) {
                lines.add(mask);
            }
        }
        assertEquals(7, lines.size(), "C(7,3) - 28 non-bases");
        for (int a : lines) {
            for (int b : lines) {
                assertTrue(a == b || Integer.bitCount(a & b) == 1, "two lines meet in one point");
            }
        }
        // the search is recorded in sweep.json and sweep.md, and read back unchanged
        SweepResult again = SweepResult.fromJson(Json.parseUtf8(Files.readAllBytes(dir.resolve(SweepRun.SWEEP_JSON)))
                .asObject("sweep.json"));
        assertEquals(UNLIMITED, again.rankCores());
        assertEquals(p, again.levels().get(0).pairs().get(0));
        String md = Files.readString(dir.resolve(SweepRun.SWEEP_MD));
        assertTrue(md.contains("| 7, 3, 28 (F7) |") && md.contains(f.certificate()), md);
    }

    /**
     * n = 4: each pair's core of rank 4 is isomorphic (brute force over the 8! bijections) to one of
     * the rank-4 classes of the complete enumeration of that pair in docs/enumerations/ (corner-n4
     * for x1 + x2 + x3 + x4 = 1, n4-x1+x2+x3+2x4=2 for the other), read from their certificates.
     */
    @Test
    void fourCubeRankCoresAreAmongTheEnumeratedClasses(@TempDir Path out) throws IOException {
        SweepResult merged = SweepMerge.merge(List.of(shard0, shard1), out);
        assertEquals(UNLIMITED, merged.rankCores());
        List<PairResult> pairs = merged.levels().get(0).pairs();
        assertEquals(List.of("n4_a1-1-1-1_b1_o1111", "n4_a1-1-1-2_b2_o1111"), pairs.stream().map(PairResult::id).toList());
        List<String> enumerations = List.of("docs/enumerations/corner-n4", "docs/enumerations/n4-x1+x2+x3+2x4=2");
        for (int i = 0; i < 2; i++) {
            RankCore.Found f = assertInstanceOf(RankCore.Found.class, pairs.get(i).rankCore().orElseThrow());
            Path file = out.resolve("n=4").resolve(f.certificate());
            assertTrue(CertificateVerifier.verify(file).passed(), "copied by the merge and verified: " + file);
            ExplicitMatroid core = RecordedCertificate.read(file).core();
            assertEquals(4, core.rank());
            List<ExplicitMatroid> classes = rankFourClasses(Path.of(enumerations.get(i)));
            assertEquals(2, classes.size(), enumerations.get(i) + "/summary.md lists two classes of rank 4");
            assertTrue(classes.stream().anyMatch(c -> isomorphic(core, c)), pairs.get(i).id() + ": " + core);
        }
    }

    @Test
    void mergeRefusesShardsWithOtherRankCoreSettings(@TempDir Path tmp) throws IOException {
        Path longer = SweepRunTest.copy(shard1, tmp.resolve("longer"));
        Path json = longer.resolve(SweepRun.SWEEP_JSON);
        String text = Files.readString(json);
        assertTrue(text.contains("\"timeLimitMillis\": 0"), text);
        Files.writeString(json, text.replace("\"timeLimitMillis\": 0", "\"timeLimitMillis\": 60000"));
        SweepException limit = assertThrows(SweepException.class,
                () -> SweepMerge.merge(List.of(shard0, longer), tmp.resolve("o1")));
        assertTrue(limit.getMessage().contains("rank-n core search (on, 60 s per pair) differs"), limit.getMessage());

        Path without = tmp.resolve("without");
        new SweepRun(without, settings(new Shard(1, 2), Optional.empty()), SweepRun.Listener.SILENT).run(4, 4);
        SweepException off = assertThrows(SweepException.class,
                () -> SweepMerge.merge(List.of(shard0, without), tmp.resolve("o2")));
        assertTrue(off.getMessage().contains("(off) differs from that of " + shard0 + " (on, no time limit)"),
                off.getMessage());
        assertFalse(Files.exists(tmp.resolve("o1")) || Files.exists(tmp.resolve("o2")), "a refused merge writes nothing");

        // a rank-n certificate swapped for another pair's is refused like a verdict's
        Path swapped = SweepRunTest.copy(shard1, tmp.resolve("swapped"));
        Path mine = rankCertificate(swapped);
        Files.copy(rankCertificate(shard0), mine, StandardCopyOption.REPLACE_EXISTING);
        SweepException construction = assertThrows(SweepException.class,
                () -> SweepMerge.merge(List.of(shard0, swapped), tmp.resolve("o3")));
        assertTrue(construction.getMessage().contains("another construction"), construction.getMessage());
    }

    /**
     * Resuming: a pair decided without the rank-n search gets only its core searched (verdict
     * certificates untouched); a recorded core whose certificate verifies is kept (file untouched);
     * a corrupted one is searched again; an unknown is kept under a limit no longer than its own and
     * searched again under a longer one.
     */
    @Test
    void resumeReusesRecordedCores(@TempDir Path dir) throws IOException {
        PairResult plain = new SweepRun(dir, settings(Shard.ALL, Optional.empty()), SweepRun.Listener.SILENT).run(3, 3)
                .levels().get(0).pairs().get(0);
        assertEquals(Optional.empty(), plain.rankCore());
        assertFalse(Files.readString(dir.resolve(SweepRun.SWEEP_JSON)).contains("rankNCore"));
        Path contracted = dir.resolve("n=3").resolve(plain.contractedVerdict().file());
        FileTime verdictTime = Files.getLastModifiedTime(contracted);

        List<String> lines = new ArrayList<>();
        PairResult withCore = new SweepRun(dir, settings(Shard.ALL, UNLIMITED), lines::add).run(3, 3)
                .levels().get(0).pairs().get(0);
        assertEquals(verdictTime, Files.getLastModifiedTime(contracted), "the verdicts were reused");
        assertEquals(plain, withCore.withRankCore(Optional.empty()));
        RankCore.Found f = assertInstanceOf(RankCore.Found.class, withCore.rankCore().orElseThrow());
        assertTrue(lines.stream().anyMatch(l -> l.contains("rank-n core 7 elements, rank 3, 28 bases (F7)")), lines.toString());
        Path rank = dir.resolve("n=3").resolve(f.certificate());
        FileTime rankTime = Files.getLastModifiedTime(rank);

        lines.clear();
        assertEquals(withCore, new SweepRun(dir, settings(Shard.ALL, UNLIMITED), lines::add).run(3, 3).levels().get(0)
                .pairs().get(0));
        assertEquals(rankTime, Files.getLastModifiedTime(rank), "the recorded core was reused");
        assertTrue(lines.stream().noneMatch(l -> l.contains("rank-n core")), "nothing searched: " + lines);

        Files.writeString(rank, "{}");
        assertEquals(withCore, new SweepRun(dir, settings(Shard.ALL, UNLIMITED), SweepRun.Listener.SILENT).run(3, 3)
                .levels().get(0).pairs().get(0));
        assertTrue(CertificateVerifier.verify(rank).passed(), "a corrupted core certificate is made again");

        // plant an unknown recorded under 5 s
        Path record = dir.resolve("n=3").resolve(plain.id() + ".pair.json");
        PairResult planted = withCore.withRankCore(Optional.of(new RankCore.Unknown("planted", 5000)));
        AtomicFiles.writeJson(record, planted.toJson());
        assertNotEquals(withCore, planted);
        Optional<RankCoreSearch> fiveSeconds = Optional.of(new RankCoreSearch(5000));
        assertEquals(planted, new SweepRun(dir, settings(Shard.ALL, fiveSeconds), SweepRun.Listener.SILENT).run(3, 3)
                .levels().get(0).pairs().get(0), "an unknown under the same limit stands");
        PairResult longer = new SweepRun(dir, settings(Shard.ALL, Optional.of(new RankCoreSearch(600_000))),
                SweepRun.Listener.SILENT).run(3, 3).levels().get(0).pairs().get(0);
        assertInstanceOf(RankCore.Found.class, longer.rankCore().orElseThrow(), "searched again under a longer limit");
    }

    /** The certificates of rank-4 cores among an enumeration's classes. */
    private static List<ExplicitMatroid> rankFourClasses(Path enumeration) throws IOException {
        List<ExplicitMatroid> out = new ArrayList<>();
        try (Stream<Path> files = Files.list(enumeration)) {
            for (Path f : files.filter(x -> x.getFileName().toString().matches("class-\\d+\\.cert\\.json")).sorted().toList()) {
                ExplicitMatroid m = CertificateReader.core(CertificateReader.readChecked(f).requireObject("content")
                        .requireObject("core"));
                if (m.rank() == 4) {
                    out.add(m);
                }
            }
        }
        return out;
    }

    /** Whether some bijection of the elements maps the bases of a onto those of b (every permutation tried). */
    private static boolean isomorphic(ExplicitMatroid a, ExplicitMatroid b) {
        if (a.size() != b.size() || a.rank() != b.rank() || a.basisCount() != b.basisCount()) {
            return false;
        }
        Set<Integer> target = new HashSet<>();
        List<Integer> source = new ArrayList<>();
        for (int mask = 0; mask < 1 << a.size(); mask++) {
            if (Integer.bitCount(mask) == a.rank()) {
                if (a.isBasis(elements(mask))) {
                    source.add(mask);
                }
                if (b.isBasis(elements(mask))) {
                    target.add(mask);
                }
            }
        }
        return permutations(new int[a.size()], 0, 0, source, target);
    }

    private static boolean permutations(int[] image, int next, int used, List<Integer> source, Set<Integer> target) {
        if (next == image.length) {
            for (int basis : source) {
                int mapped = 0;
                for (int e = 0; e < image.length; e++) {
                    if ((basis >> e & 1) != 0) {
                        mapped |= 1 << image[e];
                    }
                }
                if (!target.contains(mapped)) {
                    return false;
                }
            }
            return true;
        }
        for (int v = 0; v < image.length; v++) {
            if ((used >> v & 1) == 0) {
                image[next] = v;
                if (permutations(image, next + 1, used | 1 << v, source, target)) {
                    return true;
                }
            }
        }
        return false;
    }

    private static int[] elements(int mask) {
        return IntStream.range(0, 32).filter(e -> (mask >> e & 1) != 0).toArray();
    }

    private static Path rankCertificate(Path shard) throws IOException {
        try (Stream<Path> files = Files.list(shard.resolve("n=4"))) {
            return files.filter(f -> f.toString().endsWith(".rank-n.cert.json")).findFirst().orElseThrow();
        }
    }
}
