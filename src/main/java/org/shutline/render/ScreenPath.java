package org.shutline.render;

import java.awt.geom.Path2D;
import org.locationtech.jts.geom.CoordinateSequence;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.Point;
import org.locationtech.jts.geom.Polygon;

/**
 * Converts JTS geometry to a Java2D path in screen pixels for a viewport, decimating as
 * it goes: a vertex closer than {@code decimatePx} (in both x and y) to the last one
 * kept is dropped, except the last vertex of each line, so a zoomed-out map draws a few
 * points per pixel instead of every vertex. Polygon rings are closed; points are
 * skipped (they are drawn as symbols). O(vertices), no allocation per vertex.
 */
final class ScreenPath {
    private ScreenPath() {}

    static Path2D.Double of(Geometry geom, Viewport v, double decimatePx) {
        Path2D.Double path = new Path2D.Double(Path2D.WIND_EVEN_ODD);
        append(path, geom, v, decimatePx);
        return path;
    }

    private static void append(Path2D.Double path, Geometry geom, Viewport v, double d) {
        if (geom == null || geom.isEmpty() || geom instanceof Point) return;
        if (geom instanceof LineString ls) {
            line(path, ls.getCoordinateSequence(), v, d, false);
        } else if (geom instanceof Polygon poly) {
            line(path, poly.getExteriorRing().getCoordinateSequence(), v, d, true);
            for (int i = 0; i < poly.getNumInteriorRing(); i++) {
                line(path, poly.getInteriorRingN(i).getCoordinateSequence(), v, d, true);
            }
        } else {
            for (int i = 0; i < geom.getNumGeometries(); i++) append(path, geom.getGeometryN(i), v, d);
        }
    }

    private static void line(Path2D.Double path, CoordinateSequence cs, Viewport v, double d, boolean close) {
        int n = cs.size();
        if (n == 0) return;
        double lx = v.screenX(cs.getX(0));
        double ly = v.screenY(cs.getY(0));
        path.moveTo(lx, ly);
        for (int i = 1; i < n; i++) {
            double x = v.screenX(cs.getX(i));
            double y = v.screenY(cs.getY(i));
            boolean last = i == n - 1;
            if (!last && Math.abs(x - lx) < d && Math.abs(y - ly) < d) continue;
            path.lineTo(x, y);
            lx = x;
            ly = y;
        }
        if (close) path.closePath();
    }
}
