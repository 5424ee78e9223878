package org.chirocore.search;

/**
 * The order in which single-element minors are tried. Different orders can end in different,
 * non-isomorphic minimal cores.
 */
public enum Strategy {
    /** Try contractions before deletions: the rank drops early, which keeps later steps cheap. */
    CONTRACT_FIRST,
    /** Try deletions before contractions: keeps the rank, tends to give cores of higher rank. */
    DELETE_FIRST
}
