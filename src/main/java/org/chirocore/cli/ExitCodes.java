package org.chirocore.cli;

import org.chirocore.orient.Orientability;
import org.chirocore.search.SearchResult;

/**
 * The exit codes of every command. A proved verdict, whichever it is, is success; an answer
 * cut short by the budget is not, so scripts can tell "no" from "don't know".
 */
final class ExitCodes {
    /** A proved answer (orientable, non-orientable, a minimal core) or facts printed. */
    static final int OK = 0;
    /** A bug: an unexpected exception, reported in one line (its stack trace on request, see {@link Chirocore#configure}). */
    static final int INTERNAL_ERROR = 1;
    /** {@code verify}: some check of some certificate failed (shares its value with INTERNAL_ERROR, as the spec of verify asks). */
    static final int CHECK_FAILED = 1;
    /** Bad usage or bad input: unknown option, missing argument, unreadable or invalid file, invalid construction. */
    static final int BAD_INPUT = 2;
    /** No answer: a budget ran out. */
    static final int UNKNOWN = 3;
    /** {@code verify}: no check failed, but some part was not checked, so the statement is not fully proved. */
    static final int INCOMPLETE = org.chirocore.check.VerifierMain.INCOMPLETE;
    /**
     * A constrained search ({@code reduce --rank/--keep/--avoid}) enumerated its whole space and
     * proved that no core meets the constraints: an answer, but not the one asked for.
     */
    static final int NONE_EXISTS = 5;

    private ExitCodes() {
    }

    static int of(Orientability result) {
        return result instanceof Orientability.Unknown ? UNKNOWN : OK;
    }

    static int of(SearchResult result) {
        return result instanceof SearchResult.Unknown ? UNKNOWN : OK;
    }
}
