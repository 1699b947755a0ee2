/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.migrate;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;

import org.apertura.engine.check.CheckEngine;
import org.apertura.engine.geom.Box;
import org.apertura.engine.geom.Polygon;
import org.apertura.engine.region.MergedLayer;
import org.apertura.migrate.anamorphic.MaskSideCheck;
import org.apertura.migrate.check.EngineRules;
import org.apertura.migrate.colour.PatterningConflicts;
import org.apertura.migrate.delta.DeckDelta;
import org.apertura.migrate.field.FieldCheck;
import org.apertura.migrate.field.FieldResult;
import org.apertura.migrate.impact.LayoutImpact;
import org.apertura.migrate.layout.LayoutLayers;
import org.apertura.migrate.masks.MaskBudget;
import org.apertura.migrate.optics.OpticsAnalysis;
import org.apertura.migrate.optics.RuleOptics;
import org.apertura.migrate.shrink.Headroom;
import org.apertura.migrate.shrink.ShrinkHeadroom;
import org.apertura.rules.resolved.Layer;
import org.apertura.rules.resolved.LithographyOption;
import org.apertura.rules.resolved.ResolvedDeck;

/**
 * The migration study: a deck, a layout and a move of some layers from one lithography option to
 * another, analysed end to end (optics, deck delta, layout impact, shrink headroom, masks, multiple
 * patterning, anamorphic mask side, field). Plain Java; the result converts to the EMF results model.
 */
public final class MigrationStudy {

    private MigrationStudy() {
    }

    /**
     * Runs the study on a GDSII layout.
     *
     * @param layers the layers to move; empty for every layer whose patterning or rules differ
     *               between the two options
     * @throws IOException              when the layout cannot be read (the message names the file)
     * @throws IllegalArgumentException for unknown options or layers, or an ambiguous top cell
     */
    public static MigrationResult run(ResolvedDeck deck, Path layout, String fromOption, String toOption,
            Set<String> layers, MigrationOptions opts) throws IOException {
        LayoutLayers l = LayoutLayers.read(layout, deck, opts.topCell());
        return run(deck, l.polygons(), l.extent(), l.file(), l.topCell(), l.warnings(), fromOption, toOption, layers,
                opts);
    }

    /**
     * Runs the study on polygons given in memory (database units of the deck, keyed by deck layer).
     * The result's lists are in the fixed order of {@link MigrationResult#sorted()}.
     *
     * @param extent the top cell's extent (for the field check when no die size is declared); may be
     *               null for an empty layout
     */
    public static MigrationResult run(ResolvedDeck deck, Map<String, List<Polygon>> polygons, Box extent,
            String layoutName, String topCell, List<String> layoutWarnings, String fromOption, String toOption,
            Set<String> layers, MigrationOptions opts) {
        LithographyOption src = option(deck, fromOption);
        LithographyOption tgt = option(deck, toOption);
        List<String> moved = layers.isEmpty() ? changedLayers(deck, fromOption, toOption) : ordered(deck, layers);
        CheckEngine engine = new CheckEngine(opts.engine());
        List<String> warnings = new ArrayList<>(layoutWarnings);

        Set<String> needed = new TreeSet<>(moved);
        needed.addAll(EngineRules.of(deck, fromOption, moved).layers());
        needed.addAll(EngineRules.of(deck, toOption, moved).layers());
        Map<String, MergedLayer> merged = engine.merge(LayoutImpact.select(polygons, needed));

        List<RuleOptics> ruleOptics = new ArrayList<>(OpticsAnalysis.rules(deck, fromOption, moved));
        ruleOptics.addAll(OpticsAnalysis.rules(deck, toOption, moved));
        LayoutImpact impact = LayoutImpact.runMerged(deck, fromOption, toOption, moved, merged, engine);
        for (String u : impact.source().unsupported()) {
            warnings.add("under " + fromOption + ": " + u);
        }
        for (String u : impact.target().unsupported()) {
            warnings.add("under " + toOption + ": " + u);
        }
        boolean perAxis = opts.perAxisShrink() || tgt.isAnamorphic();
        List<Headroom> headroom = ShrinkHeadroom.measure(deck, toOption, moved, merged, engine, opts.shrinkProbe(),
                perAxis);

        Box die = extent;
        if (opts.dieWidthMm().isPresent()) {
            double dbu = deck.databaseUnitNanometres().doubleValue();
            long w = Math.round(opts.dieWidthMm().getAsDouble() * 1e6 / dbu);
            long h = Math.round(opts.dieHeightMm().getAsDouble() * 1e6 / dbu);
            long x0 = extent == null ? 0 : extent.minX(), y0 = extent == null ? 0 : extent.minY();
            die = new Box(x0, y0, x0 + w, y0 + h);
        }
        List<FieldResult> fields = new ArrayList<>();
        if (die != null) {
            Collection<String> critical = opts.criticalLayers().isEmpty() ? moved : ordered(deck, opts.criticalLayers());
            for (String o : List.of(fromOption, toOption)) {
                fields.add(FieldCheck.check(deck, o, die, critical, merged, opts.stitchKeepOutNm()));
            }
        } else {
            warnings.add("empty layout and no declared die: field check skipped");
        }
        return new MigrationResult(deck.technology(), layoutName, topCell, fromOption, toOption, moved,
                OpticsAnalysis.of(src), OpticsAnalysis.of(tgt), ruleOptics,
                DeckDelta.compare(deck, fromOption, toOption, moved), impact, headroom,
                MaskBudget.of(deck, fromOption, toOption, moved),
                PatterningConflicts.analyse(deck, fromOption, toOption, moved, merged, engine),
                MaskSideCheck.check(deck, toOption, moved, merged, engine, opts.shrinkProbe()), fields, warnings)
                .sorted();
    }

    /** Layers, in deck order, whose patterning or rules differ between the two options. */
    public static List<String> changedLayers(ResolvedDeck deck, String from, String to) {
        List<String> out = new ArrayList<>();
        for (Layer l : deck.layers()) {
            var a = deck.rules(from, l.name());
            var b = deck.rules(to, l.name());
            if (!a.patterning().equals(b.patterning()) || !a.values().equals(b.values())
                    || !a.spacingTable().equals(b.spacingTable()) || !a.enclosures().equals(b.enclosures())
                    || !a.endOfLine().equals(b.endOfLine()) || !a.density().equals(b.density())) {
                out.add(l.name());
            }
        }
        return out;
    }

    private static List<String> ordered(ResolvedDeck deck, Set<String> names) {
        for (String n : names) {
            if (deck.layer(n).isEmpty()) {
                throw new IllegalArgumentException("deck '" + deck.technology() + "' has no layer '" + n + "'");
            }
        }
        return deck.layers().stream().map(Layer::name).filter(names::contains).toList();
    }

    private static LithographyOption option(ResolvedDeck deck, String name) {
        return deck.option(name).orElseThrow(() -> new IllegalArgumentException("deck '" + deck.technology()
                + "' has no option '" + name + "' (options: "
                + String.join(", ", deck.options().stream().map(LithographyOption::name).toList()) + ")"));
    }
}
