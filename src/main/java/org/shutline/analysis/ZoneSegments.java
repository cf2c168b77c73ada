package org.shutline.analysis;

import java.util.BitSet;
import java.util.HashSet;
import java.util.Set;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Point;
import org.shutline.trace.EdgeGeometry;
import org.shutline.trace.NetworkState;
import org.shutline.trace.ValveSegments;

/**
 * Turns a {@link Zone} into the set of valve segments it touches. Point and polygon
 * zones use an {@link EdgeIndex} when one is given (O(log E + k)), else test every
 * edge (O(E)); main zones scan the state's edges, O(E).
 */
final class ZoneSegments {
    private static final GeometryFactory GF = new GeometryFactory();

    private ZoneSegments() {}

    static BitSet of(Zone zone, ValveSegments segs) {
        return of(zone, segs, null);
    }

    /** With a prebuilt edge index of the same segments (may be null): point and polygon zones then use it. */
    static BitSet of(Zone zone, ValveSegments segs, EdgeIndex index) {
        NetworkState s = segs.state();
        BitSet out = new BitSet(segs.segmentCount());
        if (zone instanceof Zone.OfSegments z) {
            for (int seg : z.segments()) {
                if (seg < 0 || seg >= segs.segmentCount()) throw new IndexOutOfBoundsException("segment " + seg);
                out.set(seg);
            }
        } else if (zone instanceof Zone.OfMains z) {
            Set<String> ids = new HashSet<>(z.mainIds());
            for (int e = 0; e < s.edgeCount(); e++) {
                if (segs.edgeSegment(e) >= 0 && ids.contains(s.mainId(s.edgeFeature(e)))) out.set(segs.edgeSegment(e));
            }
        } else if (zone instanceof Zone.InPolygon z && index != null) {
            for (int e : index.query(z.polygon().getEnvelopeInternal())) {
                if (!out.get(segs.edgeSegment(e)) && edgeLine(s, e).intersects(z.polygon())) out.set(segs.edgeSegment(e));
            }
        } else if (zone instanceof Zone.InPolygon z) {
            for (int e = 0; e < s.edgeCount(); e++) {
                if (segs.edgeSegment(e) >= 0 && !out.get(segs.edgeSegment(e)) && edgeLine(s, e).intersects(z.polygon())) {
                    out.set(segs.edgeSegment(e));
                }
            }
        } else if (zone instanceof Zone.AtPoint z) {
            int e = index != null ? index.nearest(z.x(), z.y(), z.systemId()) : nearestEdge(s, segs, z);
            if (e >= 0) out.set(segs.edgeSegment(e));
        }
        return out;
    }

    /** The active pipe edge nearest the point, on the nearest active main; -1 when there is none. */
    static int nearestEdge(NetworkState s, ValveSegments segs, Zone.AtPoint z) {
        if (!Double.isFinite(z.x()) || !Double.isFinite(z.y())) return -1;
        Point p = GF.createPoint(new Coordinate(z.x(), z.y()));
        int bestEdge = -1;
        double best = Double.POSITIVE_INFINITY;
        String bestId = null;
        for (int e = 0; e < s.edgeCount(); e++) {
            if (segs.edgeSegment(e) < 0) continue;
            int main = s.edgeFeature(e);
            if (z.systemId() != null && !s.graph().systemId(s.mainSystem(main)).equals(z.systemId())) continue;
            double d = edgeLine(s, e).distance(p);
            String id = s.mainId(main);
            if (d < best || (d == best && id.compareTo(bestId) < 0)) {
                best = d;
                bestId = id;
                bestEdge = e;
            }
        }
        return bestEdge;
    }

    static Geometry edgeLine(NetworkState s, int e) {
        return EdgeGeometry.line(s, e);
    }
}
