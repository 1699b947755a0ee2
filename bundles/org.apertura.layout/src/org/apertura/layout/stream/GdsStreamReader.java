/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.layout.stream;

import java.io.IOException;
import java.io.InterruptedIOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.atomic.AtomicBoolean;

import org.apertura.layout.gds.GdsElementRecords;
import org.apertura.layout.gds.GdsFormatException;
import org.apertura.layout.gds.GdsReadChecks;
import org.apertura.layout.gds.GdsReader;
import org.apertura.layout.gds.GdsRecordType;
import org.apertura.layout.gds.Real8;

/**
 * Reads a GDSII stream (Calma, "GDS II Stream Format Manual", Release 6.0, February 1987) straight
 * from a byte buffer into a {@link StreamLayout}, without building the EMF model: no object per
 * record or element, coordinates copied from the buffer into one growing {@code int} array per cell.
 * Files are memory-mapped in windows of up to 1 GiB, so any size works (a file that fits one window
 * is mapped once, and its parts share the mapping).
 * <p>
 * Structures are parsed by several threads at once ({@link StreamReadOptions#threads()}): the input
 * is cut into parts of about equal size, each starting at a structure (an ENDSTR record followed by
 * a BGNSTR of the usual 28 bytes and a STRNAME, found by a byte scan near each cut), and the parts are
 * parsed on their own. A part is used only when the part before it, parsed from its own start, ends
 * exactly where it begins, between structures; otherwise that part's parser carries on past it, so a
 * cut that is not a real structure start (the same bytes inside coordinates, say) costs time but never
 * changes the result. The parts are joined in file order: cell names, duplicate definitions, missing
 * cells and cycles are checked over the whole file, and the first error in file order is reported.
 * The result is the same for every thread count.
 * <p>
 * It accepts and rejects exactly what {@link GdsReader} accepts and rejects: every
 * {@link GdsFormatException} has the same file name, byte offset and problem text, and the skipped
 * record counts and warnings are the same. Text elements, properties and dates are checked as
 * GdsReader checks them but not kept. Memory is about 4 bytes per coordinate plus 8 bytes per
 * shape (24 for paths; 24 in all for a boundary that is an axis-parallel rectangle, see
 * {@link StreamCell#RECTANGLE}) and 56 per reference, in chunks of up to 16 MB shared by consecutive
 * cells (each part's last chunk cut to the size it uses when much of it is empty; a part of a few MB
 * is gathered in a reused staging array and copied out to arrays of the exact size). A file of one
 * huge structure is read by one thread: parts start only at structures.
 */
public final class GdsStreamReader {

    /** Default size of the mapped window: 1 GiB. */
    public static final long DEFAULT_WINDOW = 1L << 30;
    /** Smallest window: the largest record (65,535 bytes) must fit. */
    public static final long MIN_WINDOW = 1L << 16;
    /** ENDSTR (4 bytes, no data) and BGNSTR of 28 bytes with 16-bit integers: a likely structure start. */
    private static final int ENDSTR_HEADER = 0x0004_0700;
    private static final int BGNSTR_HEADER = 0x001C_0502;
    private static final int STRNAME_TYPE = 0x0606;
    /** How far past a cut the scan looks for a structure start in a mapped file. */
    private static final long SCAN_LIMIT = 64L << 20;

    private final String file;
    private final FileChannel channel;
    private final long fileSize;
    private final long window;
    private ByteBuffer buf;
    private long base;
    private int limit;

    private long recordOffset = -1;
    private int recordType;
    private int dataType;
    private int payloadStart;
    private int payloadLength;

    // the part: where it starts, the starts of the parts after it (a landing there ends this part)
    private final long[] partStarts;
    private int nextPart;
    private final long partBytes;
    private final long partEnd;
    private volatile boolean cancelled;
    private final AtomicBoolean claimed = new AtomicBoolean();
    private final CountDownLatch parsed = new CountDownLatch(1);

    // what the part found
    private final NameTable names = new NameTable();
    private final Map<String, Integer> skipped = new TreeMap<>();
    private int roundedPitches;
    private final List<StreamCell> cells = new ArrayList<>();
    private int[] cellIds = new int[16];
    private int[] definedIds = new int[16];
    private int definedCount;
    private boolean begun;
    private boolean units;
    private boolean unitsSeen;
    private boolean libNameSeen;
    private String libName;
    private double userUnits;
    private double metres;
    private int landedAt = -1;
    private boolean ended;
    private long trailingNonZero;
    private Throwable failure;

    // shape data of all cells, in chunks shared by consecutive cells: large chunks go straight to
    // the old generation, so collections do not copy them (per-cell arrays would be copied)
    // (16 MB less the array header, so that a chunk fills whole heap regions of G1)
    private static final int CHUNK = (1 << 22) - 16;
    // near a part's end: 1 MB chunks, small enough for G1 to pack them densely (a large array left
    // partly empty, or cut to size, would leave the rest of its last heap region unused)
    private static final int SMALL_CHUNK = (1 << 18) - 16;
    // a part of at most this many bytes writes its shapes into a staging array kept from earlier
    // reads and copies them out to arrays of the exact size: a fresh chunk would be zeroed first and
    // then cut to size, which for a file of a few MB costs as much as reading it
    private static final long STAGED_PART_BYTES = 4L << 20;
    private static final int STAGING = (1 << 18) - 16;
    private final boolean staged;
    private int[] data;
    private int dataLength;
    private int chunkFirstCell;
    private int cellStart;
    private int shapeCount;
    private int textCount;
    private int[] refs = new int[StreamCell.REF_STRIDE * 64];
    private double[] refTransforms = new double[2 * 64];
    private int refCount;
    private int[] scratchXy = new int[16];
    private final ElementRecords records = new ElementRecords();

    private GdsStreamReader(String file, FileChannel channel, ByteBuffer whole, long fileSize, long window,
            long[] partStarts, int part) {
        this.file = file;
        this.channel = channel;
        this.fileSize = fileSize;
        this.window = window;
        this.partStarts = partStarts;
        this.nextPart = part + 1;
        long start = partStarts[part];
        this.partEnd = part + 1 < partStarts.length ? partStarts[part + 1] : fileSize;
        this.partBytes = partEnd - start;
        this.staged = partBytes <= STAGED_PART_BYTES;
        if (whole != null) {
            this.buf = whole.duplicate().order(ByteOrder.BIG_ENDIAN);
            this.limit = buf.capacity();
            this.payloadStart = (int) start;
        }
        this.begun = part > 0;
        this.units = part > 0;
    }

