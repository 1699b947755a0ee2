/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.ui.tests;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.graphics.Image;
import org.eclipse.swt.graphics.ImageLoader;
import org.eclipse.swt.graphics.Rectangle;
import org.eclipse.swt.widgets.Display;

/** Saves the whole display as a PNG so that a person can look at what a test saw. */
final class Screenshots {

    private Screenshots() {
    }

    /** Must run on the UI thread. Returns the file written. */
    static Path save(Display display, String name) throws IOException {
        Path dir = Path.of(System.getProperty("apertura.screenshots", "target/screenshots"));
        Files.createDirectories(dir);
        Rectangle bounds = display.getBounds();
        Image image = new Image(display, bounds.width, bounds.height);
        GC gc = new GC(display);
        try {
            gc.copyArea(image, 0, 0);
        } finally {
            gc.dispose();
        }
        try {
            ImageLoader loader = new ImageLoader();
            loader.data = new org.eclipse.swt.graphics.ImageData[] {image.getImageData()};
            Path file = dir.resolve(name + ".png");
            loader.save(file.toString(), SWT.IMAGE_PNG);
            return file;
        } finally {
            image.dispose();
        }
    }
}
