package org.chirocore.check;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.BitSet;
import java.util.HashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;

import org.chirocore.check.CertificateVerifier.Failure;
import org.chirocore.check.CertificateVerifier.Skipped;
import org.chirocore.check.VerificationReport.Check;
import org.chirocore.check.VerificationReport.Status;

/**
 * The check of an enumeration's completeness evidence ({@code completeness.json}, written by
 * {@code enumerate}; docs/enumeration.md). For a matroid M of rank r and each contraction set C
 * listed, the evidence lists restrictions T of M/C with orientation witnesses and the minimal
 * non-orientable restrictions S. Orientability of (M/C)|T, read as "the bases of M/C inside T
 * carry signs satisfying every 3-term Grassmann–Plücker relation among them", is closed under
 * subsets; so once every T is shown orientable, a non-orientable set lies in no T, meets every
 * complement E(M/C) − T, and contains a minimal such transversal. The check shows that the listed
 * S are exactly those minimal transversals, hence every non-orientable restriction of M/C
 * contains a listed S. With the symmetries checked to be automorphisms of M and every
 * independent set of size r − R mapped by one of them onto a listed C, every minor-minimal
 * non-orientable minor of rank R of M is, up to an automorphism, (M/C)|S for a listed C and a
 * listed S, provided each listed S is non-orientable. Each listed S is shown to be either a dead
 * end (a refutation of a single-element contraction (M/C)|S / e: non-orientable and not
 * minor-minimal) or isomorphic to a certified class core (by the certificate itself, or a listed
 * element map carrying bases onto bases), directly or as the image of such a set under a listed
 * automorphism; a set shown neither way is reported as not checked. So every core of a listed
 * rank is isomorphic to a listed class's certified core; the class counts are not checked.
 *
 * <p>Nothing here is shared with the producer: M is rebuilt with {@link ProvenanceCheck}'s own
 * arithmetic, witnesses go through {@link ChirotopeCheck}, certificates through
 * {@link CertificateVerifier}, refutations through {@link RefutationCheck} and
 * {@link DratChecker} or {@link LratChecker}. Cost: C(n, r) rank evaluations, |group| · |bases|
 * lookups, |group| · C(n, r − R) set maps, the witnesses' relations, one minimal-transversal
 * computation per contraction set (Berge's incremental method, bounded by
 * {@link VerifierLimits#MAX_TRANSVERSALS}), the proofs' checks, C(|S|, R) lookups per class
 * member, and |group| · (proved sets) set maps per listed minimal set.
 */
public final class CompletenessCheck {
    /** The evidence's format name. */
    public static final String FORMAT_NAME = "chirocore-completeness";

    static final String FORMAT = "format";
    static final String INPUT = "input";
    static final String SYMMETRY = "symmetry";
    static final String COVERAGE = "contraction sets";
    static final String WITNESSES = "witnesses";
    static final String DUALITY = "transversal duality";
    static final String CERTIFICATES = "certificates";
    static final String DEAD_ENDS = "dead-end refutations";
    static final String MEMBERS = "class members";
    static final String ACCOUNTED = "minimal sets accounted for";
    static final List<String> CHECKS = List.of(FORMAT, INPUT, SYMMETRY, COVERAGE, WITNESSES, DUALITY, CERTIFICATES,
            DEAD_ENDS, MEMBERS, ACCOUNTED);

    private CompletenessCheck() {
    }

    /** Whether {@code file} is named as completeness evidence (so that {@code verify} sends it here). */
    public static boolean isEvidence(Path file) {
        Path name = file.getFileName();
        return name != null && name.toString().endsWith("completeness.json");
    }