    /** A first chunk for the whole part when small: shapes take about as many bytes as in the file. */
    private int firstChunk() {
        return chunkFor(partBytes);
    }

    /** A chunk size for the given bytes of the part left to read: large, or small near the end. */
    private static int chunkFor(long bytesLeft) {
        long wanted = bytesLeft / 4 + 64;
        return (int) (wanted >= CHUNK ? CHUNK : Math.min(wanted, SMALL_CHUNK));
    }

    /** Reads a file through a read-only memory mapping; the path as given appears in error messages. */
    public static StreamLayout read(Path path) throws IOException {
        return read(path, StreamReadOptions.DEFAULTS);
    }

    /**
     * Reads a file mapping at most {@code windowBytes} of it at a time (a record crossing the end of
     * a window is read from a new window starting at that record).
     *
     * @throws IllegalArgumentException if the window is below {@link #MIN_WINDOW} or above 2^31 - 1
     */
    public static StreamLayout read(Path path, long windowBytes) throws IOException {
        return read(path, StreamReadOptions.DEFAULTS.withWindowBytes(windowBytes));
    }

    /** Reads a file with the given window size and threads; the path as given appears in error messages. */
    public static StreamLayout read(Path path, StreamReadOptions options) throws IOException {
        try (FileChannel ch = FileChannel.open(path, StandardOpenOption.READ)) {
            long size = ch.size();
            if (size <= options.windowBytes()) { // one mapping, shared by the parts
                ByteBuffer whole = ch.map(FileChannel.MapMode.READ_ONLY, 0, size).order(ByteOrder.BIG_ENDIAN);
                return readInput(path.toString(), null, whole, size, options);
            }
            return readInput(path.toString(), ch, null, size, options);
        }
    }

    /**
     * Reads the bytes from the buffer's position to its limit (the buffer's position is not moved).
     *
     * @param fileName the name used in error messages
     */
    public static StreamLayout read(ByteBuffer buffer, String fileName) throws IOException {
        return read(buffer, fileName, StreamReadOptions.DEFAULTS);
    }

    /** Like {@link #read(ByteBuffer, String)} with the given threads (the window size does not apply). */
    public static StreamLayout read(ByteBuffer buffer, String fileName, StreamReadOptions options) throws IOException {
        ByteBuffer b = buffer.slice().order(ByteOrder.BIG_ENDIAN);
        return readInput(fileName, null, b, b.capacity(), options);
    }

    /** Reads a byte array; {@code fileName} is used in error messages. */
    public static StreamLayout read(byte[] bytes, String fileName) throws IOException {
        return read(ByteBuffer.wrap(bytes), fileName);
    }

    /** Like {@link #read(byte[], String)} with the given threads. */
    public static StreamLayout read(byte[] bytes, String fileName, StreamReadOptions options) throws IOException {
        return read(ByteBuffer.wrap(bytes), fileName, options);
    }

    // ---- parts: cutting, parsing on worker threads, joining in file order ----

    /**
     * Where a read of the buffer (from its position to its limit) with these options starts its
     * parts: offsets from the buffer's position, 0 first, each later one a likely structure start
     * (see the class comment); one element when the input is read sequentially. For diagnostics and
     * tests: the result of a read does not depend on it.
     */
    public static long[] partStarts(ByteBuffer buffer, StreamReadOptions options) throws IOException {
        ByteBuffer b = buffer.slice().order(ByteOrder.BIG_ENDIAN);
        return partStarts(null, b, b.capacity(), options.parts(b.capacity()));
    }

    /** Daemon threads shared by all reads; idle ones end after a minute. */
    private static final class Workers {
        static final ExecutorService POOL = Executors.newCachedThreadPool(r -> {
            Thread t = new Thread(r, "gds-stream-reader");
            t.setDaemon(true);
            return t;
        });
    }

    private static StreamLayout readInput(String file, FileChannel ch, ByteBuffer whole, long size,
            StreamReadOptions options) throws IOException {
        long[] starts = partStarts(ch, whole, size, options.parts(size));
        int n = starts.length;
        GdsStreamReader[] parts = new GdsStreamReader[n];
        for (int i = 0; i < n; i++) {
            parts[i] = new GdsStreamReader(file, ch, whole, size, options.windowBytes(), starts, i);
        }
        try {
            parts[0].claimed.set(true); // the calling thread's
            for (int t = 1; t < n; t++) {
                Workers.POOL.execute(() -> {
                    for (int i = 1; i < n; i++) {
                        parts[i].claimAndParse();
                    }
                });
            }
            parts[0].parseClaimed();
            Joined joined = new Joined(file);
            int at = 0;
            while (true) {
                GdsStreamReader part = parts[at];
                // parse the part here unless a worker has begun it, and while a worker parses it,
                // parse later ones nobody has begun (when workers are slow to start, on a busy
                // machine, the calling thread reads on alone)
                part.claimAndParse();
                for (int later = at + 1; later < n && part.parsed.getCount() > 0; later++) {
                    parts[later].claimAndParse();
                }
                part.awaitParsed();
                joined.add(part);
                if (part.ended) {
                    break;
                }
                if (part.landedAt <= at) {
                    throw new IllegalStateException("part " + at + " of " + file + " ended without a result");
                }
                for (int skip = at + 1; skip < part.landedAt; skip++) {
                    parts[skip].cancelled = true;
                }
                at = part.landedAt;
            }
            return joined.layout();
        } finally {
            for (GdsStreamReader part : parts) {
                part.cancelled = true;
            }
        }
    }

    /** Parses this part on the current thread unless a thread has claimed it already. */
    private void claimAndParse() {
        if (!cancelled && claimed.compareAndSet(false, true)) {
            parseClaimed();
        }
    }

    private void parseClaimed() {
        try {
            parsePart();
        } finally {
            parsed.countDown();
        }
    }

    private void awaitParsed() throws IOException {
        try {
            parsed.await();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new InterruptedIOException("interrupted while reading GDSII structures");
        }
    }

    /**
     * Where the parts start: 0, then for each cut at k/parts of the input the first likely structure
     * start at or after it and before the next cut (a cut without one is dropped).
     */
    private static long[] partStarts(FileChannel ch, ByteBuffer whole, long size, int parts) throws IOException {
        long[] starts = new long[parts];
        int n = 1;
        for (int k = 1; k < parts; k++) {
            long from = Math.max(starts[n - 1] + 2, (size * k / parts) & ~1L);
            long to = Math.min(size, size * (k + 1) / parts);
            long s = findStructureStart(ch, whole, from, to);
            if (s >= 0) {
                starts[n++] = s;
            }
        }
        return Arrays.copyOf(starts, n);
    }

