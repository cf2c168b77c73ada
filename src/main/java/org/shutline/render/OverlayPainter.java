package org.shutline.render;

import org.shutline.model.Finding;
import java.awt.BasicStroke;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Line2D;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import org.shutline.model.LinearUnit;
import org.shutline.model.Severity;

/**
 * Draws the overlays that go on top of the network: isolation circles (dashed, with a
 * radius label at the top such as "r = 100 m" or "r = 330 ft" after the CRS unit),
 * valves to operate (circled order numbers offset up and right of the valve, with a
 * leader; filled for close, hollow for open; drawn in order so number 1 is on top of
 * none), and hazard markers (standing on their point, text to the right, or to the left where
 * the right side has no room).
 */
final class OverlayPainter implements LayerPainter {
    private static final double BADGE_OFFSET = 15;
    private final MapOverlays overlays;

    OverlayPainter(MapOverlays overlays) {
        this.overlays = overlays;
    }

    @Override
    public void paint(Graphics2D g, PaintContext ctx) {
        var pen = g.getColor();
        var stroke = g.getStroke();
        var font = g.getFont();
        rings(g, ctx);
        badges(g, ctx);
        hazards(g, ctx);
        g.setColor(pen);
        g.setStroke(stroke);
        g.setFont(font);
    }

    private void rings(Graphics2D g, PaintContext ctx) {
        MapStyle s = ctx.style();
        Viewport v = ctx.viewport();
        g.setFont(s.font().deriveFont(Font.BOLD));
        FontMetrics fm = g.getFontMetrics();
        for (IsolationRing r : overlays.rings()) {
            double radius = ctx.unit().fromMetres(r.radiusMetres()) / v.scale();
            double cx = v.screenX(r.centerX());
            double cy = v.screenY(r.centerY());
            if (cx + radius < 0 || cx - radius > v.width() || cy + radius < 0 || cy - radius > v.height()) continue;
            g.setColor(s.isolation());
            g.setStroke(new BasicStroke(2f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 10f, new float[] {9f, 5f}, 0f));
            g.draw(new Ellipse2D.Double(cx - radius, cy - radius, 2 * radius, 2 * radius));
            g.setStroke(new BasicStroke(1.5f));
            g.draw(new Line2D.Double(cx - 4, cy, cx + 4, cy));
            g.draw(new Line2D.Double(cx, cy - 4, cx, cy + 4));
            String label = radiusLabel(r.radiusMetres(), ctx.unit());
            Symbols.haloText(g, s, label, (float) (cx - fm.stringWidth(label) / 2.0),
                    (float) (cy - radius - 4), s.isolation());
            ctx.drew(LegendEntry.simple(LegendKind.ISOLATION_CIRCLE, "Isolation distance"));
        }
    }

    /** "r = 100 m" in a metric CRS, "r = 330 ft" in a foot CRS (rounded to whole units). */
    static String radiusLabel(double metres, LinearUnit unit) {
        if (unit == LinearUnit.METRE) {
            return metres >= 10_000 ? String.format(Locale.ROOT, "r = %.1f km", metres / 1000)
                    : String.format(Locale.ROOT, "r = %.0f m", metres);
        }
        double ft = LinearUnit.INTERNATIONAL_FOOT.fromMetres(metres);
        return ft >= 10_000 ? String.format(Locale.ROOT, "r = %.1f mi", ft / 5280)
                : String.format(Locale.ROOT, "r = %.0f ft", ft);
    }

    private void badges(Graphics2D g, PaintContext ctx) {
        MapStyle s = ctx.style();
        Viewport v = ctx.viewport();
        List<ValveToOperate> ordered = new ArrayList<>(overlays.valvesToOperate());
        ordered.sort(Comparator.comparingInt(ValveToOperate::order).reversed());
        for (ValveToOperate op : ordered) {
            double x = v.screenX(op.x());
            double y = v.screenY(op.y());
            double bx = x + BADGE_OFFSET;
            double by = y - BADGE_OFFSET;
            if (bx < -20 || x > v.width() + 20 || by > v.height() + 20 || y < -20) continue;
            g.setColor(s.foreground());
            g.setStroke(new BasicStroke(1.5f));
            g.draw(new Line2D.Double(x, y, bx, by));
            Symbols.operateBadge(g, s, bx, by, op.order(), op.close());
            ctx.drew(op.close() ? LegendEntry.simple(LegendKind.VALVE_TO_CLOSE, "Valve to close (order)")
                    : LegendEntry.simple(LegendKind.VALVE_TO_OPEN, "Valve to open (order)"));
        }
    }

    private void hazards(Graphics2D g, PaintContext ctx) {
        MapStyle s = ctx.style();
        Viewport v = ctx.viewport();
        g.setFont(s.font().deriveFont(Font.BOLD));
        double size = s.symbolPx() * 1.2;
        for (HazardMark h : overlays.hazards()) {
            double x = v.screenX(h.x());
            double y = v.screenY(h.y()) - size * 0.75;
            if (x < -100 || x > v.width() + 20 || y < -20 || y > v.height() + 20) continue;
            Symbols.hazard(g, s, x, y, size, h.severity());
            if (!h.text().isEmpty()) {
                int tw = g.getFontMetrics().stringWidth(h.text());
                double tx = x + size * 1.3;
                if (tx + tw > v.width() && x - size * 1.3 - tw >= 0) tx = x - size * 1.3 - tw;
                Symbols.haloText(g, s, h.text(), (float) tx, (float) (y + size * 0.4), s.foreground());
            }
            ctx.drew(h.severity() == Severity.CRITICAL
                    ? LegendEntry.simple(LegendKind.CRITICAL_HAZARD, "Hazard, critical")
                    : LegendEntry.simple(LegendKind.HAZARD, "Hazard"));
        }
    }
}
