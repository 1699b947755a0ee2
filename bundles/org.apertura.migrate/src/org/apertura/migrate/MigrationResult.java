/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.migrate;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Objects;

import org.apertura.migrate.anamorphic.MaskSideResult;
import org.apertura.migrate.colour.ColouringChange;
import org.apertura.migrate.delta.DeltaStatus;
import org.apertura.migrate.delta.RuleDelta;
import org.apertura.migrate.field.FieldResult;
import org.apertura.migrate.impact.LayoutImpact;
import org.apertura.migrate.impact.ViolationChange;
import org.apertura.migrate.masks.MaskBudget;
import org.apertura.migrate.optics.OptionOptics;
import org.apertura.migrate.optics.RuleOptics;
import org.apertura.migrate.shrink.Headroom;
import org.apertura.migrate.shrink.ShrinkScope;

/**
 * Everything a migration study found. Convert to the EMF results model with
 * {@code org.apertura.migrate.persist.StudyModels}.
 * <p>
 * The constructor keeps the lists in the order given (a result read back from a saved study stays as
 * saved); {@link #sorted()} puts every list in a fixed order, and {@link MigrationStudy} returns
 * sorted results, so two runs on the same input give byte-identical reports.
 *
 * @param technology   the deck's technology
 * @param layout       the layout file (or a description of the layout given in memory)
 * @param topCell      the analysed cell
 * @param from         the source option
 * @param to           the target option
 * @param layers       the moved layers, in deck order
 * @param sourceOptics Rayleigh figures of the source option
 * @param targetOptics Rayleigh figures of the target option
 * @param ruleOptics   the k1 of each resolution-limited rule under both options (source rows first)
 * @param deltas       the deck delta of the moved layers
 * @param impact       the layout checked under both options
 * @param headroom     shrink headroom under the target option
 * @param masks        masks and exposures per moved layer
 * @param colouring    multiple-patterning changes
 * @param maskSide     anamorphic mask-side checks under the target option
 * @param fields       the die against the source and the target field
 * @param warnings     reader warnings and deck rules the engine could not check
 */
public record MigrationResult(String technology, String layout, String topCell, String from, String to,
        List<String> layers, OptionOptics sourceOptics, OptionOptics targetOptics, List<RuleOptics> ruleOptics,
        List<RuleDelta> deltas, LayoutImpact impact, List<Headroom> headroom, MaskBudget masks,
        List<ColouringChange> colouring, List<MaskSideResult> maskSide, List<FieldResult> fields,
        List<String> warnings) {

    /** The caution every report of a study carries. */
    public static final String CAUTION = "Apertura is an engineering aid, not a sign-off tool: confirm every result "
            + "with the foundry's qualified rule decks and the fab's licensed practice.";

    /** Copies the lists. */
    public MigrationResult {
        Objects.requireNonNull(technology, "technology");
        Objects.requireNonNull(layout, "layout");
        Objects.requireNonNull(topCell, "topCell");
        Objects.requireNonNull(from, "from");
        Objects.requireNonNull(to, "to");
        layers = List.copyOf(layers);
        Objects.requireNonNull(sourceOptics, "sourceOptics");
        Objects.requireNonNull(targetOptics, "targetOptics");
        ruleOptics = List.copyOf(ruleOptics);
        deltas = List.copyOf(deltas);
        Objects.requireNonNull(impact, "impact");
        headroom = List.copyOf(headroom);
        Objects.requireNonNull(masks, "masks");
        colouring = List.copyOf(colouring);
        maskSide = List.copyOf(maskSide);
        fields = List.copyOf(fields);
        warnings = List.copyOf(warnings);
    }

    /**
     * This result with every list in a fixed order: rule optics by option (source first), layer, rule;
     * deltas by layer, rule, axis; impact changes by layer, rule, kind, place, status; headroom by
     * layer, rule ({@code *} first), scope; colouring changes by layer; mask-side results by layer,
     * rule, option. Layers and rules compare by name; sorting is stable. {@code layers} keeps deck
     * order, {@code fields} the order source, target, and {@code warnings} the order they were found
     * in (layout reader first).
     */
    public MigrationResult sorted() {
        String source = from;
        return new MigrationResult(technology, layout, topCell, from, to, layers, sourceOptics, targetOptics,
                sorted(ruleOptics, Comparator.comparing((RuleOptics o) -> !o.option().equals(source))
                        .thenComparing(RuleOptics::option).thenComparing(RuleOptics::layer)
                        .thenComparing(RuleOptics::rule).thenComparingDouble(RuleOptics::valueNm)),
                sorted(deltas, Comparator.comparing(RuleDelta::layer).thenComparing(RuleDelta::rule)
                        .thenComparing(RuleDelta::axis)),
                new LayoutImpact(impact.source(), impact.target(), sorted(impact.changes(),
                        Comparator.comparing((ViolationChange c) -> c.rule()).thenComparing(ViolationChange::kind)
                                .thenComparing(ViolationChange::marker).thenComparing(ViolationChange::status))),
                sorted(headroom, Comparator.comparing(Headroom::layer).thenComparing(Headroom::rule)
                        .thenComparing(Headroom::scope)),
                masks, sorted(colouring, Comparator.comparing(ColouringChange::layer)),
                sorted(maskSide, Comparator.comparing(MaskSideResult::layer).thenComparing(MaskSideResult::rule)
                        .thenComparing(MaskSideResult::option)),
                fields, warnings);
    }

    /** An unmodifiable copy of a list, stably sorted. */
    private static <T> List<T> sorted(List<T> list, Comparator<? super T> order) {
        List<T> copy = new ArrayList<>(list);
        copy.sort(order);
        return List.copyOf(copy);
    }

    /** Delta rows of a layer with the given status. */
    public long count(String layer, DeltaStatus status) {
        return deltas.stream().filter(d -> d.layer().equals(layer) && d.status() == status).count();
    }

    /** The headroom of a layer as a whole under the given scope. */
    public Headroom layerHeadroom(String layer, ShrinkScope scope) {
        return headroom.stream().filter(h -> h.layer().equals(layer) && h.rule().equals("*") && h.scope() == scope)
                .findFirst().orElseThrow(() -> new java.util.NoSuchElementException(
                        "no " + scope + " headroom for layer " + layer));
    }
}