    /**
     * Checks the evidence in {@code file}; {@code input} is the matroid file when the enumeration's
     * input was one. The class certificates are read from the evidence's directory.
     */
    public static VerificationReport verify(Path file, Optional<Path> input) {
        long start = System.nanoTime();
        Evidence e = new Evidence(file, input);
        List<Check> checks = new ArrayList<>();
        Optional<String> blocked = Optional.empty();
        for (String name : CHECKS) {
            if (blocked.isPresent()) {
                checks.add(new Check(name, Status.NOT_RUN, "not checked because " + blocked.get()));
                continue;
            }
            Check c = CertificateVerifier.run(name, e.step(name));
            checks.add(c);
            // a failure stops the rest; so does an unchecked M, group or list of contraction sets, which the rest read
            if (c.status() == Status.FAIL || (c.status() == Status.NOT_RUN && CHECKS.indexOf(name) < CHECKS.indexOf(WITNESSES))) {
                blocked = Optional.of(name + (c.status() == Status.FAIL ? " failed" : " was not checked"));
            }
        }
        return new VerificationReport(file.toString(), checks, (System.nanoTime() - start) / 1_000_000);
    }

    /**
     * One listed contraction set: C, the orientable restrictions T with their signs (null: no
     * witness), the minimal sets S and the object listing each (with its "deadEnd" or
     * "classMember" proof, if any).
     */
    private record Entry(long contracted, List<Long> orientable, List<String> signs, List<Long> minimal,
            List<JsonTree.Obj> proofs) {
    }

    /** The evidence read step by step; each step leaves what the later ones need. */
    private static final class Evidence {
        private final Path file;
        private final Optional<Path> input;
        private JsonTree.Obj doc;
        private List<String> labels;
        private int rank;
        private List<Integer> ranks;
        private final List<Entry> entries = new ArrayList<>();
        private Set<Long> bases;
        private final List<int[]> group = new ArrayList<>();
        /** The certified class cores by class number − 1 (null: no certificate): contraction set and restriction, as masks over M. */
        private final List<long[]> certified = new ArrayList<>();
        /** Contraction set and restriction of every listed minimal set proved so far: certified cores, dead ends, class members. */
        private final List<long[]> proved = new ArrayList<>();
        private int uncertifiedClasses;

        Evidence(Path file, Optional<Path> input) {
            this.file = file;
            this.input = input;
        }

        CertificateVerifier.Step step(String name) {
            return switch (name) {
                case FORMAT -> this::format;
                case INPUT -> this::input;
                case SYMMETRY -> this::symmetry;
                case COVERAGE -> this::coverage;
                case WITNESSES -> this::witnesses;
                case DUALITY -> this::duality;
                case CERTIFICATES -> this::certificates;
                case DEAD_ENDS -> this::deadEnds;
                case MEMBERS -> this::members;
                default -> this::accounted;
            };
        }

