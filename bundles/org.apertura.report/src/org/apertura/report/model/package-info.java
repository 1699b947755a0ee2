/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/**
 * The report input model: plain immutable records (no EMF) that every writer reads.
 *
 * <p>Lengths are in nanometres ({@code Nm} in a name says so), areas in square nanometres and densities as
 * fractions; {@link org.apertura.report.model.ValueUnit} says which applies to a finding's values. A
 * {@link org.apertura.report.model.ReportData} holds a required core (provenance, layers, findings) and
 * optional sections: the layer &times; rule matrix, histograms, shrink headroom, masks, the field result
 * and geometry for pictures. A plain check has only the core.
 */
package org.apertura.report.model;
