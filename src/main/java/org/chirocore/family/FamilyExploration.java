package org.chirocore.family;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;
import java.util.Set;

import org.chirocore.cert.CertificateForms;
import org.chirocore.cert.CoreFinding;
import org.chirocore.cert.Source;
import org.chirocore.io.AtomicFiles;
import org.chirocore.io.Json;
import org.chirocore.matroid.Catalogue;
import org.chirocore.matroid.ElementSets;
import org.chirocore.matroid.ExplicitMatroid;
import org.chirocore.matroid.HyperplaneIsomorphismInspector;
import org.chirocore.matroid.Matroid;
import org.chirocore.matroid.MatroidShape;
import org.chirocore.orient.Budget;
import org.chirocore.pipeline.CertifiedReduction;
import org.chirocore.search.CoreConstraints;
import org.chirocore.search.MinimalCore;
import org.chirocore.search.Progress;
import org.chirocore.search.SearchResult;
import org.chirocore.search.SearchSettings;
import org.chirocore.search.SteeredSearch;
import org.chirocore.search.Strategy;
import org.chirocore.search.UnsatCoreSearch;

/**
 * Explores the minimal cores of each member of a family: K seeded reductions per n (seeds
 * seed, seed + 1, …, strategies alternating contract-first, delete-first), each to a fully
 * minor-minimal core. Without constraints each run is an ordinary reduction. With constraints
 * (a rank given as an expression in n, kept and avoided vertices) each run is a
 * {@link SteeredSearch}: the search itself contracts exactly rank(M) − R elements, keeps and
 * deletes what it is told and backtracks past dead ends, so it answers a core meeting the
 * constraints, "none exists" (the space was enumerated completely; the member's remaining runs
 * would only repeat it, so they are skipped) or unknown. The cores are
 * grouped up to isomorphism ({@link MatroidShape} first, then {@link HyperplaneIsomorphismInspector});
 * one representative per class, from the class's first run, is certified into
 * {@code n=K.core-J.cert.json} (its proofs in {@link Settings#forms}) and verified. Writes
 * {@link #EXPLORE_MD} and {@link #EXPLORE_JSON}.
 *
 * <p>Cost: per member, K reductions, one isomorphism test per accepted core and class of equal
 * shape, and one certification and verification per class.
 */
public final class FamilyExploration {
    /** The exploration's report in Markdown, in the output directory. */
    public static final String EXPLORE_MD = "explore.md";
    /** The exploration's report as JSON, in the output directory. */
    public static final String EXPLORE_JSON = "explore.json";

    /**
     * How to explore.
     *
     * @param seed the seed of the first run; run j uses seed + j
     * @param runs K, the number of reductions per n, at least 1
     * @param budget the budget of each orientability decision and of each refutation
     * @param keep vertex rules for the vertices a core must contain (steering)
     * @param avoid vertex rules for the vertices a core must not contain (steering: they are deleted)
     * @param rank the rank a core must have, as an expression in n, if any (steering)
     * @param totalMillis wall-clock limit of each steered run, 0 for none
     * @param forms how the class certificates state their minimality witnesses and refutation
     */
    public record Settings(long seed, int runs, Budget budget, List<VertexRule> keep, List<VertexRule> avoid,
            Optional<RankRule> rank, long totalMillis, CertificateForms forms) {
        public Settings {
            if (runs < 1) {
                throw new IllegalArgumentException("An exploration needs at least 1 run per n, not " + runs + ".");
            }
            if (budget == null || rank == null || forms == null) {
                throw new IllegalArgumentException("Exploration settings need a budget, a rank (or none) and "
                        + "certificate forms.");
            }
            if (totalMillis < 0) {
                throw new IllegalArgumentException("The time limit of a run must not be negative, not " + totalMillis
                        + ".");
            }
            keep = List.copyOf(keep);
            avoid = List.copyOf(avoid);
        }

        /** Settings whose certificates have the default forms. */
        public Settings(long seed, int runs, Budget budget, List<VertexRule> keep, List<VertexRule> avoid,
                Optional<RankRule> rank, long totalMillis) {
            this(seed, runs, budget, keep, avoid, rank, totalMillis, CertificateForms.DEFAULT);
        }

        /** Unconstrained settings: every run is an ordinary reduction, certificates in the default forms. */
        public static Settings unconstrained(long seed, int runs, Budget budget) {
            return new Settings(seed, runs, budget, List.of(), List.of(), Optional.empty(), 0);
        }

        /** Whether the runs are steered (some constraint is set). */
        public boolean steered() {
            return rank.isPresent() || !keep.isEmpty() || !avoid.isEmpty();
        }

        /**
         * The steered rank at n, if a rank is set.
         *
         * @throws FamilyException when the expression cannot be evaluated at n
         */
        public OptionalInt rank(int n) {
            if (rank.isEmpty()) {
                return OptionalInt.empty();
            }
            long r;
            try {
                r = rank.get().rank().value(n, 0);
            } catch (ArithmeticException | IllegalArgumentException e) {
                throw new FamilyException("--rank at n = " + n + ": " + e.getMessage(), e);
            }
            if (r < 0 || r > Integer.MAX_VALUE) {
                throw new FamilyException("--rank at n = " + n + " is " + r + ", not a rank.");
            }
            return OptionalInt.of((int) r);
        }

        /** The seed of run j (0-based): seed + j. */
        public long seed(int j) {
            return seed + j;
        }

        /** The strategy of run j (0-based): contract-first for even j, delete-first for odd j. */
        public static Strategy strategy(int j) {
            return j % 2 == 0 ? Strategy.CONTRACT_FIRST : Strategy.DELETE_FIRST;
        }
    }