        String format() throws IOException, Failure {
            doc = JsonTree.parse(CertificateVerifier.readRegularFile(file, VerifierLimits.MAX_CERTIFICATE_BYTES)).asObject("the file");
            doc.requireOnly(List.of("format", "version", "input", "labels", "ranks", "symmetry", "certificates",
                    "contractionSets"));
            if (!doc.requireString("format").equals(FORMAT_NAME) || doc.requireInt("version") != 2) {
                throw new Failure("format must be \"" + FORMAT_NAME + "\" version 2");
            }
            JsonTree.Arr names = doc.requireArray("labels");
            if (names.size() > VerifierLimits.MAX_ENUMERATED_ELEMENTS) {
                throw new Failure("at most " + VerifierLimits.MAX_ENUMERATED_ELEMENTS + " elements, not " + names.size());
            }
            labels = new ArrayList<>();
            for (int i = 0; i < names.size(); i++) {
                String l = names.get(i).asString("labels[" + i + "]");
                if (labels.contains(l)) {
                    throw new Failure("labels[" + i + "] repeats \"" + l + "\"");
                }
                labels.add(l);
            }
            rank = doc.requireObject("input").requireInt("rank");
            if (rank < 0 || rank > labels.size()) {
                throw new Failure("input.rank " + rank + " is not between 0 and the " + labels.size() + " elements");
            }
            ranks = new ArrayList<>();
            JsonTree.Arr rs = doc.requireArray("ranks");
            for (int i = 0; i < rs.size(); i++) {
                int r = rs.get(i).asInt("ranks[" + i + "]");
                if (r < 3 || r > rank || ranks.contains(r)) {
                    throw new Failure("ranks[" + i + "] = " + r + " is repeated or not between 3 and the rank " + rank);
                }
                ranks.add(r);
            }
            JsonTree.Arr sets = doc.requireArray("contractionSets");
            for (int i = 0; i < sets.size(); i++) {
                String at = "contractionSets[" + i + "]";
                JsonTree.Obj c = sets.get(i).asObject(at);
                c.requireOnly(List.of("contracted", "maximalOrientable", "minimalNonOrientable"));
                long contracted = mask(c.requireArray("contracted"), at + ".contracted", 0);
                List<Long> orientable = new ArrayList<>();
                List<String> signs = new ArrayList<>();
                JsonTree.Arr ts = c.requireArray("maximalOrientable");
                for (int j = 0; j < ts.size(); j++) {
                    JsonTree.Obj t = ts.get(j).asObject(at + ".maximalOrientable[" + j + "]");
                    t.requireOnly(List.of("elements", "signs"));
                    orientable.add(mask(t.requireArray("elements"), at + ".maximalOrientable[" + j + "]", contracted));
                    signs.add(t.require("signs") instanceof JsonTree.Null ? null : t.requireString("signs"));
                }
                List<Long> minimal = new ArrayList<>();
                List<JsonTree.Obj> proofs = new ArrayList<>();
                JsonTree.Arr ss = c.requireArray("minimalNonOrientable");
                for (int j = 0; j < ss.size(); j++) {
                    String where = at + ".minimalNonOrientable[" + j + "]";
                    JsonTree.Obj m = ss.get(j).asObject(where);
                    m.requireOnly(List.of("elements", "deadEnd", "classMember"));
                    long s = mask(m.requireArray("elements"), where + ".elements", contracted);
                    if (minimal.contains(s)) {
                        throw new Failure(where + " is listed twice");
                    }
                    if (m.has("deadEnd") && m.has("classMember")) {
                        throw new Failure(where + " has both a dead-end proof and a class membership");
                    }
                    minimal.add(s);
                    proofs.add(m);
                }
                entries.add(new Entry(contracted, orientable, signs, minimal, proofs));
            }
            return FORMAT_NAME + " version 2: " + labels.size() + " elements of rank " + rank + ", ranks " + ranks + ", "
                    + entries.size() + " contraction sets";
        }

        /** The labels of {@code array} as a mask over M, distinct and avoiding {@code avoid}. */
        private long mask(JsonTree.Arr array, String what, long avoid) throws Failure {
            long m = 0;
            for (int i = 0; i < array.size(); i++) {
                int e = labels.indexOf(array.get(i).asString(what + "[" + i + "]"));
                if (e < 0 || (m & 1L << e) != 0 || (avoid & 1L << e) != 0) {
                    throw new Failure(what + "[" + i + "] is not a label, repeats one, or is contracted");
                }
                m |= 1L << e;
            }
            return m;
        }

