/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.cli.internal;

/**
 * A problem with the user's input that ends the command with exit code 2 and a one-line message
 * naming the file and the position, e.g. {@code "deck.apdeck:12:5: unknown layer 'M9'"}.
 */
public final class InputException extends Exception {

    private static final long serialVersionUID = 1L;

    public InputException(String oneLineMessage) {
        super(oneLineMessage);
    }

    public InputException(String oneLineMessage, Throwable cause) {
        super(oneLineMessage, cause);
    }
}
