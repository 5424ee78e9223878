package org.chirocore.family;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Optional;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;

import org.chirocore.cert.CoreFinding;
import org.chirocore.cert.Discovery;
import org.chirocore.cert.Provenance;
import org.chirocore.cert.Source;
import org.chirocore.cert.CertificateForms;
import org.chirocore.io.Json;
import org.chirocore.matroid.ExplicitMatroid;
import org.chirocore.matroid.Matroid;
import org.chirocore.matroid.Minor;
import org.chirocore.orient.Budget;
import org.chirocore.orient.LazySatDecider;
import org.chirocore.orient.Orientability;
import org.chirocore.pipeline.CertifiedReduction;
import org.chirocore.search.MinimalityDecider;

/**
 * Checks a predicted core of each member of a family without searching: the prediction names,
 * per n, the core's vertices S(n) and a contraction set C(n) (file format in docs/families.md);
 * the candidate is M/C restricted to S, where M is the member. It is decided non-orientable, then
 * checked minor-minimal directly by {@link MinimalityDecider} (every single-element deletion and
 * contraction orientable, with witnesses), and only then certified into
 * {@code n=K.predicted.cert.json} and verified. Cost per n: building M/C on S (|S| rank
 * queries of M per r-subset), one orientability decision, up to 2|S| more, and the certification.
 */
public final class FamilyPrediction {
    private static final List<String> FIELDS = List.of("family", "members", "rule");
    private static final List<String> MEMBER_FIELDS = List.of("n", "core", "contract");
    private static final List<String> RULE_FIELDS = List.of("range", "core", "contract");

    /**
     * The predicted candidate at one n, or at every n of a rule's range.
     *
     * @param core set rules for S(n), the candidate's elements
     * @param contract set rules for C(n), the elements contracted
     */
    public record Candidate(List<SetRule> core, List<SetRule> contract) {
        public Candidate {
            core = List.copyOf(core);
            contract = List.copyOf(contract);
        }
    }

    /**
     * A prediction file.
     *
     * @param source the file name, the prefix of every message
     * @param family the name of the family it predicts
     * @param candidates the candidate for each n it covers: listed per n in {@code members}, or
     *     one {@code rule} for every n of its range
     */
    public record Prediction(String source, String family, Map<Integer, Candidate> candidates) {
        public Prediction {
            candidates = Map.copyOf(candidates);
        }

        /**
         * Reads the prediction in {@code file}.
         *
         * @throws FamilyException naming the file and the offending member
         */
        public static Prediction read(Path file) {
            return FamilyDefinition.readJson(file, Prediction::parse);
        }

        private static Prediction parse(String source, Json json) {
            Json.Obj o = json.asObject("the prediction");
            o.requireOnly(FIELDS);
            if (o.has("members") == o.has("rule")) {
                throw new FamilyException(source + ": give either \"members\" (a core per n) or \"rule\" "
                        + "(one core rule for a range of n), not " + (o.has("rule") ? "both." : "neither."));
            }
            Map<Integer, Candidate> candidates = new TreeMap<>();
            if (o.has("rule")) {
                Json.Obj r = o.require("rule").asObject("rule");
                r.requireOnly(RULE_FIELDS);
                Json.Arr range = r.requireArray("range");
                int from = range.size() == 2 ? range.get(0).asInt("rule.range[0]") : 0;
                int to = range.size() == 2 ? range.get(1).asInt("rule.range[1]") : 0;
                if (range.size() != 2 || from < 1 || from > to || to > MAX_N) {
                    throw new FamilyException(source + ": rule.range must be [a, b] with 1 <= a <= b <= "
                            + MAX_N + ".");
                }
                Candidate c = new Candidate(rules(r.requireArray("core"), "rule.core"),
                        rules(r.requireArray("contract"), "rule.contract"));
                for (int n = from; n <= to; n++) {
                    candidates.put(n, c);
                }
                return new Prediction(source, o.requireString("family"), candidates);
            }
            Json.Arr members = o.requireArray("members");
            for (int k = 0; k < members.size(); k++) {
                Json.Obj m = members.get(k).asObject("members[" + k + "]");
                m.requireOnly(MEMBER_FIELDS);
                int n = m.requireInt("n");
                Candidate c = new Candidate(rules(m.requireArray("core"), "members[" + k + "].core"),
                        rules(m.requireArray("contract"), "members[" + k + "].contract"));
                if (candidates.put(n, c) != null) {
                    throw new FamilyException(source + ": members[" + k + "]: n = " + n + " is predicted twice.");
                }
            }
            return new Prediction(source, o.requireString("family"), candidates);
        }

        private static List<SetRule> rules(Json.Arr items, String where) {
            List<SetRule> rules = new ArrayList<>();
            for (int k = 0; k < items.size(); k++) {
                String text = items.get(k).asString(where + "[" + k + "]");
                try {
                    rules.add(SetRule.parse(text));
                } catch (IllegalArgumentException e) {
                    throw new IllegalArgumentException(where + "[" + k + "]: " + e.getMessage(), e);
                }
            }
            return rules;
        }
    }

    /** What the check found at one n. */
    public sealed interface Outcome {
        /** The cube dimension. */
        int n();
    }

    /**
     * The candidate is a minimal non-orientable core; its certificate was written and verified.
     *
     * @param certificate the file name in the output directory
     * @param facts what it states, read back
     */
    public record Confirmed(int n, String certificate, CertificateFacts facts) implements Outcome {
    }

    /**
     * The candidate is not a minimal non-orientable core.
     *
     * @param reason "orientable", or which single-element minor is non-orientable
     */
    public record Refuted(int n, String reason) implements Outcome {
    }

    /** A budget ran out; nothing is claimed. */
    public record Unknown(int n, String reason) implements Outcome {
    }