        String input() throws IOException, Failure, ProvenanceCheck.Mismatch, Skipped {
            JsonTree.Obj record = doc.requireObject("input");
            if (!record.has("construction") && input.isEmpty()) {
                throw new Skipped("the input is a matroid file; give it with --input to check this evidence");
            }
            ProvenanceCheck.Source source = ProvenanceCheck.input(record, input);
            List<Integer> toSource = new ArrayList<>();
            for (int e = 0; e < source.labels().size(); e++) {
                if (!source.contractedFirst().get(e)) {
                    toSource.add(e);
                }
            }
            List<String> rebuilt = toSource.stream().map(source.labels()::get).toList();
            if (!rebuilt.equals(labels)) {
                throw new Failure("the labels are not those of the rebuilt input, in its order");
            }
            int n = labels.size();
            if (ProvenanceCheck.binomial(n, rank) > VerifierLimits.MAX_CANDIDATES) {
                throw new Failure("C(" + n + ", " + rank + ") subsets exceed the verifier's limit of " + VerifierLimits.MAX_CANDIDATES);
            }
            int base = source.rank().applyAsInt(source.contractedFirst());
            bases = new HashSet<>();
            int[] pick = ProvenanceCheck.firstCombination(rank);
            do {
                BitSet s = (BitSet) source.contractedFirst().clone();
                long m = 0;
                for (int e : pick) {
                    s.set(toSource.get(e));
                    m |= 1L << e;
                }
                if (source.rank().applyAsInt(s) == base + rank) {
                    bases.add(m);
                }
            } while (ProvenanceCheck.nextCombination(pick, n));
            return "rebuilt the input: " + n + " elements of rank " + rank + ", " + bases.size() + " bases";
        }

        String symmetry() throws Failure {
            JsonTree.Obj s = doc.requireObject("symmetry");
            s.requireOnly(List.of("kind", "permutations"));
            JsonTree.Arr ps = s.requireArray("permutations");
            int n = labels.size();
            if ((long) ps.size() * bases.size() > VerifierLimits.MAX_VECTOR_TESTS) {
                throw new Failure(ps.size() + " permutations of " + bases.size() + " bases exceed the verifier's limit");
            }
            for (int i = 0; i < ps.size(); i++) {
                JsonTree.Arr p = ps.get(i).asArray("symmetry.permutations[" + i + "]");
                int[] image = new int[n];
                long hit = 0;
                for (int e = 0; e < p.size() && e < n; e++) {
                    image[e] = p.get(e).asInt("symmetry.permutations[" + i + "][" + e + "]");
                    if (image[e] < 0 || image[e] >= n || (hit & 1L << image[e]) != 0) {
                        throw new Failure("symmetry.permutations[" + i + "] is not a permutation of the " + n + " elements");
                    }
                    hit |= 1L << image[e];
                }
                if (p.size() != n) {
                    throw new Failure("symmetry.permutations[" + i + "] has " + p.size() + " entries, not " + n);
                }
                for (long b : bases) {
                    if (!bases.contains(apply(image, b))) {
                        throw new Failure("symmetry.permutations[" + i + "] maps the basis " + names(b)
                                + " to a non-basis");
                    }
                }
                group.add(image);
            }
            if (group.isEmpty()) {
                throw new Failure("no permutation is listed; the trivial group lists the identity");
            }
            return group.size() + " permutations, each mapping the bases onto the bases (automorphisms)";
        }

        String coverage() throws Failure {
            int n = labels.size();
            Set<Long> listed = new HashSet<>();
            for (Entry e : entries) {
                int k = Long.bitCount(e.contracted());
                if (!ranks.contains(rank - k) || !independent(e.contracted()) || !listed.add(e.contracted())) {
                    throw new Failure("the contraction set " + names(e.contracted())
                            + " is dependent, listed twice, or of a size no listed rank asks for");
                }
            }
            long covered = 0;
            for (int r : ranks) {
                int k = rank - r;
                if (ProvenanceCheck.binomial(n, k) * group.size() > VerifierLimits.MAX_VECTOR_TESTS) {
                    throw new Failure("C(" + n + ", " + k + ") sets times " + group.size()
                            + " permutations exceed the verifier's limit");
                }
                int[] pick = ProvenanceCheck.firstCombination(k);
                do {
                    long x = 0;
                    for (int e : pick) {
                        x |= 1L << e;
                    }
                    if (!independent(x)) {
                        continue;
                    }
                    boolean found = false;
                    for (int j = 0; j < group.size() && !found; j++) {
                        found = listed.contains(apply(group.get(j), x));
                    }
                    if (!found) {
                        throw new Failure("the independent set " + names(x) + " is mapped onto no listed contraction set");
                    }
                    covered++;
                } while (ProvenanceCheck.nextCombination(pick, n));
            }
            return "every one of the " + covered + " independent sets of sizes " + ranks.stream().map(r -> rank - r).toList()
                    + " is mapped by a listed automorphism onto one of the " + entries.size() + " listed contraction sets";
        }

