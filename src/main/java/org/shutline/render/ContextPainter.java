package org.shutline.render;

import java.awt.BasicStroke;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.Shape;
import java.awt.geom.AffineTransform;
import java.awt.geom.Area;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.locationtech.jts.geom.CoordinateSequence;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.Polygonal;
import org.shutline.model.ContextLayer;

/**
 * Draws the context layers under the network: lines (streets) wide and grey, polygons
 * (buildings, parcels) as thin outlines, in layer order; context points are not drawn. While the ground resolution is
 * at most {@link MapStyle#labelsMaxMetresPerPixel()}, a line whose item has a
 * {@code name} attribute (any case) is labelled along its longest on-screen segment,
 * upright, when the text fits the segment and does not overlap a label already placed.
 */
final class ContextPainter implements LayerPainter {
    @Override
    public void paint(Graphics2D g, PaintContext ctx) {
        MapStyle s = ctx.style();
        var pen = g.getColor();
        var stroke = g.getStroke();
        List<ContextLayer> layers = ctx.scene().network().context();
        List<Labelled> labels = new ArrayList<>();
        for (int i = 0; i < layers.size(); i++) {
            for (ContextLayer.Item item : ctx.scene().contextIn(i, ctx.query(2))) {
                Geometry geom = item.geometry();
                Shape path = ScreenPath.of(geom, ctx.viewport(), s.decimatePx());
                if (geom instanceof Polygonal) {
                    g.setColor(s.street());
                    g.setStroke(new BasicStroke(1f));
                    g.draw(path);
                } else if (geom.getDimension() == 1) {
                    g.setColor(s.street());
                    g.setStroke(s.streetStroke());
                    g.draw(path);
                    ctx.drew(LegendEntry.simple(LegendKind.STREET, "Street"));
                    String name = nameOf(item.attributes());
                    if (name != null) labels.add(new Labelled(name, geom));
                }
            }
        }
        g.setColor(pen);
        g.setStroke(stroke);
        if (ctx.metresPerPixel() <= s.labelsMaxMetresPerPixel()) placeLabels(g, ctx, labels);
    }

    private record Labelled(String name, Geometry geom) {}

    private static String nameOf(Map<String, Object> attrs) {
        for (Map.Entry<String, Object> e : attrs.entrySet()) {
            if (e.getKey() != null && e.getKey().toLowerCase(Locale.ROOT).equals("name") && e.getValue() != null) {
                String n = e.getValue().toString().trim();
                return n.isEmpty() ? null : n;
            }
        }
        return null;
    }

    private static void placeLabels(Graphics2D g, PaintContext ctx, List<Labelled> labels) {
        MapStyle s = ctx.style();
        var font = g.getFont();
        g.setFont(s.font().deriveFont(Font.ITALIC));
        FontMetrics fm = g.getFontMetrics();
        List<Shape> placed = new ArrayList<>();
        Viewport v = ctx.viewport();
        Rectangle2D screen = new Rectangle2D.Double(0, 0, v.width(), v.height());
        for (Labelled l : labels) {
            double[] seg = longestSegment(l.geom(), v, screen);
            if (seg == null) continue;
            double dx = seg[2] - seg[0];
            double dy = seg[3] - seg[1];
            double len = Math.hypot(dx, dy);
            int tw = fm.stringWidth(l.name());
            if (len < tw + 8) continue;
            double angle = Math.atan2(dy, dx);
            if (angle > Math.PI / 2) angle -= Math.PI;
            if (angle <= -Math.PI / 2) angle += Math.PI;
            double mx = (seg[0] + seg[2]) / 2;
            double my = (seg[1] + seg[3]) / 2;
            AffineTransform at = AffineTransform.getTranslateInstance(mx, my);
            at.rotate(angle);
            Shape box = at.createTransformedShape(new Rectangle2D.Double(-tw / 2.0 - 2, -fm.getAscent() / 2.0 - 2,
                    tw + 4, fm.getAscent() + 4));
            if (!screen.contains(box.getBounds2D()) || overlaps(box, placed)) continue;
            placed.add(box);
            AffineTransform old = g.getTransform();
            g.transform(at);
            Symbols.haloText(g, s, l.name(), (float) (-tw / 2.0),
                    (float) ((fm.getAscent() - fm.getDescent()) / 2.0), s.streetLabel());
            g.setTransform(old);
        }
        g.setFont(font);
    }

    private static boolean overlaps(Shape box, List<Shape> placed) {
        Rectangle2D b = box.getBounds2D();
        for (Shape p : placed) {
            if (!p.getBounds2D().intersects(b)) continue;
            Area a = new Area(p);
            a.intersect(new Area(box));
            if (!a.isEmpty()) return true;
        }
        return false;
    }

    /**
     * The longest piece of a segment of the line inside the screen, as {x0, y0, x1, y1};
     * null if none. Segments are clipped to the screen first (Liang and Barsky, 1984), so
     * a street drawn as one long segment reaching beyond the screen is still labelled.
     */
    private static double[] longestSegment(Geometry geom, Viewport v, Rectangle2D screen) {
        double[] best = null;
        double bestLen = 0;
        for (int p = 0; p < geom.getNumGeometries(); p++) {
            if (!(geom.getGeometryN(p) instanceof LineString ls)) continue;
            CoordinateSequence cs = ls.getCoordinateSequence();
            for (int i = 1; i < cs.size(); i++) {
                double[] c = clip(v.screenX(cs.getX(i - 1)), v.screenY(cs.getY(i - 1)),
                        v.screenX(cs.getX(i)), v.screenY(cs.getY(i)), screen);
                if (c == null) continue;
                double len = Math.hypot(c[2] - c[0], c[3] - c[1]);
                if (len > bestLen) {
                    bestLen = len;
                    best = c;
                }
            }
        }
        return best;
    }

    /** The part of segment (x0, y0)-(x1, y1) inside {@code r}, or null (Liang-Barsky line clipping). */
    static double[] clip(double x0, double y0, double x1, double y1, Rectangle2D r) {
        double dx = x1 - x0;
        double dy = y1 - y0;
        double[] p = {-dx, dx, -dy, dy};
        double[] q = {x0 - r.getMinX(), r.getMaxX() - x0, y0 - r.getMinY(), r.getMaxY() - y0};
        double t0 = 0;
        double t1 = 1;
        for (int k = 0; k < 4; k++) {
            if (p[k] == 0) {
                if (q[k] < 0) return null;
                continue;
            }
            double t = q[k] / p[k];
            if (p[k] < 0) t0 = Math.max(t0, t);
            else t1 = Math.min(t1, t);
            if (t0 > t1) return null;
        }
        return new double[] {x0 + t0 * dx, y0 + t0 * dy, x0 + t1 * dx, y0 + t1 * dy};
    }
}
