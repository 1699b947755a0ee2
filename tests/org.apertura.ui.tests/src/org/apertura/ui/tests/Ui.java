/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.ui.tests;

import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import java.util.concurrent.atomic.AtomicReference;
import java.util.function.BooleanSupplier;

import org.eclipse.core.resources.IFile;
import org.eclipse.core.resources.IProject;
import org.eclipse.core.resources.IResource;
import org.eclipse.core.resources.ResourcesPlugin;
import org.eclipse.core.runtime.CoreException;
import org.eclipse.swt.widgets.Display;
import org.eclipse.ui.PlatformUI;

/** Running code on the UI thread from a test thread, waiting for the workbench, and test files. */
final class Ui {

    private Ui() {
    }

    static Display display() {
        return PlatformUI.getWorkbench().getDisplay();
    }

    /** Runs on the UI thread and returns the value; exceptions are rethrown here. */
    static <T> T sync(Callable<T> body) {
        AtomicReference<T> value = new AtomicReference<>();
        AtomicReference<Throwable> error = new AtomicReference<>();
        display().syncExec(() -> {
            try {
                value.set(body.call());
            } catch (Throwable t) {
                error.set(t);
            }
        });
        if (error.get() instanceof RuntimeException re) {
            throw re;
        }
        if (error.get() instanceof Error e) {
            throw e;
        }
        if (error.get() != null) {
            throw new IllegalStateException(error.get());
        }
        return value.get();
    }

    static void run(ThrowingRunnable body) {
        sync(() -> {
            body.run();
            return null;
        });
    }

    interface ThrowingRunnable {
        void run() throws Exception;
    }

    /** Waits (polling on the UI thread) until the condition holds; fails with the message after the limit. */
    static void waitUntil(String what, int seconds, BooleanSupplier condition) throws InterruptedException {
        long end = System.nanoTime() + seconds * 1_000_000_000L;
        while (System.nanoTime() < end) {
            if (sync(condition::getAsBoolean)) {
                return;
            }
            Thread.sleep(100);
        }
        fail("gave up waiting " + seconds + " s for: " + what);
    }

    /** Lets queued UI work run, then saves a screenshot of the whole display. */
    static Path screenshot(String name) throws InterruptedException {
        Thread.sleep(400);
        return sync(() -> {
            while (display().readAndDispatch()) {
                // drain pending paints
            }
            try {
                return Screenshots.save(display(), name);
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        });
    }

    /** The repository root (system property set by the build, else the working directory's parents). */
    static Path root() {
        String p = System.getProperty("apertura.root");
        if (p != null && Files.isDirectory(Path.of(p, "samples"))) {
            return Path.of(p);
        }
        Path here = Path.of("").toAbsolutePath();
        while (here != null && !Files.isDirectory(here.resolve("samples"))) {
            here = here.getParent();
        }
        if (here == null) {
            throw new IllegalStateException("cannot find the repository's samples folder");
        }
        return here;
    }

    /** A workspace project holding copies of files; created when missing. */
    static IProject project(String name) throws CoreException {
        IProject p = ResourcesPlugin.getWorkspace().getRoot().getProject(name);
        if (!p.exists()) {
            p.create(null);
        }
        if (!p.isOpen()) {
            p.open(null);
        }
        return p;
    }

    /** Writes bytes to a file of a project, replacing it. */
    static IFile put(IProject p, String name, byte[] content) throws CoreException, IOException {
        IFile f = p.getFile(name);
        Path location = p.getLocation().toPath().resolve(name);
        Files.write(location, content);
        f.refreshLocal(IResource.DEPTH_ZERO, null);
        return f;
    }
}
