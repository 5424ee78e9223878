package org.chirocore.check;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.BitSet;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.TreeSet;
import java.util.function.ToIntFunction;


/**
 * Check 8: rebuilding the core from its provenance with exact arithmetic of our own. A construction
 * is the affine n-cube (vertex v as the column (1, v), docs/mathematics.md §7) over Q or GF(p), pulled at O
 * onto H, optionally contracted at O; a given matroid is read from {@code --input}. Then the core
 * must be exactly M/C\D (rank_{M/C\D}(S) = rank_M(S ∪ C) − rank_M(C), [Ox, Prop. 3.1.6]). Cost: one
 * rank evaluation per r-subset of the core's ground set, plus the general-position test. Subsets
 * of a cube's ground set (up to 2^16 vertices, {@link VerifierLimits#MAX_CUBE}) are BitSets; a
 * given matroid and the core have at most {@link VerifierLimits#MAX_ELEMENTS} elements, their
 * sets are sorted element arrays.
 */
final class ProvenanceCheck {
    /** A rejected provenance; the message says what does not match. */
    static final class Mismatch extends Exception {
        private static final long serialVersionUID = 1L;

        Mismatch(String message) {
            super(message);
        }
    }

    /**
     * A matroid to take a minor of: its labels and its rank function on sets of element numbers;
     * {@code contractedFirst} is contracted before any minor is taken (a construction's pulled vertex).
     */
    record Source(List<String> labels, ToIntFunction<BitSet> rank, int fullRank, BitSet contractedFirst) {
    }

    private ProvenanceCheck() {
    }

    /**
     * Rebuilds the core; returns a description of what was rebuilt, or empty when the provenance is
     * a given matroid and no input file was supplied.
     */
    static Optional<String> rebuild(JsonTree.Obj provenance, List<String> coreLabels, BasisTable core, Optional<Path> input)
            throws Mismatch, IOException {
        provenance.requireOnly(List.of("construction", "given", "path"));
        if (provenance.has("construction") == provenance.has("given")) {
            throw new Mismatch("provenance must have exactly one of \"construction\" and \"given\"");
        }
        JsonTree.Obj path = provenance.requireObject("path");
        path.requireOnly(List.of("contracted", "deleted"));
        int removed = distinctLabels(path.requireArray("contracted"), path.requireArray("deleted"), coreLabels);
        Source source;
        String what;
        if (provenance.has("construction")) {
            JsonTree.Obj c = provenance.requireObject("construction");
            source = cube(c);
            what = "the pulled " + c.requireInt("cube") + "-cube over " + c.requireString("field");
        } else {
            JsonTree.Obj given = provenance.requireObject("given");
            given.requireOnly(List.of("sha256", "elements", "rank"));
            if (!given.requireString("sha256").matches("[0-9a-f]{64}")) {
                throw new Mismatch("given.sha256 must be 64 lower-case hex digits");
            }
            int elements = given.requireInt("elements");
            int rank = given.requireInt("rank");
            if (elements != coreLabels.size() + removed || rank < core.rank || rank > elements) {
                throw new Mismatch("given.elements " + elements + " and given.rank " + rank + " do not fit a core of "
                        + coreLabels.size() + " elements and rank " + core.rank + " after removing " + removed + " elements");
            }
            if (input.isEmpty()) {
                return Optional.empty();
            }
            source = given(given, input.get());
            what = "the given matroid " + Escaping.printable(input.get().getFileName().toString());
        }
        BitSet contracted = labelSet(path.requireArray("contracted"), source.labels(), "path.contracted");
        BitSet deleted = labelSet(path.requireArray("deleted"), source.labels(), "path.deleted");
        if (contracted.intersects(deleted) || contracted.intersects(source.contractedFirst())
                || deleted.intersects(source.contractedFirst())) {
            throw new Mismatch("path.contracted and path.deleted must be disjoint and avoid the contracted pulled vertex");
        }
        BitSet allContracted = union(contracted, source.contractedFirst());
        compareMinor(source, allContracted, deleted, coreLabels, core);
        return Optional.of(what + ", /C\\D with |C| = " + contracted.cardinality() + ", |D| = " + deleted.cardinality()
                + ", gives the core exactly");
    }

