package org.chirocore.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;

import org.chirocore.family.Shard;
import org.chirocore.io.MatroidFiles;
import org.chirocore.matroid.CubeGeometry;
import org.chirocore.matroid.CubeHyperplane;
import org.chirocore.matroid.ExplicitMatroid;
import org.chirocore.matroid.Field;
import org.chirocore.matroid.CubeReport;
import org.chirocore.matroid.Limits;
import org.chirocore.matroid.Matroid;

import org.chirocore.sweep.GeneralPositionPairs;
import org.chirocore.sweep.HyperplaneOrbit;
import org.chirocore.sweep.HyperplaneOrbits;
import org.chirocore.sweep.PullCandidate;
import org.chirocore.sweep.SweepRun;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code chirocore cube N}: facts about the affine N-cube and, optionally, a hyperplane and a vertex to pull. */
@Command(name = "cube", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = {"Print facts about the affine N-cube: elements, rank, facets, skew facets, rectangles and "
                + "hyperplanes.",
                "With --orbits: the hyperplanes up to symmetry and the general-position pairs.",
                "With --hyperplane: its equation, its vertices and whether it is a hyperplane; with --pull too: "
                        + "whether H and the vertex are in general position."})
final class CubeCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Parameters(paramLabel = "N", description = "The dimension of the cube.")
    private int n;

    @Mixin
    private ConstructionOptions construction;

    @Mixin
    private OutputOptions output;

    @Option(names = "--save", paramLabel = "FILE",
            description = "Write the pulled matroid (needs --hyperplane and --pull) to FILE as a matroid file with "
                    + "its bases: at most " + Limits.ELEMENTS + " elements and " + Limits.EXPLICIT_SUBSETS
                    + " subsets of the rank's size (n <= 5).")
    private Path save;

    @Option(names = "--contract-pulled", negatable = true, defaultValue = "true", fallbackValue = "true",
            description = "With --save: contract the pulled vertex first (default: yes).")
    private boolean contractPulled;

    @Option(names = "--orbits",
            description = "List the hyperplanes of the real N-cube up to the cube's symmetry group (one canonical "
                    + "equation per orbit, its number of vertices and orbit size) and the general-position pairs (H, O) "
                    + "up to symmetry, for N = 2.." + HyperplaneOrbits.MAX_DIMENSION + " (N = 7 takes seconds, "
                    + "N = 8 hours).")
    private boolean orbits;

    @Option(names = "--part", paramLabel = "i/k",
            description = "With --orbits: only part i of k of the enumeration (its search prefixes dealt out "
                    + "round-robin), for splitting N >= 8 over machines; the parts together give every orbit once.")
    private String part;

    @Override
    public Integer call() {
        // Every option is checked before the first line is printed, so bad input leaves no partial output.
        if (orbits && (n < SweepRun.MIN_DIMENSION || n > HyperplaneOrbits.MAX_DIMENSION)) {
            throw new ParameterException(spec.commandLine(), "--orbits needs N within " + SweepRun.MIN_DIMENSION + ".."
                    + HyperplaneOrbits.MAX_DIMENSION + ", not " + n + ".");
        }
        if (orbits && !construction.field().equals(Field.RATIONALS)) {
            throw new ParameterException(spec.commandLine(), "--orbits lists the hyperplanes of the real cube; "
                    + "it cannot be combined with --field " + construction.field() + ".");
        }
        if (part != null && !orbits) {
            throw new ParameterException(spec.commandLine(), "--part splits the enumeration of --orbits; give --orbits too.");
        }
        Shard split;
        try {
            split = part == null ? Shard.ALL : Shard.parse(part);
        } catch (IllegalArgumentException e) {
            throw new ParameterException(spec.commandLine(), "--part: " + e.getMessage());
        }
        output.checkFiles(List.of(), save);
        Matroid saved = null;
        if (save != null) {
            saved = Inputs.build(construction.construction(n, contractPulled)).matroid();
            // Checked before the C(n, r) rank tests of the enumeration, which are the long part.
            Limits.requireExplicit(saved.size(), saved.rank(), "--save " + save + ": the pulled matroid");
        }
        CubeReport r;
        try {
            r = CubeReport.of(n, construction.field(), construction.hyperplane(), construction.pull());
        } catch (IllegalArgumentException e) {
            // A dimension out of range, or a hyperplane description that does not fit the cube at all.
            throw new BadInputException(e.getMessage(), e);
        }
        PrintWriter out = spec.commandLine().getOut();
        out.println(r.n() + "-cube over " + r.field() + ": " + r.elements() + " elements, rank " + r.rank());
        out.println("facets: " + r.facets());
        out.println("skew facets: " + r.skewFacets());
        out.println("rectangles: " + r.rectangles());
        out.println("hyperplanes: " + (r.hyperplanes().isPresent() ? String.valueOf(r.hyperplanes().getAsInt())
                : "not enumerated (listed one by one only for the real cube with n <= "
                        + CubeGeometry.MAX_ENUMERATED_DIMENSION + "; --orbits counts them up to symmetry)"));
        r.hyperplane().ifPresent(h -> {
            out.println("H: " + h.equation().orElse("(not the vertex set of a real hyperplane)"));
            out.println("H vertices: " + Format.labels(h.vertices()));
            out.println("H is a hyperplane: " + h.problem().map(p -> "no: " + p).orElse("yes"));
        });
        r.pull().ifPresent(p -> out.println("pulling " + p.vertex() + " to H: "
                + p.problem().map(why -> "not possible: " + why).orElse("in general position")));
        if (orbits) {
            printOrbits(out, split);
        }
        if (saved != null) {
            Inputs.write(save, MatroidFiles.toJson(ExplicitMatroid.of(saved)));
            out.println("wrote " + save + " (rank " + saved.rank() + " on " + saved.size() + " elements)");
        }
        return ExitCodes.OK;
    }

    private void printOrbits(PrintWriter out, Shard split) {
        long[] candidates = {0};
        PrintWriter err = spec.commandLine().getErr();
        boolean progress = System.console() != null;
        long started = System.nanoTime();
        List<HyperplaneOrbit> found = HyperplaneOrbits.part(n, split.index(), split.count(),
                (m, done, total, orbitsSoFar, normals) -> {
                    if (done == total) {
                        candidates[0] += normals;
                    }
                    if (progress) {
                        // whole lines on a terminal, like a family run's progress
                        err.println(String.format("%7.1f s  %d-cube: %d of %d search prefixes, %d orbits so far",
                                (System.nanoTime() - started) / 1e9, m, done, total, orbitsSoFar));
                        err.flush();
                    }
                });
        out.println("hyperplane orbits" + (part == null ? "" : " in part " + split.index() + "/" + split.count()) + ": "
                + found.size() + " (" + found.stream().mapToLong(HyperplaneOrbit::orbitSize).sum() + " hyperplanes; "
                + candidates[0] + " candidate normals searched)");
        List<PullCandidate> general = new ArrayList<>();
        for (HyperplaneOrbit h : found) {
            CubeHyperplane rep = h.representative();
            out.println("  " + rep.equation() + ": " + rep.vertices().size() + " vertices, orbit size " + h.orbitSize());
            GeneralPositionPairs.of(h).stream().filter(PullCandidate::inGeneralPosition).forEach(general::add);
        }
        out.println("general-position pairs up to symmetry: " + general.size() + " ("
                + general.stream().mapToLong(PullCandidate::orbitSize).sum() + " pairs)");
        for (PullCandidate c : general) {
            out.println("  " + c.hyperplane().representative().equation() + ", O = " + c.vertex() + ": orbit size "
                    + c.orbitSize());
        }
    }
}
