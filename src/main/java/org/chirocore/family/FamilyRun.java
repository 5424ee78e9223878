package org.chirocore.family;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;

import org.chirocore.cert.CertificateWriter;
import org.chirocore.cert.CertificateForms;
import org.chirocore.check.CertificateVerifier;
import org.chirocore.check.VerificationReport;
import org.chirocore.io.InputFiles;
import org.chirocore.io.Json;
import org.chirocore.orient.Budget;
import org.chirocore.pipeline.CertifiedReduction;
import org.chirocore.search.Progress;
import org.chirocore.search.Strategy;

/**
 * Runs a family over a range of n: for each n, builds the member (checking that H is a
 * hyperplane and (H, O) are in general position), reduces it to a minimal non-orientable core
 * with the focus on H's vertices, certifies the core, writes {@code n=K.cert.json} atomically and
 * verifies the written file with the independent verifier; then writes the family table
 * ({@link FamilyTable}). Every member is built before any is reduced, so a definition that fails
 * at some n fails before work is spent.
 *
 * <p>Resuming: a member whose certificate already exists in the directory, passes the verifier
 * and records the same construction, seed and strategy is
 * not recomputed; any other file under that name (corrupt, unverifiable, from another family)
 * is redone. Temporary files of an interrupted write are never read.
 *
 * <p>Members run on {@code threads} threads; each member's search depends only on its input and
 * the seed, so certificates do not depend on thread timing, and the table lists members in
 * order of n. Cost: per member, what the reduction, the certification and the verifier cost.
 */
public final class FamilyRun {
    /** The family table in Markdown, in the run's directory. */
    public static final String TABLE_MD = "table.md";
    /** The family table as JSON, in the run's directory. */
    public static final String TABLE_JSON = "table.json";

    /**
     * How to run a family.
     *
     * @param seed the seed of every member's search
     * @param strategy the strategy of every member's search
     * @param budget the budget of each orientability decision
     * @param threads how many members run at once, at least 1
     * @param forms how new certificates state their minimality witnesses and refutation (an existing
     *     certificate that verifies is reused whatever its forms)
     */
    public record Settings(long seed, Strategy strategy, Budget budget, int threads, CertificateForms forms) {
        public Settings {
            if (strategy == null || budget == null || forms == null) {
                throw new IllegalArgumentException("Family run settings need a strategy, a budget and certificate forms.");
            }
            if (threads < 1) {
                throw new IllegalArgumentException("A family run needs at least 1 thread, not " + threads + ".");
            }
        }

        /** Settings whose new certificates state every witness by its signs and every relation the loop added. */
        public Settings(long seed, Strategy strategy, Budget budget, int threads) {
            this(seed, strategy, budget, threads, CertificateForms.DEFAULT);
        }
    }

    /**
     * Receives the stage each member is in ("reducing", "certifying", …) and each member's result
     * as soon as it is complete, so a batch job's log holds every finished member even when the
     * job is stopped; called from worker threads.
     */
    @FunctionalInterface
    public interface Listener {
        /** A listener that ignores everything. */
        Listener SILENT = (n, stage) -> { };

        void stage(int n, String stage);

        /** The member's result, its certificate (if any) written and verified; by default ignored. */
        default void finished(MemberResult member) {
        }

        /**
         * An explored member's findings (family explore), its class certificates written and
         * verified, as soon as the member is done; by default ignored.
         */
        default void explored(FamilyExploration.MemberFindings member) {
        }
    }

    private final FamilyDefinition family;
    private final Path dir;
    private final Settings settings;
    private final Listener listener;

    /** A run of {@code family} writing into {@code dir}; nothing is computed until {@link #run}. */
    public FamilyRun(FamilyDefinition family, Path dir, Settings settings, Listener listener) {
        this.family = family;
        this.dir = dir;
        this.settings = settings;
        this.listener = listener;
    }

    /**
     * Why the directory holds another run, whose certificates this run would replace: its table
     * records another family, definition, seed or strategy, or is not a family table at all.
     * Empty when the directory is new or holds an earlier part of this same run (resuming).
     */
    public Optional<String> otherRun() {
        Path file = dir.resolve(TABLE_JSON);
        if (!Files.exists(file)) {
            return Optional.empty();
        }
        try {
            Json.Obj table = Json.parseUtf8(InputFiles.read(file)).asObject("the table");
            String family = table.requireString("family");
            boolean sameDefinition = table.requireString("definitionSha256").equals(this.family.sha256());
            long seed = table.requireLong("seed");
            String strategy = table.requireString("strategy");
            if (family.equals(this.family.name()) && sameDefinition && seed == settings.seed()
                    && strategy.equals(settings.strategy().id())) {
                return Optional.empty();
            }
            return Optional.of(file + " records a run of family \"" + family + "\""
                    + (sameDefinition ? "" : " (another definition)") + " with seed " + seed + " and strategy "
                    + strategy + ", not this one");
        } catch (IOException | IllegalArgumentException e) {
            return Optional.of(file + " is not a family table");
        }
    }

    /** The certificate's file name of the member at n: {@code n=K.cert.json}. */
    public static String certificateName(int n) {
        return "n=" + n + ".cert.json";
    }

