package org.chirocore.family;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Map;
import java.util.TreeMap;

import org.chirocore.cert.CertificateWriter;
import org.chirocore.check.CertificateVerifier;
import org.chirocore.check.VerificationReport;
import org.chirocore.io.AtomicFiles;
import org.chirocore.io.InputFiles;
import org.chirocore.io.IoMessages;
import org.chirocore.io.Json;
import org.chirocore.orient.Budget;
import org.chirocore.search.Strategy;

/**
 * Joins the output directories of the shards of one family run ({@code family --shard i/k})
 * into one directory with one table. Refuses shards that disagree: a table of another family
 * or definition (by {@link FamilyDefinition#sha256}), another seed or strategy, a certificate
 * that fails the verifier or records another construction, seed or strategy than its shard,
 * and a set of shards that is not exactly the parts 0/k, …, (k−1)/k of one range (each table
 * records its part), so the merged table has no gaps and no n twice. Each certificate (and its
 * DRAT side file) is copied into the output atomically and verified there again. Cost: one
 * verification per member.
 */
public final class FamilyMerge {
    private FamilyMerge() {
    }

    /**
     * Merges {@code shards} of a run of {@code family} into {@code out} and writes its table.
     *
     * @throws FamilyException naming the shard and n when the shards are inconsistent, or when
     *     they are not exactly the parts 0/k, ..., (k−1)/k of one range (a shard missing or given
     *     twice, or a table that lacks a member of its part)
     * @throws IOException when a file cannot be read or written
     */
    public static FamilyTable merge(FamilyDefinition family, List<Path> shards, Path out) throws IOException {
        if (shards.isEmpty()) {
            throw new FamilyException("family merge needs at least one shard directory.");
        }
        List<Json.Obj> tables = new ArrayList<>();
        for (Path shard : shards) {
            tables.add(readTable(shard));
        }
        int[] range = complete(shards, tables);
        Files.createDirectories(out);
        Long seed = null;
        Strategy strategy = null;
        Map<Integer, MemberResult> members = new TreeMap<>();
        for (int j = 0; j < shards.size(); j++) {
            Path shard = shards.get(j);
            Json.Obj table = tables.get(j);
            String where = shard.resolve(FamilyRun.TABLE_JSON).toString();
            if (!table.requireString("family").equals(family.name())
                    || !table.requireString("definitionSha256").equals(family.sha256())) {
                throw new FamilyException(where + ": is a table of family \"" + table.requireString("family")
                        + "\" with definition digest " + table.requireString("definitionSha256") + ", not of "
                        + family.source() + " (\"" + family.name() + "\", " + family.sha256() + ").");
            }
            long s = table.requireLong("seed");
            Strategy st = Strategy.fromId(table.requireString("strategy"));
            if (seed != null && (seed != s || strategy != st)) {
                throw new FamilyException(where + ": seed " + s + " and strategy " + st.id() + " differ from seed "
                        + seed + " and strategy " + strategy.id() + " of " + shards.get(0) + ".");
            }
            seed = s;
            strategy = st;
            Json.Arr rows = table.requireArray("members");
            for (int k = 0; k < rows.size(); k++) {
                Json.Obj row = rows.get(k).asObject("members[" + k + "]");
                MemberResult m = member(family, shard, row, out, s, st);
                members.put(m.n(), m);
            }
        }
        FamilyTable merged = FamilyTable.of(family, new FamilyRun.Settings(seed, strategy, Budget.UNLIMITED, 1),
                new ArrayList<>(members.values()));
        merged.write(out, range[0], range[1], Shard.ALL);
        return merged;
    }

