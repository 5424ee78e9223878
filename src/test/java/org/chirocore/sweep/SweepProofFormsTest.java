package org.chirocore.sweep;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.math.BigInteger;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;

import org.chirocore.cert.CertificateForms;
import org.chirocore.cert.WitnessForms;
import org.chirocore.check.CertificateVerifier;
import org.chirocore.family.Shard;
import org.chirocore.io.Json;
import org.chirocore.orient.Budget;
import org.chirocore.search.Strategy;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The sweep writing its certificates in other forms ({@code sweep --matrix-witnesses
 * --trim-relations}): at n = 3, with the rank-n core search, against the default run; resuming and
 * merging across forms.
 */
class SweepProofFormsTest {
    private static final CertificateForms MATRICES_TRIMMED = new CertificateForms(WitnessForms.MATRICES, true);
    /** No time limit: M'/O at n = 3 is small enough to enumerate, so nothing depends on timing. */
    private static final Optional<RankCoreSearch> RANK_N = Optional.of(new RankCoreSearch(0));
    private static final String PAIR = "n3_a1-1-1_b1_o111";
    private static final List<String> FILES = List.of(PAIR + ".contracted.cert.json", PAIR + ".pulled.cert.json",
            SweepRun.rankCoreFile(PAIR));

    @TempDir
    static Path shared;

    private static Path plain;
    private static Path forms;

    @BeforeAll
    static void sweepBothWays() throws IOException {
        plain = shared.resolve("plain");
        forms = shared.resolve("forms");
        new SweepRun(plain, settings(Shard.ALL, CertificateForms.DEFAULT), SweepRun.Listener.SILENT).run(3, 3);
        new SweepRun(forms, settings(Shard.ALL, MATRICES_TRIMMED), SweepRun.Listener.SILENT).run(3, 3);
    }

    private static SweepRun.Settings settings(Shard shard, CertificateForms f) {
        return new SweepRun.Settings(0, Strategy.CONTRACT_FIRST, Budget.UNLIMITED, 1, shard, RANK_N, f);
    }

    /**
     * n = 3 has one general-position pair, the corner x1 + x2 + x3 = 1 with O = 111, whose M'/O is
     * the Fano plane F7 (docs/mathematics.md §7); F7 is not orientable (Oxley, Matroid Theory, 2nd
     * ed., §6.6) and every single-element minor of it is (F7\e is M(K4), graphic hence orientable:
     * Oxley, Proposition 6.4.8 and Section 5.1; F7/e has rank 2, and every matroid of rank at most 2
     * is orientable, common practice), so all three certificates (from M'/O, from M', and
     * the rank-n core) state F7. With matrix witnesses each certificate verifies, states some
     * witnesses as matrices (docs/realisations.md: F7 gets 7 of its 14), and each matrix realises
     * its minor, checked here by brute force: the non-zero maximal minors of the matrix are exactly
     * the bases of the minor computed from the certificate's bases. The trimmed relation list is no
     * longer than the default one.
     */
    @Test
    void matrixWitnessesAndTrimmedRelationsVerify() throws IOException {
        for (String file : FILES) {
            Path f = forms.resolve("n=3").resolve(file);
            Path p = plain.resolve("n=3").resolve(file);
            assertTrue(CertificateVerifier.verify(f).passed(), file);
            assertTrue(CertificateVerifier.verify(p).passed(), file);
            Json.Obj content = content(f);
            assertEquals(7, content.requireObject("core").requireArray("labels").size(), file);
            assertEquals(7, checkedMatrices(content), file);
            assertEquals(0, checkedMatrices(content(p)), file);
            int trimmed = relations(content);
            int all = relations(content(p));
            assertTrue(0 < trimmed && trimmed <= all, file + ": " + trimmed + " of " + all);
        }
    }

