package org.chirocore.check;

import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * The verifier on its own: {@code java -jar chirocore-verify.jar [--input FILE] [--json] CERT...}.
 * {@code chirocore verify} calls {@link #verify} too, so both print the same lines and exit codes.
 */
public final class VerifierMain {
    /** Every check of every certificate ran and passed. */
    public static final int VERIFIED = 0;
    /** Some check of some certificate failed. */
    public static final int REJECTED = 1;
    /** Bad usage: unknown option, no certificate. */
    public static final int USAGE = 2;
    /** No check failed, but some part was not checked: the statement is not fully proved. */
    public static final int INCOMPLETE = 4;

    static final String USAGE_TEXT = """
            Usage: java -jar chirocore-verify.jar [--input FILE] [--json] CERT...
            Checks certificates of minor-minimal non-orientable matroids (docs/certificate-format.md),
            and an enumeration's completeness evidence, a file named *completeness.json (docs/enumeration.md).
              --input FILE  the matroid file of a given-matroid provenance or enumeration input
              --json        print a JSON array of verdicts instead of text
            Exit codes: 0 every check of every file ran and passed, 1 some check failed,
            2 bad usage, 4 no check failed but some part was not checked.""";

    private VerifierMain() {
    }

    public static void main(String[] args) {
        PrintWriter out = new PrintWriter(System.out, true, StandardCharsets.UTF_8);
        List<Path> files = new ArrayList<>();
        Optional<Path> input = Optional.empty();
        boolean json = false;
        try {
            for (int i = 0; i < args.length; i++) {
                switch (args[i]) {
                    case "--help", "-h" -> {
                        out.println(USAGE_TEXT);
                        System.exit(VERIFIED);
                    }
                    case "--json" -> json = true;
                    case "--input" -> {
                        if (i + 1 == args.length || input.isPresent()) {
                            throw new IllegalArgumentException("--input needs one file name");
                        }
                        input = Optional.of(Path.of(args[++i]));
                    }
                    default -> {
                        if (args[i].startsWith("-")) {
                            throw new IllegalArgumentException("unknown option " + Escaping.printable(args[i]));
                        }
                        files.add(Path.of(args[i]));
                    }
                }
            }
            if (files.isEmpty()) {
                throw new IllegalArgumentException("no certificate given");
            }
        } catch (IllegalArgumentException e) { // also an InvalidPathException
            System.err.println("chirocore-verify: " + e.getMessage());
            System.err.println(USAGE_TEXT);
            System.exit(USAGE);
        }
        System.exit(verify(files, input, json, out));
    }

    /**
     * Verifies {@code files}, prints each verdict (text, or with {@code json} one JSON array) and
     * returns the exit code: {@link #REJECTED} when a check failed, else {@link #INCOMPLETE} when a
     * part was not checked, else {@link #VERIFIED}.
     */
    public static int verify(List<Path> files, Optional<Path> input, boolean json, PrintWriter out) {
        List<JsonTree.Value> verdicts = new ArrayList<>();
        boolean passed = true;
        boolean complete = true;
        for (Path file : files) {
            VerificationReport verdict = CompletenessCheck.isEvidence(file) ? CompletenessCheck.verify(file, input)
                    : CertificateVerifier.verify(file, input);
            passed &= verdict.passed();
            complete &= verdict.complete();
            if (json) {
                verdicts.add(toJson(verdict));
            } else {
                out.print(verdict.toText());
            }
        }
        if (json) {
            out.println(JsonTree.canonical(new JsonTree.Arr(verdicts)));
        }
        out.flush();
        return !passed ? REJECTED : complete ? VERIFIED : INCOMPLETE;
    }

    private static JsonTree.Value toJson(VerificationReport verdict) {
        List<JsonTree.Value> checks = new ArrayList<>();
        for (VerificationReport.Check c : verdict.checks()) {
            Map<String, JsonTree.Value> check = new LinkedHashMap<>();
            check.put("name", new JsonTree.Str(c.name()));
            check.put("status", new JsonTree.Str(c.status().name()));
            check.put("detail", new JsonTree.Str(Escaping.printable(c.detail())));
            checks.add(new JsonTree.Obj(check));
        }
        Map<String, JsonTree.Value> v = new LinkedHashMap<>();
        v.put("file", new JsonTree.Str(Escaping.printable(verdict.source())));
        v.put("passed", new JsonTree.Bool(verdict.passed()));
        v.put("complete", new JsonTree.Bool(verdict.complete()));
        v.put("verdict", new JsonTree.Str(verdict.word()));
        v.put("millis", new JsonTree.Int(verdict.millis()));
        v.put("checks", new JsonTree.Arr(checks));
        return new JsonTree.Obj(v);
    }
}
