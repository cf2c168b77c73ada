package org.shutline.analysis;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.List;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.linearref.LengthIndexedLine;
import org.shutline.topology.EdgeKind;
import org.shutline.trace.NetworkState;

/**
 * The gas-off extent of a state for maps: the pipe pieces that carried gas in a
 * reference state and do not now, and the services put off, each buffered by a
 * distance, merged into polygons. Empty geometry when nothing is off.
 */
public final class GasOffExtent {
    /** Default buffer around off-gas pipe and services, in metres. */
    public static final double DEFAULT_BUFFER_M = 12.0;

    private GasOffExtent() {}

    /**
     * @param s the state
     * @param liveBefore edges live in the reference state (index space of {@code s} or smaller)
     * @param liveNow edges live in {@code s}
     * @param servicesOff services off gas
     * @param buffer buffer distance in CRS units
     */
    public static Geometry of(NetworkState s, BitSet liveBefore, BitSet liveNow, BitSet servicesOff, double buffer) {
        GeometryFactory gf = new GeometryFactory();
        List<Geometry> parts = new ArrayList<>();
        for (int e = liveBefore.nextSetBit(0); e >= 0; e = liveBefore.nextSetBit(e + 1)) {
            if (e >= s.edgeCount() || liveNow.get(e) || s.edgeKind(e) != EdgeKind.PIPE) continue;
            Geometry g = pipeGeometry(s, e, gf);
            if (g != null) parts.add(g);
        }
        for (int i = servicesOff.nextSetBit(0); i >= 0; i = servicesOff.nextSetBit(i + 1)) {
            Geometry p = s.network().services().get(i).geometry();
            if (p != null) parts.add(p);
        }
        if (parts.isEmpty()) return gf.createPolygon();
        return gf.buildGeometry(parts).buffer(buffer, 4);
    }

    /** The line of pipe edge e: the piece of its main between the edge's measures, or a straight line between its nodes. */
    public static Geometry pipeGeometry(NetworkState s, int e, GeometryFactory gf) {
        int main = s.edgeFeature(e);
        if (main < s.graph().mainCount()) {
            Geometry geom = s.network().mains().get(main).geometry();
            if (geom != null && s.edgePart(e) < geom.getNumGeometries() && s.edgeM0(e) != s.edgeM1(e)) {
                return new LengthIndexedLine(geom.getGeometryN(s.edgePart(e))).extractLine(s.edgeM0(e), s.edgeM1(e));
            }
        }
        int a = s.edgeFrom(e), b = s.edgeTo(e);
        Coordinate ca = new Coordinate(s.nodeX(a), s.nodeY(a));
        Coordinate cb = new Coordinate(s.nodeX(b), s.nodeY(b));
        if (ca.equals2D(cb)) return null;
        return gf.createLineString(new Coordinate[] {ca, cb});
    }
}
