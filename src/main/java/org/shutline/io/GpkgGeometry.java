package org.shutline.io;

import java.util.Arrays;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.impl.PackedCoordinateSequence;
import org.locationtech.jts.geom.impl.PackedCoordinateSequenceFactory;
import org.locationtech.jts.io.ParseException;
import org.locationtech.jts.io.WKBReader;

/**
 * Decodes one GeoPackage geometry blob (OGC 12-128r18 section 2.1.3: magic "GP",
 * version, flags, srs_id, optional envelope, then ISO WKB).
 *
 * <p>The common shapes of a network, 2D Point, LineString and MultiLineString, are read
 * straight from the bytes into one packed {@code double[]} per line or point (JTS
 * {@link PackedCoordinateSequence.Double}, no per-vertex objects). Anything else (Z or M
 * coordinates, polygons, collections, empty parts, points with a NaN ordinate, lines of fewer than two
 * points) is handed to JTS {@link WKBReader}, which read every blob before and decides
 * exactly as it did. The empty flag of the header, and an empty WKB geometry, give no
 * geometry. A blob that is not a GeoPackage geometry, has an unknown envelope code, an
 * unknown geometry code or is cut short gives an error text, never an exception.
 * Time O(bytes of the blob). Not thread-safe (one per reader).
 */
final class GpkgGeometry {
    /** A decoded blob: the geometry (null when empty or unreadable) and, when unreadable, why. */
    record Result(Geometry geometry, String error) {}

    private static final Result EMPTY = new Result(null, null);
    private final GeometryFactory factory = new GeometryFactory(PackedCoordinateSequenceFactory.DOUBLE_FACTORY);
    private final WKBReader jts = new WKBReader();
    private byte[] b;
    private int p;
    private boolean little;

    Result decode(byte[] blob) {
        if (blob.length < 8 || blob[0] != 'G' || blob[1] != 'P') {
            return new Result(null, "not a GeoPackage geometry (no 'GP' header)");
        }
        int flags = blob[3] & 0xff;
        int env = (flags >> 1) & 7;
        int envBytes = switch (env) {
            case 0 -> 0;
            case 1 -> 32;
            case 2, 3 -> 48;
            case 4 -> 64;
            default -> -1;
        };
        if (envBytes < 0) return new Result(null, "unknown envelope code " + env + " in the GeoPackage header");
        if ((flags & 0x10) != 0) return EMPTY;
        int start = 8 + envBytes;
        if (blob.length <= start) return new Result(null, "blob of " + blob.length + " bytes ends inside its header");
        Geometry g = fast(blob, start);
        if (g == null) {
            try {
                g = jts.read(Arrays.copyOfRange(blob, start, blob.length));
            } catch (ParseException | RuntimeException e) {
                return new Result(null, e.getMessage());
            }
        }
        return g.isEmpty() ? EMPTY : new Result(g, null);
    }

    /** The geometry read directly, or null when JTS should read it (any other shape, or bytes that do not fit). */
    private Geometry fast(byte[] blob, int start) {
        b = blob;
        p = start;
        try {
            if (!order()) return null;
            long type = u32();
            if (type == 1) {
                double x = f64();
                double y = f64();
                if (Double.isNaN(x) || Double.isNaN(y)) return null; // JTS reads a point with a NaN ordinate as empty
                return factory.createPoint(new PackedCoordinateSequence.Double(new double[] {x, y}, 2, 0));
            }
            if (type == 2) return line();
            if (type == 5) {
                long n = u32();
                if (n < 1 || n > (b.length - p) / 9) return null;
                LineString[] parts = new LineString[(int) n];
                for (int i = 0; i < n; i++) {
                    if (!order() || u32() != 2) return null;
                    parts[i] = line();
                    if (parts[i] == null) return null;
                }
                return factory.createMultiLineString(parts);
            }
            return null;
        } catch (ArrayIndexOutOfBoundsException e) {
            return null; // cut short: JTS reads it again and says where
        }
    }

    private LineString line() {
        long n = u32();
        if (n < 2 || n > (b.length - p) / 16) return null;
        double[] xy = new double[(int) n * 2];
        for (int i = 0; i < xy.length; i++) xy[i] = f64();
        return factory.createLineString(new PackedCoordinateSequence.Double(xy, 2, 0));
    }

    private boolean order() {
        int o = b[p++];
        if (o != 0 && o != 1) return false;
        little = o == 1;
        return true;
    }

    private long u32() {
        int v = little
                ? (b[p] & 0xff) | (b[p + 1] & 0xff) << 8 | (b[p + 2] & 0xff) << 16 | (b[p + 3] & 0xff) << 24
                : (b[p + 3] & 0xff) | (b[p + 2] & 0xff) << 8 | (b[p + 1] & 0xff) << 16 | (b[p] & 0xff) << 24;
        p += 4;
        return v & 0xffffffffL;
    }

    private double f64() {
        long v = 0;
        if (little) {
            for (int i = 7; i >= 0; i--) v = v << 8 | (b[p + i] & 0xff);
        } else {
            for (int i = 0; i < 8; i++) v = v << 8 | (b[p + i] & 0xff);
        }
        p += 8;
        return Double.longBitsToDouble(v);
    }
}