    /** The largest n a rule's range may reach: vertices are enumerated as int bit patterns. */
    private static final int MAX_N = 30;

    private final FamilyDefinition family;
    private final Prediction prediction;
    private final Path dir;
    private final Budget budget;
    private final CertificateForms forms;

    /** A check of {@code prediction} for {@code family}, writing certificates with sign witnesses into {@code dir}. */
    public FamilyPrediction(FamilyDefinition family, Prediction prediction, Path dir, Budget budget) {
        this(family, prediction, dir, budget, CertificateForms.DEFAULT);
    }

    /** As {@link #FamilyPrediction(FamilyDefinition, Prediction, Path, Budget)}, the minimality witnesses and the refutation in {@code forms}. */
    public FamilyPrediction(FamilyDefinition family, Prediction prediction, Path dir, Budget budget, CertificateForms forms) {
        this.family = family;
        this.prediction = prediction;
        this.dir = dir;
        this.budget = budget;
        this.forms = forms;
    }

    /** The certificate's file name of a confirmed prediction at n: {@code n=K.predicted.cert.json}. */
    public static String certificateName(int n) {
        return "n=" + n + ".predicted.cert.json";
    }

    /**
     * Checks the prediction at every n of {@code from..to}.
     *
     * @throws FamilyException when the prediction is for another family, misses an n, names a
     *     vertex that is not an element of the member, or names one twice
     * @throws IOException when a certificate cannot be written
     */
    public List<Outcome> run(int from, int to) throws IOException {
        if (!prediction.family().equals(family.name())) {
            throw new FamilyException(prediction.source() + ": predicts the family \"" + prediction.family()
                    + "\", not \"" + family.name() + "\".");
        }
        List<FamilyDefinition.Member> members = new ArrayList<>();
        for (int n = from; n <= to; n++) {
            if (!prediction.candidates().containsKey(n)) {
                throw new FamilyException(prediction.source() + ": predicts no core at n = " + n + ".");
            }
            members.add(family.build(n));
        }
        Files.createDirectories(dir);
        List<Outcome> outcomes = new ArrayList<>();
        for (FamilyDefinition.Member m : members) {
            outcomes.add(check(m, prediction.candidates().get(m.construction().n())));
        }
        return outcomes;
    }

    private Outcome check(FamilyDefinition.Member member, Candidate candidate) throws IOException {
        int n = member.construction().n();
        Matroid m = member.matroid();
        List<String> core = labels(candidate.core(), n, m, "core", Set.of());
        List<String> contract = labels(candidate.contract(), n, m, "contract", Set.copyOf(core));
        Set<String> used = new HashSet<>(core);
        used.addAll(contract);
        List<String> deleted = m.labels().stream().filter(l -> !used.contains(l)).toList();
        ExplicitMatroid minor = ExplicitMatroid.of(new Minor(m, indices(m, contract), indices(m, deleted)));
        long start = System.nanoTime();
        // The verdict only: the certificate's refutation is found again by the pipeline.
        Orientability answer = LazySatDecider.sparse(budget).decide(minor);
        if (answer instanceof Orientability.Unknown u) {
            return new Unknown(n, u.reason());
        }
        if (answer instanceof Orientability.Orientable) {
            return new Refuted(n, "the predicted minor is orientable");
        }
        MinimalityDecider.Result proof = MinimalityDecider.decide(minor, budget);
        if (proof instanceof MinimalityDecider.Unknown u) {
            return new Unknown(n, u.reason());
        }
        if (proof instanceof MinimalityDecider.NonOrientableDeletion d) {
            return new Refuted(n, "not minimal: deleting " + minor.labels().get(d.element()) + " leaves a "
                    + "non-orientable minor");
        }
        if (proof instanceof MinimalityDecider.NonOrientableContraction c) {
            return new Refuted(n, "not minimal: contracting " + minor.labels().get(c.element()) + " leaves a "
                    + "non-orientable minor");
        }
        CoreFinding found = new CoreFinding(minor, new Provenance(new Source.Constructed(member.construction()),
                contract, deleted), ((MinimalityDecider.Minimal) proof).witnesses(),
                new Discovery.Predicted(1 + 2 * minor.size(), (System.nanoTime() - start) / 1_000_000));
        String name = certificateName(n);
        CertifiedReduction.Outcome written = CertifiedReduction.certify(found, budget, dir.resolve(name), Optional.empty(), forms);
        if (written instanceof CertifiedReduction.Unknown u) {
            return new Unknown(n, u.reason());
        }
        return new Confirmed(n, name, CertificateFacts.read(dir.resolve(name)));
    }

    /** The labels of {@code rules} at n, each an element of {@code m}, none twice, none in {@code kept}. */
    private List<String> labels(List<SetRule> rules, int n, Matroid m, String what, Set<String> kept) {
        List<String> labels = new ArrayList<>();
        for (SetRule rule : rules) {
            String where = prediction.source() + ": " + what + " \"" + rule.text() + "\" at n = " + n + ": ";
            List<String> given;
            try {
                given = rule.labels(n);
            } catch (IllegalArgumentException | ArithmeticException e) {
                throw new FamilyException(where + e.getMessage(), e);
            }
            for (String label : given) {
                if (!m.labels().contains(label) || labels.contains(label)) {
                    throw new FamilyException(where + "the vertex " + label + (labels.contains(label)
                            ? " is named twice." : " is not an element of the member."));
                }
                if (kept.contains(label)) {
                    throw new FamilyException(where + "the vertex " + label + " is both in the core and contracted.");
                }
                labels.add(label);
            }
        }
        return labels;
    }

    private static int[] indices(Matroid m, List<String> labels) {
        return labels.stream().mapToInt(l -> m.labels().indexOf(l)).sorted().toArray();
    }
}
