package org.chirocore.search;

import java.util.List;

import org.chirocore.orient.Budget;

/**
 * What determines a reduction: the seed of the element order, the strategy, the budget of each
 * orientability decision, and the focus: labels of elements to contract first when the input is
 * too large to enumerate (for a pulled cube, the elements of the pulled hyperplane, where the
 * obstruction sits). The same matroid and settings give the same core, unless a budget given
 * in wall-clock time turns an answer into unknown.
 */
public record SearchSettings(long seed, Strategy strategy, Budget budget, List<String> focus) {
    public SearchSettings {
        if (strategy == null || budget == null) {
            throw new IllegalArgumentException("Search settings need a strategy and a budget.");
        }
        focus = List.copyOf(focus);
    }

    /** Settings without a focus. */
    public SearchSettings(long seed, Strategy strategy, Budget budget) {
        this(seed, strategy, budget, List.of());
    }
}
