/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.migrate.persist;

import java.util.Optional;
import java.util.OptionalDouble;

import org.apertura.engine.check.Violation;
import org.apertura.engine.geom.Box;
import org.apertura.migrate.MigrationResult;
import org.apertura.migrate.anamorphic.MaskSideResult;
import org.apertura.migrate.colour.ColouringChange;
import org.apertura.migrate.delta.RuleDelta;
import org.apertura.migrate.field.FieldResult;
import org.apertura.migrate.field.StitchHit;
import org.apertura.migrate.field.StitchLine;
import org.apertura.migrate.impact.ImpactCount;
import org.apertura.migrate.impact.ViolationChange;
import org.apertura.migrate.masks.LayerMasks;
import org.apertura.migrate.model.AxisScope;
import org.apertura.migrate.model.Colouring;
import org.apertura.migrate.model.DeltaCause;
import org.apertura.migrate.model.DeltaStatus;
import org.apertura.migrate.model.FieldCheck;
import org.apertura.migrate.model.Headroom;
import org.apertura.migrate.model.ImpactStatus;
import org.apertura.migrate.model.Marker;
import org.apertura.migrate.model.MaskSideAxis;
import org.apertura.migrate.model.MaskSideCheck;
import org.apertura.migrate.model.MigrationFactory;
import org.apertura.migrate.model.OptionOptics;
import org.apertura.migrate.model.Printability;
import org.apertura.migrate.model.RuleOptics;
import org.apertura.migrate.model.ShrinkScope;
import org.apertura.migrate.model.Study;
import org.apertura.migrate.model.Transition;

/**
 * Converts a {@link MigrationResult} into the EMF results model ({@code http://apertura.org/migration/1.0}).
 * Absent optional numbers become NaN; engine violations keep their measured and required values in
 * database units and their marker box.
 */
public final class StudyModels {

    private static final MigrationFactory F = MigrationFactory.eINSTANCE;

    private StudyModels() {
    }

    /** The model of a result. */
    public static Study toModel(MigrationResult r) {
        Study s = F.createStudy();
        s.setTechnology(r.technology());
        s.setLayout(r.layout());
        s.setTopCell(r.topCell());
        s.setFromOption(r.from());
        s.setToOption(r.to());
        s.getLayers().addAll(r.layers());
        s.setCaution(MigrationResult.CAUTION);
        s.getWarnings().addAll(r.warnings());
        s.setMasksSaved(r.masks().masksSaved());
        s.setExposuresSaved(r.masks().exposuresSaved());
        s.setSourceSecondsPerWafer(nan(r.masks().sourceSeconds()));
        s.setTargetSecondsPerWafer(nan(r.masks().targetSeconds()));
        s.getOptions().add(option(r.sourceOptics()));
        s.getOptions().add(option(r.targetOptics()));
        for (org.apertura.migrate.optics.RuleOptics o : r.ruleOptics()) {
            RuleOptics m = F.createRuleOptics();
            m.setOption(o.option());
            m.setLayer(o.layer());
            m.setRule(o.rule());
            m.setPatterning(o.patterning());
            m.setPitchSplit(o.pitchSplit());
            m.setPitchNm(o.valueNm());
            m.setK1(o.k1());
            m.setVerdict(Printability.valueOf(o.verdict().name()));
            m.setMinimumSplit(o.minimumSplit());
            s.getRuleOptics().add(m);
        }
        for (RuleDelta d : r.deltas()) {
            org.apertura.migrate.model.RuleDelta m = F.createRuleDelta();
            m.setLayer(d.layer());
            m.setRule(d.rule());
            m.setAxis(AxisScope.valueOf(d.axis().name()));
            m.setUnit(d.unit());
            m.setOldValue(nan(d.oldValue()));
            m.setNewValue(nan(d.newValue()));
            m.setStatus(DeltaStatus.valueOf(d.status().name()));
            m.setCause(DeltaCause.valueOf(d.cause().name()));
            s.getDeltas().add(m);
        }
        for (ViolationChange c : r.impact().changes()) {
            org.apertura.migrate.model.ViolationChange m = F.createViolationChange();
            m.setStatus(ImpactStatus.valueOf(c.status().name()));
            m.setLayer(c.rule().layer());
            m.setRule(c.rule().rule());
            m.setKind(c.kind().name());
            m.setSourceMeasured(c.source().map(Violation::measured).orElse(Double.NaN));
            m.setSourceRequired(c.source().map(Violation::required).orElse(Double.NaN));
            m.setTargetMeasured(c.target().map(Violation::measured).orElse(Double.NaN));
            m.setTargetRequired(c.target().map(Violation::required).orElse(Double.NaN));
            m.setMarker(marker(c.marker()));
            s.getViolations().add(m);
        }
        for (ImpactCount c : r.impact().counts()) {
            org.apertura.migrate.model.ImpactCount m = F.createImpactCount();
            m.setLayer(c.layer());
            m.setRule(c.rule());
            m.setNewCount(c.newCount());
            m.setFixed(c.fixed());
            m.setPersisting(c.persisting());
            s.getImpactCounts().add(m);
        }
        for (org.apertura.migrate.shrink.Headroom h : r.headroom()) {
            Headroom m = F.createHeadroom();
            m.setLayer(h.layer());
            m.setRule(h.rule());
            m.setScope(ShrinkScope.valueOf(h.scope().name()));
            m.setFactor(h.factor());
            m.setBounded(h.bounded());
            m.setMeasured(nan(h.measured()));
            m.setRequired(nan(h.required()));
            h.limitingPlace().ifPresent(b -> m.setLimitingPlace(marker(b)));
            s.getHeadroom().add(m);
        }
        for (LayerMasks l : r.masks().layers()) {
            org.apertura.migrate.model.LayerMasks m = F.createLayerMasks();
            m.setLayer(l.layer());
            m.setSourcePatterning(l.sourcePatterning());
            m.setTargetPatterning(l.targetPatterning());
            m.setSourceMasks(l.sourceMasks());
            m.setTargetMasks(l.targetMasks());
            m.setSourceExposures(l.sourceExposures());
            m.setTargetExposures(l.targetExposures());
            m.setSourceSeconds(nan(l.sourceSeconds()));
            m.setTargetSeconds(nan(l.targetSeconds()));
            s.getMasks().add(m);
        }
        for (ColouringChange c : r.colouring()) {
            org.apertura.migrate.model.ColouringChange m = F.createColouringChange();
            m.setLayer(c.layer());
            m.setTransition(Transition.valueOf(c.transition().name()));
            m.setNote(c.note());
            c.source().ifPresent(x -> m.setSource(colouring(x)));
            c.target().ifPresent(x -> m.setTarget(colouring(x)));
            s.getColouring().add(m);
        }
        for (MaskSideResult c : r.maskSide()) {
            MaskSideCheck m = F.createMaskSideCheck();
            m.setLayer(c.layer());
            m.setRule(c.rule());
            m.setOption(c.option());
            m.setBinding(c.binding().map(Enum::name).orElse(""));
            m.setX(axis(c.x()));
            m.setY(axis(c.y()));
            s.getMaskSide().add(m);
        }
        for (FieldResult f : r.fields()) {
            FieldCheck m = F.createFieldCheck();
            m.setOption(f.option());
            m.setFieldXMm(f.fieldXMm());
            m.setFieldYMm(f.fieldYMm());
            m.setDieXMm(f.dieXMm());
            m.setDieYMm(f.dieYMm());
            m.setFieldsX(f.fieldsX());
            m.setFieldsY(f.fieldsY());
            m.setHitCount(f.hitCount());
            m.setKeepOutNm(f.keepOutNm());
            for (StitchLine l : f.lines()) {
                org.apertura.migrate.model.StitchLine ml = F.createStitchLine();
                ml.setAcross(l.across().name());
                ml.setPosition(l.position());
                m.getLines().add(ml);
            }
            for (StitchHit h : f.hits()) {
                org.apertura.migrate.model.StitchHit mh = F.createStitchHit();
                mh.setLayer(h.layer());
                mh.setCrossing(h.crossing());
                mh.setDistanceNm(h.distanceNm());
                mh.setLinePosition(h.line().position());
                mh.setLineAcross(h.line().across().name());
                mh.setShape(marker(h.shape()));
                m.getHits().add(mh);
            }
            s.getFields().add(m);
        }
        return s;
    }

