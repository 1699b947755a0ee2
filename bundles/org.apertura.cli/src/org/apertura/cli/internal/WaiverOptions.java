/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.cli.internal;

import java.nio.file.Path;
import java.util.Optional;

import picocli.CommandLine.Option;

/** Options of commands whose findings can be waived. */
public final class WaiverOptions {

    @Option(names = "--waivers", paramLabel = "FILE",
            description = "Waiver file (default: <deck>.waivers.json beside the deck, when it exists).")
    Path waivers;

    @Option(names = "--no-waivers", description = "Apply no waivers, not even the file beside the deck.")
    boolean noWaivers;

    /** The waivers to apply for a run on {@code deck}. */
    Inputs.WaiverInput read(Path deck) throws InputException {
        if (noWaivers && waivers != null) {
            throw new InputException("--waivers and --no-waivers exclude each other");
        }
        return Inputs.waivers(Optional.ofNullable(waivers), deck, noWaivers);
    }
}
