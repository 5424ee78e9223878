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
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The HTML report seen in a real headless browser (Debian's chromium): the page must not be
 * blank. Tagged "browser" and left out of the default run, which needs only Java and Maven;
 * {@code .ci/run} installs chromium and runs this tag after the default suite.
 */
@Tag("browser")
class HtmlScreenshotTest {
    private static final Path CHROMIUM = Path.of("/usr/bin/chromium");

    @TempDir
    Path dir;

    @Test
    void theFanoReportRendersWithTextAndItsPicture() throws IOException, InterruptedException {
        assertTrue(Files.isExecutable(CHROMIUM), "the browser test needs " + CHROMIUM + " (apt-get install chromium)");
        Path html = dir.resolve("fano.html");
        ReportWriter.write(CertificateReport.of(Path.of("certificates/fano.cert.json"), Optional.empty()),
                ReportFormat.HTML, html);
        Path png = dir.resolve("fano.png");
        Process browser = new ProcessBuilder(List.of(CHROMIUM.toString(), "--headless", "--no-sandbox", "--disable-gpu",
                "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update",
                "--disable-sync", "--user-data-dir=" + dir.resolve("profile"), "--window-size=1000,1400",
                "--screenshot=" + png, html.toUri().toString()))
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
        // Text and points are dark; the configuration's lines are coloured. A blank page has neither.
        assertTrue(dark > 2000, "only " + dark + " dark sample pixels: the page looks blank");
        assertTrue(coloured > 200, "only " + coloured + " coloured sample pixels: the picture is missing");
    }

    private static String read(Path log) {
        try {
            return Files.readString(log);
        } catch (IOException e) {
            return "(no log)";
        }
    }
}
