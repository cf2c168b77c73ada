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
    private final Envelope extent;

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
        extent = all;
    }

    /** The envelope of every indexed edge (null envelope when there is none); a copy. */
    Envelope extent() {
        return new Envelope(extent);
    }

    /** Pipe edges whose envelope meets {@code env}. */
    @SuppressWarnings("unchecked")
    List<Integer> query(Envelope env) {
        return tree.query(env);
    }

    /**
     * The edge nearest (x, y) on an active main (of system {@code systemId} when not null),
     * exact ties to the lower main id (then the lower edge index); -1 when there is none. See {@link #nearestHit}.
     */
    int nearest(double x, double y, String systemId) {
        return nearestHit(x, y, systemId).edge();
    }

    /** An edge and its distance from the query point (CRS units); edge -1 and distance NaN when there is none. */
    record Hit(int edge, double distance) {
        static final Hit NONE = new Hit(-1, Double.NaN);
    }

    /**
     * The edge nearest (x, y), as {@link #nearest}, with its distance. Searches growing
     * squares around the point, starting at the distance from the point to the extent
     * of all edges: a candidate at distance d found inside a square of half-side r >= d
     * is nearest, since anything nearer meets the square. The search stops at the
     * latest when the square covers the whole extent, so it ends for every finite
     * input, however far (at most about 520 rounds, r growing fourfold up to the
     * largest double); a non-finite coordinate finds nothing.
     */
    Hit nearestHit(double x, double y, String systemId) {
        if (!Double.isFinite(x) || !Double.isFinite(y) || extent.isNull()) return Hit.NONE;
        Point p = GF.createPoint(new Coordinate(x, y));
        double cover = Math.max(Math.max(Math.abs(x - extent.getMinX()), Math.abs(x - extent.getMaxX())),
                Math.max(Math.abs(y - extent.getMinY()), Math.abs(y - extent.getMaxY())));
        double r = Math.max(1.0, extent.distance(new Envelope(x, x, y, y)));
        while (true) {
            boolean all = r >= cover;
            List<Integer> cands = all ? query(extent) : query(new Envelope(x - r, x + r, y - r, y + r));
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
            if (bestEdge >= 0 && (best <= r || all)) return new Hit(bestEdge, best);
            if (all) return Hit.NONE;
            r = r * 4;
        }
    }

    ValveSegments segments() {
        return segs;
    }
}
