package org.shutline.render;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.Shape;
import java.awt.Stroke;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Line2D;
import java.awt.geom.Path2D;
import java.awt.geom.Rectangle2D;
import org.shutline.model.MainStatus;
import org.shutline.model.NormalPosition;
import org.shutline.model.Operability;
import org.shutline.model.Severity;

/**
 * The project's point symbols and line styles, drawn in screen pixels around a centre
 * ({@code cx}, {@code cy}) with an overall size {@code size}. The same methods draw the
 * map and the legend samples, so the two always agree.
 *
 * <ul>
 * <li>valve: shape by operability (circle = operable, diamond = unknown, square with a
 *     cross = inoperable), filled when normally closed, hollow when open;</li>
 * <li>regulator station: a triangle in a square;</li>
 * <li>sensing tap: a small downward triangle; control line: thin short dashes;</li>
 * <li>source: a five-pointed star;</li>
 * <li>service: a small dot; critical customer: a square with a plus;</li>
 * <li>valve to operate: a circled order number, filled for close, hollow for open;</li>
 * <li>hazard: a triangle with an exclamation mark (critical ones double-outlined);</li>
 * <li>temporary pipe (a bypass the plan lays): a dark casing with the system colour in
 *     short dashes inside, unlike any main's line;</li>
 * <li>cut and capped: two bars across the pipe with a gap between them.</li>
 * </ul>
 * Each method leaves the paint and stroke of {@code g} as it found them.
 */
public final class Symbols {
    private Symbols() {}

    /** Line width of a main of a system of the given rank: higher-pressure systems draw thicker. */
    public static float mainWidth(MapStyle style, int rank) {
        return style.mainWidthPx() + Math.max(0, 2 - rank) * 0.75f;
    }

    /** The stroke for a main of the given rank and status. */
    public static Stroke mainStroke(MapStyle style, int rank, MainStatus status) {
        float w = mainWidth(style, rank);
        return switch (status) {
            case ACTIVE -> style.activeStroke(w);
            case PROPOSED -> style.proposedStroke(w);
            case ABANDONED -> style.abandonedStroke();
        };
    }

    /**
     * Draws temporary pipe along {@code path} (screen pixels): a casing in the foreground
     * colour {@code width + 3} px wide, the halo colour inside, then the system colour in
     * short dashes.
     */
    public static void temporaryPipe(Graphics2D g, MapStyle s, Shape path, Color colour, float width) {
        Color pen = g.getColor();
        Stroke st = g.getStroke();
        g.setColor(s.foreground());
        g.setStroke(new BasicStroke(width + 3f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND));
        g.draw(path);
        g.setColor(s.halo());
        g.setStroke(new BasicStroke(width + 0.5f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND));
        g.draw(path);
        g.setColor(colour);
        g.setStroke(new BasicStroke(width + 0.5f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 10f,
                new float[] {3f, 2.5f}, 0f));
        g.draw(path);
        g.setColor(pen);
        g.setStroke(st);
    }

    /**
     * A cut and capped pipe at ({@code cx}, {@code cy}): the pipe blanked over a short gap
     * and two bars across it, {@code angle} the pipe's direction on screen (radians).
     */
    public static void cut(Graphics2D g, MapStyle s, double cx, double cy, double angle, double size) {
        Color pen = g.getColor();
        Stroke st = g.getStroke();
        double ux = Math.cos(angle), uy = Math.sin(angle);
        double nx = -uy, ny = ux;
        double gap = Math.max(2.5, size * 0.3);
        double half = size * 0.8;
        g.setColor(s.background());
        g.setStroke(new BasicStroke((float) (gap * 2), BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER));
        g.draw(new Line2D.Double(cx - nx * half * 0.6, cy - ny * half * 0.6, cx + nx * half * 0.6, cy + ny * half * 0.6));
        g.setColor(s.foreground());
        g.setStroke(new BasicStroke(2.2f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER));
        for (int side = -1; side <= 1; side += 2) {
            double bx = cx + side * ux * gap, by = cy + side * uy * gap;
            g.draw(new Line2D.Double(bx - nx * half, by - ny * half, bx + nx * half, by + ny * half));
        }
        g.setColor(pen);
        g.setStroke(st);
    }

