/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.layout.hierarchy;

/**
 * The cell hierarchy of a layout cannot be expanded: a cyclic reference, a reference to a missing
 * cell, nesting deeper than the allowed bound, too many shapes, or a coordinate that leaves the 32-bit
 * range after a transformation. The message names the cell (or the chain of cells) concerned.
 * Unchecked, because it describes the state of an in-memory model rather than an I/O failure.
 */
public class LayoutHierarchyException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    private final String cellPath;

    /**
     * @param cellPath the cell or chain of cells concerned, e.g. {@code "TOP/A/B"}
     * @param problem  what is wrong
     */
    public LayoutHierarchyException(String cellPath, String problem) {
        super(cellPath + ": " + problem);
        this.cellPath = cellPath;
    }

    /** The cell or chain of cells concerned, names separated by '/'. */
    public String cellPath() {
        return cellPath;
    }
}
