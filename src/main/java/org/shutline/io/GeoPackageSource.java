package org.shutline.io;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.LocalDate;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.shutline.model.CrsInfo;
import org.sqlite.SQLiteConfig;

/**
 * Reads every feature table of a GeoPackage into {@link RawLayer}s, in the order
 * {@code gpkg_contents} lists them, with plain SQL over the SQLite driver.
 *
 * <p>The file is opened read-only ({@code mode=ro} URI and the driver's read-only flag),
 * and immutable unless a write-ahead log lies beside it ({@link #open}): nothing is
 * written or created beside it. A damaged file is "not a readable GeoPackage (file is
 * truncated or corrupt: SQLite says ...)" ({@link #unreadable}). Metadata comes from the GeoPackage tables
 * ({@code gpkg_contents}, {@code gpkg_geometry_columns}, {@code gpkg_spatial_ref_sys},
 * OGC 12-128r18 sections 1.1.2, 1.1.3, 2.1.5); a database without them is "not a readable
 * GeoPackage". Per layer one prepared {@code SELECT pk, geom, fields...}; values by the
 * storage class of each cell, typed by the column's declared GeoPackage type as the NGA
 * library gave them before (TINYINT Byte, SMALLINT Short, MEDIUMINT Integer, INT and
 * INTEGER Long, FLOAT Float, DOUBLE and REAL Double, BOOLEAN Boolean, DATE and DATETIME the
 * calendar date in UTC, TEXT String; a cell whose storage does not fit its column, such as
 * text in a REAL column, is returned as stored so the decoder reports it). Text values
 * are interned per file, so a word or id repeated over a million rows is one string.
 * Geometry: the GeoPackage binary header and WKB decoded by {@link GpkgGeometry}; a bad
 * blob is a per-feature geometry error (a located finding), never an exception.
 * CRS: by the organization's EPSG code when it has one, else by its WKT definition; the
 * undefined systems (srs_id -1 and 0, definition "undefined") give a null CRS.
 * A file that is not an SQLite database is an {@link InputException} naming the file.
 * Time O(cells); one pass over each table.
 */
final class GeoPackageSource {
    private static final byte[] SQLITE_MAGIC = "SQLite format 3\0".getBytes(StandardCharsets.US_ASCII);

    private GeoPackageSource() {}

    /** Rows per chunk above which a table is read in several key ranges at once. */
    static final int CHUNK_ROWS = 200_000;

    static List<RawLayer> read(Path file) throws InputException {
        return read(file, Math.max(1, Math.min(4, Runtime.getRuntime().availableProcessors())), CHUNK_ROWS);
    }

