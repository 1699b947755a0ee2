/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.model;

import java.util.LinkedHashSet;
import java.util.List;
import java.util.Optional;

/** The layer &times; rule matrix of a comparison or migration, rows in the order given. */
public record RuleMatrix(List<MatrixRow> rows) {

    /** Copies the list. */
    public RuleMatrix {
        rows = List.copyOf(rows);
    }

    /** The layers in order of first appearance. */
    public List<String> layers() {
        LinkedHashSet<String> s = new LinkedHashSet<>();
        rows.forEach(r -> s.add(r.layer()));
        return List.copyOf(s);
    }

    /** The rule names in order of first appearance (the matrix columns). */
    public List<String> rules() {
        LinkedHashSet<String> s = new LinkedHashSet<>();
        rows.forEach(r -> s.add(r.rule()));
        return List.copyOf(s);
    }

    /** The rows of one layer and rule (one per axis). */
    public List<MatrixRow> cell(String layer, String rule) {
        return rows.stream().filter(r -> r.layer().equals(layer) && r.rule().equals(rule)).toList();
    }

    /** The first row of one layer and rule. */
    public Optional<MatrixRow> first(String layer, String rule) {
        return cell(layer, rule).stream().findFirst();
    }
}