    /**
     * The forms change how a proof is written, never a verdict or a core: sweep.json and sweep.md,
     * which record no forms, are byte-for-byte those of the default run.
     */
    @Test
    void theTablesDoNotDependOnTheForms() throws IOException {
        for (String table : List.of(SweepRun.SWEEP_JSON, SweepRun.SWEEP_MD)) {
            assertArrayEquals(Files.readAllBytes(plain.resolve(table)), Files.readAllBytes(forms.resolve(table)), table);
        }
    }

    /**
     * Resuming with other forms reuses a pair whose certificates verify whatever their forms (as
     * {@code family run} does): nothing is rewritten, and the result is the same.
     */
    @Test
    void aResumedSweepKeepsCertificatesOfOtherForms(@TempDir Path dir) throws IOException {
        SweepResult first = new SweepRun(dir, settings(Shard.ALL, CertificateForms.DEFAULT), SweepRun.Listener.SILENT)
                .run(3, 3);
        List<byte[]> before = new ArrayList<>();
        for (String file : FILES) {
            before.add(Files.readAllBytes(dir.resolve("n=3").resolve(file)));
        }
        List<String> lines = new ArrayList<>();
        SweepResult again = new SweepRun(dir, settings(Shard.ALL, MATRICES_TRIMMED), lines::add).run(3, 3);
        assertEquals(first, again);
        for (int i = 0; i < FILES.size(); i++) {
            assertArrayEquals(before.get(i), Files.readAllBytes(dir.resolve("n=3").resolve(FILES.get(i))), FILES.get(i));
        }
        assertFalse(lines.stream().anyMatch(l -> l.contains("rank-n core")), "the reused pair's rank-n core is kept: "
                + lines);
    }

    /**
     * Shards written in different forms merge: each certificate is verified on its own, and the
     * merged directory holds each shard's certificates in their forms (the same content as the
     * whole run's in those forms: its digest). (n = 3 has one pair, index 0, so shard 1/2 decides none.)
     */
    @Test
    void shardsOfDifferentFormsMerge(@TempDir Path dir) throws IOException {
        Path s0 = dir.resolve("s0");
        Path s1 = dir.resolve("s1");
        new SweepRun(s0, settings(new Shard(0, 2), MATRICES_TRIMMED), SweepRun.Listener.SILENT).run(3, 3);
        new SweepRun(s1, settings(new Shard(1, 2), CertificateForms.DEFAULT), SweepRun.Listener.SILENT).run(3, 3);
        Path out = dir.resolve("m");
        SweepResult merged = SweepMerge.merge(List.of(s0, s1), out);
        PairResult p = merged.levels().get(0).pairs().get(0);
        assertInstanceOf(Verdict.NonOrientable.class, p.contractedVerdict());
        for (String file : FILES) {
            assertEquals(digest(forms.resolve("n=3").resolve(file)), digest(out.resolve("n=3").resolve(file)), file);
        }
        assertArrayEquals(Files.readAllBytes(plain.resolve(SweepRun.SWEEP_JSON)),
                Files.readAllBytes(out.resolve(SweepRun.SWEEP_JSON)));
    }

    /** The certificate's digest of its content (the member {@code run}, with timings, is not covered). */
    private static String digest(Path certificate) throws IOException {
        return Json.parse(Files.readString(certificate)).asObject("certificate").requireString("sha256");
    }

    private static Json.Obj content(Path certificate) throws IOException {
        return Json.parse(Files.readString(certificate)).asObject("certificate").requireObject("content");
    }

    private static int relations(Json.Obj content) {
        return content.requireObject("nonOrientability").requireArray("relations").size();
    }

