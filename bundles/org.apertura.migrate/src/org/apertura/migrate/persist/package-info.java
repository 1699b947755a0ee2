/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/**
 * The EMF results model of a study ({@code org.apertura.migrate.model}, generated from
 * {@code model/migration.ecore}): conversion from {@link org.apertura.migrate.MigrationResult} and
 * XMI persistence in {@code *.apstudy} files.
 */
package org.apertura.migrate.persist;