    /**
     * Runs the members {@code from..to} and writes the table.
     *
     * @throws FamilyException when the range is outside the family's or a member cannot be built
     * @throws IOException when a file cannot be written
     * @throws IllegalStateException when the verifier rejects a certificate just written (a bug;
     *     the file is removed)
     */
    public FamilyTable run(int from, int to) throws IOException {
        return run(from, to, Shard.ALL);
    }

    /**
     * Runs the members of {@code from..to} that lie in {@code shard} (possibly none) and writes
     * the table of those members.
     *
     * @throws FamilyException when the range is empty or outside the family's, or a member cannot
     *     be built
     * @throws IOException when a file cannot be written
     * @throws IllegalStateException when the verifier rejects a certificate just written
     */
    public FamilyTable run(int from, int to, Shard shard) throws IOException {
        if (from > to) {
            throw new FamilyException(family.source() + ": the range " + from + ".." + to + " is empty.");
        }
        if (from < family.from() || to > family.to()) {
            throw new FamilyException(family.source() + ": the range " + from + ".." + to + " is not within the "
                    + "family's range [" + family.from() + ", " + family.to() + "].");
        }
        List<Integer> ns = shard.select(from, to);
        List<FamilyDefinition.Member> members = new ArrayList<>();
        for (int n : ns) {
            listener.stage(n, "building");
            members.add(family.build(n));
        }
        Files.createDirectories(dir);
        ExecutorService pool = Executors.newFixedThreadPool(Math.max(1, Math.min(settings.threads(), members.size())));
        List<MemberResult> results = new ArrayList<>();
        try {
            List<Future<MemberResult>> futures = new ArrayList<>();
            for (FamilyDefinition.Member m : members) {
                futures.add(pool.submit(() -> {
                    MemberResult result = member(m);
                    listener.finished(result);
                    return result;
                }));
            }
            for (Future<MemberResult> f : futures) {
                results.add(f.get());
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("The family run was interrupted.", e);
        } catch (ExecutionException e) {
            throw rethrow(e.getCause());
        } finally {
            pool.shutdownNow();
        }
        FamilyTable table = FamilyTable.of(family, settings, results);
        table.write(dir, from, to, shard);
        return table;
    }

    private MemberResult member(FamilyDefinition.Member m) throws IOException {
        int n = m.construction().n();
        int elements = m.matroid().size();
        int rank = m.matroid().rank();
        Path file = dir.resolve(certificateName(n));
        if (Files.exists(file)) {
            listener.stage(n, "checking the existing certificate");
            Optional<MemberResult> reused = reuse(m, file);
            if (reused.isPresent()) {
                listener.stage(n, "reused the existing certificate");
                return reused.get();
            }
        }
        listener.stage(n, "reducing, certifying and verifying");
        CertifiedReduction.Outcome outcome = new CertifiedReduction(new CertifiedReduction.Settings(settings.seed(),
                settings.strategy(), settings.budget(), settings.forms()), Progress.SILENT).run(m.subject(), file);
        if (outcome instanceof CertifiedReduction.Orientable) {
            return noCore(file, new MemberResult.Orientable(n, elements, rank));
        }
        if (outcome instanceof CertifiedReduction.Unknown u) {
            return noCore(file, new MemberResult.Unknown(n, elements, rank, u.reason()));
        }
        CertifiedReduction.Verified v = (CertifiedReduction.Verified) outcome;
        MemberResult.Certified certified = new MemberResult.Certified(n, elements, rank,
                file.getFileName().toString(), false, CertificateFacts.read(file), v.verification().verifyMillis());
        listener.stage(n, certified.status());
        return certified;
    }

    /** The existing certificate as this run's result, when it verifies and matches the member. */
    private Optional<MemberResult> reuse(FamilyDefinition.Member m, Path file) throws IOException {
        VerificationReport report = CertificateVerifier.verify(file);
        if (!report.passed()) {
            return Optional.empty();
        }
        CertificateFacts facts;
        try {
            facts = CertificateFacts.read(file);
        } catch (IllegalArgumentException notOurs) {
            // verifies, but lacks the run figures this tool writes: redo it
            return Optional.empty();
        }
        boolean same = facts.construction().equals(CertificateWriter.construction(m.construction()))
                && facts.search().equals(Optional.of(new CertificateFacts.Search(settings.seed(),
                        settings.strategy().id())));
        return same ? Optional.of(new MemberResult.Certified(m.construction().n(), m.matroid().size(),
                m.matroid().rank(), file.getFileName().toString(), true, facts, report.millis()))
                : Optional.empty();
    }

    /** No core at n; a stale certificate under the member's name is removed so the directory stays truthful. */
    private MemberResult noCore(Path file, MemberResult result) throws IOException {
        Files.deleteIfExists(file);
        listener.stage(result.n(), result.status());
        return result;
    }

    private static RuntimeException rethrow(Throwable cause) throws IOException {
        if (cause instanceof IOException io) {
            throw io;
        }
        if (cause instanceof RuntimeException r) {
            return r;
        }
        if (cause instanceof Error e) {
            throw e;
        }
        return new IllegalStateException("A family member failed unexpectedly.", cause);
    }
}
