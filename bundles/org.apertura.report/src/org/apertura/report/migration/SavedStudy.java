/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.migration;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;

import org.apertura.engine.check.Violation;
import org.apertura.engine.check.ViolationKind;
import org.apertura.engine.geom.Box;
import org.apertura.migrate.MigrationResult;
import org.apertura.migrate.anamorphic.MaskSideAxis;
import org.apertura.migrate.anamorphic.MaskSideResult;
import org.apertura.migrate.check.RuleRef;
import org.apertura.migrate.check.RuleSet;
import org.apertura.migrate.colour.Colouring;
import org.apertura.migrate.colour.ColouringChange;
import org.apertura.migrate.colour.Transition;
import org.apertura.migrate.delta.AxisScope;
import org.apertura.migrate.delta.DeltaCause;
import org.apertura.migrate.delta.DeltaStatus;
import org.apertura.migrate.delta.RuleDelta;
import org.apertura.migrate.field.FieldResult;
import org.apertura.migrate.field.StitchHit;
import org.apertura.migrate.field.StitchLine;
import org.apertura.migrate.impact.ImpactStatus;
import org.apertura.migrate.impact.LayoutImpact;
import org.apertura.migrate.impact.ViolationChange;
import org.apertura.migrate.masks.LayerMasks;
import org.apertura.migrate.masks.MaskBudget;
import org.apertura.migrate.model.Marker;
import org.apertura.migrate.model.Study;
import org.apertura.migrate.optics.OptionOptics;
import org.apertura.migrate.optics.Printability;
import org.apertura.migrate.optics.RuleOptics;
import org.apertura.migrate.persist.StudyModels;
import org.apertura.migrate.shrink.Headroom;
import org.apertura.migrate.shrink.ShrinkScope;
import org.apertura.rules.resolved.Axis;

/**
 * Turns a saved study (the EMF results model read from an {@code *.apstudy} file) back into a
 * {@link MigrationResult}, so that reports and the summary of a saved study are made by the same code as
 * those of a fresh run.
 *
 * <p>What a saved study does not keep, and so the result lacks: the edge pairs of violations (violations
 * carry their marker, kind and values only), the engine rules themselves (the rule sets of the impact are
 * empty; each violation names its deck rule as {@code layer/rule}), the reader's unsupported-rule lists
 * (they are among the warnings) and the shapes per mask of a colouring. NaN in the model means absent.
 */
public final class SavedStudy {

    private SavedStudy() {
    }