    /**
     * The first even offset s in [from, to) where an ENDSTR record ends and a BGNSTR record of 28
     * bytes is followed by a STRNAME record, or -1. Only a guess: parsing confirms it or not.
     */
    private static long findStructureStart(FileChannel ch, ByteBuffer whole, long from, long to) throws IOException {
        from = Math.max(from, 4);
        if (to - from < 4) {
            return -1;
        }
        long size = ch != null ? ch.size() : whole.capacity();
        long end = Math.min(to, from + SCAN_LIMIT);
        long viewStart = from - 4;
        long viewEnd = Math.min(size, end + 32);
        ByteBuffer b = ch != null ? ch.map(FileChannel.MapMode.READ_ONLY, viewStart, viewEnd - viewStart)
                : whole.slice((int) viewStart, (int) (viewEnd - viewStart));
        b.order(ByteOrder.BIG_ENDIAN);
        int last = (int) Math.min(end - viewStart, b.capacity() - 32);
        for (int q = 4; q < last; q += 2) {
            if (b.getInt(q) == BGNSTR_HEADER && b.getInt(q - 4) == ENDSTR_HEADER
                    && (b.getShort(q + 30) & 0xFFFF) == STRNAME_TYPE) {
                return viewStart + q;
            }
        }
        return -1;
    }

    /** Parses this part on the current thread, keeping any failure for the join. */
    private void parsePart() {
        try {
            // here, so that the parts' threads allocate in parallel
            data = staged ? Staging.take() : new int[firstChunk()];
            if (channel != null) {
                map(partStarts[nextPart - 1]);
            }
            if (nextPart == 1) {
                readHeader();
            }
            readLibrary();
            if (staged) {
                copyOutStaged(dataLength);
            } else {
                trimLastChunk();
            }
        } catch (Throwable e) { // Cancelled included
            failure = e;
        } finally {
            if (staged) {
                Staging.give(data);
                data = null;
            }
        }
    }

    /** Staging arrays (1 MB each) kept between reads, at most one per processor and 8 in all. */
    private static final class Staging {
        private static final int KEEP = Math.min(8, Runtime.getRuntime().availableProcessors());
        private static final ArrayDeque<int[]> FREE = new ArrayDeque<>();

        static int[] take() {
            synchronized (FREE) {
                int[] a = FREE.poll();
                if (a != null) {
                    return a;
                }
            }
            return new int[STAGING];
        }

        static void give(int[] a) {
            if (a == null || a.length != STAGING) {
                return;
            }
            synchronized (FREE) {
                if (FREE.size() < KEEP) {
                    FREE.push(a);
                }
            }
        }
    }

    /** Thrown inside a part nobody needs any more. */
    private static final class Cancelled extends RuntimeException {
        private static final long serialVersionUID = 1L;

        Cancelled() {
            super("part no longer needed", null, false, false);
        }
    }

    private void checkCancelled() {
        if (cancelled) {
            throw new Cancelled();
        }
    }

    /**
     * The parts in file order, joined as one sequential reader would have seen them: a part's
     * definitions are checked against the earlier parts' before its own first error is thrown.
     */
    private static final class Joined {
        private final String file;
        private final Map<String, Integer> ids = new HashMap<>();
        private final List<String> idNames = new ArrayList<>();
        private long[] definedAt = new long[64];
        private long[] referencedAt = new long[64];
        private String[] referencedBy = new String[64];
        private final List<StreamCell> cells = new ArrayList<>();
        private int[] cellIds = new int[64];
        private final Map<String, Integer> skipped = new TreeMap<>();
        private int roundedPitches;
        private String libName;
        private double userUnits;
        private double metres;
        private long trailingNonZero;

        Joined(String file) {
            this.file = file;
        }

        private int id(String name) {
            Integer id = ids.get(name);
            if (id != null) {
                return id;
            }
            int n = idNames.size();
            if (n == definedAt.length) {
                definedAt = Arrays.copyOf(definedAt, 2 * n);
                referencedAt = Arrays.copyOf(referencedAt, 2 * n);
                referencedBy = Arrays.copyOf(referencedBy, 2 * n);
            }
            definedAt[n] = -1;
            referencedAt[n] = -1;
            ids.put(name, n);
            idNames.add(name);
            return n;
        }

        void add(GdsStreamReader part) throws IOException {
            NameTable names = part.names;
            for (int d = 0; d < part.definedCount; d++) {
                int local = part.definedIds[d];
                int id = id(names.name(local));
                if (definedAt[id] >= 0) {
                    throw new GdsFormatException(file, names.namedAt(local), "structure '" + names.name(local)
                            + "' defined twice (first at byte " + definedAt[id] + ")");
                }
                definedAt[id] = names.definedAt(local);
            }
            if (part.failure != null) {
                throw rethrow(part.failure);
            }
            int[] global = new int[names.size()];
            for (int local = 0; local < global.length; local++) {
                int id = id(names.name(local));
                global[local] = id;
                if (referencedAt[id] < 0 && names.referencedAt(local) >= 0) {
                    referencedAt[id] = names.referencedAt(local);
                    referencedBy[id] = names.name(names.referencedBy(local));
                }
            }
            for (int i = 0; i < part.cells.size(); i++) {
                StreamCell c = part.cells.get(i);
                int[] r = c.referenceData();
                for (int j = 0; j < r.length; j += StreamCell.REF_STRIDE) {
                    r[j] = global[r[j]];
                }
                if (cells.size() == cellIds.length) {
                    cellIds = Arrays.copyOf(cellIds, 2 * cellIds.length);
                }
                cellIds[cells.size()] = global[part.cellIds[i]];
                cells.add(c);
            }
            part.skipped.forEach((k, v) -> skipped.merge(k, v, Integer::sum));
            roundedPitches += part.roundedPitches;
            if (part.libNameSeen) {
                libName = part.libName;
            }
            if (part.unitsSeen) {
                userUnits = part.userUnits;
                metres = part.metres;
            }
            trailingNonZero += part.trailingNonZero;
        }