    /**
     * Reads with {@code threads} reader threads, each on its own read-only connection:
     * the tables, and the key ranges of a table spanning more than {@code chunkRows} keys,
     * are read at the same time and put back together in table and key order, so the
     * result is the same as one sequential pass.
     */
    static List<RawLayer> read(Path file, int threads, int chunkRows) throws InputException {
        checkMagic(file);
        List<Table> tables = new ArrayList<>();
        try (Connection c = open(file)) {
            for (String t : featureTables(c, file)) tables.add(table(c, t, file));
        } catch (SQLException e) {
            throw unreadable(file, e);
        }
        Map<String, String> words = new java.util.concurrent.ConcurrentHashMap<>();
        List<Chunk> chunks = new ArrayList<>();
        for (Table t : tables) {
            long span = t.maxKey - t.minKey + 1;
            int parts = threads <= 1 || t.pk == null || span <= chunkRows ? 1 : (int) Math.min(64, (span + chunkRows - 1) / chunkRows);
            for (int i = 0; i < parts; i++) {
                long lo = parts == 1 ? Long.MIN_VALUE : t.minKey + span * i / parts;
                long hi = parts == 1 ? Long.MAX_VALUE : i == parts - 1 ? Long.MAX_VALUE : t.minKey + span * (i + 1) / parts;
                chunks.add(new Chunk(t, lo, hi));
            }
        }
        // biggest first, so the threads finish together
        List<Chunk> byCost = new ArrayList<>(chunks);
        byCost.sort(java.util.Comparator.comparingLong((Chunk ch) -> ch.estimate()).reversed());
        java.util.concurrent.ExecutorService pool = java.util.concurrent.Executors.newFixedThreadPool(threads, r -> {
            Thread th = new Thread(r, "gpkg-reader");
            th.setDaemon(true);
            return th;
        });
        ThreadLocal<Connection> conn = new ThreadLocal<>();
        List<Connection> opened = java.util.Collections.synchronizedList(new ArrayList<>());
        Map<Chunk, java.util.concurrent.Future<List<RawLayer.Feature>>> futures = new HashMap<>();
        try {
            for (Chunk ch : byCost) {
                futures.put(ch, pool.submit(() -> {
                    Connection c = conn.get();
                    if (c == null) {
                        c = open(file);
                        opened.add(c);
                        conn.set(c);
                    }
                    return ch.table.features(c, ch.lo, ch.hi, words);
                }));
            }
            List<RawLayer> out = new ArrayList<>(tables.size());
            for (Table t : tables) {
                List<RawLayer.Feature> fs = null;
                for (Chunk ch : chunks) {
                    if (ch.table != t) continue;
                    List<RawLayer.Feature> part = futures.get(ch).get();
                    if (fs == null) fs = part;
                    else fs.addAll(part);
                }
                out.add(new RawLayer(t.name, t.where, false, t.names, fs == null ? new ArrayList<>() : fs, t.crs));
            }
            return out;
        } catch (java.util.concurrent.ExecutionException e) {
            Throwable cause = e.getCause();
            if (cause instanceof InputException ie) throw ie;
            if (cause instanceof SQLException se) throw unreadable(file, se);
            if (cause instanceof RuntimeException re) throw re;
            if (cause instanceof Error er) throw er;
            throw new IllegalStateException(cause);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new InputException(file + ": reading interrupted", e);
        } finally {
            pool.shutdownNow();
            for (Connection c : opened) {
                try {
                    c.close();
                } catch (SQLException ignored) {
                    // read-only connection: nothing to lose on close
                }
            }
        }
    }

    /** One key range of one table ({@code lo} inclusive, {@code hi} exclusive). */
    private record Chunk(Table table, long lo, long hi) {
        long estimate() {
            long a = lo == Long.MIN_VALUE ? table.minKey : lo;
            long b = hi == Long.MAX_VALUE ? table.maxKey + 1 : hi;
            return Math.max(1, b - a) * (table.names.size() + 2);
        }
    }

    /**
     * A read-only connection: a {@code file:} URI with {@code mode=ro} and the driver's
     * read-only flag; with {@code immutable=1} as well when no write-ahead log
     * ({@code NAME-wal}) lies beside the file. An immutable open takes no locks and
     * creates nothing (a WAL-mode database opened only {@code mode=ro} would make
     * {@code -wal} and {@code -shm} files beside the input); it ignores a write-ahead log,
     * so when one exists the file is opened {@code mode=ro} alone, to read what the log
     * holds. (SQLite URI parameters: sqlite.org/uri.html, "immutable" and "mode".)
     */
    static Connection open(Path file) throws SQLException {
        SQLiteConfig config = new SQLiteConfig();
        config.setReadOnly(true);
        Path abs = file.toAbsolutePath();
        boolean wal = Files.exists(abs.resolveSibling(abs.getFileName() + "-wal"));
        String url = "jdbc:sqlite:" + abs.toUri().toString().replaceFirst("^file:/+", "file:/")
                + (wal ? "?mode=ro" : "?mode=ro&immutable=1");
        return org.sqlite.JDBC.createConnection(url, config.toProperties());
    }

