package org.chirocore.search;

import org.chirocore.orient.Budget;

/**
 * What determines a reduction: the seed of the element order, the strategy, and the budget of
 * each orientability decision. The same matroid and settings give the same core (up to a budget
 * given in wall-clock time, which can turn an answer into unknown).
 */
public record SearchSettings(long seed, Strategy strategy, Budget budget) {
    public SearchSettings {
        if (strategy == null || budget == null) {
            throw new IllegalArgumentException("Search settings need a strategy and a budget.");
        }
    }
}
