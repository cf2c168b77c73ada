package org.shutline.io;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import org.locationtech.jts.algorithm.Orientation;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.LinearRing;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.geom.prep.PreparedGeometry;
import org.locationtech.jts.geom.prep.PreparedGeometryFactory;

/**
 * A strict, bounds-checked reader of a shapefile's {@code .shp} and {@code .shx}
 * after the ESRI Shapefile Technical Description (July 1998).
 *
 * <p>File header (100 bytes): file code 9994 (big-endian int at 0), file length in
 * 16-bit words (big-endian at 24), version 1000 (little-endian at 28), shape type
 * (little-endian at 32), bounding box (8 little-endian doubles at 36). Records: an
 * 8-byte big-endian header (record number from 1, content length in words), then
 * the content, starting with its little-endian shape type. The {@code .shx} has the
 * same header and one 8-byte record per shape (offset and content length in words),
 * which must agree with the {@code .shp}.
 *
 * <p>Types read: Null 0, Point 1/11/21, PolyLine 3/13/23 (one part gives a
 * LineString, more a MultiLineString), Polygon 5/15/25 (rings: clockwise are outer,
 * counter-clockwise are holes of the outer ring that contains them; one outer ring
 * gives a Polygon, more a MultiPolygon). Only x and y are read; Z and M are skipped.
 * MultiPoint and MultiPatch are rejected. Any bound exceeded, count that disagrees
 * or bad header throws {@link InputException} naming the file and record number.
 * Files are read whole into memory, never opened for writing. Time O(file size).
 */
final class ShpReader {
    static final int FILE_CODE = 9994;
    static final int VERSION = 1000;
    private static final GeometryFactory GF = new GeometryFactory();

    /** A read shapefile: header shape type and one geometry per record (null for Null shapes), in record order. */
    record Result(int shapeType, List<Geometry> geometries) {
        Result {
            geometries = Collections.unmodifiableList(new ArrayList<>(geometries));
        }
    }

    private ShpReader() {}

    /** Reads {@code shp} with its index {@code shx} (null when there is none: an error after the .shp header is checked). */
    static Result read(Path shp, Path shx) throws InputException {
        ByteBuffer s = load(shp);
        header(s, shp);
        if (shx == null) throw new InputException(shp + ": no .shx index beside it");
        return read(s, shp, load(shx), shx);
    }

    /** Reads a {@code .shp} and its {@code .shx} already in memory; the paths name them in messages. */
    static Result read(byte[] shp, Path shpName, byte[] shx, Path shxName) throws InputException {
        return read(ByteBuffer.wrap(shp), shpName, ByteBuffer.wrap(shx), shxName);
    }

    private static Result read(ByteBuffer s, Path shp, ByteBuffer x, Path shx) throws InputException {
        int type = header(s, shp);
        int xtype = header(x, shx);
        if (xtype != type) {
            throw new InputException(shx + ": shape type " + xtype + " differs from " + shp.getFileName() + " (" + type + ")");
        }
        if ((x.limit() - 100) % 8 != 0) throw new InputException(shx + ": corrupt index: length is not 100 + 8 n bytes");
        int count = (x.limit() - 100) / 8;
        List<Geometry> out = new ArrayList<>(count);
        int pos = 100;
        for (int i = 0; i < count; i++) {
            int rec = i + 1;
            if (pos == s.limit()) {
                throw new InputException(shp + ": has " + i + " records but " + shx.getFileName() + " lists " + count);
            }
            long offBytes = 2L * be(x, 100 + 8 * i);
            long lenBytes = 2L * be(x, 104 + 8 * i);
            if (pos + 8 > s.limit()) throw new InputException(shp + ": truncated in the header of record " + rec);
            int number = be(s, pos);
            long len = 2L * be(s, pos + 4);
            if (number != rec) throw new InputException(shp + ": record " + rec + " is numbered " + number);
            if (len < 4 || pos + 8 + len > s.limit()) {
                throw new InputException(shp + ": truncated or corrupt: record " + rec + " content of " + len
                        + " bytes runs past the end of the file");
            }
            if (offBytes != pos || lenBytes != len) {
                throw new InputException(shx + ": index entry for record " + rec + " (offset " + offBytes + ", length "
                        + lenBytes + ") disagrees with " + shp.getFileName() + " (offset " + pos + ", length " + len + ")");
            }
            out.add(shape(s, pos + 8, (int) len, shp, rec));
            pos += 8 + (int) len;
        }
        if (pos != s.limit()) {
            throw new InputException(shp + ": has more records than the " + count + " listed in " + shx.getFileName());
        }
        return new Result(type, out);
    }

    private static ByteBuffer load(Path p) throws InputException {
        try {
            return ByteBuffer.wrap(Files.readAllBytes(p));
        } catch (IOException e) {
            throw new InputException(p + ": cannot read: " + e.getMessage(), e);
        }
    }

