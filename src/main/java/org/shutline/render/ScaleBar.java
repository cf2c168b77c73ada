package org.shutline.render;

import java.awt.BasicStroke;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;
import java.util.Locale;
import org.shutline.model.LinearUnit;

/**
 * A scale bar drawn into a given rectangle: four alternately filled parts, "0" at the
 * left end and the total length at the right end, above the bar. The length is the
 * longest "nice" value (1, 2 or 5 times a power of ten) that fits 90 % of the
 * rectangle's width: in metres and kilometres for a metric CRS, in feet and miles
 * (5 280 ft, NIST SP 811 Appendix B) for a CRS in feet. Lengths come from the
 * viewport's scale and the CRS unit: they are grid distances in the projected CRS, not
 * corrected for the projection's scale factor (within 0.04 % in UTM, common practice
 * for local maps).
 */
public final class ScaleBar {
    private ScaleBar() {}

    /** A bar length: its ground size in metres, its label, and its size in pixels. */
    public record Length(double metres, String label, double pixels) {}

    /** The bar for a ground resolution of {@code metresPerPixel} and at most {@code maxPx} pixels; null if none fits. */
    public static Length choose(double metresPerPixel, double maxPx, LinearUnit unit) {
        boolean feet = unit != LinearUnit.METRE;
        double unitMetres = feet ? LinearUnit.INTERNATIONAL_FOOT.metres() : 1.0;
        double maxUnits = maxPx * metresPerPixel / unitMetres;
        if (!(maxUnits > 0) || !Double.isFinite(maxUnits)) return null;
        double best = 0;
        double p = Math.pow(10, Math.floor(Math.log10(maxUnits)));
        for (double m : new double[] {5, 2, 1}) {
            if (m * p <= maxUnits) {
                best = m * p;
                break;
            }
        }
        if (feet && maxUnits >= 5280) {
            double miles = maxUnits / 5280;
            double mp = Math.pow(10, Math.floor(Math.log10(miles)));
            for (double m : new double[] {5, 2, 1}) {
                if (m * mp <= miles) {
                    double metres = m * mp * 5280 * unitMetres;
                    return new Length(metres, fmt(m * mp) + " mi", metres / metresPerPixel);
                }
            }
        }
        if (best == 0) return null;
        double metres = best * unitMetres;
        String label = feet ? fmt(best) + " ft" : (best >= 1000 ? fmt(best / 1000) + " km" : fmt(best) + " m");
        return new Length(metres, label, metres / metresPerPixel);
    }

    /** Draws the bar for viewport {@code v} in a CRS of unit {@code unit} into {@code box}; returns the length drawn or null. */
    public static Length paint(Graphics2D g, Rectangle2D box, Viewport v, LinearUnit unit, MapStyle s) {
        Length len = choose(unit.toMetres(v.scale()), box.getWidth() * 0.9, unit);
        if (len == null) return null;
        var pen = g.getColor();
        var stroke = g.getStroke();
        var font = g.getFont();
        g.setFont(s.font());
        FontMetrics fm = g.getFontMetrics();
        double barH = Math.max(4, Math.min(8, box.getHeight() - fm.getHeight() - 2));
        double x0 = box.getX() + Math.max(2, fm.stringWidth("0") / 2.0);
        double y0 = box.getMaxY() - barH - 1;
        double part = len.pixels() / 4;
        g.setStroke(new BasicStroke(1f));
        for (int i = 0; i < 4; i++) {
            Rectangle2D r = new Rectangle2D.Double(x0 + i * part, y0, part, barH);
            g.setColor(i % 2 == 0 ? s.foreground() : s.background());
            g.fill(r);
            g.setColor(s.foreground());
            g.draw(r);
        }
        g.setColor(s.foreground());
        float ty = (float) (y0 - 3);
        g.drawString("0", (float) (x0 - fm.stringWidth("0") / 2.0), ty);
        float lx = (float) Math.min(x0 + len.pixels() - fm.stringWidth(len.label()) / 2.0,
                box.getMaxX() - fm.stringWidth(len.label()));
        g.drawString(len.label(), lx, ty);
        g.setColor(pen);
        g.setStroke(stroke);
        g.setFont(font);
        return len;
    }

    private static String fmt(double v) {
        return v == Math.rint(v) ? String.format(Locale.ROOT, "%.0f", v) : String.format(Locale.ROOT, "%s", v);
    }
}
