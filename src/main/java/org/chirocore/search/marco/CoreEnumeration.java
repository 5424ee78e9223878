package org.chirocore.search.marco;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

import org.chirocore.matroid.ElementSet;
import org.chirocore.matroid.ElementSets;
import org.chirocore.matroid.ExplicitMatroid;
import org.chirocore.matroid.HyperplaneIsomorphismInspector;
import org.chirocore.matroid.Isomorphism;
import org.chirocore.matroid.MatroidShape;
import org.chirocore.matroid.Minor;
import org.chirocore.orient.Chirotope;
import org.chirocore.orient.Refutation;
import org.chirocore.orient.RefutationSearch;
import org.chirocore.search.CoreConstraints;
import org.chirocore.search.MinimalCore;
import org.chirocore.search.MinimalityDecider;
import org.chirocore.search.Progress;
import org.chirocore.search.SearchSettings;
import org.chirocore.search.SearchStats;

/**
 * Lists every minor-minimal non-orientable minor of a matroid M (of the wanted ranks), grouped
 * into isomorphism classes. A minor of rank R is (M/C)|S with C independent of size
 * rank(M) − R; so for each rank, each independent C up to the symmetry group (the smallest mask
 * of its orbit), it enumerates every minimal non-orientable restriction of M/C completely
 * ({@link RestrictionExplorer}, seeds grown to maximal orientable restrictions), and keeps those
 * whose single-element contractions are all orientable ({@link MinimalityDecider}, whose witnesses
 * then prove minimality). The images of each core under the group are the cores of the other
 * members of C's orbit; a minor is counted once as a matroid on its labelled ground set, however
 * many (C, S) give it. Ranks below 3 are not enumerated: every matroid of rank at most 2 is
 * orientable.
 *
 * <p>Cost: per contraction set, a complete enumeration of minimal non-orientable and maximal
 * orientable restrictions (exponential in the worst case; every solve within the budget), plus
 * up to 2|S| decisions per minimal non-orientable restriction, plus |group| images per core.
 */
public final class CoreEnumeration {
    /**
     * One isomorphism class of cores.
     *
     * @param example the first core found in the class, with its path and minimality witnesses
     * @param count how many minors of M (matroids on labelled ground sets) lie in the class
     * @param foundAtMillis time from the start until the example was found
     * @param solverCallsAtDiscovery solver calls made until then
     */
    public record CoreClass(MinimalCore example, int count, long foundAtMillis, int solverCallsAtDiscovery) {
    }

    /**
     * A maximal orientable restriction (M/C)|T: its elements, and when T spans M/C its checked
     * orientation witness (one sign per basis of (M/C)|T in canonical order); a T that does not
     * span holds no basis of M/C, so no relation, and has no witness.
     */
    public record MaximalOrientable(List<String> elements, Optional<Chirotope> witness) {
        public MaximalOrientable {
            elements = List.copyOf(elements);
        }
    }

    /**
     * The completeness evidence of one contraction set C (a representative of its orbit): every
     * maximal orientable and every minimal non-orientable restriction of M/C, as label lists.
     */
    public record ContractionEvidence(List<String> contracted, List<MaximalOrientable> maximal,
            List<MinimalSet> minimal) {
        public ContractionEvidence {
            contracted = List.copyOf(contracted);
            maximal = List.copyOf(maximal);
            minimal = List.copyOf(minimal);
        }
    }

    /**
     * A minimal non-orientable restriction (M/C)|S and, unless an automorphism of the group maps a
     * class's first core or an earlier proved set onto it (or its refutation ran out of budget),
     * the proof of what it is.
     */
    public record MinimalSet(List<String> elements, Optional<Proof> proof) {
        public MinimalSet {
            elements = List.copyOf(elements);
        }
    }

    /** Why a minimal non-orientable restriction is a core of a listed class or no core at all. */
    public sealed interface Proof {
    }

