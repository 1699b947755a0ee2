/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.cli.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;

import org.apertura.cli.AperturaCommand;
import org.junit.jupiter.api.Test;

class AperturaCommandTest {

    private final StringWriter out = new StringWriter();
    private final StringWriter err = new StringWriter();

    private int run(String... args) {
        return AperturaCommand.execute("9.8.7", new PrintWriter(out), new PrintWriter(err), args);
    }

    @Test
    void versionPrintsTheGivenVersion() {
        assertEquals(AperturaCommand.EXIT_CLEAN, run("--version"));
        assertEquals("Apertura 9.8.7", out.toString().strip());
    }

    @Test
    void helpCarriesTheCautionAndExitCodes() {
        assertEquals(AperturaCommand.EXIT_CLEAN, run("--help"));
        String help = out.toString();
        assertTrue(help.contains("qualified rule decks"), help);
        assertTrue(help.contains("Exit codes: 0 clean, 1 violations or breaks found, 2 usage or input error"), help);
    }

    @Test
    void unknownOptionIsAUsageError() {
        assertEquals(AperturaCommand.EXIT_USAGE, run("--no-such-option"));
        assertTrue(err.toString().startsWith("apertura: Unknown option: '--no-such-option'"), err.toString());
    }
}
