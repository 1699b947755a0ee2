/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report;

/** The caution every report, summary and help text carries. */
public final class Caution {

    /** One sentence, plain text. */
    public static final String TEXT = "Apertura is an engineering aid, not a sign-off tool: confirm every result "
            + "with the foundry's qualified rule decks and the fab's licensed practice.";

    private Caution() {
    }
}