    public static Stroke controlLineStroke() {
        return new BasicStroke(1f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 10f, new float[] {2f, 2f}, 0f);
    }

    public static void valve(Graphics2D g, MapStyle s, double cx, double cy, double size,
                             NormalPosition normal, Operability operable) {
        double h = size / 2.0;
        Shape shape = switch (operable) {
            case YES -> new Ellipse2D.Double(cx - h, cy - h, size, size);
            case UNKNOWN -> diamond(cx, cy, h * 1.2);
            case NO -> new Rectangle2D.Double(cx - h * 0.9, cy - h * 0.9, size * 0.9, size * 0.9);
        };
        boolean closed = normal == NormalPosition.CLOSED;
        Color fill = closed ? s.foreground() : s.background();
        Color line = closed ? s.background() : s.foreground();
        Color pen = g.getColor();
        Stroke st = g.getStroke();
        g.setColor(fill);
        g.fill(shape);
        g.setStroke(s.outline());
        g.setColor(s.foreground());
        g.draw(shape);
        if (operable == Operability.NO) {
            double k = h * 0.55;
            g.setColor(line);
            g.draw(new Line2D.Double(cx - k, cy - k, cx + k, cy + k));
            g.draw(new Line2D.Double(cx - k, cy + k, cx + k, cy - k));
        }
        g.setColor(pen);
        g.setStroke(st);
    }

    public static void station(Graphics2D g, MapStyle s, double cx, double cy, double size) {
        double h = size * 0.65;
        Color pen = g.getColor();
        Stroke st = g.getStroke();
        Shape box = new Rectangle2D.Double(cx - h, cy - h, 2 * h, 2 * h);
        g.setColor(s.background());
        g.fill(box);
        g.setColor(s.station());
        g.setStroke(s.outline());
        g.draw(box);
        Path2D tri = new Path2D.Double();
        tri.moveTo(cx, cy - h * 0.7);
        tri.lineTo(cx + h * 0.7, cy + h * 0.6);
        tri.lineTo(cx - h * 0.7, cy + h * 0.6);
        tri.closePath();
        g.fill(tri);
        g.setColor(pen);
        g.setStroke(st);
    }

    public static void tap(Graphics2D g, MapStyle s, double cx, double cy, double size) {
        double h = size * 0.45;
        Path2D tri = new Path2D.Double();
        tri.moveTo(cx - h, cy - h * 0.8);
        tri.lineTo(cx + h, cy - h * 0.8);
        tri.lineTo(cx, cy + h);
        tri.closePath();
        fillAndOutline(g, s, tri, s.tap());
    }

    public static void source(Graphics2D g, MapStyle s, double cx, double cy, double size) {
        double outer = size * 0.7;
        double inner = outer * 0.42;
        Path2D star = new Path2D.Double();
        for (int i = 0; i < 10; i++) {
            double r = (i % 2 == 0) ? outer : inner;
            double a = -Math.PI / 2 + i * Math.PI / 5;
            double x = cx + r * Math.cos(a);
            double y = cy + r * Math.sin(a);
            if (i == 0) star.moveTo(x, y);
            else star.lineTo(x, y);
        }
        star.closePath();
        fillAndOutline(g, s, star, s.source());
    }

    public static void service(Graphics2D g, MapStyle s, double cx, double cy, double size) {
        double r = Math.max(1.5, size * 0.2);
        Color pen = g.getColor();
        g.setColor(s.service());
        g.fill(new Ellipse2D.Double(cx - r, cy - r, 2 * r, 2 * r));
        g.setColor(pen);
    }

    public static void criticalService(Graphics2D g, MapStyle s, double cx, double cy, double size) {
        double h = size * 0.5;
        fillAndOutline(g, s, new Rectangle2D.Double(cx - h, cy - h, 2 * h, 2 * h), s.critical());
        Color pen = g.getColor();
        Stroke st = g.getStroke();
        g.setColor(s.background());
        g.setStroke(new BasicStroke((float) Math.max(1.5, size * 0.16)));
        double k = h * 0.6;
        g.draw(new Line2D.Double(cx - k, cy, cx + k, cy));
        g.draw(new Line2D.Double(cx, cy - k, cx, cy + k));
        g.setColor(pen);
        g.setStroke(st);
    }

