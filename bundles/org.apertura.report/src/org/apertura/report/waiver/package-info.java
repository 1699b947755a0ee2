/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/**
 * Waivers: a reviewer's decision that a finding is acceptable, kept in a file beside the deck.
 *
 * <h2>The waiver file</h2>
 * The file is named after the deck with {@code .waivers.json} appended ({@code metal.deck} &rarr;
 * {@code metal.deck.waivers.json}, see {@link org.apertura.report.waiver.WaiverFile#besideDeck}). It is UTF-8
 * JSON of this shape:
 * <pre>
 * {
 *   "format": "apertura-waivers",
 *   "version": 1,
 *   "waivers": [
 *     {
 *       "rule": "M1.S.1",
 *       "layer": "M1",
 *       "box": [1200, 340, 1218, 376],
 *       "fingerprint": "3fa9c2d1e07b5a64",
 *       "reason": "dummy fill, removed before tape-out",
 *       "author": "a.reviewer",
 *       "date": "2026-03-02",
 *       "note": "optional free text"
 *     }
 *   ]
 * }
 * </pre>
 * {@code rule}, {@code layer}, {@code reason}, {@code author} and {@code date} (ISO {@code YYYY-MM-DD}) are
 * required and must not be blank; at least one of {@code box} ({@code [x1, y1, x2, y2]} in nm, the finding's
 * marker) and {@code fingerprint} (16 hex digits, see {@link org.apertura.report.model.Fingerprint}) must be
 * given; {@code note} is optional and ignored. Any other member is an error (so a misspelt name is not silently
 * dropped). Errors name the file, line and column and the problem.
 *
 * <h2>Matching</h2>
 * On every run each finding present in the result (new, persisting or open; fixed findings are not waived) is
 * matched against the waivers in file order: a waiver matches when its rule and layer equal the finding's and
 * either its box equals the finding's marker within {@value org.apertura.report.waiver.Waivers#BOX_TOLERANCE_NM}
 * nm on every coordinate or its fingerprint equals the finding's. Both depend only on the place, so matches are
 * stable when the layout is unchanged, whatever the order of findings or waivers; a rule value change (a persisting
 * finding under a new option) keeps the match. The first matching waiver covers the finding. A waiver that
 * matches no present finding is <em>stale</em> and is listed in the report.
 *
 * <h2>Adding</h2>
 * {@link org.apertura.report.waiver.WaiverFile#add} inserts a new entry as text after the last entry of the
 * {@code waivers} array, leaving every other character of the file as the user wrote it (order, spacing, notes),
 * and writes the file atomically. An existing file that does not parse is never rewritten.
 */
package org.apertura.report.waiver;
