package org.chirocore.check;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;

import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The canonical text of docs/certificate-format.md is specified completely: an independent script
 * in another language (docs/certificate-hash.py, Python 3) recomputes the recorded hash of every
 * stored certificate, and detects a changed content. Where python3 is missing the test says so
 * loudly and is reported as skipped, never as passed.
 */
class CanonicalHashScriptTest {
    static final Path SCRIPT = Path.of("docs/certificate-hash.py");

    static boolean hasPython() {
        try {
            return new ProcessBuilder("python3", "--version").redirectErrorStream(true).start().waitFor() == 0;
        } catch (IOException e) {
            return false;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return false;
        }
    }

    static List<String> run(List<Path> certificates) throws IOException, InterruptedException {
        List<String> command = new ArrayList<>(List.of("python3", SCRIPT.toString()));
        certificates.forEach(c -> command.add(c.toString()));
        Process p = new ProcessBuilder(command).redirectErrorStream(true).start();
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        p.waitFor();
        return out.lines().toList();
    }

    @Test
    void thePythonScriptRecomputesEveryStoredHash(@TempDir Path dir) throws IOException, InterruptedException {
        if (!hasPython()) {
            System.out.println("WARNING: python3 is not installed; docs/certificate-hash.py was NOT checked against the stored certificates.");
        }
        Assumptions.assumeTrue(hasPython(), "python3 is not installed");
        List<Path> stored;
        try (Stream<Path> files = Files.list(Path.of("certificates"))) {
            stored = files.filter(f -> f.toString().endsWith(".cert.json")).sorted().toList();
        }
        List<String> lines = run(stored);
        assertEquals(stored.size(), lines.size(), String.join("\n", lines));
        for (String line : lines) {
            String[] f = line.split(" ");
            assertEquals("ok", f[3], line);
            assertEquals(f[1], f[2], line);
        }
        // one changed label, hash left as recorded: the script must notice
        String fano = Files.readString(Path.of("certificates/fano.cert.json"));
        Path changed = dir.resolve("changed.cert.json");
        Files.writeString(changed, fano.replaceFirst("\"a\"", "\"\\\\u00e9\\\\t\""));
        String line = run(List.of(changed)).get(0);
        assertTrue(line.endsWith(" MISMATCH"), line);
    }
}