    /**
     * The wanted rank of a core as an expression in n.
     *
     * @param text the expression as written, e.g. {@code n} or {@code n-1}
     * @param rank the parsed expression
     */
    public record RankRule(String text, Expression rank) {
        /**
         * Parses an expression in n.
         *
         * @throws FamilyException naming the text and what was expected
         */
        public static RankRule parse(String text) {
            try {
                return new RankRule(text, Expression.parse(text, Set.of('n')));
            } catch (IllegalArgumentException e) {
                throw new FamilyException("--rank: " + e.getMessage(), e);
            }
        }
    }

    /** One reduction of the exploration: its seed and strategy. */
    public record Attempt(long seed, Strategy strategy) {
        Json toJson() {
            return Json.Obj.builder().put("seed", seed).put("strategy", strategy.id()).build();
        }

        @Override
        public String toString() {
            return seed + " " + strategy.id();
        }
    }

    /** A run whose core was not accepted, or that found none. */
    public sealed interface Rejected {
        /** The run. */
        Attempt attempt();

        /** Why, as the report states it: "none exists: …", "orientable" or "unknown: …". */
        String reason();

        /**
         * The steered search proved that no core meets the constraints at this n.
         *
         * @param enumerated what was enumerated (or why the constraint cannot be met), in words
         */
        record NoneExists(Attempt attempt, String enumerated) implements Rejected {
            @Override
            public String reason() {
                return "none exists: " + enumerated;
            }
        }

        /** The member is orientable: the run found no core. */
        record Orientable(Attempt attempt) implements Rejected {
            @Override
            public String reason() {
                return "orientable";
            }
        }

        /**
         * A budget ran out; nothing is claimed.
         *
         * @param why why, in words
         */
        record Unknown(Attempt attempt, String why) implements Rejected {
            @Override
            public String reason() {
                return "unknown: " + why;
            }
        }
    }

    /**
     * One isomorphism class of accepted cores.
     *
     * @param core the representative: the core of the class's first run
     * @param attempts the runs whose core lies in the class, in run order
     * @param certification the representative's verified certificate, or why there is none
     */
    public record CoreClass(ExplicitMatroid core, List<Attempt> attempts, ClassCertificate certification) {
        public CoreClass {
            attempts = List.copyOf(attempts);
        }

        /** The representative's verified certificate, if it has one. */
        public Optional<ClassCertificate.Verified> certificate() {
            return certification instanceof ClassCertificate.Verified v ? Optional.of(v) : Optional.empty();
        }

        /** "verified", or "unknown: " and why there is no certificate. */
        public String status() {
            return certification instanceof ClassCertificate.Unknown u ? "unknown: " + u.reason() : "verified";
        }
    }

    /** The certificate of a class's representative, or why there is none. */
    public sealed interface ClassCertificate {
        /**
         * Written and accepted by the verifier.
         *
         * @param file the certificate's file name in the output directory
         * @param facts what it states, read back
         */
        record Verified(String file, CertificateFacts facts) implements ClassCertificate {
        }

        /**
         * The refutation ran out of budget; nothing was written.
         *
         * @param reason why, in words
         */
        record Unknown(String reason) implements ClassCertificate {
        }
    }

