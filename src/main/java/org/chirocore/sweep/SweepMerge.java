package org.chirocore.sweep;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

import org.chirocore.io.InputFiles;
import org.chirocore.cert.CertificateWriter;
import org.chirocore.check.CertificateVerifier;
import org.chirocore.family.Shard;
import org.chirocore.io.Json;

/**
 * Joins the directories of the shards i/k of one sweep ({@code sweep --shard i/k}) into one
 * directory with one sweep.json and sweep.md. Refuses, naming the shard: a missing or unreadable
 * sweep.json; shards of another range, seed, strategy, shard count or rank-n core search (on or
 * off, and its per-pair time limit); a shard index missing or
 * given twice; per-n counts that differ between shards; a pair outside its shard (index ≢ i mod
 * k), a pair index missing or given twice; a certificate (of a verdict or of a rank-n core) that
 * is missing, fails the verifier or records another construction than its pair. Shards whose
 * certificates state their proofs in other forms are joined (each certificate is verified on its
 * own; the forms are not recorded in sweep.json).
 * Each certificate is verified in its shard first; only when every check has passed are the
 * certificates, witnesses and DRAT side files copied into the output, so a refused merge writes
 * nothing. Cost: one verification per certificate.
 */
public final class SweepMerge {
    private SweepMerge() {
    }

    /**
     * Merges {@code shards} into {@code out} and writes its sweep.json and sweep.md.
     *
     * @throws SweepException naming the shard when the shards are missing, duplicated or inconsistent
     * @throws IOException when a file cannot be read or written
     */
    public static SweepResult merge(List<Path> shards, Path out) throws IOException {
        if (shards.isEmpty()) {
            throw new SweepException("sweep-merge needs at least one shard directory.");
        }
        List<SweepResult> parts = new ArrayList<>();
        for (Path shard : shards) {
            parts.add(read(shard));
        }
        SweepResult first = parts.get(0);
        int k = first.shard().count();
        Path[] byIndex = new Path[k];
        for (int s = 0; s < parts.size(); s++) {
            SweepResult p = parts.get(s);
            String where = shards.get(s).resolve(SweepRun.SWEEP_JSON).toString();
            if (p.from() != first.from() || p.to() != first.to() || p.seed() != first.seed()
                    || !p.strategy().equals(first.strategy()) || p.shard().count() != k) {
                throw new SweepException(where + ": range " + p.from() + ".." + p.to() + ", seed " + p.seed()
                        + ", strategy " + p.strategy() + " and " + p.shard().count() + " shards differ from "
                        + first.from() + ".." + first.to() + ", seed " + first.seed() + ", strategy " + first.strategy()
                        + " and " + k + " shards of " + shards.get(0) + ".");
            }
            if (!p.rankCores().equals(first.rankCores())) {
                throw new SweepException(where + ": the rank-n core search (" + rankCores(p) + ") differs from that of "
                        + shards.get(0) + " (" + rankCores(first) + ").");
            }
            int i = p.shard().index();
            if (byIndex[i] != null) {
                throw new SweepException(where + ": shard " + i + "/" + k + " is given twice (also " + byIndex[i]
                        + ").");
            }
            byIndex[i] = shards.get(s);
        }
        for (int i = 0; i < k; i++) {
            if (byIndex[i] == null) {
                throw new SweepException("shard " + i + "/" + k + " is missing; the shards given are " + shards + ".");
            }
        }
        List<SweepLevel> levels = new ArrayList<>();
        List<Copy> copies = new ArrayList<>();
        for (int li = 0; li < first.levels().size(); li++) {
            levels.add(mergeLevel(parts, shards, li, out, copies));
        }
        // Only after every shard and certificate passed is anything written, so a refused merge leaves nothing behind.
        for (Copy c : copies) {
            c.run();
        }
        SweepResult merged = new SweepResult(first.from(), first.to(), Shard.ALL, first.seed(), first.strategy(),
                levels, first.rankCores());
        SweepReport.write(out, merged);
        return merged;
    }

    private static String rankCores(SweepResult r) {
        return r.rankCores().map(c -> "on, " + c.describe()).orElse("off");
    }

    private static SweepResult read(Path shard) throws IOException {
        Path file = shard.resolve(SweepRun.SWEEP_JSON);
        if (!Files.isRegularFile(file)) {
            throw new SweepException(file + ": is missing; a shard directory holds the sweep.json its run wrote.");
        }
        try {
            return SweepResult.fromJson(Json.parseUtf8(InputFiles.read(file)).asObject("sweep.json"));
        } catch (IllegalArgumentException e) {
            throw new SweepException(file + ": " + e.getMessage(), e);
        }
    }