    /**
     * (M/C)|S / e is non-orientable, by {@code refutation}: so (M/C)|S is non-orientable and not
     * minor-minimal.
     *
     * @param contracted the label of e
     * @param minor (M/C)|S / e, on S − e in M's order, the matroid the refutation is over
     */
    public record DeadEnd(String contracted, ExplicitMatroid minor, Refutation refutation) implements Proof {
    }

    /**
     * (M/C)|S is isomorphic to the first core of class {@code classNumber} (1-based) under the
     * element map sending the i-th element of S to {@code images.get(i)}.
     */
    public record ClassMember(int classNumber, List<String> images) implements Proof {
        public ClassMember {
            images = List.copyOf(images);
        }
    }

    /**
     * The enumeration.
     *
     * @param incomplete why it is not complete (a budget ran out), empty when it is complete
     * @param ranks the ranks enumerated
     * @param representatives contraction sets enumerated (one per orbit)
     * @param contractionSets all independent contraction sets of those sizes (the orbits' sizes summed)
     * @param classes the classes, in order of discovery
     * @param maximal maximal orientable restrictions found (over the representatives)
     * @param restrictions minimal non-orientable restrictions found (over the representatives)
     * @param deadEnds those with a non-orientable single-element contraction
     * @param solverCalls orientability solves, map calls and minimality decisions
     * @param millis wall-clock time
     * @param evidence per representative contraction set, its maximal orientable and minimal
     *     non-orientable restrictions (complete only when the enumeration is; empty when the
     *     witnesses would exceed {@link #EVIDENCE_SIGNS} signs)
     */
    public record Result(Optional<String> incomplete, List<Integer> ranks, int representatives, int contractionSets,
            List<CoreClass> classes, int maximal, int restrictions, int deadEnds, int solverCalls, long millis,
            List<ContractionEvidence> evidence) {
        public Result {
            ranks = List.copyOf(ranks);
            classes = List.copyOf(classes);
            evidence = List.copyOf(evidence);
        }

        /** Whether every contraction set's enumeration finished. */
        public boolean complete() {
            return incomplete.isEmpty();
        }
    }

    /**
     * Most witness signs kept for the completeness evidence: 64 Mi, as many characters as the
     * largest evidence file the verifier reads. Beyond it the witnesses are dropped (memory) and
     * no evidence is given.
     */
    public static final long EVIDENCE_SIGNS = 64L << 20;

    private final SearchSettings settings;
    private final CoreConstraints constraints;
    private final Symmetry symmetry;
    private final Progress progress;

    /** An enumeration with these settings (seed, budget), ranks (only the rank of the constraints is read) and group. */
    public CoreEnumeration(SearchSettings settings, CoreConstraints constraints, Symmetry symmetry, Progress progress) {
        this.settings = settings;
        this.constraints = constraints;
        this.symmetry = symmetry;
        this.progress = progress;
    }

    /** Mutable state of one enumeration. */
    private static final class Run {
        final long started = System.currentTimeMillis();
        final List<CoreClass> classes = new ArrayList<>();
        final List<MatroidShape> shapes = new ArrayList<>();
        /** Every core met so far and its images under the group, with the index of its class. */
        final Map<Key, Integer> seen = new HashMap<>();
        /** Every dead end met so far and its images under the group. */
        final Set<Key> deadEndKeys = new HashSet<>();
        final List<ContractionEvidence> evidence = new ArrayList<>();
        /** Per minimal set listed, in order: C and S over M, the restriction, and the verdict of {@link #candidate}. */
        final List<Listed> listed = new ArrayList<>();
        String incomplete;
        int representatives;
        int contractionSets;
        int maximal;
        long witnessSigns;
        int restrictions;
        int deadEnds;
        int solverCalls;
    }

    /**
     * A listed minimal set: C and S as masks over M, (M/C)|S, and either the index of its class
     * (a core) or its non-orientable single-element contraction (a dead end), or neither: a
     * labelled copy of a dead end met before, decided again only if its proof is needed.
     */
    private record Listed(long contracted, long set, ExplicitMatroid restriction, int classIndex,
            Optional<MinimalityDecider.NonOrientableContraction> deadEnd) {
    }

