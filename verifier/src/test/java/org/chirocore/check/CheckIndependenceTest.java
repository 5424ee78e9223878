package org.chirocore.check;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;

/**
 * The verifier shares no code with what it checks (code-style lesson 6): its sources import only
 * java.* and each other, and name no other org.chirocore package even fully qualified, so that it
 * builds and runs with the JDK alone.
 */
class CheckIndependenceTest {
    static final Path SOURCES = Path.of("verifier/src/main/java/org/chirocore/check");
    static final List<String> ALLOWED = List.of("java.", "org.chirocore.check.");

    @Test
    void theCheckPackageImportsNothingItChecks() throws IOException {
        List<String> forbidden = new ArrayList<>();
        int files = 0;
        try (Stream<Path> paths = Files.list(SOURCES)) {
            for (Path file : paths.filter(p -> p.toString().endsWith(".java")).toList()) {
                files++;
                for (String line : Files.readAllLines(file)) {
                    String s = line.strip();
                    if (s.startsWith("import ") && ALLOWED.stream().noneMatch(a -> s.replace("import static ", "").replace("import ", "").startsWith(a))) {
                        forbidden.add(file.getFileName() + ": " + s);
                    }
                    for (String banned : List.of("org.chirocore.", "org.sat4j", "org.jgrapht", "picocli")) {
                        if (s.contains(banned) && !s.contains("org.chirocore.check")) {
                            forbidden.add(file.getFileName() + ": " + s);
                        }
                    }
                }
            }
        }
        assertTrue(files >= 5, "found only " + files + " sources in " + SOURCES.toAbsolutePath());
        assertEquals(List.of(), forbidden);
    }

    /** The verifier's Maven module declares one dependency, JUnit, for its tests only: it runs on the JDK alone. */
    @Test
    void theVerifierModuleDependsOnNothingAtRunTime() throws IOException {
        String pom = Files.readString(Path.of("verifier/pom.xml"));
        String dependencies = pom.substring(pom.indexOf("<dependencies>"), pom.indexOf("</dependencies>"));
        assertEquals(1, dependencies.split("<dependency>", -1).length - 1, dependencies);
        assertTrue(dependencies.contains("<artifactId>junit-jupiter</artifactId>") && dependencies.contains("<scope>test</scope>"),
                dependencies);
    }
}
