/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.layout.tests.xmi;

import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import org.apertura.layout.model.LayoutPackage;
import org.apertura.layout.xmi.LayoutResources;
import org.eclipse.emf.ecore.resource.ResourceSet;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Standalone registration of the layout XMI format (the plugin.xml does the same inside Eclipse). */
class LayoutResourcesTest {

    @Test
    void registersPackageAndExtension() {
        ResourceSet rs = LayoutResources.newResourceSet();
        assertNotNull(rs.getPackageRegistry().getEPackage("http://apertura.org/layout/1.0"));
        assertTrue(rs.getResourceFactoryRegistry().getExtensionToFactoryMap().containsKey("aplayout"));
        assertTrue(LayoutPackage.eINSTANCE.getEClassifier("ArrayReference") != null);
    }

    @Test
    void loadingSomethingElseFailsWithTheFileName(@TempDir Path dir) throws IOException {
        Path bad = dir.resolve("bad.aplayout");
        Files.writeString(bad, "<not-a-layout/>");
        IOException e = assertThrows(IOException.class, () -> LayoutResources.load(bad));
        assertTrue(e.getMessage().contains("bad.aplayout"), e.getMessage());
    }
}
