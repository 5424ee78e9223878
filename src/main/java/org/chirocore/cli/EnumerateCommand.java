package org.chirocore.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;
import java.util.concurrent.Callable;

import org.chirocore.cert.CertificateWriter;
import org.chirocore.cert.CoreFinding;
import org.chirocore.cert.Source;
import org.chirocore.io.Json;
import org.chirocore.matroid.CubeConstruction;
import org.chirocore.matroid.ExplicitMatroid;
import org.chirocore.matroid.Limits;
import org.chirocore.orient.Chirotope;
import org.chirocore.pipeline.CertifiedReduction;
import org.chirocore.pipeline.Subject;
import org.chirocore.search.CoreConstraints;
import org.chirocore.search.SearchSettings;
import org.chirocore.search.SteeredSearch;
import org.chirocore.search.Strategy;
import org.chirocore.search.marco.CoreEnumeration;
import org.chirocore.search.marco.Symmetry;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/**
 * {@code chirocore enumerate}: every minor-minimal non-orientable minor of a matroid file or a
 * cube construction (of one rank, or of every rank from rank(M) down to 3), grouped into
 * isomorphism classes with counts, contraction sets taken up to a symmetry group; one verified
 * certificate per class, {@code summary.json} and {@code summary.md} in the output directory.
 */
@Command(name = "enumerate", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = {"List every minor-minimal non-orientable minor, up to isomorphism, with how many minors of the "
                + "input fall in each class and a verified certificate per class.",
                "The matroid is FILE, or the n-cube of --cube with the vertex of --pull pulled to --hyperplane."},
        exitCodeListHeading = "%nExit codes:%n",
        exitCodeList = {"0:the enumeration is complete", "2:bad usage or bad input",
                "3:incomplete: a budget ran out (the classes found are still listed and certified)"})
final class EnumerateCommand implements Callable<Integer> {
    /** The summary's file names in the output directory. */
    static final String SUMMARY_JSON = "summary.json";
    static final String SUMMARY_MD = "summary.md";
    /** The completeness evidence, written when the enumeration is complete (docs/enumeration.md). */
    static final String COMPLETENESS_JSON = "completeness.json";

    @Spec
    private CommandSpec spec;

    @Mixin
    private InputOptions inputs;

    @Option(names = "--rank", paramLabel = "R", description = "Only cores of rank R (default: every rank from "
            + "rank(M) down to 3).")
    private Integer rank;

    @Option(names = "--symmetry", paramLabel = "GROUP", defaultValue = "auto",
            description = "auto (default): for --cube the cube symmetries fixing H and O, for FILE its automorphisms; "
                    + "none: no symmetry.")
    private String symmetry;

    @Mixin
    private SeedOption seed;

    @Mixin
    private BudgetOptions budget;

    @Mixin
    private ProofFormOptions proofForms;

    @Option(names = "--total-time", paramLabel = "SECONDS", defaultValue = "0",
            description = "Wall-clock limit of the enumeration (not of the certificates written after it), after which "
                    + "it ends incomplete with the classes found so far; 0 (default) for none.")
    private double totalTime;

    @Option(names = "--out", paramLabel = "DIR", required = true, description = "Output directory.")
    private Path out;

    @Mixin
    private OutputOptions output;

