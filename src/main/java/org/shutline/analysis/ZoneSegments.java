package org.shutline.analysis;

import java.util.BitSet;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Point;
import org.locationtech.jts.linearref.LengthIndexedLine;
import org.shutline.model.Main;
import org.shutline.trace.NetworkState;
import org.shutline.trace.ValveSegments;
import org.shutline.topology.EdgeKind;

/**
 * Turns a {@link Zone} into the set of valve segments it touches. Point and polygon
 * zones read main geometry (base mains only: mains added by a plan step have none), so
 * they cost O(mains) geometry tests; main zones scan the state's edges, O(edges).
 */
final class ZoneSegments {
    private static final GeometryFactory GF = new GeometryFactory();

    private ZoneSegments() {}

    static BitSet of(Zone zone, ValveSegments segs) {
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
        } else if (zone instanceof Zone.InPolygon z) {
            for (int e = 0; e < s.edgeCount(); e++) {
                if (segs.edgeSegment(e) >= 0 && !out.get(segs.edgeSegment(e)) && edgeLine(s, e).intersects(z.polygon())) {
                    out.set(segs.edgeSegment(e));
                }
            }
        } else if (zone instanceof Zone.AtPoint z) {
            int e = nearestEdge(s, segs, z);
            if (e >= 0) out.set(segs.edgeSegment(e));
        }
        return out;
    }

    /** The active pipe edge nearest the point, on the nearest active main; -1 when there is none. */
    static int nearestEdge(NetworkState s, ValveSegments segs, Zone.AtPoint z) {
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

    /** The line of one pipe edge: the piece of its main's part between m0 and m1, or the straight node-to-node line. */
    static Geometry edgeLine(NetworkState s, int e) {
        if (s.edgeKind(e) != EdgeKind.PIPE) throw new IllegalArgumentException("not a pipe edge: " + e);
        int main = s.edgeFeature(e);
        List<Main> mains = s.network().mains();
        if (main < mains.size()) {
            Geometry g = mains.get(main).geometry();
            if (g != null && s.edgePart(e) < g.getNumGeometries()) {
                return new LengthIndexedLine(g.getGeometryN(s.edgePart(e))).extractLine(s.edgeM0(e), s.edgeM1(e));
            }
        }
        int a = s.edgeFrom(e), b = s.edgeTo(e);
        return GF.createLineString(new Coordinate[] {
            new Coordinate(s.nodeX(a), s.nodeY(a)), new Coordinate(s.nodeX(b), s.nodeY(b))});
    }
}
