/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.cli;

import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;

import org.eclipse.equinox.app.IApplication;
import org.eclipse.equinox.app.IApplicationContext;
import org.eclipse.core.runtime.Platform;

/** The Equinox application {@code org.apertura.cli.app}: runs {@link AperturaCommand} with the program arguments. */
public final class HeadlessApplication implements IApplication {

    @Override
    public Object start(IApplicationContext context) {
        String[] args = (String[]) context.getArguments().getOrDefault(IApplicationContext.APPLICATION_ARGS, new String[0]);
        context.applicationRunning();
        String version = Platform.getBundle("org.apertura.cli").getVersion().toString();
        PrintWriter out = new PrintWriter(System.out, true, StandardCharsets.UTF_8);
        PrintWriter err = new PrintWriter(System.err, true, StandardCharsets.UTF_8);
        return AperturaCommand.execute(version, out, err, args);
    }

    @Override
    public void stop() {
        // The command runs to completion on the application thread; nothing to interrupt here.
    }
}