    /**
     * The matroid an input record names (as an enumeration records it: {@code construction}, or
     * {@code sha256} of the file {@code input}; with {@code elements} and {@code rank} of the
     * matroid after {@code contractedFirst} is contracted), rebuilt with our own code.
     */
    static Source input(JsonTree.Obj record, Optional<Path> input) throws Mismatch, IOException {
        if (record.has("construction")) {
            record.requireOnly(List.of("construction", "elements", "rank"));
            Source s = cube(record.requireObject("construction"));
            int elements = s.labels().size() - s.contractedFirst().cardinality();
            int rank = s.fullRank() - s.rank().applyAsInt(s.contractedFirst());
            if (elements != record.requireInt("elements") || rank != record.requireInt("rank")) {
                throw new Mismatch("the construction gives " + elements + " elements of rank " + rank + ", not the recorded "
                        + record.requireInt("elements") + " and " + record.requireInt("rank"));
            }
            return s;
        }
        if (input.isEmpty()) {
            throw new Mismatch("the input is a matroid file: give it with --input");
        }
        return given(record, input.get());
    }

    /**
     * Checks, without the source matroid, that the path's labels are strings, none repeated within
     * or across the two lists or equal to a core label; returns how many there are.
     */
    private static int distinctLabels(JsonTree.Arr contracted, JsonTree.Arr deleted, List<String> coreLabels) throws Mismatch {
        Set<String> seen = new HashSet<>(coreLabels);
        for (JsonTree.Arr array : List.of(contracted, deleted)) {
            String what = array == contracted ? "path.contracted" : "path.deleted";
            for (int i = 0; i < array.size(); i++) {
                String label = array.get(i).asString(what + "[" + i + "]");
                if (!seen.add(label)) {
                    throw new Mismatch(what + "[" + i + "] \"" + Escaping.printable(label)
                            + "\" repeats a label of the path or of the core");
                }
            }
        }
        return contracted.size() + deleted.size();
    }

    /**
     * The pulled cube of a construction, after checking that H is a flat of rank n and (H, O) are
     * in general position. Only the ranks needed are computed: a basis of H, then one cofactor
     * vector per hyperplane tested, so that membership in a span is one dot product per vertex.
     */
    private static Source cube(JsonTree.Obj c) throws Mismatch {
        c.requireOnly(List.of("cube", "field", "hyperplane", "pulled", "contractPulled"));
        int n = c.requireInt("cube");
        if (n < 1 || n > VerifierLimits.MAX_CUBE) {
            throw new Mismatch("construction.cube must be between 1 and " + VerifierLimits.MAX_CUBE + " (at most " + (1 << VerifierLimits.MAX_CUBE)
                    + " vertices), found " + n);
        }
        long p = field(c.requireString("field"));
        List<String> labels = new ArrayList<>();
        long[][] columns = new long[1 << n][n + 1];
        for (int v = 0; v < 1 << n; v++) {
            StringBuilder label = new StringBuilder();
            columns[v][0] = 1;
            for (int k = 0; k < n; k++) {
                // coordinate 1 is the most significant binary digit of the element number
                columns[v][k + 1] = (v >> (n - 1 - k)) & 1;
                label.append(columns[v][k + 1]);
            }
            labels.add(label.toString());
        }
        ToIntFunction<BitSet> rank = set -> ExactRank.rank(columns, set, p);
        BitSet h = labelSet(c.requireArray("hyperplane"), labels, "construction.hyperplane");
        BitSet o = labelSet(new JsonTree.Arr(List.of(c.require("pulled"))), labels, "construction.pulled");
        if (h.intersects(o)) {
            throw new Mismatch("the pulled vertex lies on the hyperplane");
        }
        int[] basisOfH = elements(independentSubset(rank, h, n + 1));
        if (basisOfH.length != n) {
            throw new Mismatch("the hyperplane has rank " + basisOfH.length + ", not " + n);
        }
        long[] normal = ExactRank.cofactors(columns, basisOfH, p);
        for (int e = h.nextClearBit(0); e < labels.size(); e = h.nextClearBit(e + 1)) {
            if (ExactRank.dot(normal, columns[e], p) == 0) {
                throw new Mismatch("the hyperplane is not a flat: its closure contains " + Escaping.printable(labels.get(e)));
            }
        }
        generalPosition(columns, p, labels, n, h, o);
        BitSet ho = union(h, o);
        // pulling O to H (docs/mathematics.md): subsets of H ∪ {O} of full rank n + 1 drop to rank n, other ranks are kept
        ToIntFunction<BitSet> pulled = set -> {
            int r = rank.applyAsInt(set);
            return r == n + 1 && union(set, ho).equals(ho) ? n : r;
        };
        return new Source(labels, pulled, n + 1, c.requireBoolean("contractPulled") ? o : new BitSet());
    }

