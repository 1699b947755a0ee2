/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.migrate.derive;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.nio.file.Path;
import java.util.Collection;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.Optional;

import org.apertura.rules.resolved.ConditionalSpacing;
import org.apertura.rules.resolved.DeckDiagnostic;
import org.apertura.rules.resolved.DeckLoadResult;
import org.apertura.rules.resolved.DeckLoader;
import org.apertura.rules.resolved.Density;
import org.apertura.rules.resolved.Direction;
import org.apertura.rules.resolved.Enclosure;
import org.apertura.rules.resolved.EndOfLine;
import org.apertura.rules.resolved.Layer;
import org.apertura.rules.resolved.LayerKind;
import org.apertura.rules.resolved.LayerRules;
import org.apertura.rules.resolved.LithographyOption;
import org.apertura.rules.resolved.Patterning;
import org.apertura.rules.resolved.PatterningScheme;
import org.apertura.rules.resolved.ResolvedDeck;
import org.apertura.rules.resolved.RuleKind;
import org.apertura.rules.resolved.RuleValue;
import org.apertura.rules.resolved.SpacingMetric;

/**
 * A draft deck for a target option derived from a source option by k1-preserving scaling, written
 * in the rule language with a comment on every value saying how it was derived.
 * <p>
 * Every length of the source option's rules is multiplied by {@code s = (λt/NAt)/(λs/NAs)} (areas
 * by s²) and snapped up to the manufacturing grid (max width down). Then: each layer takes the
 * target option's patterning from the deck; a layer leaving multiple patterning loses its same-mask
 * spacing, a layer entering it takes the deck's target same-mask spacing when there is one; a pitch
 * whose k1 under the target (with its pitch split) falls below the target's practical floor (at
 * least 0.25) is raised to the smallest grid value meeting it, and a pitch below width + spacing is
 * raised to that sum. Mask-side minimums are properties of the mask, not of the optics: they are
 * taken from the target option (or kept), and a width or spacing below a mask-side minimum divided by
 * the target's demagnification along an axis is raised on that axis. Density windows and bounds are
 * kept.
 *
 * @param name        the option name used in the draft
 * @param text        the deck text
 * @param diagnostics what the rule language's loader said about the text (no errors expected)
 */
public record DraftDeck(String name, String text, List<DeckDiagnostic> diagnostics) {

    /** Copies the list. */
    public DraftDeck {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(text, "text");
        diagnostics = List.copyOf(diagnostics);
    }

    /** Whether the loader reported an error. */
    public boolean hasErrors() {
        return diagnostics.stream().anyMatch(d -> d.severity() == DeckDiagnostic.Severity.ERROR);
    }

    /**
     * Derives the draft for {@code layers} (every layer when empty) and validates it with
     * {@link DeckLoader}, as if stored at {@code file}.
     */
    public static DraftDeck derive(ResolvedDeck deck, String from, String to, Collection<String> layers, Path file) {
        String name = to + "_draft";
        String text = new Writer(deck, from, to, name).write(layers);
        DeckLoadResult r = new DeckLoader().load(file, text);
        return new DraftDeck(name, text, r.diagnostics());
    }

    /** Writes the text. */
    private static final class Writer {
        private final ResolvedDeck deck;
        private final LithographyOption src;
        private final LithographyOption tgt;
        private final String name;
        private final double scale;
        private final BigDecimal unit;
        private final long grid;
        private final StringBuilder sb = new StringBuilder();

        Writer(ResolvedDeck deck, String from, String to, String name) {
            this.deck = deck;
            this.src = deck.option(from).orElseThrow(() -> new IllegalArgumentException(
                    "deck '" + deck.technology() + "' has no option '" + from + "'"));
            this.tgt = deck.option(to).orElseThrow(() -> new IllegalArgumentException(
                    "deck '" + deck.technology() + "' has no option '" + to + "'"));
            this.name = name;
            this.scale = (tgt.wavelengthNm() / tgt.numericalAperture()) / (src.wavelengthNm() / src.numericalAperture());
            this.unit = deck.databaseUnitNanometres();
            this.grid = deck.manufacturingGrid();
        }

