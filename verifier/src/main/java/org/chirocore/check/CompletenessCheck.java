package org.chirocore.check;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
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
 * listed S, provided each listed S is non-orientable. That, and that S is a core of a listed
 * class, is checked for the images of the certified class cores under the symmetries; for the
 * other listed S it is the producer's word and reported as not run.
 *
 * <p>Nothing here is shared with the producer: M is rebuilt with {@link ProvenanceCheck}'s own
 * arithmetic, witnesses go through {@link ChirotopeCheck}, certificates through
 * {@link CertificateVerifier}. Cost: C(n, r) rank evaluations, |group| · |bases| lookups,
 * |group| · C(n, r − R) set maps, the witnesses' relations, and one minimal-transversal
 * computation per contraction set (Berge's incremental method, bounded by
 * {@link VerifierLimits#MAX_TRANSVERSALS}).
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
    static final String ACCOUNTED = "minimal sets accounted for";
    static final List<String> CHECKS = List.of(FORMAT, INPUT, SYMMETRY, COVERAGE, WITNESSES, DUALITY, CERTIFICATES,
            ACCOUNTED);

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

    /** One listed contraction set: C, the orientable restrictions T with their signs (null: no witness), the minimal sets S. */
    private record Entry(long contracted, List<Long> orientable, List<String> signs, List<Long> minimal) {
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
        /** The certified class cores: contraction set and restriction, as masks over M. */
        private final List<long[]> certified = new ArrayList<>();
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
                default -> this::accounted;
            };
        }

        String format() throws IOException, Failure {
            doc = JsonTree.parse(CertificateVerifier.readRegularFile(file, VerifierLimits.MAX_CERTIFICATE_BYTES)).asObject("the file");
            doc.requireOnly(List.of("format", "version", "input", "labels", "ranks", "symmetry", "certificates",
                    "contractionSets"));
            if (!doc.requireString("format").equals(FORMAT_NAME) || doc.requireInt("version") != 1) {
                throw new Failure("format must be \"" + FORMAT_NAME + "\" version 1");
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
                JsonTree.Arr ss = c.requireArray("minimalNonOrientable");
                for (int j = 0; j < ss.size(); j++) {
                    long s = mask(ss.get(j).asArray(at + ".minimalNonOrientable[" + j + "]"),
                            at + ".minimalNonOrientable[" + j + "]", contracted);
                    if (minimal.contains(s)) {
                        throw new Failure(at + ".minimalNonOrientable[" + j + "] is listed twice");
                    }
                    minimal.add(s);
                }
                entries.add(new Entry(contracted, orientable, signs, minimal));
            }
            return FORMAT_NAME + " version 1: " + labels.size() + " elements of rank " + rank + ", ranks " + ranks + ", "
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
                    int[] elements = elements(t);
                    List<Long> local = new ArrayList<>();
                    if (ProvenanceCheck.binomial(elements.length, r) > VerifierLimits.MAX_CANDIDATES) {
                        throw new Failure("a restriction on " + elements.length + " elements exceeds the verifier's limit");
                    }
                    if (elements.length >= r) {
                        int[] pick = ProvenanceCheck.firstCombination(r);
                        do {
                            long s = e.contracted();
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
                    String where = "after contracting " + names(e.contracted()) + ", the restriction to " + names(t);
                    String signs = e.signs().get(i);
                    if (signs == null) {
                        if (!local.isEmpty()) {
                            throw new Failure(where + " spans but has no witness");
                        }
                    } else {
                        List<int[]> b = local.stream().map(CompletenessCheck::elements).toList();
                        Optional<String> v = ChirotopeCheck.violation(elements.length, r, b, signs);
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
            }
            if (uncertifiedClasses > 0) {
                throw new Skipped(uncertifiedClasses + " of " + names.size() + " classes have no certificate");
            }
            return "the " + names.size() + " class certificates verify, are certificates of this input, and their cores "
                    + "are listed minimal sets";
        }

        String accounted() throws Skipped {
            int total = 0;
            int shown = 0;
            for (Entry e : entries) {
                for (long s : e.minimal()) {
                    total++;
                    if (isImageOfCertified(e.contracted(), s)) {
                        shown++;
                    }
                }
            }
            if (shown < total) {
                throw new Skipped(shown + " of the " + total + " listed minimal sets are images of certified class cores "
                        + "under a listed automorphism; for the other " + (total - shown) + ", that they are non-orientable "
                        + "and either in a listed class or with a non-orientable single-element contraction is not checked");
            }
            return "every listed minimal set is the image of a certified class core under a listed automorphism";
        }

        private boolean isImageOfCertified(long c, long s) {
            for (long[] cs : certified) {
                for (int[] p : group) {
                    if (apply(p, cs[0]) == c && apply(p, cs[1]) == s) {
                        return true;
                    }
                }
            }
            return false;
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
