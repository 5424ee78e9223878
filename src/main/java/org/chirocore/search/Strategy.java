package org.chirocore.search;

import java.util.Locale;

/**
 * The order in which single-element minors are tried. Different orders can end in different,
 * non-isomorphic minimal cores.
 */
public enum Strategy {
    /** Try contractions before deletions: the rank drops early, which keeps later steps cheap. */
    CONTRACT_FIRST,
    /** Try deletions before contractions: keeps the rank, tends to give cores of higher rank. */
    DELETE_FIRST;

    /** The name used in options and files: "contract-first" or "delete-first". */
    public String id() {
        return name().toLowerCase(Locale.ROOT).replace('_', '-');
    }

    /**
     * The strategy named {@code id} as by {@link #id()}.
     *
     * @throws IllegalArgumentException naming the text and the known names
     */
    public static Strategy fromId(String id) {
        for (Strategy s : values()) {
            if (s.id().equals(id)) {
                return s;
            }
        }
        throw new IllegalArgumentException("Unknown strategy \"" + id + "\"; the strategies are contract-first and "
                + "delete-first.");
    }
}
