/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.migrate.field;

import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.Map;

import org.apertura.engine.geom.Box;
import org.apertura.engine.region.MergedLayer;
import org.apertura.rules.resolved.Axis;
import org.apertura.rules.resolved.LithographyOption;
import org.apertura.rules.resolved.ResolvedDeck;

/**
 * The die against an option's exposure field (26 x 33 mm full field, 26 x 16.5 mm for a 4/8
 * anamorphic option, as the deck states). When the die is larger than the field along an axis it is
 * split into {@code n = ceil(die/field)} equal parts and stitched at the n - 1 lines between them; the
 * merged shapes of the critical layers that cross a line, or come closer to it than the keep-out band,
 * are listed (a crossing shape would be printed half by each exposure).
 */
public final class FieldCheck {

    /** At most this many hits are listed per option (all are counted). */
    public static final int MAX_HITS = 1000;

    private FieldCheck() {
    }

    /**
     * Checks the die against the field of {@code option}.
     *
     * @param die       the die in database units (the top cell's extent or a declared die)
     * @param critical  the layers whose shapes must not meet a stitch line
     * @param merged    merged layers by deck layer name
     * @param keepOutNm the keep-out band on each side of a stitch line, in nm (0: crossing only)
     */
    public static FieldResult check(ResolvedDeck deck, String option, Box die, Collection<String> critical,
            Map<String, MergedLayer> merged, double keepOutNm) {
        LithographyOption o = deck.option(option).orElseThrow(() -> new IllegalArgumentException(
                "deck '" + deck.technology() + "' has no option '" + option + "'"));
        if (!(keepOutNm >= 0)) {
            throw new IllegalArgumentException("keep-out band must not be negative, got " + keepOutNm);
        }
        double dbu = deck.databaseUnitNanometres().doubleValue();
        double dieX = die.width() * dbu * 1e-6;
        double dieY = die.height() * dbu * 1e-6;
        int nx = Math.max(1, (int) Math.ceil(dieX / o.fieldXMm() - 1e-9));
        int ny = Math.max(1, (int) Math.ceil(dieY / o.fieldYMm() - 1e-9));
        List<StitchLine> lines = new ArrayList<>();
        for (int i = 1; i < nx; i++) {
            lines.add(new StitchLine(Axis.X, die.minX() + Math.round((double) die.width() * i / nx)));
        }
        for (int i = 1; i < ny; i++) {
            lines.add(new StitchLine(Axis.Y, die.minY() + Math.round((double) die.height() * i / ny)));
        }
        long band = (long) Math.ceil(keepOutNm / dbu);
        List<StitchHit> hits = new ArrayList<>();
        int count = 0;
        for (String layer : critical) {
            MergedLayer m = merged.get(layer);
            if (m == null) {
                continue;
            }
            for (int s = 0; s < m.shapeCount(); s++) {
                Box b = m.bounds(s);
                for (StitchLine line : lines) {
                    long lo = line.across() == Axis.X ? b.minX() : b.minY();
                    long hi = line.across() == Axis.X ? b.maxX() : b.maxY();
                    boolean crossing = lo < line.position() && hi > line.position();
                    long distance = crossing ? 0 : Math.max(lo - line.position(), line.position() - hi);
                    if (crossing || distance < band) {
                        count++;
                        if (hits.size() < MAX_HITS) {
                            hits.add(new StitchHit(layer, b, line, crossing, Math.max(0, distance) * dbu));
                        }
                    }
                }
            }
        }
        return new FieldResult(option, o.fieldXMm(), o.fieldYMm(), dieX, dieY, nx, ny, lines, hits, count, keepOutNm);
    }
}
