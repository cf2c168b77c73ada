package org.shutline.trace;

import java.util.List;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.linearref.LengthIndexedLine;
import org.shutline.model.Main;
import org.shutline.topology.EdgeKind;

/** The line of a pipe edge of a state, for zones, sheds and maps. */
public final class EdgeGeometry {
    private static final GeometryFactory GF = new GeometryFactory();

    private EdgeGeometry() {}

    /**
     * The piece of the edge's main part between its measures m0 and m1 (JTS
     * {@link LengthIndexedLine}); for a main with no geometry (one added by a plan step)
     * the straight line between the edge's nodes.
     */
    public static Geometry line(NetworkState s, int e) {
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