    @Override
    public Integer call() {
        if (!symmetry.equals("auto") && !symmetry.equals("none")) {
            throw new ParameterException(spec.commandLine(), "--symmetry is auto or none, not \"" + symmetry + "\".");
        }
        if (totalTime < 0 || Double.isNaN(totalTime)) {
            throw new ParameterException(spec.commandLine(), "--total-time must not be negative; got " + totalTime + ".");
        }
        output.checkDirectory(out, Arrays.asList(inputs.file()), List.of(SUMMARY_JSON, SUMMARY_MD, COMPLETENESS_JSON));
        Subject input = inputs.choose();
        if (!SteeredSearch.explorable(input.matroid())) {
            throw new BadInputException("the matroid (rank " + input.matroid().rank() + " on " + input.matroid().size()
                    + " elements) is too large to enumerate: at most " + Limits.ENUMERATED_ELEMENTS + " elements and " + SteeredSearch.EXPLORED_SUBSETS
                    + " r-subsets", null);
        }
        ExplicitMatroid m = ExplicitMatroid.of(input.matroid());
        CoreConstraints constraints = new CoreConstraints(rank == null ? OptionalInt.empty() : OptionalInt.of(rank),
                List.of(), List.of());
        try {
            constraints.validate(m);
        } catch (IllegalArgumentException e) {
            throw new ParameterException(spec.commandLine(), e.getMessage());
        }
        Symmetry group = group(input, m, symmetry.equals("none"));
        try {
            Files.createDirectories(out);
        } catch (IOException e) {
            throw new BadInputException(out + ": cannot create the output directory: " + e, e);
        }
        long deadline = totalTime == 0 ? 0 : System.currentTimeMillis() + Math.round(totalTime * 1000);
        SearchSettings settings = new SearchSettings(seed.seed(), Strategy.CONTRACT_FIRST, budget.budget().until(deadline));
        ConsoleProgress progress = ConsoleProgress.ifInteractive(spec.commandLine().getErr());
        CoreEnumeration.Result result = new CoreEnumeration(settings, constraints, group, progress).enumerate(m);
        progress.finish();
        List<Optional<CertificateWriter.Written>> certificates = new ArrayList<>();
        for (int k = 0; k < result.classes().size(); k++) {
            certificates.add(certify(result.classes().get(k), input, k + 1));
        }
        Inputs.write(out.resolve(SUMMARY_JSON), summaryJson(input, m, group, result, certificates));
        boolean evidence = result.complete() && result.evidence().size() == result.representatives();
        if (evidence) {
            Inputs.write(out.resolve(COMPLETENESS_JSON), completenessJson(input, m, group, result, certificates));
        }
        String markdown = summaryMarkdown(m, group, result, certificates);
        Inputs.writeText(out.resolve(SUMMARY_MD), markdown);
        PrintWriter w = spec.commandLine().getOut();
        w.print(markdown);
        if (result.complete() && !evidence) {
            w.println("no completeness evidence: its witnesses would exceed " + CoreEnumeration.EVIDENCE_SIGNS + " signs");
        }
        w.println("wrote " + out.resolve(SUMMARY_JSON) + ", " + out.resolve(SUMMARY_MD) + " and "
                + certificates.stream().filter(Optional::isPresent).count() + " verified certificates");
        return result.complete() ? ExitCodes.OK : ExitCodes.UNKNOWN;
    }


    /**
     * The group of {@code input}: none when asked, the cube's subgroup fixing H and O for a cube
     * construction, else the automorphism group of m.
     */
    static Symmetry group(Subject input, ExplicitMatroid m, boolean none) {
        if (none) {
            return Symmetry.none(m.size());
        }
        if (input.source() instanceof Source.Constructed c) {
            return c.construction() instanceof CubeConstruction cube ? Symmetry.ofCube(cube, m) : Symmetry.none(m.size());
        }
        try {
            return Symmetry.automorphisms(m);
        } catch (IllegalArgumentException e) {
            throw new BadInputException(input.file().map(Path::toString).orElse("the input") + ": " + e.getMessage(), e);
        }
    }

    /** The class's certificate, written and verified, or empty when its refutation ran out of budget. */
    private Optional<CertificateWriter.Written> certify(CoreEnumeration.CoreClass c, Subject input, int k) {
        try {
            CertifiedReduction.Outcome outcome = CertifiedReduction.certify(CoreFinding.searched(c.example(),
                    input.source()), budget.budget(), out.resolve(certificateName(k)), input.file(), proofForms.forms());
            return outcome instanceof CertifiedReduction.Verified v ? Optional.of(v.written()) : Optional.empty();
        } catch (IOException e) {
            throw new BadInputException(out.resolve(certificateName(k)) + ": cannot write the certificate: " + e, e);
        }
    }

    static String certificateName(int k) {
        return "class-" + k + ".cert.json";
    }