    /**
     * What the exploration found at one n.
     *
     * @param n the cube dimension
     * @param elements the member matroid's size
     * @param rank its rank
     * @param classes the isomorphism classes, in order of first appearance
     * @param rejected the runs that found no core (a run proving that none exists ends the member's runs)
     */
    public record MemberFindings(int n, int elements, int rank, List<CoreClass> classes, List<Rejected> rejected) {
        public MemberFindings {
            classes = List.copyOf(classes);
            rejected = List.copyOf(rejected);
        }

        /** The proof that no core meets the constraints at this n, if a run gave one. */
        public Optional<Rejected.NoneExists> noneExists() {
            return rejected.stream().filter(r -> r instanceof Rejected.NoneExists).map(r -> (Rejected.NoneExists) r)
                    .findFirst();
        }
    }

    /**
     * The whole exploration.
     *
     * @param family the family
     * @param settings the settings
     * @param members one per n, in increasing n
     */
    public record Findings(FamilyDefinition family, Settings settings, List<MemberFindings> members) {
        public Findings {
            members = List.copyOf(members);
        }

        /** The report in Markdown. */
        public String toMarkdown() {
            StringBuilder b = new StringBuilder();
            b.append("# Exploration of family ").append(family.name()).append("\n\n").append(family.description())
                    .append("\n\n");
            b.append("Definition ").append(family.source()).append("; ").append(settings.runs())
                    .append(" runs per n, seeds ").append(settings.seed()).append("..")
                    .append(settings.seed(settings.runs() - 1))
                    .append(", strategies alternating contract-first, delete-first");
            if (!settings.keep().isEmpty()) {
                b.append("; cores keep ").append(String.join(", ",
                        settings.keep().stream().map(VertexRule::text).toList()));
            }
            if (!settings.avoid().isEmpty()) {
                b.append("; cores avoid ").append(String.join(", ",
                        settings.avoid().stream().map(VertexRule::text).toList()));
            }
            settings.rank().ifPresent(r -> b.append("; cores have rank ").append(r.text()));
            b.append(".\n\nEvery core is fully minor-minimal").append(settings.steered()
                    ? "; the constraints steer each run's search, which answers a core meeting them, \"none exists\" "
                            + "(enumerated completely) or unknown.\n"
                    : ".\n");
            for (MemberFindings m : members) {
                b.append("\n## n = ").append(m.n()).append(" (").append(m.elements()).append(" elements, rank ")
                        .append(m.rank()).append(")\n\n");
                b.append("| class | elements | rank | bases | non-bases | frequency | runs (seed strategy) "
                        + "| certificate | vertices |\n");
                b.append("|---".repeat(9)).append("|\n");
                for (int j = 0; j < m.classes().size(); j++) {
                    CoreClass c = m.classes().get(j);
                    b.append("| ").append(j + 1).append(Catalogue.identify(c.core()).map(n -> " (" + n.symbol() + ")").orElse(""))
                            .append(" | ").append(c.core().size()).append(" | ")
                            .append(c.core().rank()).append(" | ").append(c.core().basisCount()).append(" | ")
                            .append(nonBases(c.core())).append(" | ").append(c.attempts().size()).append(" | ")
                            .append(String.join(", ", c.attempts().stream().map(Attempt::toString).toList()))
                            .append(" | ").append(c.certificate().map(f -> "`" + f.file() + "` ").orElse(""))
                            .append(c.status()).append(" | ").append(String.join(" ", c.core().labels()))
                            .append(" |\n");
                }
                for (Rejected r : m.rejected()) {
                    b.append("\n- run ").append(r.attempt()).append(": ").append(r.reason());
                }
                b.append(m.rejected().isEmpty() ? "" : "\n");
            }
            return b.toString();
        }