    /** A minor of M as a matroid on a labelled ground set: its elements and its bases, as masks over M. */
    private record Key(long ground, List<Long> bases) {
    }

    /**
     * Enumerates the cores of {@code m}.
     *
     * @throws IllegalArgumentException when the rank constraint is out of range for m
     */
    public Result enumerate(ExplicitMatroid m) {
        constraints.validate(m);
        Run run = new Run();
        List<Integer> ranks = constraints.ranks(m.rank());
        for (int rank : ranks) {
            for (int[] c : symmetry.independentRepresentatives(m, m.rank() - rank)) {
                run.representatives++;
                run.contractionSets += symmetry.orbitSize(ElementSets.mask(c));
                explore(m, c, run);
            }
        }
        if (run.incomplete == null) {
            prove(m, run);
        }
        return new Result(Optional.ofNullable(run.incomplete), ranks, run.representatives, run.contractionSets,
                run.classes, run.maximal, run.restrictions, run.deadEnds, run.solverCalls, System.currentTimeMillis() - run.started,
                run.witnessSigns > EVIDENCE_SIGNS ? List.of() : run.evidence);
    }

    /** Enumerates the minimal non-orientable restrictions of M/C and records the cores among them. */
    private void explore(ExplicitMatroid m, int[] c, Run run) {
        ExplicitMatroid n0 = ExplicitMatroid.of(new Minor(m, c, new int[0]));
        List<String> contracted = Arrays.stream(c).mapToObj(m.labels()::get).toList();
        progress.report("contracting " + (c.length == 0 ? "nothing" : String.join(" ", contracted)), n0.size(),
                n0.rank(), run.solverCalls);
        RestrictionExplorer explorer = new RestrictionExplorer(n0, 0, settings.budget(), true, settings.seed(),
                stabiliser(m, c));
        List<MaximalOrientable> maximal = new ArrayList<>();
        List<List<String>> minimal = new ArrayList<>();
        try {
            while (true) {
                RestrictionExplorer.Step step = explorer.next();
                if (step instanceof RestrictionExplorer.Done) {
                    // the proofs are filled in by prove(), once every class is known
                    run.evidence.add(new ContractionEvidence(contracted, maximal,
                            minimal.stream().map(s -> new MinimalSet(s, Optional.empty())).toList()));
                    return;
                }
                if (step instanceof RestrictionExplorer.Orientable o) {
                    run.maximal++;
                    run.witnessSigns += o.witness().map(Chirotope::size).orElse(0);
                    maximal.add(new MaximalOrientable(labels(n0, o.set()),
                            run.witnessSigns > EVIDENCE_SIGNS ? Optional.empty() : o.witness()));
                }
                if (step instanceof RestrictionExplorer.OutOfBudget o) {
                    run.incomplete = "the enumeration after contracting " + contracted + " ran out of budget: "
                            + o.reason();
                    return;
                }
                if (step instanceof RestrictionExplorer.MinimalNonOrientable mus) {
                    run.restrictions++;
                    minimal.add(labels(n0, mus.set()));
                    candidate(m, n0, ElementSets.mask(c), mus.set(), contracted, run);
                }
            }
        } finally {
            run.solverCalls += explorer.solverCalls();
        }
    }

    /**
     * The permutations of the group fixing C setwise, as permutations of M/C's elements (M's
     * other elements, renumbered in order): automorphisms of M/C, so the explorer can settle each
     * explored restriction's orbit at once.
     */
    private List<int[]> stabiliser(ExplicitMatroid m, int[] c) {
        long mask = ElementSets.mask(c);
        int[] rest = java.util.stream.IntStream.range(0, m.size()).filter(e -> (mask >>> e & 1) == 0).toArray();
        List<int[]> out = new ArrayList<>();
        for (int[] p : symmetry.permutations()) {
            if (symmetry.apply(p, mask) == mask) {
                out.add(Arrays.stream(rest).map(e -> Arrays.binarySearch(rest, p[e])).toArray());
            }
        }
        return out;
    }

