/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.tests.write;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.File;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.concurrent.TimeUnit;

import javax.imageio.ImageIO;

import org.apertura.report.internal.Palette;
import org.apertura.report.model.RuleChange;
import org.apertura.report.tests.ReportFixture;
import org.apertura.report.write.ReportFormat;
import org.apertura.report.write.ReportSet;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Opens the HTML report from disk in headless Chromium (Debian's chromium package) and checks the screenshot
 * shows the matrix (tightened-cell colour) and a violation picture (new-violation marker colour). The PNG is
 * kept in target/screenshots for a person to look at. Skipped only when chromium is not installed.
 */
class ChromiumScreenshotTest {

    private static final Path CHROMIUM = Path.of("/usr/bin/chromium");

    @TempDir
    Path dir;

    @Test
    void reportRendersInHeadlessChromium() throws Exception {
        Assumptions.assumeTrue(Files.isExecutable(CHROMIUM), "chromium is not installed");
        Path report = dir.resolve("report");
        ReportSet.write(report, ReportFixture.migration(dir), EnumSet.of(ReportFormat.HTML));
        Path png = dir.resolve("shot.png");
        Path profile = Files.createDirectory(dir.resolve("profile"));
        List<String> cmd = new ArrayList<>(List.of(CHROMIUM.toString(), "--headless", "--no-sandbox", "--disable-gpu",
                "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update",
                "--disable-sync", "--hide-scrollbars", "--user-data-dir=" + profile, "--screenshot=" + png,
                "--window-size=1400,1000", report.resolve("index.html").toUri().toString()));
        Process p = new ProcessBuilder(cmd).redirectErrorStream(true).redirectOutput(dir.resolve("chromium.log").toFile())
                .start();
        // a guard against a hung browser, not a speed assertion
        if (!p.waitFor(180, TimeUnit.SECONDS)) {
            p.destroyForcibly();
            throw new AssertionError("chromium did not finish; log: " + Files.readString(dir.resolve("chromium.log")));
        }
        assertTrue(Files.exists(png), "no screenshot; log: " + Files.readString(dir.resolve("chromium.log")));
        Path keep = Path.of(System.getProperty("apertura.root", "."))
                .resolve("tests/org.apertura.report.tests/target/screenshots");
        if (!Files.isDirectory(keep.getParent().getParent())) {
            keep = Path.of("target/screenshots");
        }
        Files.createDirectories(keep);
        Files.copy(png, keep.resolve("migration-report.png"), StandardCopyOption.REPLACE_EXISTING);

        BufferedImage img = ImageIO.read(new File(png.toString()));
        assertEquals(1400, img.getWidth());
        int paper = rgb(Palette.PAPER);
        int tightened = rgb(Palette.change(RuleChange.TIGHTENED));
        int newMarker = rgb(Palette.NEW);
        long notPaper = 0;
        long tightenedPx = 0;
        long markerPx = 0;
        for (int y = 0; y < img.getHeight(); y++) {
            for (int x = 0; x < img.getWidth(); x++) {
                int c = img.getRGB(x, y) & 0xffffff;
                if (c != paper) {
                    notPaper++;
                }
                if (near(c, tightened, 3)) {
                    tightenedPx++;
                }
                if (near(c, newMarker, 3)) {
                    markerPx++;
                }
            }
        }
        long total = (long) img.getWidth() * img.getHeight();
        assertTrue(notPaper > total / 10, "screenshot is nearly blank: " + notPaper + " of " + total);
        assertTrue(tightenedPx > 500, "matrix with a tightened cell not visible: " + tightenedPx + " px");
        assertTrue(markerPx > 50, "new-violation markers not visible: " + markerPx + " px");
    }

    private static int rgb(String hex) {
        return Integer.parseInt(hex.substring(1), 16);
    }

    private static boolean near(int a, int b, int tol) {
        for (int s = 0; s <= 16; s += 8) {
            if (Math.abs(((a >> s) & 0xff) - ((b >> s) & 0xff)) > tol) {
                return false;
            }
        }
        return true;
    }
}
