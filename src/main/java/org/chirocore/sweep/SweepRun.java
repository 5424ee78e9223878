package org.chirocore.sweep;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicInteger;

import org.chirocore.io.InputFiles;
import org.chirocore.cert.CertificateForms;
import org.chirocore.cert.CertificateWriter;
import org.chirocore.cert.CoreFinding;
import org.chirocore.cert.Provenance;
import org.chirocore.cert.Source;
import org.chirocore.check.CertificateVerifier;
import org.chirocore.family.Shard;
import org.chirocore.io.AtomicFiles;
import org.chirocore.io.Json;
import org.chirocore.io.ResultJson;
import org.chirocore.matroid.AffineCube;
import org.chirocore.matroid.Catalogue;
import org.chirocore.matroid.CubeConstruction;
import org.chirocore.matroid.ExplicitMatroid;
import org.chirocore.matroid.Field;
import org.chirocore.matroid.HyperplaneSpec;
import org.chirocore.matroid.NamedMatroid;
import org.chirocore.orient.Budget;
import org.chirocore.pipeline.CertifiedReduction;
import org.chirocore.pipeline.Subject;
import org.chirocore.search.CoreConstraints;
import org.chirocore.search.MinimalCore;
import org.chirocore.search.Progress;
import org.chirocore.search.SearchResult;
import org.chirocore.search.SteeredSearch;
import org.chirocore.search.Strategy;
import org.chirocore.search.UnsatCoreSearch;

/**
 * The sweep over every general-position pull of the real n-cube up to symmetry: for each n of a
 * range, enumerates the hyperplane orbits ({@link HyperplaneOrbits}) and the general-position
 * pairs ({@link GeneralPositionPairs}), and for each pair of its shard decides the pulled cube M'
 * and M'/O:
 * <ol>
 *   <li>M'/O is reduced to a minimal non-orientable core (focus on H's vertices). When one is
 *       found, it is certified twice, each certificate's path starting from its own matroid: from
 *       M'/O (construction with O contracted), and from M' (construction without contraction,
 *       O first in the path's contracted set; M'/O is a minor of M', so the same core refutes
 *       both). Each file is verified by the independent verifier before it counts.
 *   <li>Otherwise (M'/O orientable, or out of budget) M' is reduced on its own.
 *   <li>An orientable matroid gets its re-checked orientation written as a witness file, and the
 *       pair is marked ORIENTABLE in every output and on stderr: no such pull was known.
 *   <li>With {@link Settings#rankCores} set, a core of rank n of M'/O (deletions only) is searched
 *       by {@link SteeredSearch} under the per-pair time limit and certified from M'/O; its
 *       outcome (found, none exists, unknown) is recorded beside the verdicts and never changes them.
 * </ol>
 * Files go to {@code DIR/n=K/}: {@code ID.contracted.cert.json}, {@code ID.pulled.cert.json}
 * (or {@code .witness.json}), {@code ID.rank-n.cert.json}, and {@code ID.pair.json}, written
 * last, which makes a pair done. Every certificate is written in {@link Settings#forms}. A rerun
 * reuses a done pair whose certificates still verify and record the same construction, seed and
 * strategy, whatever their forms (which change how a proof is written, not what it proves), and
 * redoes any other; of a reused pair it keeps
 * the rank-n core outcome when its certificate still verifies likewise, when it is "none exists",
 * or when it is unknown under a limit at least this run's, and otherwise searches the core only.
 * Then {@code sweep.json} and {@code sweep.md} are written. Pairs run on {@code threads} threads;
 * each pair depends only on its input and the seed, so the files do not depend on thread timing
 * (except that a rank-n search under a time limit may answer unknown under one load and find a
 * core under another: its inner budgets count conflicts, only the limit counts time).
 *
 * <p>Cost per n: the enumeration (see {@link HyperplaneOrbits}), one general-position test per
 * candidate pair, and per decided pair one or two reductions, two refutations and two
 * verifications; with the rank-n core search, up to its time limit more per pair.
 */
public final class SweepRun {
    /** The sweep table as JSON, in the run's directory. */
    public static final String SWEEP_JSON = "sweep.json";
    /** The sweep table as Markdown, in the run's directory. */
    public static final String SWEEP_MD = "sweep.md";
    /** Smallest cube dimension swept (the 1-cube has no pull). */
    public static final int MIN_DIMENSION = 2;

