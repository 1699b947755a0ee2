/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.layout.bench;

import java.io.BufferedOutputStream;
import java.io.DataOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.lang.management.GarbageCollectorMXBean;
import java.lang.management.ManagementFactory;
import java.lang.management.MemoryMXBean;
import java.lang.management.ThreadMXBean;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.Arrays;
import java.util.Random;

import com.sun.management.OperatingSystemMXBean;

import org.apertura.layout.flatten.FlattenResult;
import org.apertura.layout.flatten.Flattener;
import org.apertura.layout.gds.GdsReadResult;
import org.apertura.layout.gds.GdsReader;
import org.apertura.layout.model.Cell;
import org.apertura.layout.model.Library;
import org.apertura.layout.stream.GdsStreamReader;
import org.apertura.layout.stream.StreamCell;
import org.apertura.layout.stream.StreamFlattener;
import org.apertura.layout.stream.StreamLayout;
import org.apertura.layout.stream.StreamReadOptions;

/**
 * Reading speed of the streaming reader {@link GdsStreamReader} (with its default options: structures
 * parsed by one thread per available processor; and with one thread) and of the EMF reader
 * {@link GdsReader}, each beside a plain sequential read of the same file (an InputStream read into
 * a 256 KiB buffer) measured in the same run, rounds interleaved so machine load hits all alike;
 * for context, a bare record walk and a fresh mapping with every page touched (the floor of any
 * mapped read); and heap used per element by each result. Not a test: it prints figures. Arguments: the ASAP7
 * library file, a scratch folder for the generated file (deleted at the end), and the size in MB of
 * the generated file (at least 200).
 */
public final class LayoutReadBenchmark {

    private static final int ROUNDS = 7;
    private static final int EMF_ROUNDS = 3;
    private static final StreamReadOptions ONE_THREAD = StreamReadOptions.DEFAULTS.withThreads(1);
    private static volatile long sink;

    private LayoutReadBenchmark() {
    }

    public static void main(String[] args) throws Exception {
        Path asap7 = Path.of(args[0]);
        Path scratch = Path.of(args[1]);
        long megabytes = args.length > 2 ? Long.parseLong(args[2]) : 220;
        System.out.printf("java %s, %d cores, max heap %d MB, load average %s%n", System.getProperty("java.version"),
                Runtime.getRuntime().availableProcessors(), Runtime.getRuntime().maxMemory() >> 20, loadAverage());

        System.out.println();
        System.out.println("== ASAP7 library " + asap7.getFileName());
        measure(asap7, 30, 21, 21);
        flattenAll(asap7);

        Path generated = scratch.resolve("generated.gds");
        try {
            System.out.println();
            long t = System.nanoTime();
            long shapes = generate(generated, megabytes << 20);
            System.out.printf("== generated layout: %.1f MB, %d elements, written in %.1f s%n",
                    Files.size(generated) / 1e6, shapes, (System.nanoTime() - t) / 1e9);
            measure(generated, 1, ROUNDS, EMF_ROUNDS);
        } finally {
            Files.deleteIfExists(generated);
        }
        System.out.printf("load average at the end %s%n", loadAverage());
    }

    /** Flattens every top cell with both paths; the polygon counts must agree. */
    private static void flattenAll(Path file) throws IOException {
        GdsReadResult r = GdsReader.read(file);
        StreamLayout s = GdsStreamReader.read(file);
        long emfPolygons = 0;
        long streamPolygons = 0;
        long t0 = System.nanoTime();
        for (int i = 0; i < 10; i++) {
            emfPolygons = 0;
            for (Cell c : r.topCells()) {
                FlattenResult f = Flattener.flatten(c);
                emfPolygons += f.polygonCount();
            }
        }
        double emfMs = (System.nanoTime() - t0) / 1e6 / 10;
        t0 = System.nanoTime();
        for (int i = 0; i < 10; i++) {
            streamPolygons = 0;
            for (StreamCell c : s.topCells()) {
                FlattenResult f = StreamFlattener.flatten(s, c);
                streamPolygons += f.polygonCount();
            }
        }
        double streamMs = (System.nanoTime() - t0) / 1e6 / 10;
        System.out.printf("flatten all %d top cells: EMF path %d polygons in %.1f ms, streaming path %d polygons in %.1f ms%n",
                r.topCells().size(), emfPolygons, emfMs, streamPolygons, streamMs);
        if (emfPolygons != streamPolygons) {
            throw new IllegalStateException("the two paths disagree");
        }
    }

