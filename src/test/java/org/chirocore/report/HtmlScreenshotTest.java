package org.chirocore.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.TimeUnit;

import javax.imageio.ImageIO;

import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * HTML reports seen in a real headless browser (Debian's chromium): a rank-3 core (the Fano
 * plane), a cube construction (the corner family at n = 4, with its cube and configuration) and
 * a family report. Each page must not be blank and must show its pictures (coloured pixels:
 * the configuration's lines, the cube's marks, the charts' series). Tagged "browser" and left
 * out of the default run, which needs only Java and Maven; {@code .ci/run} installs chromium
 * and runs this tag after the default suite. The screenshots are kept in
 * {@code target/screenshots/} for a person to look at.
 */
@Tag("browser")
class HtmlScreenshotTest {
    private static final Path CHROMIUM = Path.of("/usr/bin/chromium");

    @TempDir
    Path dir;

    @ParameterizedTest(name = "{0}")
    @CsvSource({"fano, certificates/fano.cert.json, 300", "corner-n4, certificates/corner-n4.cert.json, 600",
        "corner-family, families/corner, 1500"})
    void reportRendersWithTextAndPictures(String name, Path subject, int minColoured) throws IOException, InterruptedException {
        assertTrue(Files.isExecutable(CHROMIUM), "the browser test needs " + CHROMIUM + " (apt-get install chromium)");
        Path html = dir.resolve(name + ".html");
        Document doc = Files.isDirectory(subject) ? RunReport.of(subject) : CertificateReport.of(subject, Optional.empty());
        ReportWriter.write(doc, ReportFormat.HTML, html, true);
        Path shots = Path.of("target/screenshots");
        Files.createDirectories(shots);
        Path png = shots.resolve(name + ".png");
        Process browser = new ProcessBuilder(List.of(CHROMIUM.toString(), "--headless", "--no-sandbox", "--disable-gpu",
                "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update",
                "--disable-sync", "--hide-scrollbars", "--user-data-dir=" + dir.resolve("profile"), "--window-size=1000,2400",
                "--screenshot=" + png.toAbsolutePath(), html.toUri().toString()))
                .redirectErrorStream(true).redirectOutput(dir.resolve("browser.log").toFile()).start();
        assertTrue(browser.waitFor(120, TimeUnit.SECONDS), "chromium did not finish within 120 s");
        assertEquals(0, browser.exitValue(), () -> "chromium failed: " + read(dir.resolve("browser.log")));
        BufferedImage image = ImageIO.read(png.toFile());
        assertEquals(1000, image.getWidth());
        int dark = 0;
        int coloured = 0;
        for (int y = 0; y < image.getHeight(); y += 2) {
            for (int x = 0; x < image.getWidth(); x += 2) {
                int rgb = image.getRGB(x, y);
                int r = (rgb >> 16) & 0xff;
                int g = (rgb >> 8) & 0xff;
                int b = rgb & 0xff;
                dark += r + g + b < 200 ? 1 : 0;
                coloured += Math.max(r, Math.max(g, b)) - Math.min(r, Math.min(g, b)) > 80 ? 1 : 0;
            }
        }
        // Text and points are dark; lines, marks and series are coloured. A blank page has neither.
        assertTrue(dark > 2000, "only " + dark + " dark sample pixels: the page looks blank");
        assertTrue(coloured > minColoured, "only " + coloured + " coloured sample pixels: a picture is missing");
    }

    private static String read(Path log) {
        try {
            return Files.readString(log);
        } catch (IOException e) {
            return "(no log)";
        }
    }
}
