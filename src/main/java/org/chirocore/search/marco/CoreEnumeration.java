package org.chirocore.search.marco;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;

import org.chirocore.matroid.ElementSet;
import org.chirocore.matroid.ElementSets;
import org.chirocore.matroid.ExplicitMatroid;
import org.chirocore.matroid.HyperplaneIsomorphismInspector;
import org.chirocore.matroid.MatroidShape;
import org.chirocore.matroid.Minor;
import org.chirocore.orient.Chirotope;
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
            List<List<String>> minimal) {
        public ContractionEvidence {
            contracted = List.copyOf(contracted);
            maximal = List.copyOf(maximal);
            minimal = minimal.stream().map(List::copyOf).toList();
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
     * @param restrictions minimal non-orientable restrictions found (over the representatives)
     * @param deadEnds those with a non-orientable single-element contraction
     * @param solverCalls orientability solves, map calls and minimality decisions
     * @param millis wall-clock time
     * @param evidence per representative contraction set, its maximal orientable and minimal
     *     non-orientable restrictions (complete only when the enumeration is)
     */
    public record Result(Optional<String> incomplete, List<Integer> ranks, int representatives, int contractionSets,
            List<CoreClass> classes, int restrictions, int deadEnds, int solverCalls, long millis,
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
        final Set<Key> seen = new HashSet<>();
        final List<ContractionEvidence> evidence = new ArrayList<>();
        String incomplete;
        int representatives;
        int contractionSets;
        int restrictions;
        int deadEnds;
        int solverCalls;
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
        return new Result(Optional.ofNullable(run.incomplete), ranks, run.representatives, run.contractionSets,
                run.classes, run.restrictions, run.deadEnds, run.solverCalls, System.currentTimeMillis() - run.started,
                run.evidence);
    }

    /** Enumerates the minimal non-orientable restrictions of M/C and records the cores among them. */
    private void explore(ExplicitMatroid m, int[] c, Run run) {
        ExplicitMatroid n0 = ExplicitMatroid.of(new Minor(m, c, new int[0]));
        List<String> contracted = Arrays.stream(c).mapToObj(m.labels()::get).toList();
        progress.report("contracting " + (c.length == 0 ? "nothing" : String.join(" ", contracted)), n0.size(),
                n0.rank(), run.solverCalls);
        RestrictionExplorer explorer = new RestrictionExplorer(n0, 0, settings.budget(), true, settings.seed());
        List<MaximalOrientable> maximal = new ArrayList<>();
        List<List<String>> minimal = new ArrayList<>();
        try {
            while (true) {
                RestrictionExplorer.Step step = explorer.next();
                if (step instanceof RestrictionExplorer.Done) {
                    run.evidence.add(new ContractionEvidence(contracted, maximal, minimal));
                    return;
                }
                if (step instanceof RestrictionExplorer.Orientable o) {
                    maximal.add(new MaximalOrientable(labels(n0, o.set()), o.witness()));
                }
                if (step instanceof RestrictionExplorer.OutOfBudget o) {
                    run.incomplete = "the enumeration after contracting " + contracted + " ran out of budget: "
                            + o.reason();
                    return;
                }
                if (step instanceof RestrictionExplorer.MinimalNonOrientable mus) {
                    run.restrictions++;
                    minimal.add(labels(n0, mus.set()));
                    candidate(m, n0, mus.set(), contracted, run);
                }
            }
        } finally {
            run.solverCalls += explorer.solverCalls();
        }
    }

    private static List<String> labels(ExplicitMatroid n, long set) {
        return Arrays.stream(ElementSets.elements(set)).mapToObj(n.labels()::get).toList();
    }

    private void candidate(ExplicitMatroid m, ExplicitMatroid n0, long set, List<String> contracted, Run run) {
        ExplicitMatroid core = ExplicitMatroid.of(Minor.restriction(n0, ElementSets.elements(set)));
        MinimalityDecider.Result result = MinimalityDecider.decide(core, settings.budget());
        run.solverCalls += 2 * core.size();
        if (result instanceof MinimalityDecider.Unknown u) {
            run.incomplete = "deciding the single-element minors of a restriction ran out of budget: " + u.reason();
            return;
        }
        if (result instanceof MinimalityDecider.NonOrientableDeletion) {
            throw new IllegalStateException("A restriction found minimal non-orientable has a non-orientable deletion.");
        }
        if (result instanceof MinimalityDecider.NonOrientableContraction) {
            run.deadEnds++;
            return;
        }
        Key key = key(m, core);
        if (run.seen.contains(key)) {
            return;
        }
        Set<Key> images = new HashSet<>();
        for (int[] p : symmetry.permutations()) {
            images.add(image(p, key));
        }
        run.seen.addAll(images);
        MatroidShape shape = MatroidShape.of(core);
        for (int j = 0; j < run.classes.size(); j++) {
            CoreClass k = run.classes.get(j);
            if (run.shapes.get(j).equals(shape)
                    && new HyperplaneIsomorphismInspector(k.example().core(), core).find().isPresent()) {
                run.classes.set(j, new CoreClass(k.example(), k.count() + images.size(), k.foundAtMillis(),
                        k.solverCallsAtDiscovery()));
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