    /**
     * How to run a sweep.
     *
     * @param seed the seed of every search
     * @param strategy the strategy of every search
     * @param budget the budget of each orientability decision
     * @param threads how many pairs run at once, at least 1
     * @param shard the part of the pairs this run decides
     * @param rankCores whether to search a core of rank n per pair, and its budget
     * @param forms how new certificates state their minimality witnesses and refutation (a reused
     *     certificate that verifies keeps its own forms; see docs/sweep.md)
     */
    public record Settings(long seed, Strategy strategy, Budget budget, int threads, Shard shard,
            Optional<RankCoreSearch> rankCores, CertificateForms forms) {
        public Settings {
            if (strategy == null || budget == null || shard == null || rankCores == null || forms == null) {
                throw new IllegalArgumentException("Sweep settings need a strategy, a budget, a shard, the rank-n "
                        + "core search (or Optional.empty()) and certificate forms.");
            }
            if (threads < 1) {
                throw new IllegalArgumentException("A sweep needs at least 1 thread, not " + threads + ".");
            }
        }

        /** Settings whose certificates have the default forms (those of the stored sweep). */
        public Settings(long seed, Strategy strategy, Budget budget, int threads, Shard shard,
                Optional<RankCoreSearch> rankCores) {
            this(seed, strategy, budget, threads, shard, rankCores, CertificateForms.DEFAULT);
        }

        /** Settings without the rank-n core search, certificates in the default forms. */
        public Settings(long seed, Strategy strategy, Budget budget, int threads, Shard shard) {
            this(seed, strategy, budget, threads, shard, Optional.empty());
        }
    }

    /** Receives one progress line at a time (called from worker threads; lines are whole). */
    @FunctionalInterface
    public interface Listener {
        /** A listener that ignores everything. */
        Listener SILENT = line -> { };

        void line(String text);
    }

    private final Path dir;
    private final Settings settings;
    private final Listener listener;

    /** A sweep writing into {@code dir}; nothing is computed until {@link #run}. */
    public SweepRun(Path dir, Settings settings, Listener listener) {
        this.dir = dir;
        this.settings = settings;
        this.listener = listener;
    }

    /** The directory of dimension n inside a sweep directory. */
    static Path levelDirectory(Path dir, int n) {
        return dir.resolve("n=" + n);
    }

    /**
     * Sweeps the dimensions {@code from..to} and writes sweep.json and sweep.md.
     *
     * @throws IllegalArgumentException when the range is empty or outside
     *     {@link #MIN_DIMENSION}..{@link HyperplaneOrbits#MAX_DIMENSION}
     * @throws IOException when a file cannot be written
     * @throws IllegalStateException when the verifier rejects a certificate just written (a bug;
     *     the file is removed)
     */
    public SweepResult run(int from, int to) throws IOException {
        if (from > to || from < MIN_DIMENSION || to > HyperplaneOrbits.MAX_DIMENSION) {
            throw new IllegalArgumentException("A sweep covers cube dimensions within " + MIN_DIMENSION + ".."
                    + HyperplaneOrbits.MAX_DIMENSION + "; " + from + ".." + to + " is not such a range.");
        }
        Files.createDirectories(dir);
        List<SweepLevel> levels = new ArrayList<>();
        for (int n = from; n <= to; n++) {
            levels.add(level(n));
        }
        SweepResult result = new SweepResult(from, to, settings.shard(), settings.seed(), settings.strategy().id(),
                levels, settings.rankCores());
        SweepReport.write(dir, result);
        for (PairResult p : result.discoveries()) {
            listener.line("!!! ORIENTABLE PULL " + p.id() + ": see " + SWEEP_MD + " !!!");
        }
        return result;
    }

    private SweepLevel level(int n) throws IOException {
        long start = System.nanoTime();
        listener.line("n = " + n + ": enumerating hyperplane orbits");
        List<HyperplaneOrbit> orbits = HyperplaneOrbits.of(n, (m, done, total, found, normals) -> listener.line("n = "
                + n + ": hyperplane orbits, " + m + "-cube: " + done + " of " + total + " search prefixes, " + found
                + " orbits so far (" + millis(start) + " ms)"));
        long hyperplanes = orbits.stream().mapToLong(HyperplaneOrbit::orbitSize).sum();
        listener.line("n = " + n + ": " + orbits.size() + " hyperplane orbits, " + hyperplanes + " hyperplanes ("
                + millis(start) + " ms); testing general position");
        List<PullCandidate> general = new ArrayList<>();
        int candidates = 0;
        for (HyperplaneOrbit h : orbits) {
            for (PullCandidate c : GeneralPositionPairs.of(h)) {
                candidates++;
                if (c.inGeneralPosition()) {
                    general.add(c);
                }
            }
        }
        long pulls = general.stream().mapToLong(PullCandidate::orbitSize).sum();
        List<Integer> mine = new ArrayList<>();
        for (int i = 0; i < general.size(); i++) {
            if (i % settings.shard().count() == settings.shard().index()) {
                mine.add(i);
            }
        }
        listener.line("n = " + n + ": " + candidates + " pairs up to symmetry, " + general.size()
                + " in general position (" + pulls + " without symmetry); deciding " + mine.size() + " of them"
                + (settings.shard().count() > 1 ? " in shard " + settings.shard().index() + "/"
                        + settings.shard().count() : "") + " (" + millis(start) + " ms so far)");
        Files.createDirectories(levelDirectory(dir, n));
        List<PairResult> results = decideAll(n, general, mine);
        listener.line("n = " + n + ": done in " + millis(start) + " ms");
        return new SweepLevel(n, orbits.size(), hyperplanes, candidates, general.size(), pulls, results);
    }

