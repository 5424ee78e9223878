package org.chirocore.orient;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

import org.chirocore.matroid.ElementSet;

import org.sat4j.core.VecInt;
import org.sat4j.minisat.SolverFactory;
import org.sat4j.specs.ContradictionException;
import org.sat4j.specs.ISolver;
import org.sat4j.specs.TimeoutException;

/**
 * The map of a MARCO-style enumeration: the subsets of a ground set that are still unexplored, kept as a CNF over one variable per element (true = the element is in
 * the subset). Exploring a set T whose subsets are all known (T orientable) adds the clause "some
 * element outside T"; exploring a set U whose supersets are all known (U non-orientable) adds
 * "some element of U is missing". A seed is any model, extended greedily to a maximal one (adding
 * an element can only violate clauses of the second kind, which are checked directly).
 *
 * <p>Each call of {@link #next} is one sat4j call bounded by the conflicts and time of a
 * {@link Budget}; the map's formula has no auxiliary variables, so its size is the number of
 * explored sets.
 */
public final class UnexploredSubsets {
    /** The result of {@link #next}. */
    public sealed interface Next {
    }

    /** An unexplored set, maximal among the unexplored ones. */
    public record Seed(ElementSet set) implements Next {
    }

    /** Every subset allowed by the map has been explored. */
    public record Exhausted() implements Next {
    }

    /** The map's solver ran out of budget; nothing is claimed. */
    public record OutOfBudget(String reason) implements Next {
    }

    private final int size;
    private final ElementSet allowed;
    private final ISolver solver;
    private final List<ElementSet> supersetsBlocked = new ArrayList<>();
    private boolean contradiction;
    private int calls;
    /** The largest size a seed may have (the ground set's size until {@link #limitSize} lowers it). */
    private int cap;

    /**
     * A map of the subsets T of {0, …, size − 1} with {@code required} ⊆ T ⊆ {@code allowed}.
     *
     * @throws IllegalArgumentException when size is negative or required is not inside allowed
     */
    public UnexploredSubsets(int size, ElementSet allowed, ElementSet required) {
        if (size < 0) {
            throw new IllegalArgumentException("A subset map needs a size of at least 0, not " + size + ".");
        }
        if (!required.isSubsetOf(allowed)) {
            throw new IllegalArgumentException("The required elements " + required + " are not all allowed ("
                    + allowed + ").");
        }
        this.size = size;
        this.allowed = allowed.intersection(ElementSet.range(size));
        this.cap = size;
        this.solver = SolverFactory.newDefault();
        solver.newVar(Math.max(size, 1));
        for (int e = 0; e < size; e++) {
            if (!this.allowed.contains(e)) {
                add(new int[] {-(e + 1)});
            } else if (required.contains(e)) {
                add(new int[] {e + 1});
            }
        }
    }

    private void add(int[] clause) {
        if (contradiction) {
            return;
        }
        if (clause.length == 0) {
            contradiction = true;
            return;
        }
        try {
            solver.addClause(new VecInt(clause));
        } catch (ContradictionException e) {
            contradiction = true;
        }
    }

    /** Marks every subset of {@code set} explored. */
    public void blockSubsets(ElementSet set) {
        add(literals(allowed.minus(set), 1));
    }

    /** Marks every superset of {@code set} explored. */
    public void blockSupersets(ElementSet set) {
        supersetsBlocked.add(set);
        add(literals(set, -1));
    }

    /**
     * From now on only sets of at most {@code k} elements are unexplored (a cardinality constraint
     * of sat4j); a search for small sets lowers it as it finds them.
     */
    public void limitSize(int k) {
        if (k >= cap || contradiction) {
            cap = Math.min(cap, Math.max(k, 0));
            return;
        }
        cap = Math.max(k, 0);
        try {
            solver.addAtMost(new VecInt(literals(allowed, 1)), cap);
        } catch (ContradictionException e) {
            contradiction = true;
        }
    }

    private static int[] literals(ElementSet set, int sign) {
        int[] elements = set.elements();
        int[] clause = new int[elements.length];
        for (int i = 0; i < elements.length; i++) {
            clause[i] = sign * (elements[i] + 1);
        }
        return clause;
    }

    /**
     * An unexplored set that no other unexplored set contains: a model of the map, extended by
     * the elements of {@code order} (element indices) in that order while it stays unexplored.
     */
    public Next next(Budget budget, int[] order) {
        if (contradiction) {
            return new Exhausted();
        }
        long remaining = budget.remaining(System.currentTimeMillis());
        if (remaining < 0) {
            return new OutOfBudget(budget.timeReason());
        }
        if (budget.conflictsPerCall() > 0) {
            solver.setTimeoutOnConflicts(budget.conflictsPerCall());
        } else if (remaining > 0) {
            solver.setTimeoutMs(remaining);
        }
        calls++;
        try {
            if (!solver.isSatisfiable()) {
                return new Exhausted();
            }
        } catch (TimeoutException e) {
            return new OutOfBudget("the map of unexplored sets could not be solved within the budget");
        }
        int[] model = new int[size];
        int count = 0;
        for (int e = 0; e < size; e++) {
            if (solver.model(e + 1)) {
                model[count++] = e;
            }
        }
        ElementSet set = ElementSet.of(Arrays.copyOf(model, count));
        for (int e : order) {
            if (allowed.contains(e) && !set.contains(e) && count < cap) {
                ElementSet bigger = set.with(e);
                if (!containsBlocked(bigger)) {
                    set = bigger;
                    count++;
                }
            }
        }
        return new Seed(set);
    }

    private boolean containsBlocked(ElementSet set) {
        for (ElementSet u : supersetsBlocked) {
            if (u.isSubsetOf(set)) {
                return true;
            }
        }
        return false;
    }

    /** The solver calls made by {@link #next} so far. */
    public int calls() {
        return calls;
    }
}