    /**
     * The completeness evidence: the input, the group's permutations (image of each element by
     * number), each class's certificate, and per representative contraction set its maximal
     * orientable restrictions with their witnesses' signs and its minimal non-orientable ones.
     */
    private static Json completenessJson(Subject input, ExplicitMatroid m, Symmetry group, CoreEnumeration.Result r,
            List<Optional<CertificateWriter.Written>> certificates) {
        List<Json> sets = new ArrayList<>();
        for (CoreEnumeration.ContractionEvidence e : r.evidence()) {
            List<Json> maximal = new ArrayList<>();
            for (CoreEnumeration.MaximalOrientable t : e.maximal()) {
                maximal.add(Json.Obj.builder().put("elements", Json.Arr.ofStrings(t.elements()))
                        .put("signs", t.witness().<Json>map(w -> new Json.Str(signs(w))).orElse(Json.NULL)).build());
            }
            sets.add(Json.Obj.builder().put("contracted", Json.Arr.ofStrings(e.contracted()))
                    .put("maximalOrientable", new Json.Arr(maximal))
                    .put("minimalNonOrientable", new Json.Arr(e.minimal().stream().<Json>map(EnumerateCommand::minimal).toList()))
                    .build());
        }
        List<Json> permutations = group.permutations().stream().<Json>map(
                p -> new Json.Arr(Arrays.stream(p).<Json>mapToObj(Json.Num::of).toList())).toList();
        List<Json> classes = new ArrayList<>();
        for (int k = 0; k < certificates.size(); k++) {
            classes.add(certificates.get(k).isPresent() ? new Json.Str(certificateName(k + 1)) : Json.NULL);
        }
        return Json.Obj.builder()
                .put("format", "chirocore-completeness")
                .put("version", 2)
                .put("input", source(input, m))
                .put("labels", Json.Arr.ofStrings(m.labels()))
                .put("ranks", new Json.Arr(r.ranks().stream().<Json>map(Json.Num::of).toList()))
                .put("symmetry", Json.Obj.builder().put("kind", group.kind())
                        .put("permutations", new Json.Arr(permutations)).build())
                .put("certificates", new Json.Arr(classes))
                .put("contractionSets", new Json.Arr(sets))
                .build();
    }

    /**
     * A minimal non-orientable set: its elements, and its proof when it has one: a dead end's
     * contracted element and the refutation of that contraction, or a core's class and element map.
     */
    private static Json minimal(CoreEnumeration.MinimalSet s) {
        Json.Obj.Builder b = Json.Obj.builder().put("elements", Json.Arr.ofStrings(s.elements()));
        if (s.proof().orElse(null) instanceof CoreEnumeration.DeadEnd d) {
            b.put("deadEnd", Json.Obj.builder().put("contracted", d.contracted())
                    .put("nonOrientability", CertificateWriter.nonOrientability(d.minor(), d.refutation())).build());
        } else if (s.proof().orElse(null) instanceof CoreEnumeration.ClassMember c) {
            b.put("classMember", Json.Obj.builder().put("class", c.classNumber())
                    .put("images", Json.Arr.ofStrings(c.images())).build());
        }
        return b.build();
    }

    /** A witness's signs as '+' and '-', one per basis in canonical order. */
    private static String signs(Chirotope w) {
        StringBuilder b = new StringBuilder();
        for (int i = 0; i < w.size(); i++) {
            b.append(w.sign(i) > 0 ? '+' : '-');
        }
        return b.toString();
    }

    /** The input as the certificates' provenance records it: the construction, or the file's hash; size and rank. */
    private static Json source(Subject input, ExplicitMatroid m) {
        Json.Obj.Builder source = Json.Obj.builder();
        if (input.source() instanceof Source.Constructed c) {
            source.put("construction", CertificateWriter.construction(c.construction()));
        } else if (input.source() instanceof Source.Given g) {
            source.put("sha256", g.sha256());
        }
        return source.put("elements", m.size()).put("rank", m.rank()).build();
    }

