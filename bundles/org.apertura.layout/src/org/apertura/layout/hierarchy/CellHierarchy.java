/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.layout.hierarchy;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Collections;
import java.util.Deque;
import java.util.IdentityHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

import org.apertura.layout.model.ArrayReference;
import org.apertura.layout.model.Cell;
import org.apertura.layout.model.CellReference;
import org.apertura.layout.model.Element;
import org.apertura.layout.model.Library;

/**
 * Queries over the cell hierarchy of a library: top cells, children, cycles and depth. All walks
 * are iterative (no recursion), so a long chain of references cannot overflow the stack.
 */
public final class CellHierarchy {

    private CellHierarchy() {
    }

    /** The cells that no cell reference in the library points to, in library order. */
    public static List<Cell> topCells(Library library) {
        Set<Cell> referenced = Collections.newSetFromMap(new IdentityHashMap<>());
        for (Cell cell : library.getCells()) {
            for (Element e : cell.getElements()) {
                if (e instanceof CellReference ref && ref.getCell() != null) {
                    referenced.add(ref.getCell());
                }
            }
        }
        List<Cell> tops = new ArrayList<>();
        for (Cell cell : library.getCells()) {
            if (!referenced.contains(cell)) {
                tops.add(cell);
            }
        }
        return tops;
    }

    /**
     * The distinct cells referenced directly by a cell, in order of first reference.
     *
     * @throws LayoutHierarchyException if a reference has no cell or an unresolved proxy
     */
    public static List<Cell> children(Cell cell) {
        Set<Cell> children = new LinkedHashSet<>();
        for (Element e : cell.getElements()) {
            if (e instanceof CellReference ref) {
                Cell child = ref.getCell();
                if (child == null || child.eIsProxy()) {
                    throw new LayoutHierarchyException(cell.getName(), "reference to a missing cell");
                }
                children.add(child);
            }
        }
        return new ArrayList<>(children);
    }

    /**
     * Finds a cycle among the cells reachable from the given roots.
     *
     * @return the cells of one cycle, first repeated at the end ({@code A, B, A}), or an empty list
     */
    public static List<Cell> findCycle(Iterable<Cell> roots) {
        Map<Cell, Boolean> state = new IdentityHashMap<>(); // TRUE = on the stack, FALSE = done
        for (Cell root : roots) {
            if (state.containsKey(root)) {
                continue;
            }
            Deque<Frame> stack = new ArrayDeque<>();
            stack.push(new Frame(root, children(root)));
            state.put(root, Boolean.TRUE);
            while (!stack.isEmpty()) {
                Frame top = stack.peek();
                if (top.next < top.children.size()) {
                    Cell child = top.children.get(top.next++);
                    Boolean s = state.get(child);
                    if (s == null) {
                        state.put(child, Boolean.TRUE);
                        stack.push(new Frame(child, children(child)));
                    } else if (s) {
                        List<Cell> cycle = new ArrayList<>();
                        cycle.add(child);
                        for (Frame f : stack) { // from the innermost frame outwards
                            cycle.add(f.cell);
                            if (f.cell == child) {
                                break;
                            }
                        }
                        Collections.reverse(cycle);
                        return cycle;
                    }
                } else {
                    state.put(top.cell, Boolean.FALSE);
                    stack.pop();
                }
            }
        }
        return List.of();
    }

    /**
     * Number of levels of the hierarchy below and including a cell: 1 for a cell without
     * references, 1 + the largest depth of its children otherwise.
     *
     * @param maxDepth the largest accepted depth
     * @throws LayoutHierarchyException on a cycle, a missing cell, or a depth above maxDepth (the
     *                                  message then shows the deepest chain, cut after maxDepth + 1
     *                                  cells)
     */
    public static int checkedDepth(Cell top, int maxDepth) {
        List<Cell> cycle = findCycle(List.of(top));
        if (!cycle.isEmpty()) {
            throw new LayoutHierarchyException(path(cycle), "cyclic cell references");
        }
        Map<Cell, Integer> height = new IdentityHashMap<>();
        Deque<Frame> stack = new ArrayDeque<>();
        stack.push(new Frame(top, children(top)));
        while (!stack.isEmpty()) {
            Frame f = stack.peek();
            if (f.next < f.children.size()) {
                Cell child = f.children.get(f.next++);
                if (!height.containsKey(child)) {
                    stack.push(new Frame(child, children(child)));
                }
            } else {
                int h = 1;
                for (Cell c : f.children) {
                    h = Math.max(h, height.get(c) + 1);
                }
                height.put(f.cell, h);
                stack.pop();
            }
        }
        int depth = height.get(top);
        if (depth > maxDepth) {
            List<Cell> chain = new ArrayList<>();
            Cell c = top;
            while (c != null && chain.size() <= maxDepth) {
                chain.add(c);
                Cell next = null;
                for (Cell child : children(c)) {
                    if (height.get(child) == height.get(c) - 1) {
                        next = child;
                        break;
                    }
                }
                c = next;
            }
            throw new LayoutHierarchyException(path(chain) + (depth > chain.size() ? "/..." : ""),
                    "hierarchy is " + depth + " levels deep, more than the bound of " + maxDepth);
        }
        return depth;
    }

    /** Number of placements a reference stands for: 1, or columns x rows for an array. */
    public static long instanceCount(CellReference ref) {
        if (ref instanceof ArrayReference a) {
            return (long) a.getColumns() * a.getRows();
        }
        return 1;
    }

    /** Cell names joined by '/'. */
    public static String path(List<Cell> cells) {
        StringBuilder sb = new StringBuilder();
        for (Cell c : cells) {
            if (sb.length() > 0) {
                sb.append('/');
            }
            sb.append(c.getName());
        }
        return sb.toString();
    }

    private static final class Frame {
        final Cell cell;
        final List<Cell> children;
        int next;

        Frame(Cell cell, List<Cell> children) {
            this.cell = cell;
            this.children = children;
        }
    }
}