        String write(Collection<String> only) {
            line("// Draft deck derived by Apertura from option " + src.name() + " of \"" + deck.technology() + "\"");
            line("// for the optics of option " + tgt.name() + ": k1-preserving scaling, every length multiplied by");
            line(String.format(Locale.ROOT, "// (%s/%s) / (%s/%s) = %.4f (areas by its square), snapped up to the %s nm grid.",
                    num(tgt.wavelengthNm()), num(tgt.numericalAperture()), num(src.wavelengthNm()),
                    num(src.numericalAperture()), scale, nm(grid)));
            line("// A draft for review: Apertura is an engineering aid; confirm every value with the foundry's");
            line("// qualified rule decks and licensed practice.");
            line("");
            line("technology \"" + escape(deck.technology()) + " (draft for " + escape(tgt.name()) + ")\"");
            line("\tdatabase unit " + unit.stripTrailingZeros().toPlainString() + " nm");
            line("\tgrid " + nm(grid) + " nm");
            line("");
            for (Layer l : deck.layers()) {
                String kind = l.kind().name().toLowerCase(Locale.ROOT);
                String dir = l.direction() == Direction.NONE ? "" : " " + l.direction().name().toLowerCase(Locale.ROOT);
                line("layer " + l.name() + " gds " + l.gdsLayer() + "/" + l.gdsDatatype() + " " + kind + dir
                        + (l.description().isEmpty() ? "" : " \"" + escape(l.description()) + "\""));
            }
            line("");
            line("option " + name + " \"" + escape(tgt.description().isEmpty() ? tgt.name() : tgt.description())
                    + " (derived from " + escape(src.name()) + ")\" {");
            line("\twavelength " + num(tgt.wavelengthNm()) + " nm");
            line("\tNA " + num(tgt.numericalAperture()));
            line("\tk1 floor " + num(tgt.k1Floor()));
            line("\tk2 " + num(tgt.k2()));
            line("\tdemagnification " + (tgt.isAnamorphic() ? "x " + num(tgt.demagnificationX()) + " y "
                    + num(tgt.demagnificationY()) : num(tgt.demagnificationX())));
            line("\tfield x " + num(tgt.fieldXMm()) + " mm y " + num(tgt.fieldYMm()) + " mm");
            if (tgt.throughput().isPresent()) {
                line("\tthroughput " + num(tgt.throughput().getAsDouble()) + " wph");
            }
            if (tgt.stitchKeepOutNm().isPresent()) {
                line("\tstitch keep-out " + num(tgt.stitchKeepOutNm().getAsDouble()) + " nm");
            }
            for (Layer l : deck.layers()) {
                if (only.isEmpty() || only.contains(l.name())) {
                    layer(l);
                }
            }
            line("}");
            return sb.toString();
        }

