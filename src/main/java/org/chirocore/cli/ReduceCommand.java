package org.chirocore.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;
import java.util.concurrent.Callable;

import org.chirocore.cert.Certificate;
import org.chirocore.cert.CertificateWriter;
import org.chirocore.cert.Certification;
import org.chirocore.io.ResultJson;
import org.chirocore.orient.Refutation;
import org.chirocore.search.CoreConstraints;
import org.chirocore.search.MinimalCore;
import org.chirocore.search.SearchResult;
import org.chirocore.search.SearchSettings;
import org.chirocore.search.SteeredSearch;
import org.chirocore.search.Strategy;
import org.chirocore.search.UnsatCoreSearch;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code chirocore reduce}: reduces a matroid file or a cube construction to a minor-minimal
 * non-orientable minor and writes its certificate (docs/certificate-format.md). An orientable
 * input or an exhausted budget gives no certificate: a certificate only ever states minimal
 * non-orientability.
 */
@Command(name = "reduce", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = {"Reduce a matroid to a minor-minimal non-orientable minor, with a witness that every "
                + "single-element deletion and contraction of it is orientable.",
                "The matroid is FILE, or the n-cube of --cube with the vertex of --pull pulled to the hyperplane "
                        + "of --hyperplane (and, by default, then contracted)."})