    /**
     * The message for an SQLite failure while reading {@code file}: a damaged database
     * (SQLite's CORRUPT or NOTADB result) is "not a readable GeoPackage (file is truncated
     * or corrupt: SQLite says ...)"; anything else "cannot read GeoPackage: SQLite says ...".
     */
    static InputException unreadable(Path file, SQLException e) {
        String says = e.getMessage() == null ? "no reason given" : e.getMessage();
        boolean damaged = false;
        if (e instanceof org.sqlite.SQLiteException se) {
            org.sqlite.SQLiteErrorCode code = se.getResultCode();
            damaged = code == org.sqlite.SQLiteErrorCode.SQLITE_CORRUPT || code == org.sqlite.SQLiteErrorCode.SQLITE_NOTADB
                    || code.name().startsWith("SQLITE_CORRUPT_") || code.name().startsWith("SQLITE_IOERR_SHORT_READ");
            // the driver's text is "[CODE] description (sqlite's own message)": keep SQLite's own words
            int open = says.lastIndexOf('(');
            if (says.startsWith("[") && open > 0 && says.endsWith(")")) says = says.substring(open + 1, says.length() - 1);
        }
        if (damaged) {
            return new InputException(file + ": not a readable GeoPackage (file is truncated or corrupt: SQLite says \""
                    + says + "\")", e);
        }
        Path abs = file.toAbsolutePath();
        if (Files.exists(abs.resolveSibling(abs.getFileName() + "-wal"))) {
            return new InputException(file + ": cannot read GeoPackage: SQLite says \"" + says + "\"; the file has a write-ahead log ("
                    + abs.getFileName() + "-wal) that SQLite cannot open here (it needs the -shm file beside it, or a folder it may"
                    + " write to); close the file in the program that wrote it, which folds the log into the file", e);
        }
        return new InputException(file + ": cannot read GeoPackage: SQLite says \"" + says + "\"", e);
    }

    private static void checkMagic(Path file) throws InputException {
        byte[] head = new byte[SQLITE_MAGIC.length];
        int n;
        try (InputStream in = Files.newInputStream(file)) {
            n = in.readNBytes(head, 0, head.length);
        } catch (IOException e) {
            throw new InputException(file + ": cannot read: " + e.getMessage(), e);
        }
        if (n < head.length || !Arrays.equals(head, SQLITE_MAGIC)) {
            throw new InputException(file + ": not a GeoPackage (not an SQLite database)");
        }
    }

    private static List<String> featureTables(Connection c, Path file) throws InputException, SQLException {
        for (String required : List.of("gpkg_spatial_ref_sys", "gpkg_contents", "gpkg_geometry_columns")) {
            try (PreparedStatement s = c.prepareStatement("SELECT 1 FROM sqlite_master WHERE type IN ('table', 'view') AND name = ?")) {
                s.setString(1, required);
                try (ResultSet r = s.executeQuery()) {
                    if (!r.next()) {
                        throw new InputException(file + ": not a readable GeoPackage: it has no " + required + " table");
                    }
                }
            }
        }
        List<String> out = new ArrayList<>();
        try (Statement s = c.createStatement();
             ResultSet r = s.executeQuery("SELECT table_name FROM gpkg_contents WHERE lower(data_type) = 'features' ORDER BY rowid")) {
            while (r.next()) out.add(r.getString(1));
        }
        return out;
    }

    /** Declared column type, as NGA's GeoPackageDataType named them. */
    private enum Kind { BOOLEAN, BYTE, SHORT, INT, LONG, FLOAT, DOUBLE, TEXT, DATE, BLOB }

    private static Kind kind(String declared) {
        String t = declared == null ? "" : declared.toUpperCase(Locale.ROOT);
        int paren = t.indexOf('(');
        if (paren >= 0) t = t.substring(0, paren);
        return switch (t.trim()) {
            case "BOOLEAN" -> Kind.BOOLEAN;
            case "TINYINT" -> Kind.BYTE;
            case "SMALLINT" -> Kind.SHORT;
            case "MEDIUMINT" -> Kind.INT;
            case "INT", "INTEGER" -> Kind.LONG;
            case "FLOAT" -> Kind.FLOAT;
            case "DOUBLE", "REAL" -> Kind.DOUBLE;
            case "DATE", "DATETIME" -> Kind.DATE;
            case "BLOB" -> Kind.BLOB;
            default -> Kind.TEXT;
        };
    }

    /** A feature table's metadata: key, geometry and field columns, CRS, key range. */
    private static final class Table {
        final String name, where, pk, geomColumn;
        final List<String> names;
        final Kind[] kinds;
        final CrsInfo crs;
        final long minKey, maxKey;

