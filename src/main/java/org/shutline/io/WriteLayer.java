package org.shutline.io;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.function.IntFunction;
import org.locationtech.jts.geom.Geometry;

/**
 * One layer to be written by {@link GeoPackageWriter} or {@link ShapefileWriter}: a
 * name, a geometry kind, typed columns, and {@code size} rows read on demand through two functions
 * (row index to geometry, row and column index to value). Rows are read lazily so
 * that a million-main network is written without a second copy in memory.
 *
 * <p>Values: {@link ColumnType#TEXT} any object (written with {@code toString()}),
 * {@link ColumnType#REAL} and {@link ColumnType#INTEGER} a {@link Number},
 * {@link ColumnType#DATE} a {@link java.time.LocalDate}; null is an empty field.
 * {@link #withValue} replaces single values (used to write raw words the model
 * cannot hold, such as a misspelt status).
 */
public final class WriteLayer {
    /** Column types common to GeoPackage and dBASE. */
    public enum ColumnType { TEXT, REAL, INTEGER, DATE }

    /** The kind of geometry a layer holds (used when a layer is empty or for shapefile shape types). */
    public enum GeometryKind { POINT, LINE, POLYGON }

    /** A column: name as written and type. */
    public record Column(String name, ColumnType type) {}

    /** Reads the value of one cell. */
    @FunctionalInterface
    public interface Cells {
        Object value(int row, int column);
    }

    private final String name;
    private final GeometryKind kind;
    private final List<Column> columns;
    private final int size;
    private final IntFunction<Geometry> geometry;
    private final Cells cells;
    private final Map<Long, Object> overrides;

    public WriteLayer(String name, GeometryKind kind, List<Column> columns, int size, IntFunction<Geometry> geometry,
                      Cells cells) {
        this(name, kind, columns, size, geometry, cells, Map.of());
    }

    private WriteLayer(String name, GeometryKind kind, List<Column> columns, int size, IntFunction<Geometry> geometry,
                       Cells cells, Map<Long, Object> overrides) {
        if (size < 0) throw new IllegalArgumentException("negative size");
        if (columns.size() > 0xFFFF) throw new IllegalArgumentException("too many columns");
        this.name = name;
        this.kind = kind;
        this.columns = List.copyOf(columns);
        this.size = size;
        this.geometry = geometry;
        this.cells = cells;
        this.overrides = overrides;
    }

    public String name() {
        return name;
    }

    public GeometryKind kind() {
        return kind;
    }

    public List<Column> columns() {
        return columns;
    }

    public int size() {
        return size;
    }

    public Geometry geometry(int row) {
        return geometry.apply(row);
    }

    public Object value(int row, int column) {
        long key = ((long) row << 16) | column;
        if (overrides.containsKey(key)) return overrides.get(key);
        return cells.value(row, column);
    }

    /** Index of the named column; -1 when absent. */
    public int columnIndex(String column) {
        for (int i = 0; i < columns.size(); i++) if (columns.get(i).name().equals(column)) return i;
        return -1;
    }

    /** A copy of this layer with one cell replaced. */
    public WriteLayer withValue(int row, String column, Object value) {
        int c = columnIndex(column);
        if (c < 0) throw new IllegalArgumentException("no column " + column + " in layer " + name);
        if (row < 0 || row >= size) throw new IndexOutOfBoundsException("row " + row + " of " + size);
        Map<Long, Object> m = new HashMap<>(overrides);
        m.put(((long) row << 16) | c, value);
        return new WriteLayer(name, kind, columns, size, geometry, cells, m);
    }

    /** A layer from in-memory rows (geometry and values per row); lists are copied. */
    public static WriteLayer of(String name, GeometryKind kind, List<Column> columns, List<Geometry> geometries, List<List<Object>> rows) {
        List<Geometry> g = new ArrayList<>(geometries);
        List<List<Object>> r = new ArrayList<>();
        for (List<Object> row : rows) r.add(new ArrayList<>(row));
        if (g.size() != r.size()) throw new IllegalArgumentException("geometry and row counts differ");
        return new WriteLayer(name, kind, columns, g.size(), g::get, (i, c) -> r.get(i).get(c));
    }
}