    /**
     * The number of matrix witnesses, each checked against its minor by brute force: for every
     * r-subset of the minor's elements (r the matrix's row count), the determinant of its columns
     * is non-zero exactly when it is a basis of the minor (docs/certificate-format.md,
     * {@code minimality}). The core here has no loop or coloop, so core\e and core/e are the plain
     * deletion and contraction.
     */
    private static int checkedMatrices(Json.Obj content) {
        Json.Obj core = content.requireObject("core");
        int size = core.requireArray("labels").size();
        List<Set<Integer>> bases = new ArrayList<>();
        for (Json b : core.requireArray("bases").elements()) {
            Set<Integer> basis = new HashSet<>();
            ((Json.Arr) b).elements().forEach(x -> basis.add(Integer.parseInt(((Json.Num) x).text())));
            bases.add(basis);
        }
        int matrices = 0;
        Json.Arr minimality = content.requireArray("minimality");
        for (int e = 0; e < size; e++) {
            Json.Obj entry = (Json.Obj) minimality.get(e);
            for (boolean deletion : List.of(true, false)) {
                if (!(entry.require(deletion ? "deletion" : "contraction") instanceof Json.Obj w) || !w.has("matrix")) {
                    continue;
                }
                matrices++;
                Set<Set<Integer>> minorBases = new HashSet<>();
                for (Set<Integer> b : bases) {
                    if (b.contains(e) != deletion) {
                        Set<Integer> renumbered = new HashSet<>();
                        for (int x : b) {
                            if (x != e) {
                                renumbered.add(x < e ? x : x - 1);
                            }
                        }
                        minorBases.add(renumbered);
                    }
                }
                assertFalse(minorBases.isEmpty(), "element " + e + " is neither a loop nor a coloop of F7");
                BigInteger[][] columns = columns(w.requireArray("matrix"));
                assertEquals(size - 1, columns.length);
                int rank = minorBases.iterator().next().size();
                assertEquals(rank, columns[0].length);
                List<Set<Integer>> subsets = new ArrayList<>();
                subsets(size - 1, rank, 0, new ArrayList<>(), subsets);
                for (Set<Integer> s : subsets) {
                    List<Integer> sorted = s.stream().sorted().toList();
                    BigInteger[][] m = new BigInteger[rank][];
                    for (int i = 0; i < rank; i++) {
                        m[i] = columns[sorted.get(i)];
                    }
                    assertEquals(minorBases.contains(s), determinant(m).signum() != 0, "element " + e + (deletion
                            ? " deleted" : " contracted") + ", columns " + sorted);
                }
            }
        }
        return matrices;
    }

    private static BigInteger[][] columns(Json.Arr matrix) {
        BigInteger[][] columns = new BigInteger[matrix.size()][];
        for (int c = 0; c < matrix.size(); c++) {
            Json.Arr column = (Json.Arr) matrix.get(c);
            columns[c] = new BigInteger[column.size()];
            for (int r = 0; r < column.size(); r++) {
                columns[c][r] = new BigInteger(((Json.Num) column.get(r)).text());
            }
        }
        return columns;
    }

    private static void subsets(int n, int k, int from, List<Integer> chosen, List<Set<Integer>> out) {
        if (chosen.size() == k) {
            out.add(new HashSet<>(chosen));
            return;
        }
        for (int x = from; x < n; x++) {
            chosen.add(x);
            subsets(n, k, x + 1, chosen, out);
            chosen.remove(chosen.size() - 1);
        }
    }

    /** The determinant by expansion along the first row (the matrices here are at most 3 × 3). */
    private static BigInteger determinant(BigInteger[][] m) {
        int k = m.length;
        if (k == 1) {
            return m[0][0];
        }
        BigInteger sum = BigInteger.ZERO;
        for (int j = 0; j < k; j++) {
            BigInteger[][] minor = new BigInteger[k - 1][k - 1];
            for (int i = 1; i < k; i++) {
                for (int c = 0, cc = 0; c < k; c++) {
                    if (c != j) {
                        minor[i - 1][cc++] = m[i][c];
                    }
                }
            }
            BigInteger term = m[0][j].multiply(determinant(minor));
            sum = j % 2 == 0 ? sum.add(term) : sum.subtract(term);
        }
        return sum;
    }
}