        /** The report as JSON. */
        public Json.Obj toJson() {
            List<Json> ms = new ArrayList<>();
            for (MemberFindings m : members) {
                List<Json> classes = new ArrayList<>();
                for (CoreClass c : m.classes()) {
                    classes.add(Json.Obj.builder()
                            .put("elements", c.core().size())
                            .put("rank", c.core().rank())
                            .put("bases", c.core().basisCount())
                            .put("labels", Json.Arr.ofStrings(c.core().labels()))
                            .put("frequency", c.attempts().size())
                            .put("runs", new Json.Arr(c.attempts().stream().map(Attempt::toJson).toList()))
                            .put("certificate", c.certificate().<Json>map(f -> new Json.Str(f.file())).orElse(Json.NULL))
                            .put("sha256", c.certificate().<Json>map(f -> new Json.Str(f.facts().sha256()))
                                    .orElse(Json.NULL))
                            .put("status", c.status())
                            .build());
                }
                List<Json> rejected = m.rejected().stream().<Json>map(r -> Json.Obj.builder()
                        .put("run", r.attempt().toJson()).put("reason", r.reason()).build()).toList();
                ms.add(Json.Obj.builder().put("n", m.n())
                        .put("member", Json.Obj.builder().put("elements", m.elements()).put("rank", m.rank()).build())
                        .put("classes", new Json.Arr(classes)).put("rejected", new Json.Arr(rejected)).build());
            }
            return Json.Obj.builder()
                    .put("family", family.name())
                    .put("definition", family.source())
                    .put("seed", settings.seed())
                    .put("runs", settings.runs())
                    .put("keep", Json.Arr.ofStrings(settings.keep().stream().map(VertexRule::text).toList()))
                    .put("avoid", Json.Arr.ofStrings(settings.avoid().stream().map(VertexRule::text).toList()))
                    .put("rank", settings.rank().<Json>map(r -> new Json.Str(r.text())).orElse(Json.NULL))
                    .put("members", new Json.Arr(ms))
                    .build();
        }
    }

    private final FamilyDefinition family;
    private final Path dir;
    private final Settings settings;
    private final FamilyRun.Listener listener;

    /** An exploration of {@code family} writing into {@code dir}; nothing is computed until {@link #run}. */
    public FamilyExploration(FamilyDefinition family, Path dir, Settings settings, FamilyRun.Listener listener) {
        this.family = family;
        this.dir = dir;
        this.settings = settings;
        this.listener = listener;
    }

    /** The certificate's file name of class j (1-based) at n: {@code n=K.core-J.cert.json}. */
    public static String certificateName(int n, int j) {
        return "n=" + n + ".core-" + j + ".cert.json";
    }

    /**
     * Explores the members {@code from..to} and writes the report.
     *
     * @throws FamilyException when the range is empty or outside the family's, a member cannot be
     *     built, a kept or avoided vertex is not an element of a member, or the rank expression
     *     cannot be evaluated
     * @throws IOException when a file cannot be written
     * @throws IllegalStateException when the verifier rejects a certificate just written (a bug)
     */
    public Findings run(int from, int to) throws IOException {
        if (from > to) {
            throw new FamilyException(family.source() + ": the range " + from + ".." + to + " is empty.");
        }
        List<FamilyDefinition.Member> built = new ArrayList<>();
        List<CoreConstraints> constraints = new ArrayList<>();
        for (int n = from; n <= to; n++) {
            listener.stage(n, "building");
            FamilyDefinition.Member m = family.build(n);
            built.add(m);
            constraints.add(new CoreConstraints(settings.rank(n), labels(m, n, "--keep", settings.keep()),
                    labels(m, n, "--avoid", settings.avoid())));
        }
        Files.createDirectories(dir);
        List<MemberFindings> members = new ArrayList<>();
        for (int k = 0; k < built.size(); k++) {
            MemberFindings m = explore(built.get(k), constraints.get(k));
            members.add(m);
            listener.explored(m);
        }
        Findings report = new Findings(family, settings, members);
        AtomicFiles.writeString(dir.resolve(EXPLORE_MD), report.toMarkdown());
        AtomicFiles.writeJson(dir.resolve(EXPLORE_JSON), report.toJson());
        return report;
    }

    /** The labels of {@code rules} at n, each an element of the member; {@code option} names them in messages. */
    private List<String> labels(FamilyDefinition.Member m, int n, String option, List<VertexRule> rules) {
        List<String> labels = new ArrayList<>();
        for (VertexRule rule : rules) {
            String label;
            try {
                label = rule.label(n);
            } catch (IllegalArgumentException | ArithmeticException e) {
                throw new FamilyException(family.source() + ": " + option + " \"" + rule.text() + "\" at n = " + n
                        + ": " + e.getMessage(), e);
            }
            if (!m.matroid().labels().contains(label)) {
                throw new FamilyException(family.source() + ": " + option + " \"" + rule.text() + "\" at n = " + n
                        + " is the vertex " + label + ", which is not an element of the member (contracted?).");
            }
            labels.add(label);
        }
        return labels;
    }