    private static void measure(Path file, int warmup, int rounds, int emfRounds) throws IOException {
        double mb = Files.size(file) / 1e6;
        for (int i = 0; i < warmup; i++) {
            sink += plainRead(file);
            sink += recordWalk(file);
            sink += mapAndTouch(file);
            sink += GdsStreamReader.read(file).cells().size();
            sink += GdsStreamReader.read(file, ONE_THREAD).cells().size();
            sink += GdsReader.read(file).library().getCells().size();
        }
        double[] plain = new double[rounds];
        double[] plainCpu = new double[rounds];
        double[] walk = new double[rounds];
        double[] touch = new double[rounds];
        double[] stream = new double[rounds];
        long streamCpuNanos = 0;
        double[] streamRatio = new double[rounds];
        double[] single = new double[rounds];
        double[] singleRatio = new double[rounds];
        double[] emf = new double[emfRounds];
        double[] emfCpu = new double[emfRounds];
        double[] emfRatio = new double[emfRounds];
        long streamGc = 0;
        long emfGc = 0;
        ThreadMXBean threads = ManagementFactory.getThreadMXBean();
        OperatingSystemMXBean os = (OperatingSystemMXBean) ManagementFactory.getOperatingSystemMXBean();
        for (int i = 0; i < rounds; i++) {
            long c = threads.getCurrentThreadCpuTime();
            long t = System.nanoTime();
            sink += plainRead(file);
            plain[i] = mb / ((System.nanoTime() - t) / 1e9);
            plainCpu[i] = mb / ((threads.getCurrentThreadCpuTime() - c) / 1e9);

            t = System.nanoTime();
            sink += recordWalk(file);
            walk[i] = mb / ((System.nanoTime() - t) / 1e9);

            t = System.nanoTime();
            sink += mapAndTouch(file);
            touch[i] = mb / ((System.nanoTime() - t) / 1e9);

            long gc = gcMillis();
            c = os.getProcessCpuTime();
            t = System.nanoTime();
            StreamLayout s = GdsStreamReader.read(file);
            stream[i] = mb / ((System.nanoTime() - t) / 1e9);
            streamCpuNanos += os.getProcessCpuTime() - c;
            streamGc += gcMillis() - gc;
            streamRatio[i] = stream[i] / plain[i];
            sink += s.cells().size();
            s = null;

            t = System.nanoTime();
            s = GdsStreamReader.read(file, ONE_THREAD);
            single[i] = mb / ((System.nanoTime() - t) / 1e9);
            singleRatio[i] = single[i] / plain[i];
            sink += s.cells().size();
            s = null;

            if (i < emfRounds) {
                gc = gcMillis();
                c = threads.getCurrentThreadCpuTime();
                t = System.nanoTime();
                GdsReadResult r = GdsReader.read(file);
                emf[i] = mb / ((System.nanoTime() - t) / 1e9);
                emfCpu[i] = mb / ((threads.getCurrentThreadCpuTime() - c) / 1e9);
                emfGc += gcMillis() - gc;
                emfRatio[i] = emf[i] / plain[i];
                sink += r.library().getCells().size();
            }
        }
        double p = median(plain);
        System.out.printf("plain sequential read : median %6.0f MB/s (best %.0f) wall clock; %.0f MB/s per CPU second"
                + " (%d rounds)%n", p, max(plain), median(plainCpu), rounds);
        System.out.printf("record walk, 1 thread : median %6.0f MB/s wall clock; ratio to plain %.2f (mapped file, record"
                + " headers followed one by one and every XY value read; no checks, nothing kept)%n", median(walk),
                median(walk) / p);
        System.out.printf("mapping, pages touched: median %6.0f MB/s wall clock; ratio to plain %.2f (a fresh mapping of the"
                + " file, one byte read per 4 KiB page: the page faults every mapped read pays)%n", median(touch),
                median(touch) / p);
        System.out.printf("GdsStreamReader       : median %6.0f MB/s (best %.0f) wall clock; %.0f MB/s per CPU second"
                + " of the whole process (all threads, over all rounds); GC %.0f ms per read (%d rounds)%n",
                median(stream), max(stream), mb * rounds / (streamCpuNanos / 1e9), (double) streamGc / rounds, rounds);
        System.out.printf("GdsStreamReader 1 thr.: median %6.0f MB/s (best %.0f) wall clock (%d rounds)%n", median(single),
                max(single), rounds);
        System.out.printf("GdsReader to EMF model: median %6.0f MB/s (best %.0f) wall clock; %.0f MB/s per CPU second"
                + " of the reading thread; GC %.0f ms per read (%d rounds)%n", median(emf), max(emf), median(emfCpu),
                (double) emfGc / emfRounds, emfRounds);
        System.out.printf("streaming / plain     : %.2f (median of per-round ratios %.2f; goal >= 0.5)%n",
                median(stream) / p, median(streamRatio));
        System.out.printf("streaming 1 thr./plain: %.2f (median of per-round ratios %.2f)%n", median(single) / p,
                median(singleRatio));
        System.out.printf("EMF reader / plain    : %.2f (median of per-round ratios %.2f)%n", median(emf) / p,
                median(emfRatio));
        heapPerElement(file);
    }

