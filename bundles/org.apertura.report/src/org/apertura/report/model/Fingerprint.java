/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.model;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.Locale;
import java.util.Optional;

/**
 * The stable identity of a finding: the first 16 hex digits (64 bits) of the SHA-256 of its rule id,
 * layer, rule kind, marker box and edge pair, with coordinates written to 0.001 nm. It does not depend on
 * the measured or required values or on the finding's position in a list, so it stays the same when
 * only a rule value changes, when findings are reordered, and on every re-run of an unchanged layout.
 */
public final class Fingerprint {

    private Fingerprint() {
    }

    /** The fingerprint of a finding's place. */
    public static String of(String ruleId, String layer, String ruleKind, NmBox marker, Optional<EdgePair> edges) {
        StringBuilder sb = new StringBuilder();
        sb.append(ruleId).append('\u0000').append(layer).append('\u0000').append(ruleKind).append('\u0000');
        box(sb, marker.x1(), marker.y1(), marker.x2(), marker.y2());
        edges.ifPresent(e -> {
            sb.append('|');
            box(sb, e.a().x1(), e.a().y1(), e.a().x2(), e.a().y2());
            sb.append('|');
            box(sb, e.b().x1(), e.b().y1(), e.b().x2(), e.b().y2());
        });
        try {
            byte[] d = MessageDigest.getInstance("SHA-256").digest(sb.toString().getBytes(StandardCharsets.UTF_8));
            return HexFormat.of().formatHex(d, 0, 8);
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is required of every Java platform", e);
        }
    }

    private static void box(StringBuilder sb, double... v) {
        for (double d : v) {
            // 0.0 and -0.0 must hash alike
            sb.append(String.format(Locale.ROOT, "%.3f", d == 0 ? 0.0 : d)).append(',');
        }
    }
}