    /**
     * A maximal independent subset of {@code set}, chosen greedily in increasing order; the search
     * stops once it has {@code maxRank} elements, as no larger independent set exists.
     */
    private static BitSet independentSubset(ToIntFunction<BitSet> rank, BitSet set, int maxRank) {
        BitSet basis = new BitSet();
        for (int e = set.nextSetBit(0); e >= 0 && basis.cardinality() < maxRank; e = set.nextSetBit(e + 1)) {
            if (rank.applyAsInt(with(basis, e)) > basis.cardinality()) {
                basis.set(e);
            }
        }
        return basis;
    }

    /**
     * (H, O) in general position (docs/mathematics.md): for every hyperline L ⊆ H, the closure of
     * L ∪ {O} is L ∪ {O}. Each L is the closure of n − 1 independent elements S of H, and lies in H
     * as H is a flat. S ∪ {O} is independent exactly when S is (O lies outside the span of H), and
     * then its cofactor vector c has c · v = 0 exactly for the vectors v in span(S ∪ {O}); on H
     * these are the vectors of L (span(S ∪ {O}) ∩ span(H) = span(S)). So no vertex outside H ∪ {O}
     * may have c · v = 0. Cost: C(|H|, n − 1) subsets S, each with n + 1 determinants and 2^n dot
     * products, bounded by {@link Limits#MAX_VECTOR_TESTS}.
     */
    private static void generalPosition(long[][] columns, long p, List<String> labels, int n, BitSet h, BitSet o)
            throws Mismatch {
        int[] hs = elements(h);
        long candidates = binomial(hs.length, n - 1);
        if (candidates > VerifierLimits.MAX_VECTOR_TESTS / labels.size()) {
            throw new Mismatch("the hyperplane has " + (candidates == Long.MAX_VALUE ? "too many" : candidates)
                    + " hyperline candidates; testing general position would exceed the verifier's limit of "
                    + VerifierLimits.MAX_VECTOR_TESTS + " vector tests");
        }
        Set<BitSet> seen = new HashSet<>();
        int[] pick = firstCombination(n - 1);
        int[] withO = new int[n];
        withO[n - 1] = o.nextSetBit(0);
        do {
            for (int i = 0; i < n - 1; i++) {
                withO[i] = hs[pick[i]];
            }
            long[] normal = ExactRank.cofactors(columns, withO, p);
            if (ExactRank.isZero(normal)) {
                continue;
            }
            BitSet line = new BitSet();
            for (int e : hs) {
                line.set(e, ExactRank.dot(normal, columns[e], p) == 0);
            }
            if (!seen.add(line)) {
                continue;
            }
            for (int e = 0; e < labels.size(); e++) {
                if (!h.get(e) && !o.get(e) && ExactRank.dot(normal, columns[e], p) == 0) {
                    throw new Mismatch("(H, O) are not in general position: the closure of the hyperline "
                            + Escaping.printable(labelsOf(line, labels)) + " with O contains " + labels.get(e));
                }
            }
        } while (nextCombination(pick, hs.length));
    }

    /** The prime p of "GF(p)" (p ≤ 46 340), or 0 for "Q". */
    private static long field(String field) throws Mismatch {
        if (field.equals("Q")) {
            return 0;
        }
        if (field.matches("GF\\([1-9][0-9]{0,4}\\)")) {
            long p = Long.parseLong(field.substring(3, field.length() - 1));
            if (p <= 46_340 && ExactRank.isPrime(p)) {
                return p;
            }
        }
        throw new Mismatch("the field must be \"Q\" or \"GF(p)\" with p a prime at most 46340, found \"" + field + "\"");
    }

