package org.chirocore.architecture;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Keeps the package dependencies of DEVELOPERS.md true by scanning import lines: only
 * {@code orient} talks to sat4j, and no library package reaches up into the CLI or sideways into
 * a package it must not know. The verifier, package {@code check} in the module {@code verifier/},
 * is held to the JDK alone by its own {@code CheckIndependenceTest}.
 */
class DependencyRulesTest {
    private static final Path MAIN = Path.of("src/main/java/org/chirocore");

    @ParameterizedTest(name = "{0} does not import {1}")
    @CsvSource({
        "matroid, org.sat4j", "search, org.sat4j", "io, org.sat4j", "cli, org.sat4j",
        "matroid, org.chirocore.orient", "matroid, org.chirocore.search", "matroid, org.chirocore.cli",
        "matroid, org.chirocore.io",
        "orient, org.chirocore.search", "orient, org.chirocore.cli", "orient, org.chirocore.io",
        "search, org.chirocore.cli", "search, org.chirocore.io",
        "io, org.chirocore.cli", "io, org.chirocore.search", "io, org.chirocore.cert",
        "cert, org.sat4j", "cert, org.chirocore.cli",
        "matroid, org.chirocore.cert", "orient, org.chirocore.cert", "search, org.chirocore.cert",
        "family, org.sat4j", "family, org.chirocore.cli",
        "matroid, org.chirocore.family", "orient, org.chirocore.family", "search, org.chirocore.family",
        "io, org.chirocore.family", "cert, org.chirocore.family", "cert, org.chirocore.check",
        "proof, org.sat4j", "proof, org.chirocore.cli", "proof, org.chirocore.io", "proof, org.chirocore.cert",
        "proof, org.chirocore.check", "proof, org.chirocore.search", "proof, org.chirocore.family",
        "matroid, org.chirocore.proof", "orient, org.chirocore.proof",
        "report, org.sat4j", "report, org.chirocore.cli", "report, org.chirocore.orient",
        "report, org.chirocore.search", "report, org.chirocore.family",
        "family, org.chirocore.report",
        "sweep, org.sat4j", "sweep, org.chirocore.cli", "sweep, org.chirocore.report", "sweep, org.chirocore.proof",
        "matroid, org.chirocore.sweep", "orient, org.chirocore.sweep", "search, org.chirocore.sweep",
        "io, org.chirocore.sweep", "cert, org.chirocore.sweep",
        "family, org.chirocore.sweep", "pipeline, org.chirocore.sweep", "report, org.chirocore.sweep", "proof, org.chirocore.sweep",
        "pipeline, org.sat4j", "pipeline, org.chirocore.cli", "pipeline, org.chirocore.family",
        "pipeline, org.chirocore.report", "pipeline, org.chirocore.proof",
        "matroid, org.chirocore.pipeline", "orient, org.chirocore.pipeline", "search, org.chirocore.pipeline",
        "io, org.chirocore.pipeline", "cert, org.chirocore.pipeline",
        "report, org.chirocore.pipeline",
        "family, org.chirocore.cert.Certification", "sweep, org.chirocore.cert.Certification", "cli, org.chirocore.cert.Certification",
    })
    void packageDoesNotImport(String pkg, String forbidden) throws IOException {
        assertEquals(List.of(), importsOf(pkg, forbidden));
    }

    private static List<String> importsOf(String pkg, String prefix) throws IOException {
        List<String> offending = new ArrayList<>();
        try (Stream<Path> files = Files.walk(MAIN.resolve(pkg))) {
            for (Path f : files.filter(p -> p.toString().endsWith(".java")).toList()) {
                for (String line : Files.readAllLines(f)) {
                    String t = line.trim();
                    if (t.startsWith("import ") && t.replace("import static ", "").replace("import ", "")
                            .startsWith(prefix)) {
                        offending.add(f.getFileName() + ": " + t);
                    }
                }
            }
        }
        return offending;
    }

    /**
     * The "may import" column of DEVELOPERS.md's package table, as an allow-list: every package in
     * the source tree has a row, and imports nothing from this project, sat4j, jgrapht or picocli
     * beyond its row ({@code cli} may import everything).
     */
    private static final Map<String, Set<String>> MAY_IMPORT = Map.ofEntries(
            Map.entry("matroid", Set.of("org.jgrapht")),
            Map.entry("orient", Set.of("matroid", "org.sat4j")),
            Map.entry("search", Set.of("matroid", "orient")),
            Map.entry("io", Set.of("matroid", "orient")),
            Map.entry("cert", Set.of("matroid", "orient", "search", "io", "proof")),
            Map.entry("pipeline", Set.of("matroid", "orient", "search", "cert", "io", "check")),
            Map.entry("proof", Set.of("matroid", "orient")),
            Map.entry("report", Set.of("io", "matroid", "cert", "check")),
            Map.entry("family", Set.of("matroid", "orient", "search", "cert", "pipeline", "check", "io")),
            Map.entry("sweep", Set.of("matroid", "orient", "search", "cert", "check", "pipeline", "family", "io")));

    @Test
    void everyPackageImportsOnlyWhatTheTableAllows() throws IOException {
        List<String> offending = new ArrayList<>();
        try (Stream<Path> dirs = Files.list(MAIN)) {
            for (Path dir : dirs.filter(Files::isDirectory).sorted().toList()) {
                String pkg = dir.getFileName().toString();
                if (pkg.equals("cli")) {
                    continue;
                }
                Set<String> allowed = MAY_IMPORT.get(pkg);
                if (allowed == null) {
                    offending.add(pkg + ": no row in DEVELOPERS.md's package table");
                    continue;
                }
                for (String used : dependenciesOf(pkg)) {
                    if (!used.equals(pkg) && !allowed.contains(used)) {
                        offending.add(pkg + " imports " + used);
                    }
                }
            }
        }
        assertEquals(List.of(), offending);
    }

    /** The project packages and third-party roots (org.sat4j, org.jgrapht, picocli) imported by a package. */
    private static Set<String> dependenciesOf(String pkg) throws IOException {
        Set<String> used = new TreeSet<>();
        try (Stream<Path> files = Files.walk(MAIN.resolve(pkg))) {
            for (Path f : files.filter(p -> p.toString().endsWith(".java")).toList()) {
                for (String line : Files.readAllLines(f)) {
                    String t = line.trim();
                    if (!t.startsWith("import ")) {
                        continue;
                    }
                    String name = t.replace("import static ", "").replace("import ", "");
                    if (name.startsWith("org.chirocore.")) {
                        used.add(name.substring("org.chirocore.".length()).split("\\.")[0]);
                    } else {
                        for (String root : List.of("org.sat4j", "org.jgrapht", "picocli")) {
                            if (name.startsWith(root + ".")) {
                                used.add(root);
                            }
                        }
                    }
                }
            }
        }
        return used;
    }
}
