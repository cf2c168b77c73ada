package org.shutline.plan;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.linearref.LengthIndexedLine;
import org.shutline.topology.EdgeKind;
import org.shutline.topology.Graph;
import org.shutline.trace.NetworkState;

/**
 * Finds the point of a main nearest to a given point, and the pipe edge holding it in
 * a given state (after earlier cuts). Works for mains of the input network (their
 * geometry is known); mains added by a plan (bypass hoses) are not located.
 */
final class PipeLocator {
    /** A located point: pipe edge in the state, measure along the main's part, position, distance from the asked point. */
    record Located(int edge, double measure, double x, double y, double distance) {
    }

    private PipeLocator() {}

    /** The located point, or null when the main has no pipe left in this state near that measure. */
    static Located nearest(NetworkState s, int main, double x, double y) {
        if (main >= s.graph().mainCount()) return null;
        Geometry geom = s.network().mains().get(main).geometry();
        if (geom == null || geom.isEmpty()) return null;
        Coordinate q = new Coordinate(x, y);
        Located best = null;
        for (int p = 0; p < geom.getNumGeometries(); p++) {
            Geometry part = geom.getGeometryN(p);
            if (part.isEmpty()) continue;
            LengthIndexedLine lil = new LengthIndexedLine(part);
            double m = lil.project(q);
            Coordinate c = lil.extractPoint(m);
            double d = c.distance(q);
            if (best != null && d >= best.distance()) continue;
            int e = edgeAt(s, main, p, m);
            if (e >= 0) best = new Located(e, m, c.x, c.y, d);
        }
        return best;
    }

    /** The present (not removed) pipe edge of main/part holding measure m, or -1. */
    static int edgeAt(NetworkState s, int main, int part, double m) {
        Graph g = s.graph();
        int found = -1;
        for (int i = g.mainEdgeStart(main); i < g.mainEdgeEnd(main) && found < 0; i++) {
            found = match(s, g.mainEdge(i), main, part, m);
        }
        for (int e = g.edgeCount(); e < s.edgeCount() && found < 0; e++) found = match(s, e, main, part, m);
        return found;
    }

    private static int match(NetworkState s, int e, int main, int part, double m) {
        if (s.isRemoved(e) || s.edgeKind(e) != EdgeKind.PIPE || s.edgeFeature(e) != main || s.edgePart(e) != part) return -1;
        double lo = Math.min(s.edgeM0(e), s.edgeM1(e));
        double hi = Math.max(s.edgeM0(e), s.edgeM1(e));
        return m >= lo - 1e-9 && m <= hi + 1e-9 ? e : -1;
    }
}