    private List<PairResult> decideAll(int n, List<PullCandidate> general, List<Integer> mine) throws IOException {
        ExecutorService pool = Executors.newFixedThreadPool(Math.max(1, Math.min(settings.threads(), mine.size())));
        AtomicInteger done = new AtomicInteger();
        List<PairResult> results = new ArrayList<>();
        try {
            List<Future<PairResult>> futures = new ArrayList<>();
            for (int i : mine) {
                futures.add(pool.submit(() -> {
                    long start = System.nanoTime();
                    PairResult r;
                    try {
                        r = pair(n, i, general.get(i));
                    } catch (IOException e) {
                        throw new UncheckedIOException(e);
                    }
                    listener.line("n = " + n + ": pair " + (done.incrementAndGet()) + " of " + mine.size() + " "
                            + r.id() + ": pulled " + r.pulledVerdict().text() + ", contracted "
                            + r.contractedVerdict().text() + r.core().map(c -> ", core " + c.elements()
                                    + " elements rank " + c.rank() + c.name().map(x -> " (" + x + ")").orElse(""))
                                    .orElse("") + " (" + millis(start) + " ms)");
                    return r;
                }));
            }
            for (Future<PairResult> f : futures) {
                results.add(f.get());
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("The sweep was interrupted.", e);
        } catch (ExecutionException e) {
            // a task throws only unchecked exceptions, an I/O failure wrapped
            if (e.getCause() instanceof UncheckedIOException io) {
                throw io.getCause();
            }
            if (e.getCause() instanceof Error error) {
                throw error;
            }
            throw (RuntimeException) e.getCause();
        } finally {
            pool.shutdownNow();
        }
        return results;
    }

    /** The construction of a pair: the real n-cube, H by its equation, O pulled, and contracted or not. */
    static CubeConstruction construction(int n, List<Integer> normal, int offset, String pulled, boolean contract) {
        return new CubeConstruction(n, Field.RATIONALS, new HyperplaneSpec.ByEquation(normal, offset), pulled, contract);
    }

    private PairResult pair(int n, int index, PullCandidate c) throws IOException {
        HyperplaneOrbit h = c.hyperplane();
        String id = PairResult.id(n, h.normal(), h.offset(), c.vertex());
        Path level = levelDirectory(dir, n);
        Path record = level.resolve(id + ".pair.json");
        CubeConstruction contracted = construction(n, h.normal(), h.offset(), c.vertex(), true);
        CubeConstruction pulled = construction(n, h.normal(), h.offset(), c.vertex(), false);
        if (Files.exists(record)) {
            Optional<PairResult> reused = reuse(record, level, index, contracted, pulled);
            if (reused.isPresent()) {
                PairResult earlier = reused.get();
                if (settings.rankCores().isEmpty()) {
                    return earlier.withRankCore(Optional.empty());
                }
                Optional<RankCore> kept = reusableRankCore(earlier.rankCore(), level, contracted);
                if (kept.isPresent()) {
                    return earlier.withRankCore(kept);
                }
                PairResult completed = earlier.withRankCore(Optional.of(rankCore(n, id, level, Subject.of(contracted),
                        earlier.contractedVerdict())));
                AtomicFiles.writeJson(record, completed.toJson());
                return completed;
            }
        }
        CertifiedReduction.Settings pipeline = pipelineSettings();
        Subject contractedSubject = Subject.of(contracted);
        Verdict contractedVerdict;
        Verdict pulledVerdict;
        Optional<PairResult.Core> core = Optional.empty();
        SearchResult first = new UnsatCoreSearch(pipeline.search(contractedSubject), Progress.SILENT)
                .reduce(contractedSubject.matroid());
        if (first instanceof SearchResult.Found f) {
            MinimalCore m = f.core();
            CoreFinding searched = CoreFinding.searched(m, contractedSubject.source());
            contractedVerdict = certify(searched, level.resolve(id + ".contracted.cert.json"));
            // M'/O is a minor of M': the same core, with O contracted first on the path from M'
            List<String> path = new ArrayList<>();
            path.add(c.vertex());
            path.addAll(m.contracted());
            CoreFinding fromPulled = new CoreFinding(m.core(), new Provenance(new Source.Constructed(pulled), path,
                    m.deleted()), searched.witnesses(), searched.discovery());
            pulledVerdict = certify(fromPulled, level.resolve(id + ".pulled.cert.json"));
            core = Optional.of(core(m.core()));
        } else {
            contractedVerdict = noCore(first, level, id + ".contracted");
            Subject pulledSubject = Subject.of(pulled);
            SearchResult second = new UnsatCoreSearch(pipeline.search(pulledSubject), Progress.SILENT)
                    .reduce(pulledSubject.matroid());
            if (second instanceof SearchResult.Found f) {
                pulledVerdict = certify(CoreFinding.searched(f.core(), pulledSubject.source()),
                        level.resolve(id + ".pulled.cert.json"));
                core = Optional.of(core(f.core().core()));
            } else {
                pulledVerdict = noCore(second, level, id + ".pulled");
            }
        }
        Optional<RankCore> rankCore = settings.rankCores().isEmpty() ? Optional.empty()
                : Optional.of(rankCore(n, id, level, contractedSubject, contractedVerdict));
        PairResult result = new PairResult(n, index, h.normal(), h.offset(), c.hyperplane().representative()
                .vertices().stream().map(v -> AffineCube.real(n).label(v)).toList(), c.vertex(),
                h.orbitSize(), c.orbitSize(), pulledVerdict, contractedVerdict, core, rankCore);
        AtomicFiles.writeJson(record, result.toJson());
        return result;
    }

    private CertifiedReduction.Settings pipelineSettings() {
        return new CertifiedReduction.Settings(settings.seed(), settings.strategy(), settings.budget(), settings.forms());
    }

    /** The file name of a pair's rank-n core certificate. */
    static String rankCoreFile(String id) {
        return id + ".rank-n.cert.json";
    }

    /**
     * Searches a core of rank n of M'/O (deletions only) with the steered search of
     * {@code reduce --rank n} under the per-pair time limit, and certifies a core found through the
     * one certified pipeline (written and verified before it counts).
     */
    private RankCore rankCore(int n, String id, Path level, Subject subject, Verdict contractedVerdict)
            throws IOException {
        long start = System.nanoTime();
        RankCoreSearch search = settings.rankCores().orElseThrow();
        int rank = subject.matroid().rank();
        RankCore out;
        if (contractedVerdict instanceof Verdict.Orientable) {
            out = new RankCore.NoneExists("M'/O is orientable, so no minor of it is non-orientable");
        } else if (rank < CoreConstraints.SMALLEST_CORE_RANK) {
            out = new RankCore.NoneExists("M'/O has rank " + rank + ", and every matroid of rank at most 2 is orientable");
        } else {
            CertifiedReduction.Settings pipeline = pipelineSettings();
            SteeredSearch.Result r = new SteeredSearch(pipeline.search(subject), new CoreConstraints(OptionalInt.of(rank),
                    List.of(), List.of()), search.millisPerPair(), Progress.SILENT).search(subject.matroid());
            if (r instanceof SteeredSearch.Found f) {
                Path file = level.resolve(rankCoreFile(id));
                CertifiedReduction.Outcome o = CertifiedReduction.certify(CoreFinding.searched(f.core(), subject.source()),
                        settings.budget(), file, Optional.empty(), settings.forms());
                out = o instanceof CertifiedReduction.Unknown u
                        ? new RankCore.Unknown("certifying the core found ran out of budget: " + u.reason(),
                                search.millisPerPair())
                        : found(f.core().core(), file.getFileName().toString());
            } else if (r instanceof SteeredSearch.NoneExists none) {
                out = new RankCore.NoneExists(none.enumerated());
            } else {
                out = new RankCore.Unknown(((SteeredSearch.Unknown) r).reason(), search.millisPerPair());
            }
        }
        listener.line("n = " + n + ": " + id + ": rank-n core " + out.text() + " (" + millis(start) + " ms)");
        return out;
    }

    /**
     * An earlier pair's rank-n core outcome that stands: a core whose certificate still verifies
     * and records M'/O, this seed and strategy (described afresh from the certificate); "none
     * exists"; or unknown under a limit this run's does not exceed. Empty when it must be searched.
     */
    private Optional<RankCore> reusableRankCore(Optional<RankCore> earlier, Path level, CubeConstruction contracted)
            throws IOException {
        if (earlier.isEmpty()) {
            return Optional.empty();
        }
        RankCore r = earlier.get();
        if (r instanceof RankCore.Found f) {
            if (!certified(new Verdict.NonOrientable(f.certificate()), level, contracted)) {
                return Optional.empty();
            }
            return Optional.of(found(RecordedCertificate.read(level.resolve(f.certificate())).core(),
                    f.certificate()));
        }
        if (r instanceof RankCore.Unknown u && !settings.rankCores().orElseThrow().coveredBy(u.millis())) {
            return Optional.empty();
        }
        return earlier;
    }

    private static RankCore.Found found(ExplicitMatroid m, String file) {
        return new RankCore.Found(m.size(), m.rank(), m.basisCount(), m.labels(),
                Catalogue.identify(m).map(NamedMatroid::symbol), file);
    }

    /** Certifies, writes and verifies through the one certified pipeline. */
    private Verdict certify(CoreFinding found, Path file) throws IOException {
        CertifiedReduction.Outcome outcome = CertifiedReduction.certify(found, settings.budget(), file, Optional.empty(),
                settings.forms());
        if (outcome instanceof CertifiedReduction.Unknown u) {
            return new Verdict.Unknown(u.reason());
        }
        return new Verdict.NonOrientable(file.getFileName().toString());
    }

    /** The verdict without a core: an orientation (written as a witness, loudly) or no answer. */
    private Verdict noCore(SearchResult r, Path level, String base) throws IOException {
        if (r instanceof SearchResult.Orientable o) {
            String name = base + ".witness.json";
            AtomicFiles.writeJson(level.resolve(name), ResultJson.chirotope(o.witness()));
            listener.line("!!! ORIENTABLE: " + base + " has an orientation, written to " + name + " !!!");
            return new Verdict.Orientable(name);
        }
        return new Verdict.Unknown(((SearchResult.Unknown) r).reason());
    }

    /**
     * The pair of an earlier run, when both its verdicts are certificates that still verify and
     * record this pair's constructions, seed and strategy; anything else is redone.
     */
    private Optional<PairResult> reuse(Path record, Path level, int index, CubeConstruction contracted,
            CubeConstruction pulled) throws IOException {
        PairResult earlier;
        try {
            earlier = PairResult.fromJson(Json.parseUtf8(InputFiles.read(record)).asObject("the pair"));
        } catch (IllegalArgumentException unreadable) {
            return Optional.empty();
        }
        boolean same = earlier.index() == index
                && certified(earlier.contractedVerdict(), level, contracted)
                && certified(earlier.pulledVerdict(), level, pulled);
        if (!same) {
            return Optional.empty();
        }
        // the core is read back from the certificate, so that its description follows this version
        ExplicitMatroid m = RecordedCertificate.read(level.resolve(earlier.contractedVerdict().file())).core();
        return Optional.of(new PairResult(earlier.n(), index, earlier.normal(), earlier.offset(), earlier.hyperplane(),
                earlier.pulled(), earlier.hyperplaneOrbit(), earlier.orbitSize(), earlier.pulledVerdict(),
                earlier.contractedVerdict(), Optional.of(core(m)), earlier.rankCore()));
    }

    private static PairResult.Core core(ExplicitMatroid m) {
        return new PairResult.Core(m.size(), m.rank(), m.labels(), Catalogue.identify(m).map(NamedMatroid::symbol));
    }

    private boolean certified(Verdict v, Path level, CubeConstruction construction) throws IOException {
        if (!(v instanceof Verdict.NonOrientable)) {
            return false;
        }
        Path file = level.resolve(v.file());
        if (!Files.exists(file) || !CertificateVerifier.verify(file).passed()) {
            return false;
        }
        try {
            RecordedCertificate recorded = RecordedCertificate.read(file);
            return recorded.construction().equals(CertificateWriter.construction(construction))
                    && recorded.seed() == settings.seed() && recorded.strategy().equals(settings.strategy().id());
        } catch (IllegalArgumentException notOurs) {
            return false;
        }
    }

    private static long millis(long start) {
        return (System.nanoTime() - start) / 1_000_000;
    }
}
