package org.shutline.render;

import java.awt.BasicStroke;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Line2D;
import java.awt.geom.Rectangle2D;
import java.util.List;
import org.shutline.model.Severity;

/**
 * A legend of the symbols actually drawn (the entries returned by
 * {@link MapPainter#paint}) in a given rectangle: a title, then one row per entry
 * with its sample symbol and label, in as many columns as the rows need. When the
 * rectangle is too small for all entries, the last row says how many were left out.
 */
public final class Legend {
    private Legend() {}

    /** Draws the legend; returns how many entries were drawn. */
    public static int paint(Graphics2D g, Rectangle2D box, List<LegendEntry> entries, MapStyle s) {
        var pen = g.getColor();
        var font = g.getFont();
        g.setFont(s.font().deriveFont(Font.BOLD));
        FontMetrics fm = g.getFontMetrics();
        g.setColor(s.foreground());
        g.drawString("Legend", (float) box.getX() + 2, (float) box.getY() + fm.getAscent());
        double top = box.getY() + fm.getHeight() + 4;
        g.setFont(s.font());
        fm = g.getFontMetrics();
        double rowH = Math.max(s.symbolPx() * 1.7, fm.getHeight() + 3);
        int rows = Math.max(0, (int) ((box.getMaxY() - top) / rowH));
        int cols = rows == 0 ? 0 : Math.max(1, (int) Math.ceil(entries.size() / (double) rows));
        double colW = cols == 0 ? 0 : box.getWidth() / cols;
        if (cols > 0 && colW < 120) {
            cols = Math.max(1, (int) (box.getWidth() / 120));
            colW = box.getWidth() / cols;
        }
        int capacity = rows * cols;
        int shown = entries.size() <= capacity ? entries.size() : Math.max(0, capacity - 1);
        for (int i = 0; i < shown; i++) {
            double x = box.getX() + (i / rows) * colW;
            double y = top + (i % rows) * rowH;
            Rectangle2D sampleBox = new Rectangle2D.Double(x + 2, y, 34, rowH);
            sample(g, sampleBox, entries.get(i), s);
            g.setColor(s.foreground());
            String text = fit(entries.get(i).label(), fm, colW - 44);
            g.drawString(text, (float) (x + 42), (float) (y + (rowH + fm.getAscent() - fm.getDescent()) / 2));
        }
        if (shown < entries.size() && capacity > 0) {
            int i = capacity - 1;
            double x = box.getX() + (i / rows) * colW;
            double y = top + (i % rows) * rowH;
            g.setColor(s.foreground());
            g.drawString("... " + (entries.size() - shown) + " more", (float) (x + 42),
                    (float) (y + (rowH + fm.getAscent() - fm.getDescent()) / 2));
        }
        g.setColor(pen);
        g.setFont(font);
        return shown;
    }

    /** Draws the sample symbol of one entry centred in {@code r}, with the map's own symbol code. */
    public static void sample(Graphics2D g, Rectangle2D r, LegendEntry e, MapStyle s) {
        double cx = r.getCenterX();
        double cy = r.getCenterY();
        var pen = g.getPaint();
        var stroke = g.getStroke();
        Line2D line = new Line2D.Double(r.getX() + 2, cy, r.getMaxX() - 2, cy);
        switch (e.kind()) {
            case STREET -> {
                g.setColor(s.street());
                g.setStroke(s.streetStroke());
                g.draw(line);
            }
            case MAIN -> {
                g.setColor(s.systemColour(e.rank()));
                g.setStroke(Symbols.mainStroke(s, e.rank(), e.status()));
                g.draw(line);
            }
            case TEMPORARY_PIPE -> Symbols.temporaryPipe(g, s, line, s.systemColour(Math.max(0, e.rank())),
                    Symbols.mainWidth(s, Math.max(0, e.rank())));
            case CUT -> {
                g.setColor(s.systemColour(0));
                g.setStroke(s.activeStroke(Symbols.mainWidth(s, 1)));
                g.draw(line);
                Symbols.cut(g, s, cx, cy, 0, s.symbolPx());
            }
            case VALVE -> Symbols.valve(g, s, cx, cy, s.symbolPx(), e.normal(), e.operable());
            case STATION -> Symbols.station(g, s, cx, cy, s.symbolPx() * 1.3);
            case SENSE_TAP -> Symbols.tap(g, s, cx, cy, s.symbolPx());
            case CONTROL_LINE -> {
                g.setColor(s.tap());
                g.setStroke(Symbols.controlLineStroke());
                g.draw(line);
            }
            case SOURCE -> Symbols.source(g, s, cx, cy, s.symbolPx() * 1.5);
            case SERVICE -> Symbols.service(g, s, cx, cy, s.symbolPx());
            case CRITICAL_SERVICE -> Symbols.criticalService(g, s, cx, cy, s.symbolPx());
            case GAS_OFF -> {
                Rectangle2D box = new Rectangle2D.Double(r.getX() + 3, r.getY() + 3, r.getWidth() - 6, r.getHeight() - 6);
                g.setPaint(GasOffPainter.hatch(s.gasOff()));
                g.fill(box);
                g.setPaint(s.gasOff());
                g.setStroke(new BasicStroke(2f));
                g.draw(box);
            }
            case VALVE_TO_CLOSE -> Symbols.operateBadge(g, s, cx, cy, 1, true);
            case VALVE_TO_OPEN -> Symbols.operateBadge(g, s, cx, cy, 1, false);
            case HAZARD -> Symbols.hazard(g, s, cx, cy, s.symbolPx() * 0.9, Severity.WARNING);
            case CRITICAL_HAZARD -> Symbols.hazard(g, s, cx, cy, s.symbolPx() * 0.9, Severity.CRITICAL);
            case ISOLATION_CIRCLE -> {
                g.setColor(s.isolation());
                g.setStroke(new BasicStroke(2f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND,
                        10f, new float[] {5f, 3f}, 0f));
                double rr = Math.min(r.getWidth(), r.getHeight()) / 2 - 2;
                g.draw(new Ellipse2D.Double(cx - rr, cy - rr, 2 * rr, 2 * rr));
            }
            case GRID -> {
                g.setColor(s.grid());
                g.setStroke(new BasicStroke(1f));
                g.draw(line);
                g.draw(new Line2D.Double(cx, r.getY() + 2, cx, r.getMaxY() - 2));
            }
        }
        g.setPaint(pen);
        g.setStroke(stroke);
    }

    private static String fit(String text, FontMetrics fm, double width) {
        if (fm.stringWidth(text) <= width) return text;
        String t = text;
        while (t.length() > 1 && fm.stringWidth(t + "...") > width) t = t.substring(0, t.length() - 1);
        return t + "...";
    }
}