final class ReduceCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Parameters(paramLabel = "FILE", arity = "0..1", description = "A matroid file (instead of --cube).")
    private Path file;

    @Option(names = "--cube", paramLabel = "N", description = "Start from the affine N-cube (instead of FILE).")
    private Integer cube;

    @Mixin
    private ConstructionOptions construction;

    @Option(names = "--contract-pulled", negatable = true, defaultValue = "true", fallbackValue = "true",
            description = "Contract the pulled vertex before reducing (default: yes).")
    private boolean contractPulled;

    @Option(names = "--seed", paramLabel = "S", defaultValue = "0",
            description = "Seed of the element order (default: ${DEFAULT-VALUE}).")
    private long seed;

    @Option(names = "--strategy", paramLabel = "STRATEGY", defaultValue = "contract-first",
            converter = Converters.StrategyConverter.class, completionCandidates = Converters.StrategyNames.class,
            description = "Which single-element minors to try first: ${COMPLETION-CANDIDATES} "
                    + "(default: ${DEFAULT-VALUE}).")
    private Strategy strategy;

    @Option(names = "--focus", negatable = true, defaultValue = "true", fallbackValue = "true",
            description = "For a construction too large to enumerate, contract the elements of the pulled hyperplane "
                    + "first (default: yes).")
    private boolean focus;

    @Mixin
    private BudgetOptions budget;

    @Option(names = "--out", paramLabel = "FILE", required = true,
            description = "Where to write the certificate of the core (written atomically; a large proof goes "
                    + "beside it as NAME.drat.gz). Nothing is written unless a core is found.")
    private Path out;

    @Option(names = "--witness-out", paramLabel = "FILE",
            description = "When the input is orientable, write its chirotope there.")
    private Path witnessOut;

    @Option(names = "--rank", paramLabel = "R",
            description = "The core must have rank R: exactly rank(M) - R elements are contracted (R = rank(M): "
                    + "deletions only). The search enumerates contraction sets and backtracks past dead ends.")
    private Integer rank;

    @Option(names = "--keep", paramLabel = "V", split = ",",
            description = "Elements (labels) the core must contain; neither contracted nor deleted.")
    private List<String> keep = List.of();

    @Option(names = "--avoid", paramLabel = "V", split = ",", description = "Elements (labels) that must be deleted.")
    private List<String> avoid = List.of();

    @Option(names = "--total-time", paramLabel = "SECONDS", defaultValue = "0",
            description = "With --rank, --keep or --avoid: wall-clock limit of the whole search, after which it "
                    + "answers unknown; 0 (default) for none.")
    private double totalTime;

    @Override
    public Integer call() {
        Inputs.Input input = input();
        Inputs.requireDirectoryOf(out);
        if (witnessOut != null) {
            Inputs.requireDirectoryOf(witnessOut);
        }
        SearchSettings settings = new SearchSettings(seed, strategy, budget.budget(),
                focus ? input.focus() : List.of());
        CoreConstraints constraints = constraints(input);
        ConsoleProgress progress = ConsoleProgress.ifInteractive(spec.commandLine().getErr());
        PrintWriter w = spec.commandLine().getOut();
        String from = Format.shape(input.matroid().rank(), input.matroid().size());
        if (constraints.any()) {
            SteeredSearch.Result steered = new SteeredSearch(settings, constraints, Math.round(totalTime * 1000),
                    progress).search(input.matroid());
            progress.finish();
            if (steered instanceof SteeredSearch.Found f) {
                return certify(w, from, f.core(), input);
            }
            if (steered instanceof SteeredSearch.NoneExists none) {
                w.println("none exists: no minor-minimal non-orientable minor meets the constraints; enumerated "
                        + none.enumerated() + "; no certificate written");
                return ExitCodes.NONE_EXISTS;
            }
            w.println("unknown: " + ((SteeredSearch.Unknown) steered).reason() + "; no certificate written");
            return ExitCodes.UNKNOWN;
        }
        SearchResult result = new UnsatCoreSearch(settings, progress).reduce(input.matroid());
        progress.finish();
        if (result instanceof SearchResult.Found f) {
            return certify(w, from, f.core(), input);
        } else if (result instanceof SearchResult.Orientable o) {
            w.println("orientable: " + from + "; no non-orientable minor to find, no certificate written");
            if (witnessOut != null) {
                Inputs.write(witnessOut, ResultJson.chirotope(o.witness()));
                w.println("wrote the witness to " + witnessOut);
            }
        } else if (result instanceof SearchResult.Unknown u) {
            w.println("unknown: " + u.reason() + "; no certificate written");
        }
        return ExitCodes.of(result);
    }

    /** The constraints of --rank, --keep and --avoid, checked against the input. */
    private CoreConstraints constraints(Inputs.Input input) {
        if (totalTime < 0 || Double.isNaN(totalTime)) {
            throw new ParameterException(spec.commandLine(), "--total-time must not be negative; got " + totalTime + ".");
        }
        try {
            CoreConstraints c = new CoreConstraints(rank == null ? OptionalInt.empty() : OptionalInt.of(rank), keep,
                    avoid);
            c.validate(input.matroid());
            return c;
        } catch (IllegalArgumentException e) {
            throw new ParameterException(spec.commandLine(), e.getMessage());
        }
    }

    /** Certifies {@code core}, writes and verifies the certificate, and prints the summary. */
    private int certify(PrintWriter w, String from, MinimalCore core, Inputs.Input input) {
        Certification certification = Certification.of(core, input.source(), budget.budget());
        if (certification instanceof Certification.OutOfBudget o) {
            w.println("unknown: a core was found, but proving it for the certificate ran out of budget: "
                    + o.reason() + "; no certificate written");
            return ExitCodes.UNKNOWN;
        }
        Certificate certificate = ((Certification.Certified) certification).certificate();
        // The verifier reads a given matroid's file only with --input, and its reader does not yet
        // take a matrix file without labels or element count; for a file input the provenance check is
        // left to `verify CERT --input FILE` and everything else is checked here.
        summarise(w, from, core, certificate, VerifiedCertificates.writeVerified(out, certificate, Optional.empty()));
        return ExitCodes.OK;
    }

    /** The input chosen by exactly one of FILE and --cube. */
    private Inputs.Input input() {
        if ((file == null) == (cube == null)) {
            throw new ParameterException(spec.commandLine(), "Give exactly one of FILE or --cube N; "
                    + (file == null ? "neither was given." : "both were given."));
        }
        if (file == null) {
            return Inputs.build(construction.construction(cube, contractPulled));
        }
        if (construction.anyGiven() || spec.commandLine().getParseResult().hasMatchedOption("--contract-pulled")) {
            throw new ParameterException(spec.commandLine(),
                    "--field, --hyperplane, --pull and --[no-]contract-pulled only go with --cube, not with FILE.");
        }
        return Inputs.read(file);
    }

    private static void summarise(PrintWriter w, String from, MinimalCore core, Certificate certificate,
            CertificateWriter.Written written) {
        w.println("non-orientable core: " + Format.shape(core.core().rank(), core.core().size(),
                core.core().basisCount()) + " (from " + from + ")");
        w.println("contracted: " + Format.labels(core.contracted()));
        w.println("deleted: " + Format.labels(core.deleted()));
        w.println("witnesses: " + core.witnesses().size()
                + " (every single-element deletion and contraction is orientable)");
        w.println("search: " + core.stats().millis() + " ms, " + core.stats().decisions() + " decisions");
        Refutation proof = certificate.refutation();
        w.println("proof: " + proof.relations().size() + " relations, " + proof.stats().lemmas() + " lemmas, "
                + proof.stats().deletions() + " deletions, " + proof.drat().length() + " bytes of DRAT, "
                + proof.stats().solve().millis() + " ms");
        w.println("wrote " + written.certificate() + " (sha256 " + written.sha256() + ")"
                + written.dratFile().map(d -> " and " + d).orElse("") + "; verified by the independent checker");
    }
}