        private static IOException rethrow(Throwable t) {
            if (t instanceof IOException e) {
                return e;
            }
            if (t instanceof RuntimeException e) {
                throw e;
            }
            if (t instanceof Error e) {
                throw e;
            }
            throw new IllegalStateException(t);
        }

        /**
         * The layout: references resolved to cell indexes (a reference to a name no structure
         * defines fails at its first SNAME in file order, as GdsReader reports it), no cycles.
         */
        StreamLayout layout() throws GdsFormatException {
            List<String> warnings = new ArrayList<>();
            String trailing = GdsReadChecks.trailingBytesWarning(trailingNonZero);
            if (trailing != null) {
                warnings.add(trailing);
            }
            int[] indexOfName = new int[idNames.size()];
            Arrays.fill(indexOfName, -1);
            for (int i = 0; i < cells.size(); i++) {
                indexOfName[cellIds[i]] = i;
            }
            int missing = -1;
            for (int id = 0; id < indexOfName.length; id++) {
                if (indexOfName[id] < 0 && referencedAt[id] >= 0
                        && (missing < 0 || referencedAt[id] < referencedAt[missing])) {
                    missing = id;
                }
            }
            if (missing >= 0) {
                throw new GdsFormatException(file, referencedAt[missing], "cell '" + referencedBy[missing]
                        + "' references missing cell '" + idNames.get(missing) + "'");
            }
            for (StreamCell c : cells) {
                int[] r = c.referenceData();
                for (int i = 0; i < r.length; i += StreamCell.REF_STRIDE) {
                    r[i] = indexOfName[r[i]];
                }
            }
            List<StreamCell> cycle = findCycle(cells);
            if (!cycle.isEmpty()) {
                StringBuilder path = new StringBuilder();
                for (StreamCell c : cycle) {
                    if (path.length() > 0) {
                        path.append('/');
                    }
                    path.append(c.name());
                }
                throw new GdsFormatException(file, cycle.get(0).offset(), "cyclic cell references: " + path);
            }
            GdsReadChecks.addEndWarnings(warnings, skipped, roundedPitches);
            boolean[] referenced = new boolean[cells.size()];
            for (StreamCell c : cells) {
                int[] r = c.referenceData();
                for (int i = 0; i < r.length; i += StreamCell.REF_STRIDE) {
                    referenced[r[i]] = true;
                }
            }
            List<StreamCell> tops = new ArrayList<>();
            for (int i = 0; i < cells.size(); i++) {
                if (!referenced[i]) {
                    tops.add(cells.get(i));
                }
            }
            return new StreamLayout(libName, userUnits, metres, cells, tops, skipped, warnings);
        }
    }

    private void map(long at) throws IOException {
        long length = Math.min(window, fileSize - at);
        buf = channel.map(FileChannel.MapMode.READ_ONLY, at, length).order(ByteOrder.BIG_ENDIAN);
        base = at;
        limit = (int) length;
    }

    // ---- records, with exactly the checks and messages of GdsRecordInput ----

    private boolean next() throws IOException {
        int pos = payloadStart + payloadLength;
        long at = base + pos;
        long remaining = fileSize - at;
        if (remaining < 4) {
            if (remaining == 0) {
                recordOffset = at;
                payloadStart = pos;
                payloadLength = 0;
                return false;
            }
            throw new GdsFormatException(file, at, "file ends inside a record header (" + remaining + " of 4 bytes present)");
        }
        if (pos + 4 > limit) {
            map(at);
            pos = 0;
        }
        recordOffset = at;
        ByteBuffer b = buf;
        int header = b.getInt(pos);
        int length = header >>> 16;
        recordType = (header >> 8) & 0xFF;
        dataType = header & 0xFF;
        if (length < 4) {
            throw error("record length " + length + " is below the 4-byte header (record type "
                    + GdsRecordType.nameOf(recordType) + ")");
        }
        if ((length & 1) != 0) {
            throw error("record length " + length + " is odd (record type " + GdsRecordType.nameOf(recordType) + ")");
        }
        if (length > remaining) {
            throw error("file ends inside " + GdsRecordType.nameOf(recordType) + " record: length " + length
                    + ", only " + remaining + " bytes left");
        }
        if (pos + length > limit) {
            map(at);
            pos = 0;
        }
        payloadStart = pos + 4;
        payloadLength = length - 4;
        return true;
    }

    private int int16(int index) {
        return buf.getShort(payloadStart + 2 * index);
    }

    private int int32(int index) {
        return buf.getInt(payloadStart + 4 * index);
    }

    private double real8(int index) {
        return Real8.decode(buf.getLong(payloadStart + 8 * index));
    }

    /** Payload length without trailing NUL padding (the string's length in ISO-8859-1). */
    private int stringLength() {
        int end = payloadStart + payloadLength;
        while (end > payloadStart && buf.get(end - 1) == 0) {
            end--;
        }
        return end - payloadStart;
    }

    private String string() {
        int n = stringLength();
        byte[] bytes = new byte[n];
        buf.get(payloadStart, bytes);
        return new String(bytes, StandardCharsets.ISO_8859_1);
    }

    private long drainCountingNonZero() throws IOException {
        long nonZero = 0;
        long at = base + payloadStart + payloadLength;
        while (at < fileSize) {
            int pos = (int) (at - base);
            if (pos >= limit) {
                map(at);
                pos = 0;
            }
            for (int i = pos; i < limit; i++) {
                if (buf.get(i) != 0) {
                    nonZero++;
                }
            }
            at = base + limit;
        }
        return nonZero;
    }

    private GdsFormatException error(String problem) {
        return records.error(problem);
    }

    // ---- library and structures, following GdsReader step by step ----

    private void readHeader() throws IOException {
        if (!next()) {
            throw error("empty file: no HEADER record");
        }
        if (recordType != GdsRecordType.HEADER.code()) {
            throw error("file does not start with a HEADER record (found " + GdsRecordType.nameOf(recordType) + ")");
        }
        check(GdsRecordType.HEADER, 2);
    }

