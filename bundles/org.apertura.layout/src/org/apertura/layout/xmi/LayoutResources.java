/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.layout.xmi;

import java.io.IOException;
import java.util.Map;

import org.apertura.layout.model.Library;
import org.apertura.layout.model.LayoutPackage;
import org.eclipse.emf.common.util.URI;
import org.eclipse.emf.ecore.resource.Resource;
import org.eclipse.emf.ecore.resource.ResourceSet;
import org.eclipse.emf.ecore.resource.impl.ResourceSetImpl;
import org.eclipse.emf.ecore.xmi.XMLResource;
import org.eclipse.emf.ecore.xmi.impl.XMIResourceFactoryImpl;

/**
 * XMI, the native file format of the layout model, under the file extension {@value #FILE_EXTENSION}.
 * Inside Eclipse the bundle's plugin.xml registers the package and the extension; outside it (plain
 * Java, tests, the command line) call {@link #register(ResourceSet)} or use {@link #save} and
 * {@link #load}, which do it for you. Cell references are stored by cell name (the cell name is the
 * model's ID attribute).
 */
public final class LayoutResources {

    /** File extension of layout XMI files. */
    public static final String FILE_EXTENSION = "aplayout";

    private LayoutResources() {
    }

    /** Registers the layout package and the XMI factory for {@value #FILE_EXTENSION} in a resource set. */
    public static ResourceSet register(ResourceSet resourceSet) {
        resourceSet.getPackageRegistry().put(LayoutPackage.eNS_URI, LayoutPackage.eINSTANCE);
        resourceSet.getResourceFactoryRegistry().getExtensionToFactoryMap()
                .put(FILE_EXTENSION, new XMIResourceFactoryImpl());
        return resourceSet;
    }

    /** A new resource set with {@link #register(ResourceSet)} applied. */
    public static ResourceSet newResourceSet() {
        return register(new ResourceSetImpl());
    }

    /** Saves a library (detached or not) as XMI to a file, UTF-8. */
    public static void save(Library library, java.nio.file.Path file) throws IOException {
        Resource resource = newResourceSet().createResource(URI.createFileURI(file.toAbsolutePath().toString()));
        resource.getContents().add(library);
        resource.save(Map.of(XMLResource.OPTION_ENCODING, "UTF-8"));
    }

    /**
     * Loads a library from an XMI file.
     *
     * @throws IOException when the file cannot be read or does not hold a library
     */
    public static Library load(java.nio.file.Path file) throws IOException {
        Resource resource = newResourceSet().createResource(URI.createFileURI(file.toAbsolutePath().toString()));
        try {
            resource.load(Map.of());
        } catch (IOException | RuntimeException e) {
            throw new IOException(file + ": not a layout XMI file: " + e.getMessage(), e);
        }
        if (resource.getContents().isEmpty() || !(resource.getContents().get(0) instanceof Library library)) {
            throw new IOException(file + ": does not contain a layout library");
        }
        return library;
    }
}