        private void layer(Layer l) {
            LayerRules a = deck.rules(src.name(), l.name());
            LayerRules b = deck.rules(tgt.name(), l.name());
            Patterning p = b.patterning();
            StringBuilder body = new StringBuilder();
            if (p.scheme() != PatterningScheme.SINGLE_EXPOSURE || a.patterning().scheme() != PatterningScheme.SINGLE_EXPOSURE) {
                rule(body, "patterning " + patterning(p), "as the deck's option " + tgt.name()
                        + (a.patterning().equals(p) ? "" : " (" + a.patterning().label() + " under " + src.name() + ")"));
            }
            long width = 0, spacing = 0;
            for (RuleKind k : List.of(RuleKind.WIDTH, RuleKind.MAX_WIDTH, RuleKind.SPACING, RuleKind.AREA)) {
                Optional<RuleValue> v = a.value(k);
                if (v.isEmpty()) {
                    continue;
                }
                switch (k) {
                    case WIDTH -> {
                        RuleValue s = scaled(v.get(), true);
                        String how = derivation(v.get(), s);
                        RuleValue m = maskFloor(s, maskValue(a, b, RuleKind.MASK_WIDTH));
                        if (!m.equals(s)) {
                            how += "; raised to " + value(m) + " for the mask width " + value(maskValue(a, b,
                                    RuleKind.MASK_WIDTH).orElseThrow()) + " at " + demag();
                        }
                        width = along(l, m);
                        rule(body, "width " + value(m), how);
                    }
                    case MAX_WIDTH -> {
                        RuleValue s = scaled(v.get(), false);
                        rule(body, "max width " + value(s), derivation(v.get(), s) + ", snapped down");
                    }
                    case SPACING -> {
                        RuleValue s = scaled(v.get(), true);
                        String how = derivation(v.get(), s);
                        RuleValue m = maskFloor(s, maskValue(a, b, RuleKind.MASK_SPACING));
                        if (!m.equals(s)) {
                            how += "; raised to " + value(m) + " for the mask spacing " + value(maskValue(a, b,
                                    RuleKind.MASK_SPACING).orElseThrow()) + " at " + demag();
                        }
                        spacing = along(l, m);
                        rule(body, "spacing " + value(m) + metric(a.spacingMetric()), how);
                    }
                    case AREA -> {
                        long dbu2 = (long) Math.ceil(v.get().max() * scale * scale - 1e-9);
                        BigDecimal nm2 = unit.multiply(unit).multiply(BigDecimal.valueOf(dbu2))
                                .setScale(0, RoundingMode.CEILING);
                        rule(body, "area " + nm2.toPlainString() + " nm2", String.format(Locale.ROOT,
                                "%s nm2 x %.4f^2, rounded up to whole nm2", area(v.get().max()), scale));
                    }
                    default -> throw new IllegalStateException(k.name());
                }
            }
            for (ConditionalSpacing c : a.spacingTable()) {
                RuleValue s = scaled(c.spacing(), true);
                StringBuilder cond = new StringBuilder(" if");
                if (c.width().isPresent()) {
                    cond.append(" width ").append(c.widthInclusive() ? ">=" : ">").append(' ')
                            .append(nm(snapUp(c.width().getAsLong() * scale))).append(" nm");
                    if (c.runLength().isPresent()) {
                        cond.append(" and");
                    }
                }
                if (c.runLength().isPresent()) {
                    cond.append(" run ").append(c.runLengthInclusive() ? ">=" : ">").append(' ')
                            .append(nm(snapUp(c.runLength().getAsLong() * scale))).append(" nm");
                }
                rule(body, "spacing " + value(s) + metric(c.metric()) + cond,
                        derivation(c.spacing(), s) + ", thresholds scaled alike");
            }
            if (a.value(RuleKind.PITCH).isPresent() && l.kind() == LayerKind.LINE) {
                pitch(body, l, a.value(RuleKind.PITCH).get(), p, width + spacing);
            }
            if (a.endOfLine().isPresent()) {
                EndOfLine e = a.endOfLine().get();
                RuleValue tip = scaled(e.tipLength(), true);
                StringBuilder t = new StringBuilder("end-of-line tip " + (e.tipLengthInclusive() ? "<=" : "<") + " "
                        + value(tip) + ":");
                e.tipToTip().ifPresent(v -> t.append(" tip-to-tip ").append(value(scaled(v, true))));
                e.tipToSide().ifPresent(v -> t.append(" tip-to-side ").append(value(scaled(v, true))));
                rule(body, t.toString(), "every length x " + fmt(scale) + ", snapped up");
            }
            for (Enclosure e : a.enclosures()) {
                RuleValue all = scaled(e.allSides(), true);
                StringBuilder t = new StringBuilder("enclosure of " + e.innerLayer() + " " + value(all));
                if (e.pairValue().isPresent()) {
                    t.append(", ").append(value(scaled(e.pairValue().get(), true))).append(" on ")
                            .append(e.pair().name().toLowerCase(Locale.ROOT)).append(" sides");
                }
                rule(body, t.toString(), derivation(e.allSides(), all) + (e.pairValue().isPresent() ? "; pair likewise" : ""));
            }
            if (a.density().isPresent()) {
                Density d = a.density().get();
                StringBuilder t = new StringBuilder("density");
                d.minimum().ifPresent(v -> t.append(" min ").append(num(v * 100)).append(" %"));
                d.maximum().ifPresent(v -> t.append(" max ").append(num(v * 100)).append(" %"));
                t.append(" window ").append(nm(d.window())).append(" nm step ").append(nm(d.step())).append(" nm");
                rule(body, t.toString(), "kept: a density does not scale with the optics");
            }
            boolean leaving = a.patterning().isMultiMask() && !p.isMultiMask();
            if (p.isMultiMask()) {
                if (a.patterning().isMultiMask() && a.value(RuleKind.SAME_MASK_SPACING).isPresent()) {
                    RuleValue v = a.value(RuleKind.SAME_MASK_SPACING).get();
                    RuleValue s = scaled(v, true);
                    rule(body, "same-mask spacing " + value(s), derivation(v, s));
                } else if (b.value(RuleKind.SAME_MASK_SPACING).isPresent()) {
                    rule(body, "same-mask spacing " + value(b.value(RuleKind.SAME_MASK_SPACING).get()),
                            "the layer enters multiple patterning: the deck's value under " + tgt.name());
                }
            } else if (leaving && a.value(RuleKind.SAME_MASK_SPACING).isPresent()) {
                body.append("\t\t// same-mask spacing ").append(value(a.value(RuleKind.SAME_MASK_SPACING).get()))
                        .append(" dropped: one mask under ").append(tgt.name()).append('\n');
            }
            for (RuleKind k : List.of(RuleKind.MASK_WIDTH, RuleKind.MASK_SPACING)) {
                Optional<RuleValue> v = b.value(k).or(() -> a.value(k));
                if (v.isPresent()) {
                    String word = k == RuleKind.MASK_WIDTH ? "mask width " : "mask spacing ";
                    rule(body, word + value(v.get()), b.value(k).isPresent()
                            ? "mask side, not scaled: the deck's value under " + tgt.name()
                            : "mask side, not scaled: kept from " + src.name());
                }
            }
            if (body.length() > 0) {
                line("");
                line("\ton " + l.name() + " {");
                sb.append(body);
                line("\t}");
            }
        }

