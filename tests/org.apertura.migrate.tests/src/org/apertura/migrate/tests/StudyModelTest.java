/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.migrate.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;

import org.apertura.engine.check.CheckOptions;
import org.apertura.engine.geom.Box;
import org.apertura.migrate.MigrationOptions;
import org.apertura.migrate.MigrationResult;
import org.apertura.migrate.MigrationStudy;
import org.apertura.migrate.model.ImpactStatus;
import org.apertura.migrate.model.Study;
import org.apertura.migrate.persist.StudyModels;
import org.apertura.migrate.persist.StudyResources;
import org.eclipse.emf.ecore.util.EcoreUtil;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The EMF results model: conversion and an XMI round trip. */
class StudyModelTest {

    @Test
    void resultSurvivesXmi(@TempDir Path dir) throws IOException {
        MigrationResult r = MigrationStudy.run(HandmadeCase.deck(), HandmadeCase.layout(), new Box(0, 0, 4400, 1000),
                "handmade", "TOP", List.of(), "src", "tgt", Set.of(), MigrationOptions.defaults()
                        .withEngine(CheckOptions.threads(1)));
        Study model = StudyModels.toModel(r);
        Study copy = EcoreUtil.copy(model);
        Path file = dir.resolve("handmade." + StudyResources.FILE_EXTENSION);
        StudyResources.save(model, file);
        Study back = StudyResources.load(file);
        assertTrue(EcoreUtil.equals(copy, back));
        assertEquals(List.of("M1", "V1"), back.getLayers());
        assertEquals(2, back.getMasksSaved());
        assertEquals(2, back.getViolations().stream().filter(v -> v.getStatus() == ImpactStatus.NEW).count());
        assertEquals(r.deltas().size(), back.getDeltas().size());
        assertTrue(back.getCaution().contains("engineering aid"));
        assertTrue(Double.isNaN(back.getDeltas().stream().filter(d -> d.getRule().equals("same-mask-spacing"))
                .findFirst().orElseThrow().getNewValue()));
    }

    @Test
    void garbageIsAnIoErrorNamingTheFile(@TempDir Path dir) throws IOException {
        Path file = dir.resolve("bad." + StudyResources.FILE_EXTENSION);
        Files.writeString(file, "not xml at all");
        IOException e = assertThrows(IOException.class, () -> StudyResources.load(file));
        assertTrue(e.getMessage().contains("bad.apstudy"), e.getMessage());
    }
}
