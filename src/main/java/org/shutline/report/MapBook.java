package org.shutline.report;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.prep.PreparedGeometry;
import org.locationtech.jts.geom.prep.PreparedGeometryFactory;
import org.shutline.model.LinearUnit;

/**
 * The sheet grid of a map book: a page-fit grid of equal cells, each exactly the
 * ground shown by one sheet's map frame at the book's scale, laid over the area of
 * interest and centred on it; only cells that touch the area (the gas-off extent, or
 * the area's envelope when there is no extent) are kept. Sheets are numbered 1.. row
 * by row from the north-west corner.
 *
 * <p>Scale: among the round scales ({@link MapScales#ROUND}) from {@link #MIN_SCALE} to
 * {@link #FIELD_SCALE}, the one needing the fewest sheets (ties: the most detailed);
 * when that is still more than {@code maxSheets}, the most detailed coarser scale that
 * needs at most {@code maxSheets}; the coarsest of the list when none is enough. Cost: O(scales x cells) prepared
 * intersection tests.
 */
public final class MapBook {
    /** The most detailed scale a book sheet is drawn at. */
    public static final int MIN_SCALE = 1000;
    /** Up to this scale the one with the fewest sheets is taken (our choice: at 1:2,500 single services still show). */
    public static final int FIELD_SCALE = 2500;

    /** One sheet of the book: its number, grid column and row (0 = west, north), and the ground it shows. */
    public record Cell(int number, int column, int row, Envelope ground) {
        public Cell {
            ground = new Envelope(ground);
        }

        @Override
        public Envelope ground() {
            return new Envelope(ground);
        }
    }

    private final int scale;
    private final List<Cell> cells;
    private final Map<Long, Cell> byPosition = new HashMap<>();

    private MapBook(int scale, List<Cell> cells) {
        this.scale = scale;
        this.cells = List.copyOf(cells);
        for (Cell c : cells) byPosition.put(key(c.column(), c.row()), c);
    }

    /**
     * Plans the book for {@code interest} (may be null or empty: then {@code area} is
     * used as a rectangle) with map frames of {@code frameWpt} x {@code frameHpt} points.
     */
    public static MapBook plan(Geometry interest, Envelope area, double frameWpt, double frameHpt, LinearUnit unit,
                               int maxSheets) {
        if (maxSheets < 1) throw new IllegalArgumentException("a map book needs at least one sheet: " + maxSheets);
        GeometryFactory gf = new GeometryFactory();
        Geometry target = interest != null && !interest.isEmpty() ? interest
                : area == null || area.isNull() ? null : gf.toGeometry(area);
        if (target == null) return new MapBook(MIN_SCALE, List.of());
        PreparedGeometry prep = PreparedGeometryFactory.prepare(target);
        Envelope e = target.getEnvelopeInternal();
        List<Cell> best = null;
        int bestScale = 0;
        for (int d : MapScales.ROUND) {
            if (d < MIN_SCALE) continue;
            double s = MapScales.crsUnitsPerPoint(d, unit);
            List<Cell> cs = cells(prep, e, frameWpt * s, frameHpt * s, gf);
            boolean better = best == null || (d <= FIELD_SCALE ? cs.size() < best.size() : best.size() > maxSheets);
            if (better) {
                best = cs;
                bestScale = d;
            }
            if (d >= FIELD_SCALE && best.size() <= maxSheets) break;
        }
        return new MapBook(bestScale, best);
    }

    private static List<Cell> cells(PreparedGeometry prep, Envelope e, double cw, double ch, GeometryFactory gf) {
        int cols = Math.max(1, (int) Math.ceil(e.getWidth() / cw - 1e-9));
        int rows = Math.max(1, (int) Math.ceil(e.getHeight() / ch - 1e-9));
        double x0 = (e.getMinX() + e.getMaxX()) / 2 - cols * cw / 2;
        double top = (e.getMinY() + e.getMaxY()) / 2 + rows * ch / 2;
        List<Cell> out = new ArrayList<>();
        int n = 0;
        for (int r = 0; r < rows; r++) {
            for (int c = 0; c < cols; c++) {
                Envelope g = new Envelope(x0 + c * cw, x0 + (c + 1) * cw, top - (r + 1) * ch, top - r * ch);
                if (prep.intersects(gf.toGeometry(g))) out.add(new Cell(++n, c, r, g));
            }
        }
        return out;
    }

    private static long key(int c, int r) {
        return ((long) c << 32) ^ (r & 0xffffffffL);
    }

    /** The scale denominator of every sheet. */
    public int scale() {
        return scale;
    }

    public List<Cell> cells() {
        return cells;
    }

    public int size() {
        return cells.size();
    }

    /** The envelope of all sheets (null envelope when there are none). */
    public Envelope extent() {
        Envelope e = new Envelope();
        for (Cell c : cells) e.expandToInclude(c.ground());
        return e;
    }

    /** The sheets adjacent to {@code c} across each edge, by sheet number (edges with no sheet are absent). */
    public Map<MapSheet.Side, Integer> neighbours(Cell c) {
        Map<MapSheet.Side, Integer> m = new EnumMap<>(MapSheet.Side.class);
        put(m, MapSheet.Side.NORTH, c.column(), c.row() - 1);
        put(m, MapSheet.Side.SOUTH, c.column(), c.row() + 1);
        put(m, MapSheet.Side.WEST, c.column() - 1, c.row());
        put(m, MapSheet.Side.EAST, c.column() + 1, c.row());
        return m;
    }

    private void put(Map<MapSheet.Side, Integer> m, MapSheet.Side side, int col, int row) {
        Cell n = byPosition.get(key(col, row));
        if (n != null) m.put(side, n.number());
    }

    /**
     * The number of the sheet showing point (x, y), 0 when none does; a point on the
     * edge shared by two sheets goes to the lower-numbered one.
     */
    public int sheetOf(double x, double y) {
        for (Cell c : cells) {
            if (c.ground.contains(x, y)) return c.number();
        }
        return 0;
    }
}