        Table(String name, String where, String pk, String geomColumn, List<String> names, Kind[] kinds, CrsInfo crs, long minKey, long maxKey) {
            this.name = name;
            this.where = where;
            this.pk = pk;
            this.geomColumn = geomColumn;
            this.names = names;
            this.kinds = kinds;
            this.crs = crs;
            this.minKey = minKey;
            this.maxKey = maxKey;
        }

        /** The features with key in [lo, hi), in key order. */
        List<RawLayer.Feature> features(Connection c, long lo, long hi, Map<String, String> words) throws SQLException {
            String key = pk == null ? "rowid" : quote(pk);
            StringBuilder sql = new StringBuilder("SELECT ").append(key).append(", ").append(quote(geomColumn));
            for (String n : names) sql.append(", ").append(quote(n));
            sql.append(" FROM ").append(quote(name));
            boolean ranged = lo != Long.MIN_VALUE || hi != Long.MAX_VALUE;
            if (ranged) sql.append(" WHERE ").append(key).append(" >= ? AND ").append(key).append(" < ?");
            sql.append(" ORDER BY 1");
            GpkgGeometry geom = new GpkgGeometry();
            List<RawLayer.Feature> fs = new ArrayList<>();
            int nv = names.size();
            Interner[] intern = new Interner[nv];
            for (int i = 0; i < nv; i++) intern[i] = new Interner(words);
            try (PreparedStatement s = c.prepareStatement(sql.toString())) {
                if (ranged) {
                    s.setLong(1, lo);
                    s.setLong(2, hi);
                }
                try (ResultSet r = s.executeQuery()) {
                    while (r.next()) {
                        long fid = r.getLong(1);
                        Object[] vals = new Object[nv];
                        for (int i = 0; i < nv; i++) vals[i] = value(r, i + 3, kinds[i], intern[i]);
                        byte[] blob = r.getBytes(2);
                        RawLayer.Feature f;
                        if (blob == null) {
                            f = new RawLayer.Feature(fid, null, null, vals);
                        } else {
                            GpkgGeometry.Result g = geom.decode(blob);
                            f = new RawLayer.Feature(fid, g.geometry(), g.error() == null ? null
                                    : "geometry (field " + geomColumn + ") not readable: " + g.error(), vals);
                        }
                        fs.add(f);
                    }
                }
            }
            return fs;
        }
    }

    private static Table table(Connection c, String table, Path file) throws InputException, SQLException {
        String where = file + " layer " + table;
        String geomColumn = null;
        long srsId = Long.MIN_VALUE;
        try (PreparedStatement s = c.prepareStatement(
                "SELECT column_name, srs_id FROM gpkg_geometry_columns WHERE lower(table_name) = lower(?)")) {
            s.setString(1, table);
            try (ResultSet r = s.executeQuery()) {
                if (r.next()) {
                    geomColumn = r.getString(1);
                    srsId = r.getLong(2);
                }
            }
        }
        if (geomColumn == null) {
            throw new InputException(where + ": not a readable GeoPackage: feature table without a gpkg_geometry_columns row");
        }
        String pk = null;
        String pkType = null;
        List<String> names = new ArrayList<>();
        List<Kind> kinds = new ArrayList<>();
        try (Statement s = c.createStatement(); ResultSet r = s.executeQuery("PRAGMA table_info(" + quote(table) + ")")) {
            while (r.next()) {
                String name = r.getString("name");
                if (r.getInt("pk") > 0 && pk == null) {
                    pk = name;
                    pkType = r.getString("type");
                } else if (!name.equalsIgnoreCase(geomColumn)) {
                    names.add(name);
                    kinds.add(kind(r.getString("type")));
                }
            }
        }
        if (names.isEmpty() && pk == null) throw new InputException(where + ": table not found");
        CrsInfo crs = crs(c, srsId, where);
        // key ranges only over an INTEGER PRIMARY KEY (the rowid): a range query on it is a b-tree seek
        boolean rowidKey = pk != null && pkType != null && pkType.trim().equalsIgnoreCase("INTEGER");
        long min = 0, max = -1;
        if (rowidKey) {
            try (Statement s = c.createStatement();
                 ResultSet r = s.executeQuery("SELECT min(" + quote(pk) + "), max(" + quote(pk) + ") FROM " + quote(table))) {
                if (r.next() && r.getObject(1) != null) {
                    min = r.getLong(1);
                    max = r.getLong(2);
                }
            }
        }
        return new Table(table, where, pk, geomColumn, names, kinds.toArray(new Kind[0]), crs,
                rowidKey ? min : 0, rowidKey ? max : -1);
    }