    private static void heapPerElement(Path file) throws IOException {
        MemoryMXBean memory = ManagementFactory.getMemoryMXBean();
        long before = usedAfterGc(memory);
        StreamLayout s = GdsStreamReader.read(file);
        long after = usedAfterGc(memory);
        long streamElements = s.elementCount();
        System.out.printf("heap, streaming: %7.1f MB for %d elements (%d shapes) = %.0f bytes per element%n",
                (after - before) / 1e6, streamElements, s.shapeCount(), (double) (after - before) / streamElements);
        sink += s.cells().size();
        s = null;

        before = usedAfterGc(memory);
        GdsReadResult r = GdsReader.read(file);
        after = usedAfterGc(memory);
        long elements = 0;
        for (Cell c : r.library().getCells()) {
            elements += c.getElements().size();
        }
        Library keep = r.library();
        System.out.printf("heap, EMF model: %7.1f MB for %d elements = %.0f bytes per element%n",
                (after - before) / 1e6, elements, (double) (after - before) / elements);
        sink += keep.getCells().size();
    }

    private static long gcMillis() {
        long sum = 0;
        for (GarbageCollectorMXBean gc : ManagementFactory.getGarbageCollectorMXBeans()) {
            sum += Math.max(0, gc.getCollectionTime());
        }
        return sum;
    }

    private static long usedAfterGc(MemoryMXBean memory) {
        for (int i = 0; i < 3; i++) {
            System.gc();
        }
        return memory.getHeapMemoryUsage().getUsed();
    }

    /**
     * Following the record lengths one record at a time through a mapped file and reading every XY
     * value, printed for context. (The streaming reader, which recognises whole elements at once and
     * uses several threads, can be faster than this.)
     */
    private static long recordWalk(Path file) throws IOException {
        try (FileChannel ch = FileChannel.open(file, StandardOpenOption.READ)) {
            ByteBuffer b = ch.map(FileChannel.MapMode.READ_ONLY, 0, ch.size());
            int n = b.capacity();
            long sum = 0;
            int pos = 0;
            while (pos + 4 <= n) {
                int length = b.getShort(pos) & 0xFFFF;
                if (length < 4) {
                    break;
                }
                if (b.get(pos + 2) == 0x10) {
                    for (int p = pos + 4; p < pos + length; p += 4) {
                        sum += b.getInt(p);
                    }
                }
                pos += length;
            }
            return sum;
        }
    }

    /** Maps the file afresh and reads one byte of every 4 KiB page, printed for context. */
    private static long mapAndTouch(Path file) throws IOException {
        try (FileChannel ch = FileChannel.open(file, StandardOpenOption.READ)) {
            ByteBuffer b = ch.map(FileChannel.MapMode.READ_ONLY, 0, ch.size());
            long sum = 0;
            for (int i = 0; i < b.capacity(); i += 4096) {
                sum += b.get(i);
            }
            return sum;
        }
    }

    private static long plainRead(Path file) throws IOException {
        byte[] buf = new byte[1 << 18];
        long x = 0;
        try (InputStream in = Files.newInputStream(file)) {
            int n;
            while ((n = in.read(buf)) > 0) {
                x += buf[n - 1];
            }
        }
        return x;
    }

    private static String loadAverage() {
        try {
            return Files.readString(Path.of("/proc/loadavg")).strip();
        } catch (IOException e) {
            return "unknown";
        }
    }

    private static double median(double[] v) {
        double[] s = v.clone();
        Arrays.sort(s);
        return s[s.length / 2];
    }

    private static double max(double[] v) {
        return Arrays.stream(v).max().orElse(0);
    }