    /** Checks the 100-byte header against the file; returns the shape type. */
    private static int header(ByteBuffer b, Path p) throws InputException {
        if (b.limit() < 100) throw new InputException(p + ": truncated: " + b.limit() + " bytes, shorter than the 100-byte header");
        int code = be(b, 0);
        if (code != FILE_CODE) {
            throw new InputException(p + ": not a shapefile (file code " + code + ", expected " + FILE_CODE + ")");
        }
        long words = be(b, 24) & 0xffffffffL;
        int version = b.duplicate().order(ByteOrder.LITTLE_ENDIAN).getInt(28);
        int type = b.duplicate().order(ByteOrder.LITTLE_ENDIAN).getInt(32);
        if (version != VERSION) throw new InputException(p + ": unsupported shapefile version " + version);
        if (2 * words != b.limit()) {
            throw new InputException(p + ": truncated or corrupt: header gives " + 2 * words + " bytes, file has " + b.limit());
        }
        switch (type) {
            case 0, 1, 11, 21, 3, 13, 23, 5, 15, 25 -> { }
            case 8, 18, 28 -> throw new InputException(p + ": MultiPoint shapefiles are not read (one point per feature expected)");
            default -> throw new InputException(p + ": unsupported shape type " + type);
        }
        return type;
    }

    private static Geometry shape(ByteBuffer b, int at, int len, Path p, int rec) throws InputException {
        ByteBuffer le = b.duplicate().order(ByteOrder.LITTLE_ENDIAN);
        int type = le.getInt(at);
        switch (type) {
            case 0:
                return null;
            case 1, 11, 21:
                need(len, 20, p, rec);
                return GF.createPoint(new Coordinate(le.getDouble(at + 4), le.getDouble(at + 12)));
            case 3, 13, 23, 5, 15, 25:
                return parts(le, at, len, type, p, rec);
            case 8, 18, 28:
                throw new InputException(p + ": record " + rec + " is a MultiPoint, which is not read");
            default:
                throw new InputException(p + ": record " + rec + " has unsupported shape type " + type);
        }
    }

    private static Geometry parts(ByteBuffer le, int at, int len, int type, Path p, int rec) throws InputException {
        need(len, 44, p, rec);
        int nParts = le.getInt(at + 36);
        int nPoints = le.getInt(at + 40);
        if (nParts < 1 || nPoints < 0 || nParts > nPoints) {
            throw new InputException(p + ": record " + rec + ": corrupt part/point counts (" + nParts + ", " + nPoints + ")");
        }
        need(len, 44 + 4L * nParts + 16L * nPoints, p, rec);
        int pts = at + 44 + 4 * nParts;
        List<Coordinate[]> lines = new ArrayList<>(nParts);
        for (int i = 0; i < nParts; i++) {
            int start = le.getInt(at + 44 + 4 * i);
            int end = i + 1 < nParts ? le.getInt(at + 48 + 4 * i) : nPoints;
            if (start < 0 || start >= end || end > nPoints || (i == 0 && start != 0)) {
                throw new InputException(p + ": record " + rec + ": corrupt part index " + i);
            }
            // "A part is a connected sequence of two or more points" (ESRI Shapefile Technical Description, 1998, PolyLine)
            if (end - start < 2) {
                throw new InputException(p + ": record " + rec + ": part " + i + " has one point (a line needs two or more)");
            }
            Coordinate[] cs = new Coordinate[end - start];
            for (int j = start; j < end; j++) {
                cs[j - start] = new Coordinate(le.getDouble(pts + 16 * j), le.getDouble(pts + 16 * j + 8));
            }
            lines.add(cs);
        }
        boolean polygon = type % 10 == 5;
        if (!polygon) {
            if (lines.size() == 1) return GF.createLineString(lines.get(0));
            LineString[] ls = new LineString[lines.size()];
            for (int i = 0; i < ls.length; i++) ls[i] = GF.createLineString(lines.get(i));
            return GF.createMultiLineString(ls);
        }
        return polygon(lines, p, rec);
    }

    private static Geometry polygon(List<Coordinate[]> rings, Path p, int rec) throws InputException {
        List<LinearRing> outers = new ArrayList<>();
        List<LinearRing> holes = new ArrayList<>();
        for (Coordinate[] r : rings) {
            if (r.length < 4 || !r[0].equals2D(r[r.length - 1])) {
                throw new InputException(p + ": record " + rec + ": polygon ring is not closed or has under 4 points");
            }
            LinearRing ring = GF.createLinearRing(r);
            if (Orientation.isCCW(r)) holes.add(ring); else outers.add(ring);
        }
        if (outers.isEmpty()) { // all rings counter-clockwise: take them as outer rings
            outers.addAll(holes);
            holes.clear();
        }
        List<List<LinearRing>> holesOf = new ArrayList<>();
        List<PreparedGeometry> shells = new ArrayList<>();
        for (LinearRing o : outers) {
            holesOf.add(new ArrayList<>());
            shells.add(PreparedGeometryFactory.prepare(GF.createPolygon(o)));
        }
        for (LinearRing h : holes) {
            int owner = 0;
            for (int i = 0; i < shells.size(); i++) {
                if (shells.get(i).covers(GF.createPoint(h.getCoordinateN(0)))) { owner = i; break; }
            }
            holesOf.get(owner).add(h);
        }
        Polygon[] polys = new Polygon[outers.size()];
        for (int i = 0; i < polys.length; i++) {
            polys[i] = GF.createPolygon(outers.get(i), holesOf.get(i).toArray(new LinearRing[0]));
        }
        return polys.length == 1 ? polys[0] : GF.createMultiPolygon(polys);
    }

    private static int be(ByteBuffer b, int at) {
        return b.duplicate().order(ByteOrder.BIG_ENDIAN).getInt(at);
    }

    private static void need(int len, long bytes, Path p, int rec) throws InputException {
        if (bytes > len) {
            throw new InputException(p + ": record " + rec + " is corrupt: needs " + bytes + " bytes, has " + len);
        }
    }
}