    private static Object value(ResultSet r, int col, Kind k, Interner words) throws SQLException {
        Object v = r.getObject(col);
        if (v == null) return null;
        if (v instanceof String s) {
            if (k == Kind.DATE) return date(s);
            return words.of(s);
        }
        if (v instanceof Integer || v instanceof Long) {
            long l = ((Number) v).longValue();
            return switch (k) {
                case BOOLEAN -> l != 0;
                case BYTE -> (byte) l;
                case SHORT -> (short) l;
                case INT -> (int) l;
                case LONG -> l;
                case FLOAT -> (float) l;
                case DOUBLE -> (double) l;
                case TEXT -> words.of(Long.toString(l));
                default -> v;
            };
        }
        if (v instanceof Double d) {
            return switch (k) {
                case FLOAT -> d.floatValue();
                case TEXT -> words.of(r.getString(col));
                default -> d;
            };
        }
        return v;
    }

    /**
     * Interns the text of one column through the file's shared table while that pays:
     * after {@value #PROBE} values, a column with more than half of them distinct (an id
     * column) stops interning, so unique ids do not fill the table.
     */
    private static final class Interner {
        private static final int PROBE = 4096;
        private final Map<String, String> table;
        private final Map<String, String> seen = new HashMap<>();
        /** This column's own words, in front of the shared table: a plain map read without synchronisation. */
        private final Map<String, String> local = new HashMap<>();
        private int count;
        private boolean on = true;

        Interner(Map<String, String> table) {
            this.table = table;
        }

        String of(String s) {
            if (!on) return s;
            if (count < PROBE) {
                count++;
                seen.putIfAbsent(s, s);
                if (count == PROBE) {
                    on = seen.size() <= PROBE / 2;
                    seen.clear();
                    if (!on) return s;
                }
            }
            String l = local.get(s);
            if (l != null) return l;
            String t = table.putIfAbsent(s, s);
            String w = t == null ? s : t;
            if (local.size() < 65_536) local.put(w, w);
            return w;
        }
    }

    /** A DATE or DATETIME cell stored as text: its calendar date (in UTC for a time with an offset); else the text. */
    private static Object date(String s) {
        String t = s.trim();
        try {
            if (t.length() > 10) return OffsetDateTime.parse(t).withOffsetSameInstant(ZoneOffset.UTC).toLocalDate();
            return LocalDate.parse(t);
        } catch (DateTimeParseException e) {
            // not a GeoPackage date: LayerDecoder tries the yyyy-mm-dd prefix and reports a bad value
            return s;
        }
    }

    private static String quote(String name) {
        return "\"" + name.replace("\"", "\"\"") + "\"";
    }

    private static CrsInfo crs(Connection c, long srsId, String where) throws InputException, SQLException {
        String org = null;
        long code = 0;
        String def = null;
        boolean found = false;
        try (PreparedStatement s = c.prepareStatement(
                "SELECT organization, organization_coordsys_id, definition FROM gpkg_spatial_ref_sys WHERE srs_id = ?")) {
            s.setLong(1, srsId);
            try (ResultSet r = s.executeQuery()) {
                if (r.next()) {
                    found = true;
                    org = r.getString(1);
                    code = r.getLong(2);
                    def = r.getString(3);
                }
            }
        }
        if (!found) return null;
        if ("EPSG".equalsIgnoreCase(org) && code > 0) {
            try {
                return Crs.fromEpsg((int) code);
            } catch (InputException e) {
                // proj4j's table lacks this code: fall back to the WKT definition below
                if (def == null) throw e;
            }
        }
        if (def == null || def.isBlank() || def.trim().equalsIgnoreCase("undefined") || srsId <= 0) return null;
        return Crs.fromWkt(def, where);
    }
}