        private void pitch(StringBuilder body, Layer l, RuleValue v, Patterning p, long widthPlusSpacing) {
            RuleValue s = scaled(v, true);
            long along = along(l, s);
            String how = derivation(v, s);
            double floor = Math.max(tgt.k1Floor(), LithographyOption.PHYSICAL_K1_LIMIT);
            double k1 = tgt.k1(deck.toNanometres(along), p.pitchSplit());
            long raised = along;
            if (k1 < floor) {
                // smallest pitch p with (p * split / 2) * NA / lambda >= floor
                double minNm = 2 * floor * tgt.wavelengthNm() / (tgt.numericalAperture() * p.pitchSplit());
                raised = snapUp(minNm / unit.doubleValue() - 1e-9);
                how += String.format(Locale.ROOT, "; k1 %.3f below the floor %s: raised to %s nm", k1, num(floor), nm(raised));
            }
            if (raised < widthPlusSpacing) {
                raised = widthPlusSpacing;
                how += "; raised to width + spacing";
            }
            double k1Final = tgt.k1(deck.toNanometres(raised), p.pitchSplit());
            how += String.format(Locale.ROOT, "; k1 = (%s x %d / 2) x %s / %s = %.2f (%s)", nm(raised), p.pitchSplit(),
                    num(tgt.numericalAperture()), num(tgt.wavelengthNm()), k1Final, p.label());
            RuleValue out = raised == along ? s : RuleValue.of(Math.max(raised, s.max()));
            if (raised != along && !s.isIsotropic()) {
                out = l.direction().pitchAxis() == org.apertura.rules.resolved.Axis.X ? new RuleValue(raised, s.y())
                        : new RuleValue(s.x(), raised);
            }
            rule(body, "pitch " + value(out), how);
        }