    /** A given matroid read from a matroid file (docs/matroid-format.md), after checking its hash, size and rank. */
    private static Source given(JsonTree.Obj given, Path input) throws Mismatch, IOException {
        given.requireOnly(List.of("sha256", "elements", "rank"));
        byte[] bytes = CertificateVerifier.readRegularFile(input, VerifierLimits.MAX_CERTIFICATE_BYTES);
        if (!CertificateVerifier.sha256(bytes).equals(given.requireString("sha256"))) {
            throw new Mismatch("the SHA-256 of " + input.getFileName() + " is " + CertificateVerifier.sha256(bytes)
                    + ", not the recorded " + given.requireString("sha256"));
        }
        Source m = GivenMatroid.read(JsonTree.parse(bytes));
        BitSet all = new BitSet();
        all.set(0, m.labels().size());
        if (m.labels().size() != given.requireInt("elements") || m.rank().applyAsInt(all) != given.requireInt("rank")) {
            throw new Mismatch("the input has " + m.labels().size() + " elements and rank " + m.rank().applyAsInt(all)
                    + ", not the recorded " + given.requireInt("elements") + " and " + given.requireInt("rank"));
        }
        return m;
    }

    /** Reading a matroid file into a rank function, with our own code. */
    private static final class GivenMatroid {
        /**
         * Reads a matroid file with the rules of docs/matroid-format.md: labels distinct and
         * non-empty, {@code labels} and {@code elements} agreeing (with a matrix both may be
         * omitted), exactly one of bases, nonbases and matrix, sets of r distinct elements in
         * range, no set listed twice, and the bases satisfying the basis axioms.
         */
        static Source read(JsonTree.Value json) throws Mismatch {
            JsonTree.Obj m = json.asObject("the input matroid");
            m.requireOnly(List.of("rank", "labels", "elements", "comment", "bases", "nonbases", "matrix"));
            int given = (m.has("bases") ? 1 : 0) + (m.has("nonbases") ? 1 : 0) + (m.has("matrix") ? 1 : 0);
            if (given != 1) {
                throw new Mismatch("the input must have exactly one of \"bases\", \"nonbases\", \"matrix\"");
            }
            int n = m.has("labels") ? m.requireArray("labels").size() : m.has("elements") ? m.requireInt("elements")
                    : m.has("matrix") ? m.requireObject("matrix").requireArray("columns").size() : -1;
            if (n < 0) {
                throw new Mismatch("the input needs \"labels\" or \"elements\" to give its number of elements");
            }
            if (n > VerifierLimits.MAX_ELEMENTS || (m.has("labels") && m.has("elements") && m.requireInt("elements") != n)) {
                throw new Mismatch("the input must have at most " + VerifierLimits.MAX_ELEMENTS + " elements, and labels and elements must agree");
            }
            List<String> labels = new ArrayList<>();
            for (int i = 0; i < n; i++) {
                String label = m.has("labels") ? m.requireArray("labels").get(i).asString("labels[" + i + "]") : Integer.toString(i);
                if (label.isEmpty() || labels.contains(label)) {
                    throw new Mismatch("labels[" + i + "] is empty or repeats an earlier label");
                }
                labels.add(label);
            }
            int r = m.requireInt("rank");
            if (r < 0 || r > n) {
                throw new Mismatch("the input's rank " + r + " is not between 0 and its " + n + " elements");
            }
            if (m.has("matrix")) {
                return new Source(labels, matrixRank(m.requireObject("matrix"), n, r), r, new BitSet());
            }
            String listed = m.has("bases") ? "bases" : "nonbases";
            // a set of sorted sets in lexicographic order: the canonical order of the bases
            TreeSet<int[]> sets = new TreeSet<>(java.util.Arrays::compare);
            for (int[] b : ParsedCertificate.sets(m.requireArray(listed), listed, VerifierLimits.MAX_BASES)) {
                if (!sets.add(sorted(b, n, r))) {
                    throw new Mismatch(listed + " lists " + java.util.Arrays.toString(b) + " twice");
                }
            }
            if (listed.equals("nonbases") && binomial(n, r) > VerifierLimits.MAX_BASES) {
                throw new Mismatch("the input has too many " + r + "-subsets to list its bases");
            }
            List<int[]> bases = new ArrayList<>();
            if (listed.equals("bases")) {
                bases.addAll(sets);
            } else {
                int[] pick = firstCombination(r);
                do {
                    if (!sets.contains(pick)) {
                        bases.add(pick.clone());
                    }
                } while (nextCombination(pick, n));
            }
            Optional<String> defect = new BasisTable(n, r, bases).exchangeDefect();
            if (defect.isPresent()) {
                throw new Mismatch("the input's bases do not form a matroid: " + defect.get());
            }
            // the rank of S in a matroid is the largest |S ∩ B| over its bases B ([Ox, §1.3])
            return new Source(labels, set -> {
                int best = 0;
                for (int[] b : bases) {
                    int common = 0;
                    for (int e : b) {
                        common += set.get(e) ? 1 : 0;
                    }
                    best = Math.max(best, common);
                }
                return best;
            }, r, new BitSet());
        }

