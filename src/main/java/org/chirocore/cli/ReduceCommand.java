package org.chirocore.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.OptionalInt;
import java.util.concurrent.Callable;

import org.chirocore.cert.Certificate;
import org.chirocore.cert.CertificateWriter;
import org.chirocore.cert.CoreFinding;
import org.chirocore.cert.Discovery;
import org.chirocore.io.IoMessages;
import org.chirocore.io.Json;
import org.chirocore.io.ResultJson;
import org.chirocore.matroid.Catalogue;
import org.chirocore.matroid.ExplicitMatroid;
import org.chirocore.orient.Refutation;
import org.chirocore.pipeline.CertifiedReduction;
import org.chirocore.pipeline.Subject;
import org.chirocore.search.CoreConstraints;
import org.chirocore.search.SteeredSearch;
import org.chirocore.search.Strategy;
import org.chirocore.search.marco.SmallestCore;
import org.chirocore.search.marco.Symmetry;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/**
 * {@code chirocore reduce}: reduces a matroid file or a cube construction to a minor-minimal
 * non-orientable minor, writes its certificate (docs/certificate-format.md) and verifies the written
 * file with the independent checker, all through {@link CertifiedReduction}. An orientable
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

    @Mixin
    private InputOptions inputs;

    @Mixin
    private SeedOption seed;

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

    @Mixin
    private ProofFormOptions proofForms;

    @Mixin
    private OutputOptions output;

    @Option(names = "--out", paramLabel = "FILE", required = true,
            description = "Where to write the certificate of the core (written atomically; a large proof goes "
                    + "beside it as NAME.drat.gz) and checked by the independent verifier. Nothing is written unless "
                    + "a core is found.")
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

    @Option(names = "--smallest",
            description = "Find a core with the fewest elements: every contraction set (up to the symmetry of the input) is "
                    + "searched for a non-orientable restriction smaller than the best so far, until none is left. Why "
                    + "nothing smaller exists goes to FILE.smallest.json beside the certificate. Not with --rank, --keep "
                    + "or --avoid.")
    private boolean smallest;

    @Option(names = "--total-time", paramLabel = "SECONDS", defaultValue = "0",
            description = "With --rank, --keep, --avoid or --smallest: wall-clock limit of the whole search, after which it "
                    + "answers unknown; 0 (default) for none.")
    private double totalTime;

    @Override
    public Integer call() {
        // A large proof goes beside the certificate, so its name is an output too.
        output.checkFiles(Arrays.asList(inputs.file()), out, CertificateWriter.proofFile(out, proofForms.forms().lratProof()), witnessOut,
                smallest ? smallestRecord(out) : null);
        Subject input = inputs.choose();
        CoreConstraints constraints = constraints(input);
        if (smallest && constraints.any()) {
            throw new ParameterException(spec.commandLine(), "--smallest does not combine with --rank, --keep or --avoid: "
                    + "a smallest minor meeting them need not be minor-minimal.");
        }
        ConsoleProgress progress = ConsoleProgress.ifInteractive(spec.commandLine().getErr());
        CertifiedReduction.Outcome outcome;
        try {
            CertifiedReduction.Settings settings = new CertifiedReduction.Settings(seed.seed(), strategy,
                    budget.budget(), proofForms.forms());
            Subject subject = focus ? input : input.withoutFocus();
            if (smallest) {
                return smallest(subject, settings, progress);
            }
            if (constraints.any()) {
                SteeredSearch.Result steered = new SteeredSearch(settings.search(subject), constraints,
                        Math.round(totalTime * 1000), progress).search(subject.matroid());
                if (steered instanceof SteeredSearch.NoneExists none) {
                    spec.commandLine().getOut().println("none exists: no minor-minimal non-orientable minor meets the "
                            + "constraints; enumerated " + none.enumerated() + "; no certificate written");
                    return ExitCodes.NONE_EXISTS;
                }
                outcome = steered instanceof SteeredSearch.Found f
                        ? CertifiedReduction.certify(CoreFinding.searched(f.core(), subject.source()), budget.budget(),
                                out, subject.file(), settings.forms())
                        : new CertifiedReduction.Unknown(((SteeredSearch.Unknown) steered).reason());
            } else {
                outcome = new CertifiedReduction(settings, progress).run(subject, out);
            }
        } catch (IOException e) {
            throw new BadInputException(out + ": cannot write the certificate: " + IoMessages.plain(e), e);
        } finally {
            progress.finish();
        }
        PrintWriter w = spec.commandLine().getOut();
        String from = Format.shape(input.matroid().rank(), input.matroid().size());
        if (outcome instanceof CertifiedReduction.Verified v) {
            summarise(w, from, input.matroid().size(), v);
            return ExitCodes.OK;
        }
        if (outcome instanceof CertifiedReduction.Orientable o) {
            w.println("orientable: " + from + "; no non-orientable minor to find, no certificate written");
            if (witnessOut != null) {
                Inputs.write(witnessOut, ResultJson.chirotope(o.witness()));
                w.println("wrote the witness to " + witnessOut);
            }
            return ExitCodes.OK;
        }
        w.println("unknown: " + ((CertifiedReduction.Unknown) outcome).reason() + "; no certificate written");
        return ExitCodes.UNKNOWN;
    }

    /** The side file of --smallest: the record of the contraction sets searched. */
    static Path smallestRecord(Path certificate) {
        return certificate.resolveSibling(certificate.getFileName() + ".smallest.json");
    }

    /** --smallest: the search, then the certificate of its answer and the record of why nothing is smaller. */
    private int smallest(Subject subject, CertifiedReduction.Settings settings, ConsoleProgress progress)
            throws IOException {
        ExplicitMatroid m = ExplicitMatroid.of(subject.matroid());
        Symmetry group = EnumerateCommand.group(subject, m, false);
        SmallestCore.Result r = new SmallestCore(settings.search(subject), group, Math.round(totalTime * 1000), progress).search(m);
        progress.finish();
        PrintWriter w = spec.commandLine().getOut();
        String from = Format.shape(m.rank(), m.size());
        if (r instanceof SmallestCore.Unknown u) {
            w.println("unknown: " + u.reason() + "; no certificate written");
            return ExitCodes.UNKNOWN;
        }
        if (r instanceof SmallestCore.NoneExists none) {
            w.println("orientable: " + from + "; every minor of at most " + m.size() + " elements was searched ("
                    + none.searched().size() + " contraction sets up to symmetry); no certificate written");
            return ExitCodes.OK;
        }
        SmallestCore.Found found = (SmallestCore.Found) r;
        CertifiedReduction.Outcome outcome = CertifiedReduction.certify(
                CoreFinding.searched(found.core(), subject.source()), budget.budget(), out, subject.file(),
                settings.forms());
        if (!(outcome instanceof CertifiedReduction.Verified v)) {
            w.println("unknown: " + ((CertifiedReduction.Unknown) outcome).reason() + "; no certificate written");
            return ExitCodes.UNKNOWN;
        }
        summarise(w, from, m.size(), v);
        int size = found.core().core().size();
        Inputs.write(smallestRecord(out), smallestJson(group, found));
        w.println("smallest: no non-orientable minor has fewer than " + size + " elements: "
                + found.searched().size() + " contraction sets up to symmetry ("
                + found.searched().stream().mapToInt(SmallestCore.Exhausted::orbit).sum() + " in all, symmetry "
                + group.kind() + " of order " + group.order() + ") each searched to exhaustion below "
                + size + " elements; wrote " + smallestRecord(out));
        return ExitCodes.OK;
    }

    private static Json smallestJson(Symmetry group, SmallestCore.Found found) {
        List<Json> sets = found.searched().stream().<Json>map(e -> Json.Obj.builder()
                .put("contracted", Json.Arr.ofStrings(e.contracted()))
                .put("orbit", e.orbit())
                .put("noNonOrientableRestrictionBelow", e.exhaustedBelow())
                .put("orientableRestrictions", e.orientable())
                .put("minimalNonOrientableRestrictions", e.nonOrientable())
                .put("solverCalls", e.solverCalls())
                .build()).toList();
        return Json.Obj.builder()
                .put("format", "chirocore-smallest-core")
                .put("version", 1)
                .put("elements", found.core().core().size())
                .put("symmetry", Json.Obj.builder().put("kind", group.kind()).put("order", group.order()).build())
                .put("trusted", "the producer's SAT answers (orientable restrictions and the exhausted map of "
                        + "unexplored subsets), not independently checked")
                .put("contractionSets", new Json.Arr(sets))
                .put("millis", found.millis())
                .build();
    }

    /** The constraints of --rank, --keep and --avoid, checked against the input. */
    private CoreConstraints constraints(Subject input) {
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


    private static void summarise(PrintWriter w, String from, int inputSize, CertifiedReduction.Verified v) {
        Certificate certificate = v.certificate();
        ExplicitMatroid core = certificate.core();
        w.println("non-orientable core: " + Format.shape(core.rank(), core.size(), core.basisCount()) + " (from "
                + from + ")");
        w.println("isomorphism class: " + Format.named(Catalogue.identify(core)));
        w.println("contracted: " + Format.labels(certificate.provenance().contracted()));
        w.println("deleted: " + Format.deleted(certificate.provenance().deleted(), core.size(),
                certificate.provenance().contracted().size(), inputSize));
        w.println("witnesses: " + 2 * certificate.minimality().size()
                + " (every single-element deletion and contraction is orientable; " + certificate.witnessCount("signs")
                + " by signs, " + certificate.witnessCount("transported") + " transported by automorphisms of the core, "
                + certificate.witnessCount("matrix") + " by matrices)");
        if (certificate.discovery() instanceof Discovery.Searched s) {
            w.println("search: " + s.stats().millis() + " ms, " + s.stats().decisions() + " decisions");
        }
        Refutation proof = certificate.refutation();
        w.println("proof: " + proof.relations().size() + " relations, " + proof.stats().lemmas() + " lemmas, "
                + proof.stats().deletions() + " deletions, " + proof.drat().length() + " bytes of DRAT, "
                + proof.stats().solve().millis() + " ms" + certificate.lrat().map(l -> "; written as " + l.length() + " bytes of LRAT").orElse(""));
        CertificateWriter.Written written = v.written();
        w.println("wrote " + written.certificate() + " (sha256 " + written.sha256() + ")"
                + written.proofFile().map(d -> " and " + d).orElse(""));
        w.println(Format.verified(v.verification()));
    }
}