    private static List<String> labels(ExplicitMatroid n, long set) {
        return Arrays.stream(ElementSets.elements(set)).mapToObj(n.labels()::get).toList();
    }

    private void candidate(ExplicitMatroid m, ExplicitMatroid n0, long c, long set, List<String> contracted, Run run) {
        ExplicitMatroid core = ExplicitMatroid.of(Minor.restriction(n0, ElementSets.elements(set)));
        long s = ElementSets.mask(core.labels().stream().mapToInt(m.labels()::indexOf).toArray());
        Key key = key(m, core);
        // the same labelled minor as a core or dead end met before (often its image under the group) needs no decision
        if (run.seen.containsKey(key)) {
            run.listed.add(new Listed(c, s, core, run.seen.get(key), Optional.empty()));
            return;
        }
        if (run.deadEndKeys.contains(key)) {
            run.deadEnds++;
            run.listed.add(new Listed(c, s, core, -1, Optional.empty()));
            return;
        }
        MinimalityDecider.Result result = MinimalityDecider.decide(core, settings.budget());
        run.solverCalls += 2 * core.size();
        if (result instanceof MinimalityDecider.Unknown u) {
            run.incomplete = "deciding the single-element minors of a restriction ran out of budget: " + u.reason();
            return;
        }
        if (result instanceof MinimalityDecider.NonOrientableDeletion) {
            throw new IllegalStateException("A restriction found minimal non-orientable has a non-orientable deletion.");
        }
        if (result instanceof MinimalityDecider.NonOrientableContraction d) {
            run.deadEnds++;
            for (int[] p : symmetry.permutations()) {
                run.deadEndKeys.add(image(p, key));
            }
            run.listed.add(new Listed(c, s, core, -1, Optional.of(d)));
            return;
        }
        Set<Key> images = new HashSet<>();
        for (int[] p : symmetry.permutations()) {
            images.add(image(p, key));
        }
        MatroidShape shape = MatroidShape.of(core);
        for (int j = 0; j < run.classes.size(); j++) {
            CoreClass k = run.classes.get(j);
            if (run.shapes.get(j).equals(shape)
                    && new HyperplaneIsomorphismInspector(k.example().core(), core).find().isPresent()) {
                run.classes.set(j, new CoreClass(k.example(), k.count() + images.size(), k.foundAtMillis(),
                        k.solverCallsAtDiscovery()));
                record(run, images, j, c, s, core);
                return;
            }
        }
        List<String> deleted = m.labels().stream().filter(l -> !contracted.contains(l) && !core.labels().contains(l))
                .toList();
        long millis = System.currentTimeMillis() - run.started;
        MinimalCore example = new MinimalCore(core, contracted, deleted, ((MinimalityDecider.Minimal) result).witnesses(),
                settings, new SearchStats(run.solverCalls, n0.size(), millis));
        progress.report("found class " + (run.classes.size() + 1), core.size(), core.rank(), run.solverCalls);
        run.classes.add(new CoreClass(example, images.size(), millis, run.solverCalls));
        run.shapes.add(shape);
        record(run, images, run.classes.size() - 1, c, s, core);
    }

    private static void record(Run run, Set<Key> images, int classIndex, long c, long s, ExplicitMatroid core) {
        for (Key k : images) {
            run.seen.put(k, classIndex);
        }
        run.listed.add(new Listed(c, s, core, classIndex, Optional.empty()));
    }

