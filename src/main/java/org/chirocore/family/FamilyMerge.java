package org.chirocore.family;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Map;
import java.util.TreeMap;

import org.chirocore.cert.CertificateWriter;
import org.chirocore.check.CertificateVerifier;
import org.chirocore.check.Report;
import org.chirocore.io.Json;
import org.chirocore.orient.Budget;
import org.chirocore.search.Strategy;

/**
 * Joins the output directories of the shards of one family run ({@code family --shard i/k})
 * into one directory with one table. Refuses shards that disagree: a table of another family
 * or definition (by {@link FamilyDefinition#sha256}), another seed or strategy, a certificate
 * that fails the verifier or records another construction, seed or strategy than its shard, or
 * one n present twice with different content (an n present twice with the same content counts
 * once). Each certificate (and its DRAT side file) is copied into the output and verified there
 * again. Cost: one verification per member.
 */
public final class FamilyMerge {
    private FamilyMerge() {
    }

    /**
     * Merges {@code shards} of a run of {@code family} into {@code out} and writes its table.
     *
     * @throws FamilyException naming the shard and n when the shards are inconsistent
     * @throws IOException when a file cannot be read or written
     */
    public static FamilyTable merge(FamilyDefinition family, List<Path> shards, Path out) throws IOException {
        if (shards.isEmpty()) {
            throw new FamilyException("family merge needs at least one shard directory.");
        }
        Files.createDirectories(out);
        Long seed = null;
        Strategy strategy = null;
        Map<Integer, MemberResult> members = new TreeMap<>();
        Map<Integer, Path> origin = new TreeMap<>();
        for (Path shard : shards) {
            Json.Obj table = readTable(shard);
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
                MemberResult earlier = members.putIfAbsent(m.n(), m);
                if (earlier != null && !sameContent(earlier, m)) {
                    throw new FamilyException(where + ": n = " + m.n() + " differs from n = " + m.n() + " in "
                            + origin.get(m.n()) + ".");
                }
                origin.putIfAbsent(m.n(), shard);
            }
        }
        FamilyTable merged = FamilyTable.of(family, new FamilyRun.Settings(seed, strategy, Budget.UNLIMITED, 1),
                new ArrayList<>(members.values()));
        merged.write(out);
        return merged;
    }

    private static Json.Obj readTable(Path shard) throws IOException {
        Path file = shard.resolve(FamilyRun.TABLE_JSON);
        try {
            return Json.parseUtf8(Files.readAllBytes(file)).asObject("the table");
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
        String dratName = CertificateWriter.baseName(source) + ".drat.gz";
        if (!source.toAbsolutePath().normalize().equals(target.toAbsolutePath().normalize())) {
            Files.copy(source, target, StandardCopyOption.REPLACE_EXISTING);
            if (Files.exists(shard.resolve(dratName))) {
                Files.copy(shard.resolve(dratName), out.resolve(dratName), StandardCopyOption.REPLACE_EXISTING);
            }
        }
        Report report = CertificateVerifier.verify(target);
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

    private static boolean sameContent(MemberResult a, MemberResult b) {
        if (a instanceof MemberResult.Certified ca && b instanceof MemberResult.Certified cb) {
            return ca.facts().sha256().equals(cb.facts().sha256());
        }
        return a.equals(b);
    }
}
