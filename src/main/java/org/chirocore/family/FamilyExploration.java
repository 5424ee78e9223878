package org.chirocore.family;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;

import org.chirocore.cert.CoreFinding;
import org.chirocore.cert.Source;
import org.chirocore.io.AtomicFiles;
import org.chirocore.io.Json;
import org.chirocore.matroid.Catalogue;
import org.chirocore.matroid.ElementSets;
import org.chirocore.matroid.ExplicitMatroid;
import org.chirocore.matroid.HyperplaneIsomorphismInspector;
import org.chirocore.matroid.MatroidShape;
import org.chirocore.orient.Budget;
import org.chirocore.pipeline.CertifiedReduction;
import org.chirocore.search.MinimalCore;
import org.chirocore.search.Progress;
import org.chirocore.search.SearchResult;
import org.chirocore.search.SearchSettings;
import org.chirocore.search.Strategy;
import org.chirocore.search.UnsatCoreSearch;

/**
 * Explores the minimal cores of each member of a family: K seeded reductions per n (seeds
 * seed, seed + 1, …, strategies alternating contract-first, delete-first), each an ordinary
 * reduction to a fully minor-minimal core. Constraints are a <em>filter</em>, not a change of the
 * search: a core is accepted only when it contains every kept vertex (so none was deleted or
 * contracted) and has the target rank; the others are counted as filtered. The accepted cores are
 * grouped up to isomorphism ({@link MatroidShape} first, then {@link HyperplaneIsomorphismInspector});
 * one representative per class, from the class's first run, is certified into
 * {@code n=K.core-J.cert.json} and verified. Writes {@link #EXPLORE_MD} and {@link #EXPLORE_JSON}.
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
     * @param keep vertex rules for the vertices an accepted core must contain
     * @param targetRank the rank an accepted core must have, if any
     */
    public record Settings(long seed, int runs, Budget budget, List<VertexRule> keep, OptionalInt targetRank) {
        public Settings {
            if (runs < 1) {
                throw new IllegalArgumentException("An exploration needs at least 1 run per n, not " + runs + ".");
            }
            if (budget == null || targetRank == null) {
                throw new IllegalArgumentException("Exploration settings need a budget and a target rank (or none).");
            }
            keep = List.copyOf(keep);
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

        /** Why, as the report states it: "filtered: …", "orientable" or "unknown: …". */
        String reason();

        /**
         * The run's core failed a constraint.
         *
         * @param why which constraint, in words
         */
        record Filtered(Attempt attempt, String why) implements Rejected {
            @Override
            public String reason() {
                return "filtered: " + why;
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
     * @param rejected the runs that were filtered out or found no core
     */
    public record MemberFindings(int n, int elements, int rank, List<CoreClass> classes, List<Rejected> rejected) {
        public MemberFindings {
            classes = List.copyOf(classes);
            rejected = List.copyOf(rejected);
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
                b.append("; accepted cores keep ").append(String.join(", ",
                        settings.keep().stream().map(VertexRule::text).toList()));
            }
            settings.targetRank().ifPresent(r -> b.append("; accepted cores have rank ").append(r));
            b.append(".\n\nEvery core is fully minor-minimal; constraints only filter the runs' cores.\n");
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
                    .put("targetRank", settings.targetRank().isPresent()
                            ? Json.Num.of(settings.targetRank().getAsInt()) : Json.NULL)
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
     *     built, or a kept vertex is not an element of a member
     * @throws IOException when a file cannot be written
     * @throws IllegalStateException when the verifier rejects a certificate just written (a bug)
     */
    public Findings run(int from, int to) throws IOException {
        if (from > to) {
            throw new FamilyException(family.source() + ": the range " + from + ".." + to + " is empty.");
        }
        List<FamilyDefinition.Member> built = new ArrayList<>();
        List<List<String>> kept = new ArrayList<>();
        for (int n = from; n <= to; n++) {
            listener.stage(n, "building");
            FamilyDefinition.Member m = family.build(n);
            built.add(m);
            kept.add(keptLabels(m, n));
        }
        Files.createDirectories(dir);
        List<MemberFindings> members = new ArrayList<>();
        for (int k = 0; k < built.size(); k++) {
            members.add(explore(built.get(k), kept.get(k)));
        }
        Findings report = new Findings(family, settings, members);
        AtomicFiles.writeString(dir.resolve(EXPLORE_MD), report.toMarkdown());
        AtomicFiles.writeJson(dir.resolve(EXPLORE_JSON), report.toJson());
        return report;
    }

    private List<String> keptLabels(FamilyDefinition.Member m, int n) {
        List<String> labels = new ArrayList<>();
        for (VertexRule rule : settings.keep()) {
            String label;
            try {
                label = rule.label(n);
            } catch (IllegalArgumentException | ArithmeticException e) {
                throw new FamilyException(family.source() + ": --keep \"" + rule.text() + "\" at n = " + n + ": "
                        + e.getMessage(), e);
            }
            if (!m.matroid().labels().contains(label)) {
                throw new FamilyException(family.source() + ": --keep \"" + rule.text() + "\" at n = " + n
                        + " is the vertex " + label + ", which is not an element of the member (contracted?).");
            }
            labels.add(label);
        }
        return labels;
    }

    private MemberFindings explore(FamilyDefinition.Member m, List<String> kept) throws IOException {
        int n = m.construction().n();
        List<MinimalCore> representatives = new ArrayList<>();
        List<MatroidShape> shapes = new ArrayList<>();
        List<List<Attempt>> attempts = new ArrayList<>();
        List<Rejected> rejected = new ArrayList<>();
        for (int j = 0; j < settings.runs(); j++) {
            Attempt attempt = new Attempt(settings.seed(j), Settings.strategy(j));
            listener.stage(n, "run " + (j + 1) + " of " + settings.runs() + " (seed " + attempt + ")");
            SearchResult result = new UnsatCoreSearch(new SearchSettings(attempt.seed(), attempt.strategy(),
                    settings.budget(), m.construction().focus()), Progress.SILENT).reduce(m.matroid());
            if (result instanceof SearchResult.Orientable) {
                rejected.add(new Rejected.Orientable(attempt));
                continue;
            }
            if (result instanceof SearchResult.Unknown u) {
                rejected.add(new Rejected.Unknown(attempt, u.reason()));
                continue;
            }
            MinimalCore core = ((SearchResult.Found) result).core();
            String filter = filter(core.core(), kept);
            if (filter != null) {
                rejected.add(new Rejected.Filtered(attempt, filter));
                continue;
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
                    new Source.Constructed(m.construction())), settings.budget(), dir.resolve(name));
            classes.add(new CoreClass(representative.core(), attempts.get(c),
                    outcome instanceof CertifiedReduction.Unknown u ? new ClassCertificate.Unknown(u.reason())
                            : new ClassCertificate.Verified(name, CertificateFacts.read(dir.resolve(name)))));
        }
        return new MemberFindings(n, m.matroid().size(), m.matroid().rank(), classes, rejected);
    }

    /** Why {@code core} is not accepted, or null when it is. */
    private String filter(ExplicitMatroid core, List<String> kept) {
        List<String> missing = kept.stream().filter(l -> !core.labels().contains(l)).toList();
        if (!missing.isEmpty()) {
            return "the core lacks the kept vertices " + String.join(" ", missing);
        }
        if (settings.targetRank().isPresent() && core.rank() != settings.targetRank().getAsInt()) {
            return "the core has rank " + core.rank() + ", not " + settings.targetRank().getAsInt();
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