    /**
     * Library records from the part's start until ENDLIB, or until the start of a later part is
     * reached between structures (with BGNLIB and UNITS read, as a later part assumes).
     */
    private void readLibrary() throws IOException {
        while (true) {
            if (nextPart < partStarts.length) {
                long at = base + payloadStart + payloadLength;
                while (nextPart < partStarts.length && partStarts[nextPart] < at) {
                    nextPart++;
                }
                if (nextPart < partStarts.length && partStarts[nextPart] == at && begun && units) {
                    landedAt = nextPart;
                    return;
                }
            }
            checkCancelled();
            if (!next()) {
                throw error("file ends before ENDLIB");
            }
            int type = recordType;
            if (type == 0x01) { // BGNLIB
                check(GdsRecordType.BGNLIB, 24);
                begun = true;
            } else if (type == 0x02) { // LIBNAME
                check(GdsRecordType.LIBNAME, 0);
                String n = string();
                libName = n.isEmpty() ? null : n;
                libNameSeen = true;
            } else if (type == 0x03) { // UNITS
                check(GdsRecordType.UNITS, 16);
                double u = real8(0);
                double m = real8(1);
                if (!(u > 0) || !(m > 0)) {
                    throw error("UNITS must be positive, found " + u + " user units and " + m + " m per database unit");
                }
                userUnits = u;
                metres = m;
                units = true;
                unitsSeen = true;
            } else if (type == 0x05) { // BGNSTR
                if (!begun || !units) {
                    throw error("BGNSTR before " + (begun ? "UNITS" : "BGNLIB"));
                }
                readStructure();
            } else if (type == 0x04) { // ENDLIB
                trailingNonZero = drainCountingNonZero();
                ended = true;
                return;
            } else {
                skipOrFail("outside a structure");
            }
        }
    }

    private void readStructure() throws IOException {
        long start = recordOffset;
        check(GdsRecordType.BGNSTR, 24);
        cellStart = dataLength;
        shapeCount = 0;
        textCount = 0;
        refCount = 0;
        int id = -1;
        int plainRuns = 0;
        while (true) {
            if (!next()) {
                throw error("file ends inside structure " + (id < 0 ? "(unnamed)" : "'" + names.name(id) + "'"));
            }
            int type = recordType;
            if ((type == 0x08 || type == 0x09 || type == 0x0C) && id >= 0 && plainElements()) {
                if ((++plainRuns & 0x3FF) == 0) {
                    checkCancelled();
                }
            } else if (type == 0x06) { // STRNAME
                check(GdsRecordType.STRNAME, 1);
                int n = stringLength();
                if (n == 0) {
                    throw error("empty STRNAME");
                }
                if (id >= 0) {
                    throw error("second STRNAME '" + string() + "' in structure '" + names.name(id) + "'");
                }
                int found = names.find(buf, payloadStart, n);
                if (found >= 0 && names.defined(found)) {
                    throw error("structure '" + names.name(found) + "' defined twice (first at byte "
                            + names.definedAt(found) + ")");
                }
                id = found >= 0 ? found : names.add(buf, payloadStart, n);
                names.define(id, start, recordOffset);
                if (definedCount == definedIds.length) {
                    definedIds = Arrays.copyOf(definedIds, 2 * definedCount);
                }
                definedIds[definedCount++] = id;
            } else if (type == 0x07) { // ENDSTR
                break;
            } else if (GdsRecordType.isElementStart(type)) {
                if (id < 0) {
                    throw error(GdsRecordType.nameOf(type) + " element in a structure without STRNAME");
                }
                readElement(id);
            } else {
                skipOrFail("outside an element in structure " + (id < 0 ? "(unnamed)" : "'" + names.name(id) + "'"));
            }
        }
        if (id < 0) {
            throw new GdsFormatException(file, start, "structure without STRNAME");
        }
        if (cells.size() == cellIds.length) {
            cellIds = Arrays.copyOf(cellIds, 2 * cellIds.length);
        }
        cellIds[cells.size()] = id;
        cells.add(new StreamCell(names.name(id), start, data, cellStart, dataLength, shapeCount,
                Arrays.copyOf(refs, refCount * StreamCell.REF_STRIDE), Arrays.copyOf(refTransforms, refCount * 2),
                textCount));
    }

    /**
     * An element's records through this reader: boundary, box and path coordinates go straight into
     * {@link #data} after a reserved header, committed only at ENDEL; reference and text points go
     * to a scratch array; an SNAME becomes a name id; STRING and PROPVALUE are checked, not kept.
     */
    private final class ElementRecords extends GdsElementRecords {
        int snameId;

        @Override
        protected boolean next() throws IOException {
            return GdsStreamReader.this.next();
        }

        @Override
        protected int recordType() {
            return recordType;
        }

        @Override
        protected int recordDataType() {
            return dataType;
        }

        @Override
        protected int payloadLength() {
            return payloadLength;
        }

        @Override
        protected long recordOffset() {
            return recordOffset;
        }

        @Override
        protected int int16(int index) {
            return GdsStreamReader.this.int16(index);
        }

        @Override
        protected int int32(int index) {
            return GdsStreamReader.this.int32(index);
        }

        @Override
        protected double real8(int index) {
            return GdsStreamReader.this.real8(index);
        }

        @Override
        protected String file() {
            return file;
        }

        @Override
        protected void count(String what) {
            GdsStreamReader.this.count(what);
        }

        @Override
        protected void xy(int values) {
            int k = kind();
            copyXy(k == 0x08 || k == 0x09 || k == 0x2D, k == 0x09 ? 6 : 2, values);
        }

        @Override
        protected void sname() {
            int n = stringLength();
            int found = names.find(buf, payloadStart, n);
            snameId = found >= 0 ? found : names.add(buf, payloadStart, n);
        }

        @Override
        protected void string() {
            // checked, not kept
        }

        @Override
        protected void propertyValue(int attributeNumber) {
            // checked, not kept
        }
    }

