package org.shutline.analysis;

import java.util.List;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Point;
import org.locationtech.jts.index.strtree.STRtree;
import org.shutline.trace.EdgeGeometry;
import org.shutline.trace.NetworkState;
import org.shutline.trace.ValveSegments;

/**
 * A spatial index (JTS STRtree) of the pipe edges that belong to a valve segment, for
 * point and polygon zones: built once per {@link ValveSegments} in O(E log E), then
 * a nearest-edge query costs O(log E + k) for the k edges near the point.
 */
final class EdgeIndex {
    private static final GeometryFactory GF = new GeometryFactory();
    private final ValveSegments segs;
    private final NetworkState s;
    private final STRtree tree = new STRtree();
    private final double span;

    EdgeIndex(ValveSegments segs) {
        this.segs = segs;
        this.s = segs.state();
        Envelope all = new Envelope();
        for (int e = 0; e < s.edgeCount(); e++) {
            if (segs.edgeSegment(e) < 0) continue;
            Geometry g = EdgeGeometry.line(s, e);
            Envelope env = g == null ? new Envelope(s.nodeX(s.edgeFrom(e)), s.nodeX(s.edgeTo(e)), s.nodeY(s.edgeFrom(e)), s.nodeY(s.edgeTo(e)))
                    : g.getEnvelopeInternal();
            all.expandToInclude(env);
            tree.insert(env, e);
        }
        tree.build();
        span = Math.max(1.0, Math.max(all.getWidth(), all.getHeight()));
    }

    /** Pipe edges whose envelope meets {@code env}. */
    @SuppressWarnings("unchecked")
    List<Integer> query(Envelope env) {
        return tree.query(env);
    }

    /**
     * The edge nearest (x, y) on an active main (of system {@code systemId} when not null),
     * exact ties to the lower main id; -1 when there is none. Searches growing squares
     * around the point (exact ties then to the lower edge index); a candidate at distance d found inside a square of half-side
     * r >= d is nearest, since anything nearer meets the square.
     */
    int nearest(double x, double y, String systemId) {
        Point p = GF.createPoint(new Coordinate(x, y));
        for (double r = 1.0; ; r *= 4) {
            List<Integer> cands = query(new Envelope(x - r, x + r, y - r, y + r));
            int bestEdge = -1;
            double best = Double.POSITIVE_INFINITY;
            String bestId = null;
            for (int e : cands) {
                int main = s.edgeFeature(e);
                if (systemId != null && !s.graph().systemId(s.mainSystem(main)).equals(systemId)) continue;
                Geometry g = EdgeGeometry.line(s, e);
                double d = g == null ? Math.hypot(s.nodeX(s.edgeFrom(e)) - x, s.nodeY(s.edgeFrom(e)) - y) : g.distance(p);
                String id = s.mainId(main);
                // ties: lower main id, then lower edge (the plain scan's order), so both give the same edge
                if (d < best || (d == best && (id.compareTo(bestId) < 0 || (id.equals(bestId) && e < bestEdge)))) {
                    best = d;
                    bestId = id;
                    bestEdge = e;
                }
            }
            if (bestEdge >= 0 && best <= r) return bestEdge;
            if (r > 4 * span + Math.abs(x) + Math.abs(y)) return bestEdge;
        }
    }

    ValveSegments segments() {
        return segs;
    }
}
