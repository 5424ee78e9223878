package org.chirocore.check;

import java.util.List;

/**
 * The verdict on one certificate: one line per check of the spec, in the spec's order.
 *
 * @param source the file name, or a description of the bytes checked
 * @param checks the check lines
 * @param millis wall-clock time taken
 */
public record VerificationReport(String source, List<Check> checks, long millis) {
    public VerificationReport {
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

    /** Whether every check ran and passed: only then does the certificate prove its whole statement. */
    public boolean complete() {
        return checks.stream().allMatch(c -> c.status() == Status.PASS);
    }

    /**
     * The verdict in words: "verified" when {@link #complete}, "REJECTED" when a check failed, and
     * otherwise "verified except" and the checks that did not run.
     */
    public String word() {
        if (!passed()) {
            return "REJECTED";
        }
        List<String> notRun = checks.stream().filter(c -> c.status() != Status.PASS).map(Check::name).toList();
        return notRun.isEmpty() ? "verified" : "verified except " + String.join(", ", notRun);
    }

    /**
     * The verdict as terminal text: one line per check, then the verdict line. Every text taken
     * from the certificate is escaped ({@link Escaping#printable}), and the verdict line holds only the
     * source name, the verdict and the verifier's own time, nothing else the certificate's writer chose.
     */
    public String toText() {
        StringBuilder out = new StringBuilder();
        for (Check c : checks) {
            out.append(String.format("%-8s %s: %s%n", c.status(), c.name(), Escaping.printable(c.detail())));
        }
        return out.append(Escaping.printable(source)).append(": ").append(word()).append(" (checked in ").append(millis)
                .append(" ms)").append(System.lineSeparator()).toString();
    }

    /** The check of this name. */
    public Check check(String name) {
        return checks.stream().filter(c -> c.name().equals(name)).findFirst()
                .orElseThrow(() -> new IllegalArgumentException("No check is named \"" + name + "\"."));
    }
}