        String witnesses() throws Failure {
            int count = 0;
            int spanning = 0;
            for (Entry e : entries) {
                int r = rank - Long.bitCount(e.contracted());
                for (int i = 0; i < e.orientable().size(); i++) {
                    long t = e.orientable().get(i);
                    int size = Long.bitCount(t);
                    long[] local = localBases(e.contracted(), t);
                    String where = "after contracting " + names(e.contracted()) + ", the restriction to " + names(t);
                    String signs = e.signs().get(i);
                    if (signs == null) {
                        if (local.length > 0) {
                            throw new Failure(where + " spans but has no witness");
                        }
                    } else {
                        Optional<String> v = ChirotopeCheck.violation(size, r,
                                Arrays.stream(local).mapToObj(CompletenessCheck::elements).toList(), signs);
                        if (v.isPresent()) {
                            throw new Failure(where + ": the witness is not a chirotope: " + v.get());
                        }
                        spanning++;
                    }
                    count++;
                }
            }
            return count + " orientable restrictions: " + spanning + " witnesses are chirotopes (every 3-term relation "
                    + "holds), the other " + (count - spanning) + " sets do not span and hold no basis";
        }

        String duality() throws Failure {
            int total = 0;
            for (Entry e : entries) {
                long ground = all() & ~e.contracted();
                List<Long> transversals = List.of(0L);
                for (long t : e.orientable()) {
                    transversals = extend(transversals, ground & ~t);
                }
                Set<Long> expected = new HashSet<>(transversals);
                for (long s : e.minimal()) {
                    if (!expected.contains(s)) {
                        throw new Failure("after contracting " + names(e.contracted()) + ", the listed minimal set "
                                + names(s) + " is not a minimal transversal of the complements");
                    }
                }
                if (expected.size() != e.minimal().size()) {
                    long missing = transversals.stream().filter(x -> !e.minimal().contains(x)).findFirst().orElseThrow();
                    throw new Failure("after contracting " + names(e.contracted()) + ", the minimal transversal "
                            + names(missing) + " of the complements is not listed");
                }
                total += expected.size();
            }
            return "for each contraction set the " + total + " listed minimal sets are exactly the minimal transversals "
                    + "of the complements of its orientable restrictions";
        }

        /** The minimal transversals of the hypergraph so far ({@code current}) and one more edge (Berge). */
        private static List<Long> extend(List<Long> current, long edge) throws Failure {
            Set<Long> next = new HashSet<>();
            for (long x : current) {
                if ((x & edge) != 0) {
                    next.add(x);
                } else {
                    for (long s = edge; s != 0; s &= s - 1) {
                        next.add(x | Long.lowestOneBit(s));
                    }
                }
                if (next.size() > VerifierLimits.MAX_TRANSVERSALS) {
                    throw new Failure("more than " + VerifierLimits.MAX_TRANSVERSALS + " candidate transversals, the verifier's limit");
                }
            }
            List<Long> sorted = new ArrayList<>(next);
            sorted.sort((a, b) -> Integer.compare(Long.bitCount(a), Long.bitCount(b)));
            List<Long> minimal = new ArrayList<>();
            for (long x : sorted) {
                if (minimal.stream().noneMatch(y -> (y & ~x) == 0)) {
                    minimal.add(x);
                }
            }
            return minimal;
        }