    private MemberFindings explore(FamilyDefinition.Member m, CoreConstraints constraints) throws IOException {
        int n = m.construction().n();
        List<MinimalCore> representatives = new ArrayList<>();
        List<MatroidShape> shapes = new ArrayList<>();
        List<List<Attempt>> attempts = new ArrayList<>();
        List<Rejected> rejected = new ArrayList<>();
        for (int j = 0; j < settings.runs(); j++) {
            Attempt attempt = new Attempt(settings.seed(j), Settings.strategy(j));
            listener.stage(n, "run " + (j + 1) + " of " + settings.runs() + " (seed " + attempt + ")");
            SearchSettings search = new SearchSettings(attempt.seed(), attempt.strategy(), settings.budget(),
                    m.construction().focus());
            Rejected none = settings.steered() ? impossible(m.matroid(), constraints, attempt) : null;
            if (none != null) {
                rejected.add(none);
                break;
            }
            MinimalCore core;
            if (settings.steered()) {
                SteeredSearch.Result result = new SteeredSearch(search, constraints, settings.totalMillis(),
                        Progress.SILENT).search(m.matroid());
                if (result instanceof SteeredSearch.NoneExists e) {
                    // the enumeration does not depend on the seed: further runs would repeat it
                    rejected.add(new Rejected.NoneExists(attempt, e.enumerated()));
                    break;
                }
                if (result instanceof SteeredSearch.Unknown u) {
                    rejected.add(new Rejected.Unknown(attempt, u.reason()));
                    continue;
                }
                core = ((SteeredSearch.Found) result).core();
            } else {
                SearchResult result = new UnsatCoreSearch(search, Progress.SILENT).reduce(m.matroid());
                if (result instanceof SearchResult.Orientable) {
                    rejected.add(new Rejected.Orientable(attempt));
                    continue;
                }
                if (result instanceof SearchResult.Unknown u) {
                    rejected.add(new Rejected.Unknown(attempt, u.reason()));
                    continue;
                }
                core = ((SearchResult.Found) result).core();
            }
            int cls = classOf(core.core(), representatives, shapes);
            if (cls < 0) {
                representatives.add(core);
                shapes.add(MatroidShape.of(core.core()));
                attempts.add(new ArrayList<>());
                cls = representatives.size() - 1;
            }
            attempts.get(cls).add(attempt);
        }
        List<CoreClass> classes = new ArrayList<>();
        for (int c = 0; c < representatives.size(); c++) {
            String name = certificateName(n, c + 1);
            listener.stage(n, "certifying and verifying class " + (c + 1));
            MinimalCore representative = representatives.get(c);
            CertifiedReduction.Outcome outcome = CertifiedReduction.certify(CoreFinding.searched(representative,
                    new Source.Constructed(m.construction())), settings.budget(), dir.resolve(name), Optional.empty(),
                    settings.forms());
            classes.add(new CoreClass(representative.core(), attempts.get(c),
                    outcome instanceof CertifiedReduction.Unknown u ? new ClassCertificate.Unknown(u.reason())
                            : new ClassCertificate.Verified(name, CertificateFacts.read(dir.resolve(name)))));
        }
        return new MemberFindings(n, m.matroid().size(), m.matroid().rank(), classes, rejected);
    }

    /**
     * "None exists" without a search when the wanted rank is out of reach: a minor's rank is at
     * most the member's, and every matroid of rank at most 2 is orientable; else null.
     */
    private static Rejected impossible(Matroid member, CoreConstraints constraints, Attempt attempt) {
        if (constraints.rank().isEmpty()) {
            return null;
        }
        int r = constraints.rank().getAsInt();
        if (r > member.rank()) {
            return new Rejected.NoneExists(attempt, "the member has rank " + member.rank() + " < " + r
                    + ", and no minor has a larger rank than its matroid");
        }
        if (r < CoreConstraints.SMALLEST_CORE_RANK) {
            return new Rejected.NoneExists(attempt, "every matroid of rank " + r + " is orientable");
        }
        return null;
    }

    /** The index of the class of {@code core}, or −1 for a new class. */
    private static int classOf(ExplicitMatroid core, List<MinimalCore> representatives, List<MatroidShape> shapes) {
        MatroidShape shape = MatroidShape.of(core);
        for (int c = 0; c < representatives.size(); c++) {
            if (shapes.get(c).equals(shape)
                    && new HyperplaneIsomorphismInspector(representatives.get(c).core(), core).find().isPresent()) {
                return c;
            }
        }
        return -1;
    }

    private static long nonBases(ExplicitMatroid core) {
        return ElementSets.binomial(core.size(), core.rank()) - core.basisCount();
    }
}