        private static ToIntFunction<BitSet> matrixRank(JsonTree.Obj matrix, int n, int r) throws Mismatch {
            matrix.requireOnly(List.of("field", "columns"));
            long p = field(matrix.requireString("field"));
            JsonTree.Arr cols = matrix.requireArray("columns");
            if (cols.size() != n && n != 0) {
                throw new Mismatch("the input matrix has " + cols.size() + " columns for " + n + " elements");
            }
            long[][] columns = new long[cols.size()][];
            for (int j = 0; j < columns.length; j++) {
                JsonTree.Arr col = cols.get(j).asArray("columns[" + j + "]");
                columns[j] = new long[col.size()];
                for (int i = 0; i < col.size(); i++) {
                    columns[j][i] = col.get(i).asLong("columns[" + j + "][" + i + "]");
                }
                if (columns[j].length != columns[0].length || columns[j].length > VerifierLimits.MAX_ELEMENTS) {
                    throw new Mismatch("the input matrix columns must have one length, at most " + VerifierLimits.MAX_ELEMENTS);
                }
            }
            BitSet all = new BitSet();
            all.set(0, columns.length);
            if (ExactRank.rank(columns, all, p) != r) {
                throw new Mismatch("the input matrix does not have the declared rank " + r);
            }
            return set -> ExactRank.rank(columns, set, p);
        }

        /** The elements of {@code set} in increasing order, after checking they are r distinct elements of 0..n−1. */
        private static int[] sorted(int[] set, int n, int r) throws Mismatch {
            int[] s = set.clone();
            java.util.Arrays.sort(s);
            for (int i = 0; i < s.length; i++) {
                if (s[i] < 0 || s[i] >= n || (i > 0 && s[i] == s[i - 1])) {
                    throw new Mismatch("an input basis set mentions element " + s[i] + " twice or out of range");
                }
            }
            if (set.length != r) {
                throw new Mismatch("an input basis set has " + set.length + " elements, not the rank " + r);
            }
            return s;
        }
    }