    /** Reads the element at the current record into {@link #data} (shapes) or {@link #refs} (references). */
    private void readElement(int owner) throws IOException {
        ElementRecords r = records;
        if (!r.read()) {
            return;
        }
        int kind = r.kind();
        int points = r.xyValues() / 2;
        switch (kind) {
            case 0x08, 0x09, 0x2D -> {
                int at = dataLength;
                int k = kind == 0x08 ? StreamCell.BOUNDARY : kind == 0x2D ? StreamCell.BOX : StreamCell.PATH;
                data[at] = k << 28 | points;
                data[at + 1] = r.layer() << 16 | (r.datatype() & 0xFFFF);
                if (k == StreamCell.PATH) {
                    data[at + 2] = r.pathType();
                    data[at + 3] = r.width();
                    data[at + 4] = r.beginExtension();
                    data[at + 5] = r.endExtension();
                }
                dataLength = at + StreamCell.headerSize(k) + r.xyValues();
                if (k == StreamCell.BOUNDARY && points == 5) {
                    dataLength = StreamCell.packRectangle(data, at);
                }
                shapeCount++;
            }
            case 0x0C -> textCount++;
            case 0x0A, 0x0B -> {
                int[] xy = scratchXy;
                int columns = 1;
                int rows = 1;
                int columnPitchX = 0;
                int columnPitchY = 0;
                int rowPitchX = 0;
                int rowPitchY = 0;
                if (kind == 0x0B) {
                    columns = r.columns();
                    rows = r.rows();
                    columnPitchX = pitch((long) xy[2] - xy[0], columns);
                    columnPitchY = pitch((long) xy[3] - xy[1], columns);
                    rowPitchX = pitch((long) xy[4] - xy[0], rows);
                    rowPitchY = pitch((long) xy[5] - xy[1], rows);
                }
                if ((refCount + 1) * StreamCell.REF_STRIDE > refs.length) {
                    refs = Arrays.copyOf(refs, refs.length * 2);
                    refTransforms = Arrays.copyOf(refTransforms, refTransforms.length * 2);
                }
                int i = refCount * StreamCell.REF_STRIDE;
                int strans = r.strans();
                refs[i] = r.snameId; // a name id until resolved
                refs[i + 1] = xy[0];
                refs[i + 2] = xy[1];
                refs[i + 3] = ((strans & 0x8000) != 0 ? StreamCell.REFLECTED : 0)
                        | ((strans & 0x0004) != 0 ? StreamCell.ABSOLUTE_MAG : 0)
                        | ((strans & 0x0002) != 0 ? StreamCell.ABSOLUTE_ANGLE : 0)
                        | (kind == 0x0B ? StreamCell.ARRAY : 0);
                refs[i + 4] = columns;
                refs[i + 5] = rows;
                refs[i + 6] = columnPitchX;
                refs[i + 7] = columnPitchY;
                refs[i + 8] = rowPitchX;
                refs[i + 9] = rowPitchY;
                refTransforms[2 * refCount] = r.magnification();
                refTransforms[2 * refCount + 1] = r.angle();
                refCount++;
                names.referenced(r.snameId, r.snameOffset(), owner);
            }
            default -> throw new IllegalStateException("element kind " + kind);
        }
    }

    /**
     * The common case, taken only when it cannot fail: standing on a BOUNDARY, PATH or TEXT record
     * without payload, stores (texts: counts) as many consecutive elements of these kinds as are
     * plain and lie whole in this window. A plain BOUNDARY is exactly LAYER, DATATYPE, XY (at least
     * one point) and ENDEL with their prescribed data types and lengths; a plain PATH may add
     * PATHTYPE (0, 1, 2 or 4) and WIDTH before the XY; a plain TEXT is described at
     * {@link #plainText}. No per-record checks are needed: the patterns imply them. Afterwards the reader stands on the last ENDEL, as {@link #readElement} would
     * leave it; when the first element is not plain nothing changes and false is returned.
     */
    private boolean plainElements() {
        ByteBuffer b = buf;
        int lim = limit;
        int p = payloadStart - 4;
        int[] d = data;
        int length = dataLength;
        int shapes = shapeCount;
        int texts = textCount;
        int lastEndel = -1;
        while (p + 20 <= lim) {
            // element record and LAYER header; LAYER value, DATATYPE header and value
            long head = b.getLong(p);
            if (head == 0x0004_0800_0006_0D02L && p + 64 <= lim) {
                // the usual rectangle: a boundary of five points in 64 bytes, read as eight longs
                long l1 = b.getLong(p + 8);
                long l2 = b.getLong(p + 16);
                long l7 = b.getLong(p + 56);
                if ((l1 & 0x0000_FFFF_FFFF_0000L) == 0x0000_0006_0E02_0000L && (l2 >>> 32) == 0x002C_1003L
                        && (int) l7 == 0x0004_1100) {
                    long l3 = b.getLong(p + 24);
                    long l4 = b.getLong(p + 32);
                    long l5 = b.getLong(p + 40);
                    long l6 = b.getLong(p + 48);
                    // points as x << 32 | y
                    long p0 = l2 << 32 | l3 >>> 32;
                    long p1 = l3 << 32 | l4 >>> 32;
                    long p2 = l4 << 32 | l5 >>> 32;
                    long p3 = l5 << 32 | l6 >>> 32;
                    long p4 = l6 << 32 | l7 >>> 32;
                    int turn = StreamCell.rectangleTurn(p0, p1, p2, p3, p4);
                    if (turn >= 0) {
                        if (length + 6 > d.length) {
                            dataLength = length;
                            grow(6);
                            d = data;
                            length = dataLength;
                        }
                        d[length] = StreamCell.RECTANGLE << 28 | turn | 5;
                        d[length + 1] = (int) (l1 >> 48) << 16 | (int) (l1 & 0xFFFF);
                        d[length + 2] = (int) l2;
                        d[length + 3] = (int) (l3 >> 32);
                        d[length + 4] = (int) l4;
                        d[length + 5] = (int) (l5 >> 32);
                        length += 6;
                        shapes++;
                        lastEndel = p + 60;
                        p += 64;
                        continue;
                    }
                }
            }
            int header;
            int kind;
            if (head == 0x0004_0800_0006_0D02L) {
                header = 2;
                kind = StreamCell.BOUNDARY;
            } else if (head == 0x0004_0900_0006_0D02L) {
                header = 6;
                kind = StreamCell.PATH;
            } else if (head == 0x0004_0C00_0006_0D02L) {
                int endel = plainText(b, p, lim);
                if (endel < 0) {
                    break;
                }
                texts++;
                lastEndel = endel;
                p = endel + 4;
                continue;
            } else {
                break;
            }
            long layerKey = b.getLong(p + 8);
            if ((int) (layerKey >>> 16) != 0x0006_0E02) {
                break;
            }
            int q = p + 16;
            int pathType = 0;
            int width = 0;
            if (kind == StreamCell.PATH) {
                if (q + 6 <= lim && b.getInt(q) == 0x0006_2102) {
                    pathType = b.getShort(q + 4);
                    if (pathType != 0 && pathType != 1 && pathType != 2 && pathType != 4) {
                        break;
                    }
                    q += 6;
                }
                if (q + 8 <= lim && b.getInt(q) == 0x0008_0F03) {
                    width = b.getInt(q + 4);
                    q += 8;
                }
                if (q + 4 > lim) {
                    break;
                }
            }
            int xyHeader = b.getInt(q);
            int xyLength = xyHeader >>> 16;
            if ((xyHeader & 0xFFFF) != 0x1003 || xyLength < 12 || ((xyLength - 4) & 7) != 0) {
                break;
            }
            int endel = q + xyLength;
            if (endel + 4 > lim || b.getInt(endel) != 0x0004_1100) {
                break;
            }
            int values = (xyLength - 4) >> 2;
            if (length + header + values > d.length) {
                dataLength = length;
                grow(header + values);
                d = data;
                length = dataLength;
            }
            d[length] = kind << 28 | values >> 1;
            d[length + 1] = (int) (layerKey >> 48) << 16 | (int) (layerKey & 0xFFFF);
            if (kind == StreamCell.PATH) {
                d[length + 2] = pathType;
                d[length + 3] = width;
                d[length + 4] = 0;
                d[length + 5] = 0;
            }
            int to = length + header;
            int from = q + 4;
            for (int i = 0; i < values; i += 2) {
                long xy = b.getLong(from + 4 * i);
                d[to + i] = (int) (xy >> 32);
                d[to + i + 1] = (int) xy;
            }
            length = to + values;
            shapes++;
            lastEndel = endel;
            p = endel + 4;
        }
        dataLength = length;
        shapeCount = shapes;
        textCount = texts;
        if (lastEndel < 0) {
            return false;
        }
        recordOffset = base + lastEndel;
        recordType = 0x11;
        dataType = 0;
        payloadStart = lastEndel + 4;
        payloadLength = 0;
        return true;
    }