    /** A circled order number; returns the badge's radius. */
    public static double operateBadge(Graphics2D g, MapStyle s, double cx, double cy, int order, boolean close) {
        Font old = g.getFont();
        Font f = s.font().deriveFont(Font.BOLD);
        g.setFont(f);
        FontMetrics fm = g.getFontMetrics();
        String text = Integer.toString(order);
        double r = Math.max(fm.getAscent() * 0.85, fm.stringWidth(text) / 2.0 + 3);
        Shape c = new Ellipse2D.Double(cx - r, cy - r, 2 * r, 2 * r);
        Color pen = g.getColor();
        Stroke st = g.getStroke();
        g.setColor(close ? s.foreground() : s.background());
        g.fill(c);
        g.setColor(s.foreground());
        g.setStroke(new BasicStroke(1.6f));
        g.draw(c);
        g.setColor(close ? s.background() : s.foreground());
        g.drawString(text, (float) (cx - fm.stringWidth(text) / 2.0), (float) (cy + (fm.getAscent() - fm.getDescent()) / 2.0));
        g.setColor(pen);
        g.setStroke(st);
        g.setFont(old);
        return r;
    }

    public static void hazard(Graphics2D g, MapStyle s, double cx, double cy, double size, Severity severity) {
        double h = size * 0.8;
        Path2D tri = new Path2D.Double();
        tri.moveTo(cx, cy - h);
        tri.lineTo(cx + h * 1.05, cy + h * 0.75);
        tri.lineTo(cx - h * 1.05, cy + h * 0.75);
        tri.closePath();
        boolean critical = severity == Severity.CRITICAL;
        fillAndOutline(g, s, tri, critical ? s.critical() : s.hazard());
        Color pen = g.getColor();
        Stroke st = g.getStroke();
        if (critical) {
            g.setColor(s.foreground());
            g.setStroke(new BasicStroke(1f));
            Path2D outer = new Path2D.Double();
            double o = h * 1.3;
            outer.moveTo(cx, cy - o);
            outer.lineTo(cx + o * 1.05, cy + h * 0.95);
            outer.lineTo(cx - o * 1.05, cy + h * 0.95);
            outer.closePath();
            g.draw(outer);
        }
        g.setColor(Color.BLACK);
        g.setStroke(new BasicStroke((float) Math.max(1.5, size * 0.14), BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND));
        g.draw(new Line2D.Double(cx, cy - h * 0.45, cx, cy + h * 0.2));
        g.fill(new Ellipse2D.Double(cx - 1.1, cy + h * 0.42, 2.2, 2.2));
        g.setColor(pen);
        g.setStroke(st);
    }

    /**
     * Text with a halo of the style's halo colour so it reads over any line: the glyph
     * outlines stroked 2 px wide in the halo colour, then the text once on top (so a PDF
     * holds each label once as selectable text, not nine times).
     */
    public static void haloText(Graphics2D g, MapStyle s, String text, float x, float y, Color colour) {
        Color pen = g.getColor();
        Stroke st = g.getStroke();
        if (!text.isEmpty()) {
            Shape outline = new java.awt.font.TextLayout(text, g.getFont(), g.getFontRenderContext())
                    .getOutline(java.awt.geom.AffineTransform.getTranslateInstance(x, y));
            g.setColor(s.halo());
            g.setStroke(new BasicStroke(2f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND));
            g.draw(outline);
        }
        g.setColor(colour);
        g.drawString(text, x, y);
        g.setColor(pen);
        g.setStroke(st);
    }

    static Shape diamond(double cx, double cy, double h) {
        Path2D d = new Path2D.Double();
        d.moveTo(cx, cy - h);
        d.lineTo(cx + h, cy);
        d.lineTo(cx, cy + h);
        d.lineTo(cx - h, cy);
        d.closePath();
        return d;
    }

    private static void fillAndOutline(Graphics2D g, MapStyle s, Shape shape, Color fill) {
        Color pen = g.getColor();
        Stroke st = g.getStroke();
        g.setColor(fill);
        g.fill(shape);
        g.setColor(s.foreground());
        g.setStroke(s.outline());
        g.draw(shape);
        g.setColor(pen);
        g.setStroke(st);
    }
}