    private static Json summaryJson(Subject input, ExplicitMatroid m, Symmetry group,
            CoreEnumeration.Result r, List<Optional<CertificateWriter.Written>> certificates) {
        List<Json> classes = new ArrayList<>();
        for (int k = 0; k < r.classes().size(); k++) {
            CoreEnumeration.CoreClass c = r.classes().get(k);
            ExplicitMatroid core = c.example().core();
            Optional<CertificateWriter.Written> written = certificates.get(k);
            classes.add(Json.Obj.builder()
                    .put("class", k + 1)
                    .put("elements", core.size())
                    .put("rank", core.rank())
                    .put("bases", core.basisCount())
                    .put("count", c.count())
                    .put("example", Json.Obj.builder()
                            .put("labels", Json.Arr.ofStrings(core.labels()))
                            .put("contracted", Json.Arr.ofStrings(c.example().contracted()))
                            .build())
                    .put("certificate", written.isPresent() ? new Json.Str(certificateName(k + 1)) : Json.NULL)
                    .put("sha256", written.<Json>map(x -> new Json.Str(x.sha256())).orElse(Json.NULL))
                    .put("foundAtMillis", c.foundAtMillis())
                    .put("solverCallsAtDiscovery", c.solverCallsAtDiscovery())
                    .build());
        }
        return Json.Obj.builder()
                .put("format", "chirocore-enumeration")
                .put("version", 1)
                .put("input", source(input, m))
                .put("ranks", new Json.Arr(r.ranks().stream().<Json>map(Json.Num::of).toList()))
                .put("symmetry", Json.Obj.builder().put("kind", group.kind()).put("order", group.order()).build())
                .put("complete", r.complete())
                .put("incomplete", r.incomplete().<Json>map(Json.Str::new).orElse(Json.NULL))
                .put("contractionSets", Json.Obj.builder().put("representatives", r.representatives())
                        .put("all", r.contractionSets()).build())
                .put("maximalOrientableRestrictions", r.maximal())
                .put("minimalNonOrientableRestrictions", r.restrictions())
                .put("withNonOrientableContraction", r.deadEnds())
                .put("solverCalls", r.solverCalls())
                .put("millis", r.millis())
                .put("classes", new Json.Arr(classes))
                .build();
    }

    private static String summaryMarkdown(ExplicitMatroid m, Symmetry group, CoreEnumeration.Result r,
            List<Optional<CertificateWriter.Written>> certificates) {
        StringBuilder b = new StringBuilder();
        b.append("# Minor-minimal non-orientable minors\n\n");
        b.append("Input: ").append(Format.shape(m.rank(), m.size())).append("; ranks ")
                .append(r.ranks()).append("; symmetry ").append(group.kind()).append(" (order ")
                .append(group.order()).append(").\n\n");
        b.append(r.complete() ? "The enumeration is **complete**: " : "The enumeration is **incomplete** ("
                + r.incomplete().orElseThrow() + "): ");
        b.append(r.representatives()).append(" contraction sets up to symmetry (")
                .append(r.contractionSets()).append(" in all), ").append(r.restrictions())
                .append(" minimal non-orientable restrictions, ").append(r.deadEnds())
                .append(" of them with a non-orientable single-element contraction; ").append(r.solverCalls())
                .append(" solver calls, ").append(r.millis()).append(" ms.\n\n");
        b.append("| class | elements | rank | bases | count | found at (ms) | solver calls then | certificate "
                + "| example (contracted; labels) |\n");
        b.append("|---".repeat(9)).append("|\n");
        for (int k = 0; k < r.classes().size(); k++) {
            CoreEnumeration.CoreClass c = r.classes().get(k);
            ExplicitMatroid core = c.example().core();
            b.append("| ").append(k + 1).append(" | ").append(core.size()).append(" | ").append(core.rank())
                    .append(" | ").append(core.basisCount()).append(" | ").append(c.count()).append(" | ")
                    .append(c.foundAtMillis()).append(" | ").append(c.solverCallsAtDiscovery()).append(" | ")
                    .append(certificates.get(k).isPresent() ? "`" + certificateName(k + 1) + "` verified"
                            : "none (refutation out of budget)")
                    .append(" | ").append(Format.labels(c.example().contracted())).append("; ")
                    .append(String.join(" ", core.labels())).append(" |\n");
        }
        return b.toString();
    }
}