        /** The mask-side minimum the draft uses: the target option's, else the source option's. */
        private static Optional<RuleValue> maskValue(LayerRules a, LayerRules b, RuleKind kind) {
            return b.value(kind).or(() -> a.value(kind));
        }

        /** Raises each axis of a wafer value to the mask minimum divided by that axis' demagnification. */
        private RuleValue maskFloor(RuleValue v, Optional<RuleValue> mask) {
            if (mask.isEmpty()) {
                return v;
            }
            long x = Math.max(v.x(), snapUp(mask.get().x() / tgt.demagnificationX()));
            long y = Math.max(v.y(), snapUp(mask.get().y() / tgt.demagnificationY()));
            return new RuleValue(x, y);
        }

        private String demag() {
            return tgt.isAnamorphic() ? num(tgt.demagnificationX()) + "x along x, " + num(tgt.demagnificationY())
                    + "x along y" : num(tgt.demagnificationX()) + "x";
        }

        private long along(Layer l, RuleValue v) {
            return l.direction() == Direction.NONE ? v.min() : v.along(l.direction().pitchAxis());
        }

        private RuleValue scaled(RuleValue v, boolean up) {
            return new RuleValue(up ? snapUp(v.x() * scale) : snapDown(v.x() * scale),
                    up ? snapUp(v.y() * scale) : snapDown(v.y() * scale));
        }

        /** The smallest grid multiple at or above x (database units), tolerant to rounding noise. */
        private long snapUp(double x) {
            return (long) Math.ceil(x / grid - 1e-9) * grid;
        }

        private long snapDown(double x) {
            return (long) Math.floor(x / grid + 1e-9) * grid;
        }

        private String derivation(RuleValue from, RuleValue to) {
            if (from.isIsotropic() && to.isIsotropic()) {
                return nm(from.x()) + " nm x " + fmt(scale) + " = " + fmt(deck.toNanometres(from.x()) * scale) + " -> "
                        + nm(to.x()) + " nm";
            }
            return "x " + nm(from.x()) + " / y " + nm(from.y()) + " nm, each x " + fmt(scale) + ", snapped up";
        }

        private String value(RuleValue v) {
            return v.isIsotropic() ? nm(v.x()) + " nm" : "x " + nm(v.x()) + " nm y " + nm(v.y()) + " nm";
        }

        private static String metric(SpacingMetric m) {
            return m == SpacingMetric.PROJECTION ? " projection" : "";
        }

        private static String patterning(Patterning p) {
            return switch (p.scheme()) {
                case SINGLE_EXPOSURE -> "single";
                case LITHO_ETCH -> "litho-etch " + p.masks();
                case SPACER_DIVISION -> "spacer " + p.pitchSplit() + p.cutLayer().map(c -> " cut " + c).orElse("");
            };
        }

        private void rule(StringBuilder body, String rule, String comment) {
            body.append("\t\t").append(rule).append("    // ").append(comment).append('\n');
        }

        private String nm(long dbu) {
            return unit.multiply(BigDecimal.valueOf(dbu)).stripTrailingZeros().toPlainString();
        }

        private String area(long dbu2) {
            return unit.multiply(unit).multiply(BigDecimal.valueOf(dbu2)).stripTrailingZeros().toPlainString();
        }

        private static String num(double v) {
            return BigDecimal.valueOf(v).stripTrailingZeros().toPlainString();
        }

        private static String fmt(double v) {
            return String.format(Locale.ROOT, "%.4f", v).replaceAll("0+$", "").replaceAll("\\.$", "");
        }

        private static String escape(String s) {
            return s.replace("\\", "\\\\").replace("\"", "\\\"");
        }

        private void line(String s) {
            sb.append(s).append('\n');
        }
    }
}
