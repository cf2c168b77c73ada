package org.shutline.io;

import java.io.BufferedOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.locationtech.jts.algorithm.Orientation;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.LinearRing;
import org.locationtech.jts.geom.Point;
import org.locationtech.jts.geom.Polygon;
import org.shutline.model.Progress;

/**
 * Writes the {@code .shp} and {@code .shx} files of one layer, after the ESRI Shapefile
 * Technical Description (July 1998): a 100-byte header (file code 9994 and file length
 * in 16-bit words big-endian; version 1000, shape type and bounding box little-endian),
 * then per record a big-endian record number (from 1) and content length, and the
 * little-endian content. Shape types: Point (1), PolyLine (3), Polygon (5); a null or
 * empty geometry is a Null shape (0). Polygon rings are written with the shell
 * clockwise and holes counter-clockwise, as the specification requires.
 *
 * <p>Two passes over the layer's geometries: one for the extent and the file length,
 * one to write. O(total vertices); one record buffer at a time.
 */
final class ShpGeometryWriter {
    static final int POINT = 1;
    static final int POLYLINE = 3;
    static final int POLYGON = 5;

    private ShpGeometryWriter() {}

    static int shapeType(WriteLayer.GeometryKind kind) {
        return switch (kind) {
            case POINT -> POINT;
            case LINE -> POLYLINE;
            case POLYGON -> POLYGON;
        };
    }

    /** Write {@code shp} and {@code shx} (both new files). */
    static void write(WriteLayer layer, Path shp, Path shx, Progress progress) throws IOException {
        int type = shapeType(layer.kind());
        Envelope env = new Envelope();
        long contentWords = 0;
        for (int i = 0; i < layer.size(); i++) {
            Geometry g = layer.geometry(i);
            check(layer, i, g, type);
            if (g != null && !g.isEmpty()) env.expandToInclude(g.getEnvelopeInternal());
            contentWords += 4 + contentBytes(g, type) / 2;
        }
        long shpWords = 50 + contentWords;
        long shxWords = 50 + 4L * layer.size();
        if (shpWords > Integer.MAX_VALUE) throw new IOException("layer " + layer.name() + " is too large for a shapefile");
        try (OutputStream s = new BufferedOutputStream(Files.newOutputStream(shp), 1 << 16);
             OutputStream x = new BufferedOutputStream(Files.newOutputStream(shx), 1 << 16)) {
            s.write(header(type, shpWords, env));
            x.write(header(type, shxWords, env));
            long offset = 50;
            for (int i = 0; i < layer.size(); i++) {
                Geometry g = layer.geometry(i);
                int len = contentBytes(g, type);
                ByteBuffer rec = ByteBuffer.allocate(8 + len);
                rec.order(ByteOrder.BIG_ENDIAN).putInt(i + 1).putInt(len / 2);
                rec.order(ByteOrder.LITTLE_ENDIAN);
                content(rec, g, type);
                s.write(rec.array());
                ByteBuffer idx = ByteBuffer.allocate(8).order(ByteOrder.BIG_ENDIAN);
                idx.putInt((int) offset).putInt(len / 2);
                x.write(idx.array());
                offset += 4 + len / 2;
                if ((i & 0x3FFF) == 0x3FFF) progress.checkCancelled();
            }
        }
    }

    private static void check(WriteLayer layer, int row, Geometry g, int type) {
        if (g == null || g.isEmpty()) return;
        boolean ok = switch (type) {
            case POINT -> g instanceof Point;
            case POLYLINE -> g.getDimension() == 1;
            default -> g.getDimension() == 2;
        };
        if (!ok) {
            throw new IllegalArgumentException("layer " + layer.name() + " row " + row + ": a " + g.getGeometryType()
                + " cannot be written as shape type " + type);
        }
    }

    private static byte[] header(int type, long words, Envelope env) {
        ByteBuffer b = ByteBuffer.allocate(100);
        b.order(ByteOrder.BIG_ENDIAN).putInt(9994);
        for (int i = 0; i < 5; i++) b.putInt(0);
        b.putInt((int) words);
        b.order(ByteOrder.LITTLE_ENDIAN).putInt(1000).putInt(type);
        if (env.isNull()) {
            for (int i = 0; i < 4; i++) b.putDouble(0);
        } else {
            b.putDouble(env.getMinX()).putDouble(env.getMinY()).putDouble(env.getMaxX()).putDouble(env.getMaxY());
        }
        for (int i = 0; i < 4; i++) b.putDouble(0);
        return b.array();
    }

    /** Content length in bytes (without the 8-byte record header). */
    private static int contentBytes(Geometry g, int type) {
        if (g == null || g.isEmpty()) return 4;
        if (type == POINT) return 20;
        List<Coordinate[]> parts = parts(g, type);
        int points = 0;
        for (Coordinate[] p : parts) points += p.length;
        return 44 + 4 * parts.size() + 16 * points;
    }

    private static void content(ByteBuffer b, Geometry g, int type) {
        if (g == null || g.isEmpty()) {
            b.putInt(0);
            return;
        }
        b.putInt(type);
        if (type == POINT) {
            Point p = (Point) g;
            b.putDouble(p.getX()).putDouble(p.getY());
            return;
        }
        List<Coordinate[]> parts = parts(g, type);
        Envelope e = g.getEnvelopeInternal();
        b.putDouble(e.getMinX()).putDouble(e.getMinY()).putDouble(e.getMaxX()).putDouble(e.getMaxY());
        int points = 0;
        for (Coordinate[] p : parts) points += p.length;
        b.putInt(parts.size()).putInt(points);
        int start = 0;
        for (Coordinate[] p : parts) {
            b.putInt(start);
            start += p.length;
        }
        for (Coordinate[] p : parts) {
            for (Coordinate c : p) b.putDouble(c.x).putDouble(c.y);
        }
    }

    private static List<Coordinate[]> parts(Geometry g, int type) {
        List<Coordinate[]> out = new ArrayList<>();
        for (int i = 0; i < g.getNumGeometries(); i++) {
            Geometry part = g.getGeometryN(i);
            if (part.isEmpty()) continue;
            if (type == POLYLINE) {
                out.add(((LineString) part).getCoordinates());
            } else {
                Polygon poly = (Polygon) part;
                out.add(ring(poly.getExteriorRing(), false));
                for (int h = 0; h < poly.getNumInteriorRing(); h++) out.add(ring(poly.getInteriorRingN(h), true));
            }
        }
        return out;
    }

    /** Ring coordinates with the orientation the specification asks for (shell clockwise, hole counter-clockwise). */
    private static Coordinate[] ring(LinearRing r, boolean hole) {
        Coordinate[] c = r.getCoordinates();
        if (Orientation.isCCW(c) != hole) {
            Coordinate[] rev = new Coordinate[c.length];
            for (int i = 0; i < c.length; i++) rev[i] = c[c.length - 1 - i];
            return rev;
        }
        return c;
    }
}