    /**
     * Writes a layout of at least {@code bytes} bytes: cells of 2,000 shapes each (rectangles,
     * 8-vertex polygons, 3-point paths, labels) on a few layers, and a top cell placing every cell
     * once and as a 4 x 4 array. Records are written directly (independent of the writer).
     *
     * @return number of shapes written
     */
    static long generate(Path file, long bytes) throws IOException {
        Random random = new Random(7);
        long shapes = 0;
        int cells = 0;
        try (OutputStream os = new BufferedOutputStream(Files.newOutputStream(file), 1 << 20);
                DataOutputStream out = new DataOutputStream(os)) {
            rec(out, 0x00, 2, 2);
            out.writeShort(600);
            rec(out, 0x01, 2, 24);
            out.write(new byte[24]);
            ascii(out, 0x02, "BENCH");
            rec(out, 0x03, 5, 16);
            out.writeLong(0x3E4189374BC6A7F0L);
            out.writeLong(0x3944B82FA09B5A54L);
            while (out.size() < bytes - 1_000_000) {
                rec(out, 0x05, 2, 24);
                out.write(new byte[24]);
                ascii(out, 0x06, "C" + cells++);
                for (int i = 0; i < 2000; i++) {
                    int kind = random.nextInt(20);
                    int x = random.nextInt(1_000_000);
                    int y = random.nextInt(1_000_000);
                    int layer = 1 + random.nextInt(8);
                    if (kind < 15) {
                        int w = 18 + random.nextInt(200);
                        int h = 18 + random.nextInt(200);
                        element(out, 0x08, layer);
                        rec(out, 0x10, 3, 40);
                        int[] xy = {x, y, x + w, y, x + w, y + h, x, y + h, x, y};
                        for (int v : xy) {
                            out.writeInt(v);
                        }
                    } else if (kind < 17) {
                        element(out, 0x08, layer);
                        rec(out, 0x10, 3, 72);
                        int[] xy = {x, y, x + 100, y, x + 100, y + 50, x + 60, y + 50, x + 60, y + 120, x + 20, y + 120,
                            x + 20, y + 50, x, y + 50, x, y};
                        for (int v : xy) {
                            out.writeInt(v);
                        }
                    } else if (kind < 19) {
                        element(out, 0x09, layer);
                        rec(out, 0x0F, 3, 4);
                        out.writeInt(36);
                        rec(out, 0x10, 3, 24);
                        int[] xy = {x, y, x + 500, y, x + 500, y + 300};
                        for (int v : xy) {
                            out.writeInt(v);
                        }
                    } else {
                        rec(out, 0x0C, 0, 0);
                        rec(out, 0x0D, 2, 2);
                        out.writeShort(layer);
                        rec(out, 0x16, 2, 2);
                        out.writeShort(251);
                        rec(out, 0x10, 3, 8);
                        out.writeInt(x);
                        out.writeInt(y);
                        ascii(out, 0x19, "net" + i);
                    }
                    rec(out, 0x11, 0, 0);
                    shapes++;
                }
                rec(out, 0x07, 0, 0);
            }
            rec(out, 0x05, 2, 24);
            out.write(new byte[24]);
            ascii(out, 0x06, "TOP");
            for (int c = 0; c < cells; c++) {
                rec(out, 0x0A, 0, 0);
                ascii(out, 0x12, "C" + c);
                rec(out, 0x10, 3, 8);
                out.writeInt(c * 1_100_000);
                out.writeInt(0);
                rec(out, 0x11, 0, 0);
                rec(out, 0x0B, 0, 0);
                ascii(out, 0x12, "C" + c);
                rec(out, 0x13, 2, 4);
                out.writeShort(4);
                out.writeShort(4);
                rec(out, 0x10, 3, 24);
                int[] xy = {c * 1_100_000, 2_000_000, c * 1_100_000 + 4 * 1_000_000, 2_000_000, c * 1_100_000,
                    2_000_000 + 4 * 1_000_000};
                for (int v : xy) {
                    out.writeInt(v);
                }
                rec(out, 0x11, 0, 0);
                shapes += 2;
            }
            rec(out, 0x07, 0, 0);
            rec(out, 0x04, 0, 0);
        }
        return shapes;
    }

    private static void element(DataOutputStream out, int type, int layer) throws IOException {
        rec(out, type, 0, 0);
        rec(out, 0x0D, 2, 2);
        out.writeShort(layer);
        rec(out, 0x0E, 2, 2);
        out.writeShort(0);
    }

    private static void rec(DataOutputStream out, int type, int dataType, int payload) throws IOException {
        out.writeShort(payload + 4);
        out.writeByte(type);
        out.writeByte(dataType);
    }

    private static void ascii(DataOutputStream out, int type, String s) throws IOException {
        byte[] b = s.getBytes(StandardCharsets.US_ASCII);
        int padded = b.length + (b.length & 1);
        rec(out, type, 6, padded);
        out.write(b);
        if (padded > b.length) {
            out.writeByte(0);
        }
    }
}
