package org.chirocore.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;

import org.chirocore.cert.CertificateWriter;
import org.chirocore.check.CertificateVerifier;
import org.chirocore.check.VerificationReport;
import org.chirocore.family.Shard;
import org.chirocore.io.Json;
import org.chirocore.matroid.ExplicitMatroid;
import org.chirocore.orient.Budget;
import org.chirocore.search.Strategy;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The sweep stored in {@code certificates/sweep} (n = 3..6, docs/sweep.md): complete against a
 * fresh enumeration, and every certificate passes every check of the independent verifier and
 * records its own pair's construction, and so does every recorded core of rank n; the certificates
 * of n = 3..4 are regenerated with their recorded settings (seed 0, contract-first, the recorded
 * rank-n search) and must be byte-identical in their hashed content.
 */
class StoredSweepTest {
    private static final Path DIR = Path.of("certificates/sweep");
    private static SweepResult stored;

    @BeforeAll
    static void read() throws IOException {
        stored = SweepResult.fromJson(Json.parseUtf8(Files.readAllBytes(DIR.resolve(SweepRun.SWEEP_JSON)))
                .asObject("sweep.json"));
    }

    static Stream<PairResult> pairs() throws IOException {
        read();
        return stored.levels().stream().flatMap(l -> l.pairs().stream());
    }

    /** Counts: OEIS A363505 (orbits) and A007847 (hyperplanes); the pairs are those of a fresh enumeration. */
    @Test
    void storedSweepIsComplete() {
        assertEquals(List.of(3, 4, 5, 6), stored.levels().stream().map(SweepLevel::n).toList());
        assertEquals(List.of(3, 6, 15, 63), stored.levels().stream().map(SweepLevel::orbits).toList(), "OEIS A363505");
        assertEquals(List.of(20L, 140L, 3254L, 252434L), stored.levels().stream().map(SweepLevel::hyperplanes).toList(),
                "OEIS A007847");
        for (SweepLevel level : stored.levels()) {
            List<String> fresh = HyperplaneOrbits.of(level.n()).stream()
                    .flatMap(h -> GeneralPositionPairs.of(h).stream())
                    .filter(PullCandidate::inGeneralPosition)
                    .map(c -> PairResult.id(level.n(), c.hyperplane().normal(), c.hyperplane().offset(), c.vertex()))
                    .toList();
            assertEquals(fresh, level.pairs().stream().map(PairResult::id).toList(), "n = " + level.n());
        }
        assertEquals(List.of(), stored.discoveries());
        assertTrue(stored.rankCores().isPresent(), "the stored sweep searched a core of rank n per pair");
        assertTrue(stored.levels().stream().flatMap(l -> l.pairs().stream()).allMatch(p -> p.rankCore().isPresent()));
    }

    /**
     * A recorded core of rank n: its certificate passes every check, records the pair's M'/O, and
     * has the recorded shape; n = 3, 4 as measured outside the sweep (docs/sweep.md: F7; 8
     * elements with 56 bases, the enumerations of docs/enumerations).
     */
    @ParameterizedTest(name = "{0}")
    @MethodSource("pairs")
    void rankCoreCertificatesVerify(PairResult pair) throws IOException {
        if (!(pair.rankCore().orElseThrow() instanceof RankCore.Found f)) {
            return;
        }
        Path file = SweepRun.levelDirectory(DIR, pair.n()).resolve(f.certificate());
        assertEquals(SweepRun.rankCoreFile(pair.id()), f.certificate());
        VerificationReport report = CertificateVerifier.verify(file);
        for (VerificationReport.Check c : report.checks()) {
            assertTrue(c.status() == VerificationReport.Status.PASS, file + ": " + c);
        }
        assertEquals(CertificateWriter.construction(SweepRun.construction(pair.n(), pair.normal(), pair.offset(),
                pair.pulled(), true)), RecordedCertificate.read(file).construction(), file.toString());
        ExplicitMatroid core = RecordedCertificate.read(file).core();
        assertEquals(List.of(core.size(), core.rank(), (long) core.basisCount(), core.labels()),
                List.of(f.elements(), f.rank(), f.bases(), f.labels()));
        assertEquals(pair.n(), f.rank());
        if (pair.n() <= 4) {
            assertEquals(pair.n() == 3 ? List.of(7, 28L) : List.of(8, 56L), List.of(f.elements(), f.bases()));
        }
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("pairs")
    void bothCertificatesVerify(PairResult pair) throws IOException {
        assertInstanceOf(Verdict.NonOrientable.class, pair.pulledVerdict());
        assertInstanceOf(Verdict.NonOrientable.class, pair.contractedVerdict());
        for (boolean contract : new boolean[] {false, true}) {
            Verdict v = contract ? pair.contractedVerdict() : pair.pulledVerdict();
            Path file = SweepRun.levelDirectory(DIR, pair.n()).resolve(v.file());
            VerificationReport report = CertificateVerifier.verify(file);
            for (VerificationReport.Check c : report.checks()) {
                assertTrue(c.status() == VerificationReport.Status.PASS, file + ": " + c);
            }
            assertEquals(CertificateWriter.construction(SweepRun.construction(pair.n(), pair.normal(), pair.offset(),
                    pair.pulled(), contract)), RecordedCertificate.read(file).construction(), file.toString());
        }
    }

    /**
     * Behaviour unchanged: a fresh sweep of n = 3..4 with the stored settings writes certificates
     * (verdicts and cores of rank n) with the stored content digests.
     */
    @Test
    void smallLevelsAreRegeneratedByteIdentically(@TempDir Path fresh) throws IOException {
        new SweepRun(fresh, new SweepRun.Settings(0, Strategy.CONTRACT_FIRST, Budget.UNLIMITED, 1, Shard.ALL,
                stored.rankCores()), SweepRun.Listener.SILENT).run(3, 4);
        int compared = 0;
        for (SweepLevel level : stored.levels().subList(0, 2)) {
            for (PairResult pair : level.pairs()) {
                List<String> files = new ArrayList<>(List.of(pair.pulledVerdict().file(), pair.contractedVerdict().file()));
                files.add(((RankCore.Found) pair.rankCore().orElseThrow()).certificate());
                for (String file : files) {
                    Path old = SweepRun.levelDirectory(DIR, pair.n()).resolve(file);
                    Path now = SweepRun.levelDirectory(fresh, pair.n()).resolve(file);
                    assertEquals(digest(old), digest(now), now + " differs from " + old);
                    compared++;
                }
            }
        }
        assertEquals(9, compared, "the stored sweep has 1 + 2 pairs at n = 3, 4, each with 3 certificates");
    }

    private static String digest(Path certificate) throws IOException {
        return Json.parseUtf8(Files.readAllBytes(certificate)).asObject(certificate.toString()).requireString("sha256");
    }
}