    /**
     * The ENDEL offset of a plain TEXT element at {@code p}, or -1: LAYER, TEXTTYPE, optional
     * PRESENTATION (justifications defined), optional STRANS, MAG (positive) and ANGLE, XY of one
     * point, STRING and ENDEL, each with its prescribed data type and length, all before
     * {@code lim}. Texts are counted, not kept.
     */
    private static int plainText(ByteBuffer b, int p, int lim) {
        if ((int) (b.getLong(p + 8) >>> 16) != 0x0006_1602) {
            return -1;
        }
        int q = p + 16;
        if (q + 6 <= lim && b.getInt(q) == 0x0006_1701) {
            int presentation = b.getShort(q + 4) & 0xFFFF;
            if (((presentation >> 2) & 3) == 3 || (presentation & 3) == 3) {
                return -1;
            }
            q += 6;
        }
        if (q + 6 <= lim && b.getInt(q) == 0x0006_1A01) {
            q += 6;
        }
        if (q + 12 <= lim && b.getInt(q) == 0x000C_1B05) {
            if (!(Real8.decode(b.getLong(q + 4)) > 0)) {
                return -1;
            }
            q += 12;
        }
        if (q + 12 <= lim && b.getInt(q) == 0x000C_1C05) {
            q += 12;
        }
        if (q + 16 > lim || b.getInt(q) != 0x000C_1003) {
            return -1;
        }
        q += 12;
        int string = b.getInt(q);
        int length = string >>> 16;
        if ((string & 0xFFFF) != 0x1906 || length < 4 || (length & 1) != 0) {
            return -1;
        }
        q += length;
        if (q + 4 > lim || b.getInt(q) != 0x0004_1100) {
            return -1;
        }
        return q;
    }

    /**
     * Makes room for {@code more} values after {@link #dataLength}: a new chunk, into which the
     * current cell's shapes so far are moved (so that a cell's shapes stay in one array). Near the
     * part's end the chunk is sized for the bytes left: a shape takes at most about as many bytes
     * in the chunk as in the file.
     */
    private void grow(int more) {
        if (staged) {
            growStaged(more);
            return;
        }
        int cellSoFar = dataLength - cellStart;
        long left = Math.max(0, partEnd - (base + payloadStart));
        int size = (int) Math.max(chunkFor(left + (1 << 18)), 2L * (cellSoFar + more));
        int[] chunk = new int[size];
        System.arraycopy(data, cellStart, chunk, 0, cellSoFar);
        data = chunk;
        cellStart = 0;
        dataLength = cellSoFar;
        chunkFirstCell = cells.size();
    }

    /**
     * Staged: copies the finished cells out, moves the current cell's shapes so far to the front of
     * the staging array, and takes a larger array (not kept later) if they still do not fit.
     */
    private void growStaged(int more) {
        copyOutStaged(cellStart);
        int cellSoFar = dataLength - cellStart;
        if (cellSoFar + more <= data.length) {
            System.arraycopy(data, cellStart, data, 0, cellSoFar);
        } else {
            int[] larger = new int[(int) Math.min(Integer.MAX_VALUE - 16, 2L * (cellSoFar + more))];
            System.arraycopy(data, cellStart, larger, 0, cellSoFar);
            Staging.give(data);
            data = larger;
        }
        cellStart = 0;
        dataLength = cellSoFar;
    }

    /**
     * Staged: gives the cells finished since the last copy, whose shapes end at {@code end}, an
     * array of exactly their shapes.
     */
    private void copyOutStaged(int end) {
        if (chunkFirstCell == cells.size()) {
            return;
        }
        moveChunkCellsTo(Arrays.copyOf(data, end));
        chunkFirstCell = cells.size();
    }

    /** Points the cells made since the chunk began at {@code array}, which holds their shapes where the chunk did. */
    private void moveChunkCellsTo(int[] array) {
        for (int i = chunkFirstCell; i < cells.size(); i++) {
            StreamCell c = cells.get(i);
            cells.set(i, new StreamCell(c.name(), c.offset(), array, c.shapeStart(), c.shapeEnd(), c.shapeCount(),
                    c.referenceData(), c.referenceTransforms(), c.textCount()));
        }
    }

    /**
     * Gives the cells in the last chunk an array of the size they use when much of the chunk is
     * empty, so that the parts' unused chunk ends do not add up to much.
     */
    private void trimLastChunk() {
        int unused = data.length - dataLength;
        if (unused <= data.length / 4 || unused < 1024 || chunkFirstCell == cells.size()) {
            return;
        }
        int[] exact = Arrays.copyOf(data, dataLength);
        moveChunkCellsTo(exact);
        data = exact;
    }