    /**
     * Compares M/C\D with the core: same labels in order, same rank, and the r-subsets S of the
     * remaining elements with rank_M(S ∪ C) = rank_M(C) + r, enumerated in lexicographic order, are
     * exactly the core's bases. C is first replaced by a basis B of C (rank_M(S ∪ C) = rank_M(S ∪ B)
     * in any matroid), so every rank query is on at most r + rank_M(C) elements.
     */
    private static void compareMinor(Source m, BitSet contracted, BitSet deleted, List<String> coreLabels, BasisTable core)
            throws Mismatch {
        BitSet ground = union(contracted, deleted);
        ground.flip(0, m.labels().size());
        int[] kept = elements(ground);
        List<String> keptLabels = new ArrayList<>();
        for (int e : kept) {
            keptLabels.add(m.labels().get(e));
        }
        if (!keptLabels.equals(coreLabels)) {
            throw new Mismatch("the rebuilt minor has the elements " + keptLabels + ", the core " + coreLabels);
        }
        BitSet basisOfC = independentSubset(m.rank(), contracted, m.fullRank());
        int rc = basisOfC.cardinality();
        int r = m.rank().applyAsInt(union(ground, basisOfC)) - rc;
        if (r != core.rank) {
            throw new Mismatch("the rebuilt minor has rank " + r + ", the core " + core.rank);
        }
        if (binomial(kept.length, r) > VerifierLimits.MAX_CANDIDATES) {
            throw new Mismatch("the minor has more than " + VerifierLimits.MAX_CANDIDATES + " candidate bases to rebuild");
        }
        int next = 0;
        int[] pick = firstCombination(r);
        do {
            BitSet inM = (BitSet) basisOfC.clone();
            for (int i : pick) {
                inM.set(kept[i]);
            }
            boolean listed = next < core.count() && java.util.Arrays.equals(core.basis(next), pick);
            boolean basis = m.rank().applyAsInt(inM) == rc + r;
            if (listed != basis) {
                throw new Mismatch(listed ? "the core lists " + BasisTable.set(pick) + ", which is not a basis of the rebuilt minor"
                        : "the rebuilt minor has the basis " + BasisTable.set(pick) + ", which the core does not list");
            }
            next += listed ? 1 : 0;
        } while (nextCombination(pick, kept.length));
        if (next != core.count()) {
            throw new Mismatch("the core lists " + BasisTable.set(core.basis(next)) + ", which is not a basis of the rebuilt minor");
        }
    }

    /** The set of the listed labels, which must be distinct labels of the matroid. */
    private static BitSet labelSet(JsonTree.Arr array, List<String> labels, String what) throws Mismatch {
        Map<String, Integer> index = new HashMap<>();
        for (int e = 0; e < labels.size(); e++) {
            index.put(labels.get(e), e);
        }
        BitSet set = new BitSet();
        for (int i = 0; i < array.size(); i++) {
            Integer e = index.get(array.get(i).asString(what + "[" + i + "]"));
            if (e == null || set.get(e)) {
                throw new Mismatch(what + " lists \"" + Escaping.printable(array.get(i).asString(what))
                        + "\", which is no label of the matroid or repeated");
            }
            set.set(e);
        }
        return set;
    }

    private static String labelsOf(BitSet set, List<String> labels) {
        List<String> out = new ArrayList<>();
        for (int e : elements(set)) {
            out.add(labels.get(e));
        }
        return out.toString();
    }

    /** The elements of {@code set} in increasing order. */
    private static int[] elements(BitSet set) {
        int[] out = new int[set.cardinality()];
        for (int i = 0, e = set.nextSetBit(0); e >= 0; i++, e = set.nextSetBit(e + 1)) {
            out[i] = e;
        }
        return out;
    }

    private static BitSet union(BitSet a, BitSet b) {
        BitSet u = (BitSet) a.clone();
        u.or(b);
        return u;
    }

    private static BitSet with(BitSet a, int e) {
        BitSet u = (BitSet) a.clone();
        u.set(e);
        return u;
    }

    static int[] firstCombination(int k) {
        int[] c = new int[Math.max(k, 0)];
        for (int i = 0; i < c.length; i++) {
            c[i] = i;
        }
        return c;
    }

    /** Advances {@code c} to the next k-subset of {0..n−1} in lexicographic order; false after the last. */
    static boolean nextCombination(int[] c, int n) {
        int k = c.length;
        int i = k - 1;
        while (i >= 0 && c[i] == n - k + i) {
            i--;
        }
        if (i < 0) {
            return false;
        }
        c[i]++;
        for (int j = i + 1; j < k; j++) {
            c[j] = c[j - 1] + 1;
        }
        return true;
    }

    /** C(n, k), capped at Long.MAX_VALUE; 0 when k < 0 or k > n. */
    static long binomial(int n, int k) {
        if (k < 0 || k > n) {
            return 0;
        }
        long b = 1;
        for (int i = 1; i <= k; i++) {
            b = b > Long.MAX_VALUE / (n - k + i) ? Long.MAX_VALUE : b * (n - k + i) / i;
        }
        return b;
    }
}