    /**
     * Fills in the proofs of the listed minimal sets, in order: none for a set that an
     * automorphism of the group maps a class's first core or an earlier proved set onto (the
     * checker finds that automorphism itself); else a dead end's refutation of its non-orientable
     * contraction (none when that runs out of budget: the checker then reports the set as not
     * checked), or a core's isomorphism to its class's first core.
     */
    private void prove(ExplicitMatroid m, Run run) {
        // the images (p(C0), p(S0)) of the proved sets under the group
        Set<List<Long>> proved = new HashSet<>();
        for (CoreClass k : run.classes) {
            long c = ElementSets.mask(k.example().contracted().stream().mapToInt(m.labels()::indexOf).toArray());
            long s = ElementSets.mask(k.example().core().labels().stream().mapToInt(m.labels()::indexOf).toArray());
            addImages(proved, c, s);
        }
        RefutationSearch refuter = new RefutationSearch(settings.budget());
        List<Optional<Proof>> proofs = new ArrayList<>();
        for (Listed l : run.listed) {
            Optional<Proof> proof = Optional.empty();
            if (!proved.contains(List.of(l.contracted(), l.set()))) {
                Optional<MinimalityDecider.NonOrientableContraction> deadEnd = l.deadEnd();
                if (deadEnd.isEmpty() && l.classIndex() < 0
                        && MinimalityDecider.decide(l.restriction(), settings.budget())
                                instanceof MinimalityDecider.NonOrientableContraction d) {
                    deadEnd = Optional.of(d);
                }
                if (l.classIndex() < 0) {
                    if (deadEnd.isEmpty()) {
                        // its decision ran out of budget: listed without a proof, which the checker reports
                        proofs.add(Optional.empty());
                        continue;
                    }
                    MinimalityDecider.NonOrientableContraction d = deadEnd.get();
                    RefutationSearch.Outcome o = refuter.refute(d.minor());
                    run.solverCalls++;
                    if (o instanceof RefutationSearch.Orientable) {
                        throw new IllegalStateException("A contraction decided non-orientable has a chirotope.");
                    }
                    if (o instanceof RefutationSearch.Refuted r) {
                        proof = Optional.of(new DeadEnd(l.restriction().labels().get(d.element()), d.minor(),
                                r.refutation()));
                    }
                } else {
                    ExplicitMatroid example = run.classes.get(l.classIndex()).example().core();
                    Isomorphism iso = new HyperplaneIsomorphismInspector(l.restriction(), example).find()
                            .orElseThrow(() -> new IllegalStateException("A core is not isomorphic to its class."));
                    proof = Optional.of(new ClassMember(l.classIndex() + 1,
                            iso.image().stream().map(example.labels()::get).toList()));
                }
                if (proof.isPresent()) {
                    addImages(proved, l.contracted(), l.set());
                }
            }
            proofs.add(proof);
        }
        int next = 0;
        for (int i = 0; i < run.evidence.size(); i++) {
            ContractionEvidence e = run.evidence.get(i);
            List<MinimalSet> sets = new ArrayList<>();
            for (MinimalSet s : e.minimal()) {
                sets.add(new MinimalSet(s.elements(), proofs.get(next++)));
            }
            run.evidence.set(i, new ContractionEvidence(e.contracted(), e.maximal(), sets));
        }
    }

    private void addImages(Set<List<Long>> proved, long c, long s) {
        for (int[] p : symmetry.permutations()) {
            proved.add(List.of(symmetry.apply(p, c), symmetry.apply(p, s)));
        }
    }

    /** The core as a key over M's elements. */
    private static Key key(ExplicitMatroid m, ExplicitMatroid core) {
        int[] toM = core.labels().stream().mapToInt(m.labels()::indexOf).toArray();
        List<Long> bases = new ArrayList<>();
        for (long b : core.basisSets().stream().mapToLong(ElementSet::toMask).toArray()) {
            long lifted = 0;
            for (long s = b; s != 0; s &= s - 1) {
                lifted |= 1L << toM[Long.numberOfTrailingZeros(s)];
            }
            bases.add(lifted);
        }
        long ground = 0;
        for (int e : toM) {
            ground |= 1L << e;
        }
        return canonical(ground, bases);
    }

    private Key image(int[] p, Key key) {
        return canonical(symmetry.apply(p, key.ground()), key.bases().stream().map(b -> symmetry.apply(p, b)).toList());
    }

    private static Key canonical(long ground, List<Long> bases) {
        List<Long> sorted = new ArrayList<>(bases);
        sorted.sort(Long::compareUnsigned);
        return new Key(ground, sorted);
    }
}
