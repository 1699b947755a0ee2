/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.migrate.persist;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Map;

import org.apertura.migrate.model.MigrationPackage;
import org.apertura.migrate.model.Study;
import org.eclipse.emf.common.util.URI;
import org.eclipse.emf.ecore.resource.Resource;
import org.eclipse.emf.ecore.resource.ResourceSet;
import org.eclipse.emf.ecore.resource.impl.ResourceSetImpl;
import org.eclipse.emf.ecore.xmi.XMLResource;
import org.eclipse.emf.ecore.xmi.impl.XMIResourceFactoryImpl;

/** XMI persistence of study results, in files ending {@value #FILE_EXTENSION}. */
public final class StudyResources {

    /** File extension of study result files. */
    public static final String FILE_EXTENSION = "apstudy";

    private StudyResources() {
    }

    /** Registers the results package and the XMI factory for {@value #FILE_EXTENSION} in a resource set. */
    public static ResourceSet register(ResourceSet resourceSet) {
        resourceSet.getPackageRegistry().put(MigrationPackage.eNS_URI, MigrationPackage.eINSTANCE);
        resourceSet.getResourceFactoryRegistry().getExtensionToFactoryMap().put(FILE_EXTENSION,
                new XMIResourceFactoryImpl());
        return resourceSet;
    }

    /** Saves a study as UTF-8 XMI; the study is moved into the new resource. */
    public static void save(Study study, Path file) throws IOException {
        Resource resource = register(new ResourceSetImpl())
                .createResource(URI.createFileURI(file.toAbsolutePath().toString()));
        resource.getContents().add(study);
        resource.save(Map.of(XMLResource.OPTION_ENCODING, "UTF-8"));
    }

    /**
     * Loads a study.
     *
     * @throws IOException when the file cannot be read or holds no study (the message names the file,
     *                     and the line and column of an XML error)
     */
    public static Study load(Path file) throws IOException {
        Resource resource = register(new ResourceSetImpl())
                .createResource(URI.createFileURI(file.toAbsolutePath().toString()));
        try {
            resource.load(Map.of());
        } catch (IOException | RuntimeException e) {
            Throwable c = e;
            while (c.getCause() != null && !(c instanceof org.xml.sax.SAXParseException)) {
                c = c.getCause();
            }
            String where = c instanceof org.xml.sax.SAXParseException p
                    ? ":" + p.getLineNumber() + ":" + p.getColumnNumber() : "";
            throw new IOException(file + where + ": not a study result file: " + c.getMessage(), e);
        }
        if (resource.getContents().isEmpty() || !(resource.getContents().get(0) instanceof Study study)) {
            throw new IOException(file + ": does not contain a study result");
        }
        return study;
    }
}