        String certificates() throws Failure, Skipped {
            JsonTree.Arr names = doc.requireArray("certificates");
            Path dir = file.toAbsolutePath().getParent();
            JsonTree.Obj record = doc.requireObject("input");
            for (int i = 0; i < names.size(); i++) {
                if (names.get(i) instanceof JsonTree.Null) {
                    uncertifiedClasses++;
                    certified.add(null);
                    continue;
                }
                String name = names.get(i).asString("certificates[" + i + "]");
                if (!name.matches("[A-Za-z0-9._-]+") || name.startsWith(".")) {
                    throw new Failure("certificates[" + i + "] must name a file in the evidence's directory");
                }
                VerificationReport report = CertificateVerifier.verify(dir.resolve(name), input);
                if (!report.complete()) {
                    throw new Failure(name + " is " + report.word());
                }
                JsonTree.Obj content;
                try {
                    content = JsonTree.parse(CertificateVerifier.readRegularFile(dir.resolve(name),
                            VerifierLimits.MAX_CERTIFICATE_BYTES)).asObject(name).requireObject("content");
                } catch (IOException ex) {
                    throw new Failure(name + ": cannot read: " + ex.getMessage());
                }
                JsonTree.Obj provenance = content.requireObject("provenance");
                boolean same = record.has("construction")
                        ? provenance.has("construction") && JsonTree.canonical(provenance.require("construction"))
                                .equals(JsonTree.canonical(record.require("construction")))
                        : provenance.has("given") && provenance.requireObject("given").requireString("sha256")
                                .equals(record.requireString("sha256"));
                if (!same) {
                    throw new Failure(name + " is the certificate of another input");
                }
                long c = mask(provenance.requireObject("path").requireArray("contracted"), name + " path.contracted", 0);
                long s = mask(content.requireObject("core").requireArray("labels"), name + " core.labels", c);
                if (entries.stream().noneMatch(e -> e.contracted() == c && e.minimal().contains(s))) {
                    throw new Failure(name + ": its core is no listed minimal set of a listed contraction set");
                }
                certified.add(new long[] {c, s});
                proved.add(new long[] {c, s});
            }
            if (uncertifiedClasses > 0) {
                throw new Skipped(uncertifiedClasses + " of " + names.size() + " classes have no certificate");
            }
            return "the " + names.size() + " class certificates verify, are certificates of this input, and their cores "
                    + "are listed minimal sets";
        }

        /**
         * Each listed dead-end proof: for S listed with C and e ∈ S, the bases of (M/C)|S / e =
         * (M/(C ∪ e))|(S − e) are rebuilt (the (R − 1)-subsets X of S − e with X ∪ C ∪ e a basis of
         * M, in canonical order over S − e in M's order), and the proof (normalisation, relations,
         * DRAT or LRAT, in the certificate format's encoding) refutes their CNF. So that minor is
         * non-orientable, hence (M/C)|S is, and it is no core (a proper minor is non-orientable).
         */
        String deadEnds() throws Failure {
            int count = 0;
            for (Entry e : entries) {
                for (int j = 0; j < e.minimal().size(); j++) {
                    if (!e.proofs().get(j).has("deadEnd")) {
                        continue;
                    }
                    JsonTree.Obj proof = e.proofs().get(j).requireObject("deadEnd");
                    long s = e.minimal().get(j);
                    String where = "after contracting " + names(e.contracted()) + ", the dead end " + names(s);
                    proof.requireOnly(List.of("contracted", "nonOrientability"));
                    int x = labels.indexOf(proof.requireString("contracted"));
                    if (x < 0 || (s & 1L << x) == 0) {
                        throw new Failure(where + ": its contracted element is not one of its elements");
                    }
                    long c = e.contracted() | 1L << x;
                    long rest = s & ~(1L << x);
                    int r = rank - Long.bitCount(c);
                    BasisTable minor = new BasisTable(Long.bitCount(rest), r,
                            Arrays.stream(localBases(c, rest)).mapToObj(CompletenessCheck::elements).toList());
                    if (minor.count() == 0) {
                        throw new Failure(where + ": contracting " + names(1L << x) + " leaves no basis");
                    }
                    refute(minor, proof.requireObject("nonOrientability"), where + " contracted by " + names(1L << x));
                    proved.add(new long[] {e.contracted(), s});
                    count++;
                }
            }
            return count + " dead ends: each has a single-element contraction whose CNF the listed proof refutes";
        }

