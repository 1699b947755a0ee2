/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.engine.tests.support;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

import org.apertura.engine.geom.Polygon;

/**
 * Reads BOUNDARY, BOX and PATH elements of every structure of a GDSII stream file into polygons keyed
 * by "layer/datatype", ignoring hierarchy (the shared test cells are flat). Record layout after the
 * Calma GDS II Stream Format Manual, Release 6.0 (references.md §4). PATH with pathtype 0 (flush) and
 * 2 (half-width extension) become one polygon per segment; pathtype 1 (round) is treated as 2.
 */
public final class MiniGds {

    /** Polygons by "layer/datatype" and the database unit in metres. */
    public record Library(Map<String, List<Polygon>> layers, double metresPerDbu) {
        public List<Polygon> layer(int layer, int datatype) {
            return layers.getOrDefault(layer + "/" + datatype, List.of());
        }
    }

    private MiniGds() {
    }

    public static Library read(Path file) throws IOException {
        byte[] b = Files.readAllBytes(file);
        Map<String, List<Polygon>> out = new TreeMap<>();
        double dbu = Double.NaN;
        int pos = 0;
        int element = -1, layer = -1, datatype = -1, pathType = 0;
        long width = 0;
        long[] xy = null;
        while (pos + 4 <= b.length) {
            int len = ((b[pos] & 0xff) << 8) | (b[pos + 1] & 0xff);
            int type = b[pos + 2] & 0xff;
            if (len == 0) {
                break; // zero padding after ENDLIB
            }
            if (len < 4 || len % 2 != 0 || pos + len > b.length) {
                throw new IOException(file + ": bad record length " + len + " at byte " + pos);
            }
            int p = pos + 4, n = len - 4;
            switch (type) {
                case 0x03 -> dbu = real8(b, p + 8);
                case 0x08, 0x09, 0x2D -> {
                    element = type;
                    pathType = 0;
                    width = 0;
                }
                case 0x0D -> layer = int16(b, p);
                case 0x0E, 0x2E -> datatype = int16(b, p);
                case 0x0F -> width = Math.abs(int32(b, p));
                case 0x21 -> pathType = int16(b, p);
                case 0x10 -> {
                    xy = new long[n / 4];
                    for (int i = 0; i < xy.length; i++) {
                        xy[i] = int32(b, p + 4 * i);
                    }
                }
                case 0x11 -> {
                    if (element >= 0 && xy != null) {
                        List<Polygon> list = out.computeIfAbsent(layer + "/" + datatype, k -> new ArrayList<>());
                        try {
                            if (element == 0x09) {
                                list.addAll(path(xy, width, pathType));
                            } else if (xy.length >= 8) {
                                list.add(Polygon.of(xy));
                            }
                        } catch (IllegalArgumentException ex) {
                            throw new IOException(file + ": bad element ending at byte " + pos + ": " + ex.getMessage(), ex);
                        }
                    }
                    element = -1;
                    xy = null;
                }
                case 0x04 -> pos = b.length - len; // ENDLIB: stop
                default -> {
                }
            }
            pos += len;
        }
        if (Double.isNaN(dbu)) {
            throw new IOException(file + ": no UNITS record");
        }
        return new Library(out, dbu);
    }

    private static List<Polygon> path(long[] xy, long width, int pathType) {
        List<Polygon> out = new ArrayList<>();
        double h = width / 2.0;
        int n = xy.length / 2;
        for (int i = 0; i + 1 < n; i++) {
            double x0 = xy[2 * i], y0 = xy[2 * i + 1], x1 = xy[2 * i + 2], y1 = xy[2 * i + 3];
            double len = Math.hypot(x1 - x0, y1 - y0);
            if (len == 0 || width == 0) {
                continue;
            }
            double ux = (x1 - x0) / len, uy = (y1 - y0) / len;
            double e0 = pathType != 0 || i > 0 ? h : 0, e1 = pathType != 0 || i + 2 < n ? h : 0;
            double ax = x0 - ux * e0, ay = y0 - uy * e0, bx = x1 + ux * e1, by = y1 + uy * e1;
            double nx = -uy * h, ny = ux * h;
            out.add(Polygon.of(Math.round(ax + nx), Math.round(ay + ny), Math.round(bx + nx), Math.round(by + ny),
                    Math.round(bx - nx), Math.round(by - ny), Math.round(ax - nx), Math.round(ay - ny)));
        }
        return out;
    }

    private static int int16(byte[] b, int p) {
        return (short) (((b[p] & 0xff) << 8) | (b[p + 1] & 0xff));
    }

    private static int int32(byte[] b, int p) {
        return ((b[p] & 0xff) << 24) | ((b[p + 1] & 0xff) << 16) | ((b[p + 2] & 0xff) << 8) | (b[p + 3] & 0xff);
    }

    /** GDSII 8-byte real: sign, 7-bit excess-64 base-16 exponent, 56-bit mantissa. */
    static double real8(byte[] b, int p) {
        int sign = b[p] & 0x80;
        int exp = (b[p] & 0x7f) - 64;
        long mant = 0;
        for (int i = 1; i < 8; i++) {
            mant = (mant << 8) | (b[p + i] & 0xff);
        }
        double v = mant / Math.pow(2, 56) * Math.pow(16, exp);
        return sign != 0 ? -v : v;
    }
}
