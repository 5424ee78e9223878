package org.chirocore.check;

import java.util.List;

/**
 * The verdict on one certificate: one line per check of the spec, in the spec's order.
 *
 * @param source the file name, or a description of the bytes checked
 * @param checks the check lines
 * @param millis wall-clock time taken
 */
public record Report(String source, List<Check> checks, long millis) {
    public Report {
        checks = List.copyOf(checks);
    }

    /** The state of one check. */
    public enum Status {
        PASS, FAIL, NOT_RUN
    }

    /**
     * One check line.
     *
     * @param name the check's short name, e.g. "basis exchange"
     * @param detail what was checked, or on failure the first offending item
     */
    public record Check(String name, Status status, String detail) {
    }

    /**
     * Whether no check failed. A check is NOT_RUN without a failure only for a given-matroid
     * provenance verified without its input file; every other NOT_RUN follows a failure.
     */
    public boolean passed() {
        return checks.stream().noneMatch(c -> c.status() == Status.FAIL);
    }

    /** The check of this name. */
    public Check check(String name) {
        return checks.stream().filter(c -> c.name().equals(name)).findFirst()
                .orElseThrow(() -> new IllegalArgumentException("No check is named \"" + name + "\"."));
    }
}