    /** Copies the XY payload: for shapes into {@link #data} after the header, else to the scratch array. */
    private void copyXy(boolean shape, int header, int values) {
        int[] target;
        int at;
        if (shape) {
            if (dataLength + header + values > data.length) {
                grow(header + values);
            }
            target = data;
            at = dataLength + header;
        } else {
            if (values > scratchXy.length) {
                scratchXy = new int[Math.max(values, 2 * scratchXy.length)];
            }
            target = scratchXy;
            at = 0;
        }
        ByteBuffer b = buf;
        int p = payloadStart;
        for (int i = 0; i < values; i++, p += 4) {
            target[at + i] = b.getInt(p);
        }
    }

    private int pitch(long span, int count) {
        if (GdsReadChecks.isPitchRounded(span, count)) {
            roundedPitches++;
        }
        return GdsReadChecks.pitch(span, count);
    }

    /**
     * A cycle, as GdsReader finds it: depth-first from each cell in file order over the children in
     * reference order (repeats of the previous child dropped); the cycle as cells A, B, ..., A.
     */
    static List<StreamCell> findCycle(List<StreamCell> cells) {
        int n = cells.size();
        int[][] children = new int[n][];
        boolean any = false;
        for (int i = 0; i < n; i++) {
            int[] r = cells.get(i).referenceData();
            int[] kids = new int[r.length / StreamCell.REF_STRIDE];
            int k = 0;
            for (int j = 0; j < r.length; j += StreamCell.REF_STRIDE) {
                if (k == 0 || kids[k - 1] != r[j]) {
                    kids[k++] = r[j];
                }
            }
            children[i] = k == 0 ? null : Arrays.copyOf(kids, k);
            any |= k > 0;
        }
        if (!any) {
            return List.of();
        }
        byte[] state = new byte[n]; // 0 unseen, 1 on the stack, 2 finished
        int[] stack = new int[n];
        int[] next = new int[n];
        for (int root = 0; root < n; root++) {
            if (state[root] != 0 || children[root] == null) {
                continue;
            }
            stack[0] = root;
            next[0] = 0;
            state[root] = 1;
            int depth = 1;
            while (depth > 0) {
                int top = stack[depth - 1];
                int[] kids = children[top];
                int i = next[depth - 1];
                if (kids != null && i < kids.length) {
                    next[depth - 1] = i + 1;
                    int child = kids[i];
                    if (state[child] == 0) {
                        state[child] = 1;
                        stack[depth] = child;
                        next[depth] = 0;
                        depth++;
                    } else if (state[child] == 1) {
                        List<StreamCell> cycle = new ArrayList<>();
                        cycle.add(cells.get(child));
                        for (int d = depth - 1; d >= 0; d--) {
                            cycle.add(cells.get(stack[d]));
                            if (stack[d] == child) {
                                break;
                            }
                        }
                        Collections.reverse(cycle);
                        return cycle;
                    }
                } else {
                    state[top] = 2;
                    depth--;
                }
            }
        }
        return List.of();
    }

    private void check(GdsRecordType type, int minBytes) throws GdsFormatException {
        records.check(type, minBytes);
    }

    private void skipOrFail(String where) throws GdsFormatException {
        records.skipOrFail(where);
    }

    private void count(String what) {
        skipped.merge(what, 1, Integer::sum);
    }

    /**
     * Structure names, found by their bytes in the buffer without building a string (open
     * addressing); per name: where it was defined and its first reference, in this part.
     */
    private static final class NameTable {
        private byte[][] bytes = new byte[64][];
        private String[] strings = new String[64];
        private long[] definedAt = new long[64];
        private long[] namedAt = new long[64];
        private long[] referencedAt = new long[64];
        private int[] referencedBy = new int[64];
        private int size;
        private int[] slots = new int[256]; // id + 1, 0 empty

        int size() {
            return size;
        }

        String name(int id) {
            return strings[id];
        }

        boolean defined(int id) {
            return definedAt[id] >= 0;
        }

        long definedAt(int id) {
            return definedAt[id];
        }

        /** Defines a name: its structure's BGNSTR and its STRNAME record are at the given offsets. */
        void define(int id, long offset, long strnameOffset) {
            definedAt[id] = offset;
            namedAt[id] = strnameOffset;
        }

        long namedAt(int id) {
            return namedAt[id];
        }

        long referencedAt(int id) {
            return referencedAt[id];
        }

        int referencedBy(int id) {
            return referencedBy[id];
        }

        void referenced(int id, long offset, int owner) {
            if (referencedAt[id] < 0) {
                referencedAt[id] = offset;
                referencedBy[id] = owner;
            }
        }

        private static int hash(ByteBuffer b, int from, int length) {
            int h = 1;
            for (int i = 0; i < length; i++) {
                h = 31 * h + b.get(from + i);
            }
            return h ^ (h >>> 16);
        }

        int find(ByteBuffer b, int from, int length) {
            int mask = slots.length - 1;
            for (int s = hash(b, from, length) & mask;; s = (s + 1) & mask) {
                int v = slots[s];
                if (v == 0) {
                    return -1;
                }
                byte[] name = bytes[v - 1];
                if (name.length == length && equal(name, b, from)) {
                    return v - 1;
                }
            }
        }

        private static boolean equal(byte[] name, ByteBuffer b, int from) {
            for (int i = 0; i < name.length; i++) {
                if (name[i] != b.get(from + i)) {
                    return false;
                }
            }
            return true;
        }

        int add(ByteBuffer b, int from, int length) {
            if (size == bytes.length) {
                int cap = size * 2;
                bytes = Arrays.copyOf(bytes, cap);
                strings = Arrays.copyOf(strings, cap);
                definedAt = Arrays.copyOf(definedAt, cap);
                namedAt = Arrays.copyOf(namedAt, cap);
                referencedAt = Arrays.copyOf(referencedAt, cap);
                referencedBy = Arrays.copyOf(referencedBy, cap);
            }
            byte[] name = new byte[length];
            b.get(from, name);
            int id = size++;
            bytes[id] = name;
            strings[id] = new String(name, StandardCharsets.ISO_8859_1);
            definedAt[id] = -1;
            referencedAt[id] = -1;
            if (size * 2 > slots.length) {
                rehash(slots.length * 2);
            } else {
                insert(id);
            }
            return id;
        }

        private void insert(int id) {
            int mask = slots.length - 1;
            byte[] name = bytes[id];
            int s = hash(ByteBuffer.wrap(name), 0, name.length) & mask;
            while (slots[s] != 0) {
                s = (s + 1) & mask;
            }
            slots[s] = id + 1;
        }

        private void rehash(int capacity) {
            slots = new int[capacity];
            for (int id = 0; id < size; id++) {
                insert(id);
            }
        }
    }
}