    /**
     * The result a saved study describes.
     *
     * @throws IllegalArgumentException when the study does not hold both its options or holds a value no enum
     *                                  of this version knows (the message names the value)
     */
    public static MigrationResult toResult(Study s) {
        OptionOptics source = option(s, s.getFromOption());
        OptionOptics target = option(s, s.getToOption());
        List<RuleOptics> optics = new ArrayList<>();
        for (org.apertura.migrate.model.RuleOptics m : s.getRuleOptics()) {
            optics.add(new RuleOptics(m.getOption(), m.getLayer(), m.getRule(), m.getPatterning(), m.getPitchSplit(),
                    m.getPitchNm(), m.getK1(), Printability.valueOf(m.getVerdict().name()), m.getMinimumSplit()));
        }
        List<RuleDelta> deltas = new ArrayList<>();
        for (org.apertura.migrate.model.RuleDelta m : s.getDeltas()) {
            deltas.add(new RuleDelta(m.getLayer(), m.getRule(), AxisScope.valueOf(m.getAxis().name()), m.getUnit(),
                    opt(m.getOldValue()), opt(m.getNewValue()), DeltaStatus.valueOf(m.getStatus().name()),
                    DeltaCause.valueOf(m.getCause().name())));
        }
        List<ViolationChange> changes = new ArrayList<>();
        for (org.apertura.migrate.model.ViolationChange m : s.getViolations()) {
            ImpactStatus status = ImpactStatus.valueOf(m.getStatus().name());
            ViolationKind kind = ViolationKind.valueOf(m.getKind());
            RuleRef ref = new RuleRef(m.getLayer(), m.getRule(), Optional.empty());
            Box marker = box(m.getMarker());
            Optional<Violation> src = status == ImpactStatus.NEW ? Optional.empty()
                    : Optional.of(new Violation(ref.id(), m.getLayer(), kind, m.getSourceMeasured(), m.getSourceRequired(),
                            null, null, marker));
            Optional<Violation> tgt = status == ImpactStatus.FIXED ? Optional.empty()
                    : Optional.of(new Violation(ref.id(), m.getLayer(), kind, m.getTargetMeasured(), m.getTargetRequired(),
                            null, null, marker));
            changes.add(new ViolationChange(status, ref, kind, marker, src, tgt));
        }
        LayoutImpact impact = new LayoutImpact(emptyRules(s.getFromOption()), emptyRules(s.getToOption()), changes);
        List<Headroom> headroom = new ArrayList<>();
        for (org.apertura.migrate.model.Headroom m : s.getHeadroom()) {
            headroom.add(new Headroom(m.getLayer(), m.getRule(), ShrinkScope.valueOf(m.getScope().name()), m.getFactor(),
                    m.isBounded(), StudyModels.box(m.getLimitingPlace()), opt(m.getMeasured()), opt(m.getRequired())));
        }
        List<LayerMasks> masks = new ArrayList<>();
        for (org.apertura.migrate.model.LayerMasks m : s.getMasks()) {
            masks.add(new LayerMasks(m.getLayer(), m.getSourcePatterning(), m.getTargetPatterning(), m.getSourceMasks(),
                    m.getTargetMasks(), m.getSourceExposures(), m.getTargetExposures(), opt(m.getSourceSeconds()),
                    opt(m.getTargetSeconds())));
        }
        List<ColouringChange> colouring = new ArrayList<>();
        for (org.apertura.migrate.model.ColouringChange m : s.getColouring()) {
            colouring.add(new ColouringChange(m.getLayer(), Transition.valueOf(m.getTransition().name()),
                    colouring(m.getSource()), colouring(m.getTarget()), m.getNote() == null ? "" : m.getNote()));
        }
        List<MaskSideResult> maskSide = new ArrayList<>();
        for (org.apertura.migrate.model.MaskSideCheck m : s.getMaskSide()) {
            maskSide.add(new MaskSideResult(m.getLayer(), m.getRule(), m.getOption(), axis(m.getX()), axis(m.getY()),
                    m.getBinding() == null || m.getBinding().isEmpty() ? Optional.empty()
                            : Optional.of(Axis.valueOf(m.getBinding()))));
        }
        List<FieldResult> fields = new ArrayList<>();
        for (org.apertura.migrate.model.FieldCheck m : s.getFields()) {
            List<StitchLine> lines = new ArrayList<>();
            m.getLines().forEach(l -> lines.add(new StitchLine(Axis.valueOf(l.getAcross()), l.getPosition())));
            List<StitchHit> hits = new ArrayList<>();
            m.getHits().forEach(h -> hits.add(new StitchHit(h.getLayer(), box(h.getShape()),
                    new StitchLine(Axis.valueOf(h.getLineAcross()), h.getLinePosition()), h.isCrossing(),
                    h.getDistanceNm())));
            fields.add(new FieldResult(m.getOption(), m.getFieldXMm(), m.getFieldYMm(), m.getDieXMm(), m.getDieYMm(),
                    m.getFieldsX(), m.getFieldsY(), lines, hits, m.getHitCount(), m.getKeepOutNm()));
        }
        return new MigrationResult(s.getTechnology(), s.getLayout(), s.getTopCell(), s.getFromOption(), s.getToOption(),
                s.getLayers(), source, target, optics, deltas, impact, headroom, new MaskBudget(masks), colouring,
                maskSide, fields, s.getWarnings());
    }

    private static OptionOptics option(Study s, String name) {
        for (org.apertura.migrate.model.OptionOptics m : s.getOptions()) {
            if (name != null && name.equals(m.getName())) {
                return new OptionOptics(m.getName(), m.getWavelengthNm(), m.getNumericalAperture(), m.getK1Floor(),
                        m.getK2(), m.getResolutionNm(), m.getPhysicalLimitNm(), m.getDepthOfFocusNm(),
                        m.getDemagnificationX(), m.getDemagnificationY(), m.getFieldXMm(), m.getFieldYMm(),
                        opt(m.getThroughput()));
            }
        }
        throw new IllegalArgumentException("the study has no optics for its option '" + name + "'");
    }

    private static RuleSet emptyRules(String option) {
        return new RuleSet(option, List.of(), Map.of(), Set.of(), List.of());
    }

    private static Optional<Colouring> colouring(org.apertura.migrate.model.Colouring m) {
        if (m == null) {
            return Optional.empty();
        }
        List<Box> conflicts = new ArrayList<>();
        m.getConflicts().forEach(c -> conflicts.add(box(c)));
        return Optional.of(new Colouring(m.getOption(), m.getMasks(), m.getSameMaskNm(), m.getShapes(),
                m.getConflictEdges(), m.isColourable(), conflicts, List.of()));
    }

    private static MaskSideAxis axis(org.apertura.migrate.model.MaskSideAxis m) {
        return new MaskSideAxis(Axis.valueOf(m.getAxis()), m.getDemagnification(), opt(m.getWaferMinimum()),
                m.getMaskMinimum(), opt(m.getMargin()), m.getViolations());
    }

    private static Box box(Marker m) {
        if (m == null) {
            throw new IllegalArgumentException("the study has a violation or shape without its marker box");
        }
        return new Box(m.getMinX(), m.getMinY(), m.getMaxX(), m.getMaxY());
    }

    private static OptionalDouble opt(double v) {
        return Double.isNaN(v) ? OptionalDouble.empty() : OptionalDouble.of(v);
    }
}