    private static OptionOptics option(org.apertura.migrate.optics.OptionOptics o) {
        OptionOptics m = F.createOptionOptics();
        m.setName(o.option());
        m.setWavelengthNm(o.wavelengthNm());
        m.setNumericalAperture(o.numericalAperture());
        m.setK1Floor(o.k1Floor());
        m.setK2(o.k2());
        m.setResolutionNm(o.resolutionNm());
        m.setPhysicalLimitNm(o.physicalLimitNm());
        m.setDepthOfFocusNm(o.depthOfFocusNm());
        m.setDemagnificationX(o.demagnificationX());
        m.setDemagnificationY(o.demagnificationY());
        m.setFieldXMm(o.fieldXMm());
        m.setFieldYMm(o.fieldYMm());
        m.setThroughput(nan(o.throughput()));
        return m;
    }

    private static Colouring colouring(org.apertura.migrate.colour.Colouring c) {
        Colouring m = F.createColouring();
        m.setOption(c.option());
        m.setMasks(c.masks());
        m.setSameMaskNm(c.sameMaskNm());
        m.setShapes(c.shapes());
        m.setConflictEdges(c.conflictEdges());
        m.setColourable(c.colourable());
        c.conflicts().forEach(b -> m.getConflicts().add(marker(b)));
        return m;
    }

    private static MaskSideAxis axis(org.apertura.migrate.anamorphic.MaskSideAxis a) {
        MaskSideAxis m = F.createMaskSideAxis();
        m.setAxis(a.axis().name());
        m.setDemagnification(a.demagnification());
        m.setWaferMinimum(nan(a.waferMinimum()));
        m.setMaskMinimum(a.maskMinimum());
        m.setMargin(nan(a.margin()));
        m.setViolations(a.violations());
        return m;
    }

    /** A marker of a box. */
    public static Marker marker(Box b) {
        Marker m = F.createMarker();
        m.setMinX(b.minX());
        m.setMinY(b.minY());
        m.setMaxX(b.maxX());
        m.setMaxY(b.maxY());
        return m;
    }

    /** The box of a marker, empty for null. */
    public static Optional<Box> box(Marker m) {
        return m == null ? Optional.empty() : Optional.of(new Box(m.getMinX(), m.getMinY(), m.getMaxX(), m.getMaxY()));
    }

    private static double nan(OptionalDouble v) {
        return v.isPresent() ? v.getAsDouble() : Double.NaN;
    }
}