    /**
     * Checks that the tables are the parts 0..k−1 of one split of one range, each listing exactly
     * the n of its part, and returns the range.
     */
    private static int[] complete(List<Path> shards, List<Json.Obj> tables) {
        int from = 0;
        int to = 0;
        int count = 0;
        Map<Integer, Path> byIndex = new TreeMap<>();
        for (int j = 0; j < shards.size(); j++) {
            String where = shards.get(j).resolve(FamilyRun.TABLE_JSON).toString();
            Json.Obj table = tables.get(j);
            if (!table.has(FamilyTable.PART)) {
                throw new FamilyException(where + ": records no \"" + FamilyTable.PART + "\" (the range and shard i/k "
                        + "it covers); it was written by an older version of chirocore: run that shard again.");
            }
            Json.Obj part = table.requireObject(FamilyTable.PART);
            Shard shard;
            try {
                shard = new Shard(part.requireInt("shard"), part.requireInt("of"));
            } catch (IllegalArgumentException e) {
                throw new FamilyException(where + ": " + FamilyTable.PART + ": " + e.getMessage(), e);
            }
            int a = part.requireInt("from");
            int b = part.requireInt("to");
            if (j == 0) {
                from = a;
                to = b;
                count = shard.count();
            } else if (a != from || b != to || shard.count() != count) {
                throw new FamilyException(where + ": is shard " + shard.index() + "/" + shard.count() + " of n = " + a
                        + ".." + b + ", but " + shards.get(0) + " is a shard of " + count + " of n = " + from + ".."
                        + to + "; merge the shards of one run.");
            }
            Path earlier = byIndex.put(shard.index(), shards.get(j));
            if (earlier != null) {
                throw new FamilyException(where + ": shard " + shard.index() + "/" + count + " is given twice (also "
                        + earlier + ").");
            }
            List<Integer> listed = new ArrayList<>();
            Json.Arr rows = table.requireArray("members");
            for (int k = 0; k < rows.size(); k++) {
                listed.add(rows.get(k).asObject("members[" + k + "]").requireInt("n"));
            }
            if (!listed.equals(shard.select(from, to))) {
                throw new FamilyException(where + ": lists n = " + listed + ", but shard " + shard.index() + "/"
                        + count + " of n = " + from + ".." + to + " has n = " + shard.select(from, to) + ".");
            }
        }
        List<String> missing = new ArrayList<>();
        for (int i = 0; i < count; i++) {
            if (!byIndex.containsKey(i)) {
                missing.add(i + "/" + count);
            }
        }
        if (!missing.isEmpty()) {
            throw new FamilyException("shard" + (missing.size() == 1 ? " " : "s ") + String.join(", ", missing)
                    + " of n = " + from + ".." + to + " " + (missing.size() == 1 ? "is" : "are") + " missing: give the "
                    + "output directory of family --shard " + missing.get(0) + " as well (the merge would have gaps).");
        }
        return new int[] {from, to};
    }

    private static Json.Obj readTable(Path shard) throws IOException {
        Path file = shard.resolve(FamilyRun.TABLE_JSON);
        try {
            return Json.parseUtf8(InputFiles.read(file)).asObject("the table");
        } catch (IOException e) {
            throw new FamilyException(file + ": cannot read the shard's table: " + IoMessages.plain(e), e);
        } catch (IllegalArgumentException e) {
            throw new FamilyException(file + ": " + e.getMessage(), e);
        }
    }

    /** The member of one row, its certificate copied into {@code out} and verified there. */
    private static MemberResult member(FamilyDefinition family, Path shard, Json.Obj row, Path out, long seed,
            Strategy strategy) throws IOException {
        int n = row.requireInt("n");
        Json.Obj pulled = row.requireObject("pulled");
        int elements = pulled.requireInt("elements");
        int rank = pulled.requireInt("rank");
        if (!row.has("certificate")) {
            return MemberResult.withoutCore(n, elements, rank, row.requireString("status"));
        }
        String name = FamilyRun.certificateName(n);
        Path source = shard.resolve(name);
        Path target = out.resolve(name);
        if (!source.toAbsolutePath().normalize().equals(target.toAbsolutePath().normalize())) {
            AtomicFiles.copy(source, target);
            for (Path proof : CertificateWriter.proofFiles(source)) {
                if (Files.exists(proof)) {
                    AtomicFiles.copy(proof, target.resolveSibling(proof.getFileName()));
                }
            }
        }
        VerificationReport report = CertificateVerifier.verify(target);
        if (!report.passed()) {
            throw new FamilyException(source + ": the certificate of n = " + n + " fails the verifier.");
        }
        CertificateFacts facts = CertificateFacts.read(target);
        if (!facts.construction().equals(CertificateWriter.construction(family.construction(n)))
                || !facts.search().equals(Optional.of(new CertificateFacts.Search(seed, strategy.id())))) {
            throw new FamilyException(source + ": the certificate of n = " + n + " records another construction, "
                    + "seed or strategy than " + family.source() + " with seed " + seed + " and " + strategy.id() + ".");
        }
        return new MemberResult.Certified(n, elements, rank, name, true, facts, report.millis());
    }
}