        /** The proof, in the certificate format's {@code nonOrientability} form with the proof inline, refutes the CNF over {@code minor}. */
        private static void refute(BasisTable minor, JsonTree.Obj non, String where) throws Failure {
            non.requireOnly(List.of("normalised", "relations", "drat", "lrat"));
            if (non.has("drat") == non.has("lrat")) {
                throw new Failure(where + ": exactly one of \"drat\" and \"lrat\" is needed");
            }
            List<int[]> fixed = RefutationCheck.normalised(minor,
                    ParsedCertificate.sets(non.requireArray("normalised"), "normalised", VerifierLimits.MAX_ELEMENTS + 1));
            RefutationCheck.independent(minor.size, fixed);
            Cnf cnf = RefutationCheck.cnf(minor, fixed, ParsedCertificate.relations(non.requireArray("relations")));
            Optional<String> failure = non.has("lrat") ? LratChecker.check(cnf, non.requireString("lrat"))
                    : Optional.of(DratChecker.check(cnf, non.requireString("drat"))).filter(o -> !o.valid())
                            .map(DratChecker.Outcome::failure);
            if (failure.isPresent()) {
                throw new Failure(where + ": the proof does not refute the CNF: " + failure.get());
            }
        }

        /**
         * Each listed class membership: the listed images map S bijectively onto the core S0 of the
         * class's certificate (contraction set C0), and the bases of (M/C)|S onto those of
         * (M/C0)|S0, so (M/C)|S is isomorphic to a certified minor-minimal non-orientable matroid.
         */
        String members() throws Failure {
            int count = 0;
            int uncertified = 0;
            for (Entry e : entries) {
                for (int j = 0; j < e.minimal().size(); j++) {
                    if (!e.proofs().get(j).has("classMember")) {
                        continue;
                    }
                    JsonTree.Obj member = e.proofs().get(j).requireObject("classMember");
                    long s = e.minimal().get(j);
                    String where = "after contracting " + names(e.contracted()) + ", the class member " + names(s);
                    member.requireOnly(List.of("class", "images"));
                    int k = member.requireInt("class");
                    if (k < 1 || k > certified.size()) {
                        throw new Failure(where + ": class " + k + " is not listed");
                    }
                    long[] core = certified.get(k - 1);
                    if (core == null) {
                        uncertified++;
                        continue;
                    }
                    int[] from = elements(s);
                    int[] to = elements(core[1]);
                    JsonTree.Arr images = member.requireArray("images");
                    if (images.size() != from.length) {
                        throw new Failure(where + ": " + images.size() + " images for " + from.length + " elements");
                    }
                    int[] position = new int[from.length];
                    long hit = 0;
                    for (int i = 0; i < from.length; i++) {
                        int y = labels.indexOf(images.get(i).asString("images[" + i + "]"));
                        position[i] = Arrays.binarySearch(to, y);
                        if (y < 0 || position[i] < 0 || (hit & 1L << position[i]) != 0) {
                            throw new Failure(where + ": images[" + i + "] is not an element of the class core, or repeats one");
                        }
                        hit |= 1L << position[i];
                    }
                    long[] mine = localBases(e.contracted(), s);
                    Set<Long> theirs = new HashSet<>();
                    for (long b : localBases(core[0], core[1])) {
                        theirs.add(b);
                    }
                    for (long b : mine) {
                        long image = 0;
                        for (long t = b; t != 0; t &= t - 1) {
                            image |= 1L << position[Long.numberOfTrailingZeros(t)];
                        }
                        if (!theirs.contains(image)) {
                            throw new Failure(where + ": the images do not map the bases onto those of class " + k);
                        }
                    }
                    if (mine.length != theirs.size() || mine.length == 0) {
                        throw new Failure(where + " has " + mine.length + " bases, class " + k + " has " + theirs.size());
                    }
                    proved.add(new long[] {e.contracted(), s});
                    count++;
                }
            }
            return count + " class members are isomorphic to certified class cores (bases mapped onto bases)"
                    + (uncertified == 0 ? "" : "; " + uncertified + " members of classes without a certificate are not checked");
        }

