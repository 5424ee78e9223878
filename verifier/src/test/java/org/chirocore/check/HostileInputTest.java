package org.chirocore.check;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The hostile inputs of {@link HostileInputs}, each about 10 MB, verified in a separate JVM with a
 * 1 GB heap: every one is rejected with a FAIL line that names the limit or the defect, and nothing
 * is printed on stderr (no stack trace). The figures it prints are a benchmark, not asserted.
 * Tagged slow: it writes 30 MB and inflates 256 MiB.
 */
@Tag("slow")
class HostileInputTest {
    @Test
    void everyHostileInputIsRejectedWithinAOneGigabyteHeap(@TempDir Path dir) throws IOException, InterruptedException {
        Path java = Path.of(System.getProperty("java.home"), "bin", "java");
        Process p = new ProcessBuilder(java.toString(), "-Xmx1g", "-cp", System.getProperty("java.class.path"),
                HostileInputs.class.getName(), dir.toString()).start();
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        String err = new String(p.getErrorStream().readAllBytes(), StandardCharsets.UTF_8);
        assertEquals(0, p.waitFor(), out + err);
        System.out.print(out);
        assertEquals("", err);
        List<String> lines = out.lines().toList();
        assertEquals(4, lines.size(), out);
        assertTrue(lines.get(0).contains("FAIL after the hash: basis exchange: basis exchange fails: no y in"), lines.get(0));
        assertTrue(lines.get(1).contains("minimality witnesses: the sign witnesses need "), lines.get(1));
        assertTrue(lines.get(2).contains("clausal proof: line ") && lines.get(2).contains("propagation steps, the verifier's limit"), lines.get(2));
        assertTrue(lines.get(3).contains("clausal proof: cannot read: the uncompressed bomb.drat.gz has more than " + VerifierLimits.MAX_PROOF_BYTES),
                lines.get(3));
        lines.forEach(l -> assertTrue(l.contains("REJECTED; FAIL after the hash: ") && !l.contains("after the hash: none"), l));
    }
}
