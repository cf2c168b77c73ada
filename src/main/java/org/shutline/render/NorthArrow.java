package org.shutline.render;

import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.geom.AffineTransform;
import java.awt.geom.Path2D;
import java.awt.geom.Point2D;
import java.awt.geom.Rectangle2D;

/**
 * A north arrow drawn into a given rectangle: a two-halved arrow head (one half filled)
 * with "N" at its tip, turned by an angle measured clockwise from screen up. Grid north
 * is straight up (angle 0); {@link #trueNorth} gives the angle of true north at the
 * viewport centre from the CRS (the meridian convergence of the projection).
 */
public final class NorthArrow {
    private NorthArrow() {}

    /**
     * Clockwise angle in radians from screen up to true north at the viewport centre:
     * the screen direction of a step of 0.001 degree north. 0 when the transform fails.
     */
    public static double trueNorth(GeoTransform geo, Viewport v) {
        Point2D ll = geo.toLonLat(v.centerX(), v.centerY());
        Point2D north = geo.fromLonLat(ll.getX(), Math.min(89.999, ll.getY() + 0.001));
        double dx = v.screenX(north.getX()) - v.width() / 2.0;
        double dy = v.screenY(north.getY()) - v.height() / 2.0;
        if (!Double.isFinite(dx) || !Double.isFinite(dy) || (dx == 0 && dy == 0)) return 0;
        return Math.atan2(dx, -dy);
    }

    public static void paint(Graphics2D g, Rectangle2D box, double angle, MapStyle s) {
        var pen = g.getColor();
        var stroke = g.getStroke();
        var font = g.getFont();
        AffineTransform old = g.getTransform();
        g.setFont(s.font().deriveFont(Font.BOLD));
        FontMetrics fm = g.getFontMetrics();
        double size = Math.min(box.getWidth(), box.getHeight() - fm.getHeight());
        double h = Math.max(8, size) / 2.0;
        double cx = box.getCenterX();
        double cy = box.getMaxY() - h;
        g.translate(cx, cy);
        g.rotate(angle);
        Path2D left = new Path2D.Double();
        left.moveTo(0, -h);
        left.lineTo(-h * 0.5, h * 0.8);
        left.lineTo(0, h * 0.45);
        left.closePath();
        Path2D right = new Path2D.Double();
        right.moveTo(0, -h);
        right.lineTo(h * 0.5, h * 0.8);
        right.lineTo(0, h * 0.45);
        right.closePath();
        g.setColor(s.background());
        g.fill(right);
        g.setColor(s.foreground());
        g.fill(left);
        g.setStroke(s.outline());
        g.draw(left);
        g.draw(right);
        g.drawString("N", (float) (-fm.stringWidth("N") / 2.0), (float) (-h - 3));
        g.setTransform(old);
        g.setColor(pen);
        g.setStroke(stroke);
        g.setFont(font);
    }
}