        String accounted() throws Skipped {
            // every image (p(C0), p(S0)) of a proved set under a listed automorphism p (the identity is listed)
            Set<List<Long>> images = new HashSet<>();
            for (long[] cs : proved) {
                for (int[] p : group) {
                    images.add(List.of(apply(p, cs[0]), apply(p, cs[1])));
                }
            }
            int total = 0;
            int shown = 0;
            for (Entry e : entries) {
                for (long s : e.minimal()) {
                    total++;
                    if (images.contains(List.of(e.contracted(), s))) {
                        shown++;
                    }
                }
            }
            if (shown < total) {
                throw new Skipped(shown + " of the " + total + " listed minimal sets are certified class cores, checked dead "
                        + "ends or class members, or images of one under a listed automorphism; for the other "
                        + (total - shown) + ", that they are non-orientable and either in a listed class or with a "
                        + "non-orientable single-element contraction is not checked");
            }
            return "every one of the " + total + " listed minimal sets is a certified class core, a checked dead end or "
                    + "class member, or the image of one under a listed automorphism";
        }

        /**
         * The bases of (M/c)|t as masks over t's elements in M's order (position i = the i-th
         * element of t), in canonical order: the (r − |c|)-subsets X of t with X ∪ c a basis of M.
         */
        private long[] localBases(long c, long t) throws Failure {
            int[] elements = elements(t);
            int r = rank - Long.bitCount(c);
            if (ProvenanceCheck.binomial(elements.length, r) > VerifierLimits.MAX_CANDIDATES) {
                throw new Failure("a restriction on " + elements.length + " elements exceeds the verifier's limit");
            }
            List<Long> local = new ArrayList<>();
            if (elements.length >= r && r >= 0) {
                int[] pick = ProvenanceCheck.firstCombination(r);
                do {
                    long s = c;
                    long l = 0;
                    for (int p : pick) {
                        s |= 1L << elements[p];
                        l |= 1L << p;
                    }
                    if (bases.contains(s)) {
                        local.add(l);
                    }
                } while (ProvenanceCheck.nextCombination(pick, elements.length));
            }
            return local.stream().mapToLong(Long::longValue).toArray();
        }

        private boolean independent(long set) {
            for (long b : bases) {
                if ((set & ~b) == 0) {
                    return true;
                }
            }
            return false;
        }

        private long all() {
            return labels.size() == 64 ? -1L : (1L << labels.size()) - 1;
        }

        private String names(long set) {
            List<String> out = new ArrayList<>();
            for (int e : elements(set)) {
                out.add(labels.get(e));
            }
            return Escaping.printable("{" + String.join(" ", out) + "}");
        }
    }

    private static long apply(int[] p, long set) {
        long out = 0;
        for (long s = set; s != 0; s &= s - 1) {
            out |= 1L << p[Long.numberOfTrailingZeros(s)];
        }
        return out;
    }

    private static int[] elements(long set) {
        int[] out = new int[Long.bitCount(set)];
        int i = 0;
        for (long s = set; s != 0; s &= s - 1) {
            out[i++] = Long.numberOfTrailingZeros(s);
        }
        return out;
    }
}