    private static SweepLevel mergeLevel(List<SweepResult> parts, List<Path> shards, int li, Path out,
            List<Copy> copies) throws IOException {
        SweepLevel reference = parts.get(0).levels().get(li);
        int n = reference.n();
        Map<Integer, PairResult> pairs = new TreeMap<>();
        for (int s = 0; s < parts.size(); s++) {
            SweepResult p = parts.get(s);
            String where = shards.get(s).resolve(SweepRun.SWEEP_JSON).toString();
            if (p.levels().size() != parts.get(0).levels().size() || !p.levels().get(li).sameCounts(reference)) {
                throw new SweepException(where + ": the counts of n = " + n + " differ from those of " + shards.get(0)
                        + ".");
            }
            for (PairResult pair : p.levels().get(li).pairs()) {
                if (pair.n() != n || pair.index() % p.shard().count() != p.shard().index()
                        || pair.index() >= reference.generalPositionPairs()) {
                    throw new SweepException(where + ": pair " + pair.id() + " has index " + pair.index()
                            + ", which does not belong to shard " + p.shard().index() + "/" + p.shard().count()
                            + " of the " + reference.generalPositionPairs() + " pairs of n = " + n + ".");
                }
                if (pairs.put(pair.index(), pair) != null) {
                    throw new SweepException(where + ": pair index " + pair.index() + " of n = " + n
                            + " appears twice.");
                }
                Path from = SweepRun.levelDirectory(shards.get(s), n);
                if (pair.rankCore().isPresent() != p.rankCores().isPresent()) {
                    throw new SweepException(where + ": pair " + pair.id() + (pair.rankCore().isPresent()
                            ? " has a rank-n core outcome, but the shard ran without the search"
                            : " has no rank-n core outcome, but the shard ran the search") + ".");
                }
                check(pair, pair.contractedVerdict(), true, from, where);
                check(pair, pair.pulledVerdict(), false, from, where);
                if (pair.rankCore().orElse(null) instanceof RankCore.Found f) {
                    check(pair, new Verdict.NonOrientable(f.certificate()), true, from, where);
                }
                copies.add(new Copy(pair, from, SweepRun.levelDirectory(out, n)));
            }
        }
        for (int i = 0; i < reference.generalPositionPairs(); i++) {
            if (!pairs.containsKey(i)) {
                throw new SweepException("pair " + i + " of n = " + n + " is in no shard: the shard that should hold "
                        + "it did not finish.");
            }
        }
        return reference.withPairs(new ArrayList<>(pairs.values()));
    }

    /** Copies a checked pair's certificates (and their proof files) from its shard into the merged directory. */
    private record Copy(PairResult pair, Path from, Path to) {
        void run() throws IOException {
            Files.createDirectories(to);
            for (String file : files(pair)) {
                Path source = from.resolve(file);
                Files.copy(source, to.resolve(file), StandardCopyOption.REPLACE_EXISTING);
                for (Path proof : CertificateWriter.proofFiles(source)) {
                    if (Files.exists(proof)) {
                        Files.copy(proof, to.resolve(proof.getFileName()), StandardCopyOption.REPLACE_EXISTING);
                    }
                }
            }
        }
    }

    /** The files of a pair: its certificates or witnesses, and its rank-n core's certificate. */
    private static List<String> files(PairResult pair) {
        List<String> out = new ArrayList<>();
        for (Verdict v : List.of(pair.contractedVerdict(), pair.pulledVerdict())) {
            if (!v.file().isEmpty()) {
                out.add(v.file());
            }
        }
        if (pair.rankCore().orElse(null) instanceof RankCore.Found f) {
            out.add(f.certificate());
        }
        return out;
    }

    private static void check(PairResult pair, Verdict v, boolean contract, Path from, String where)
            throws IOException {
        if (v.file().isEmpty()) {
            return;
        }
        Path source = from.resolve(v.file());
        if (!Files.isRegularFile(source)) {
            throw new SweepException(where + ": the file " + source + " of pair " + pair.id() + " is missing.");
        }
        if (!(v instanceof Verdict.NonOrientable)) {
            return;
        }
        if (!CertificateVerifier.verify(source).passed()) {
            throw new SweepException(where + ": the certificate " + source + " of pair " + pair.id()
                    + " fails the verifier.");
        }
        Json.Obj recorded;
        try {
            recorded = RecordedCertificate.read(source).construction();
        } catch (IllegalArgumentException e) {
            throw new SweepException(where + ": the certificate " + source + " is not one the sweep writes: "
                    + e.getMessage(), e);
        }
        Json.Obj expected = CertificateWriter.construction(SweepRun.construction(pair.n(), pair.normal(),
                pair.offset(), pair.pulled(), contract));
        if (!recorded.equals(expected)) {
            throw new SweepException(where + ": the certificate " + source + " records another construction than "
                    + "pair " + pair.id() + ".");
        }
    }
}
