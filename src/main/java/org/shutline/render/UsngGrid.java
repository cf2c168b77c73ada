package org.shutline.render;

import java.awt.BasicStroke;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.geom.Path2D;
import java.awt.geom.Point2D;
import java.util.Locale;
import java.util.Objects;

/**
 * Draws US National Grid lines over a map: lines of constant UTM easting and northing
 * (WGS84, the zone of the viewport centre) at a spacing suited to the scale, each
 * traced through 24 points so the grid follows the network CRS's curvature, labelled
 * where it meets the bottom edge (eastings) and the left edge (northings) with its
 * digits within the 100 km square (for 1 km lines "23" for easting 323 000), and the
 * grid zone and 100 km square of the centre in the top-left corner ("18S UJ").
 *
 * <p>Spacing: the finest of 100 m, 1 km and 10 km that leaves at least
 * {@value #MIN_SPACING_PX} pixels between lines; none when even 10 km is closer.
 * Lines of the centre's zone are drawn across the whole viewport, also where it
 * reaches into a neighbouring zone (a map that spans a zone boundary shows one grid).
 */
public final class UsngGrid {
    /** Smallest distance between drawn grid lines, in pixels. */
    public static final double MIN_SPACING_PX = 60;
    private static final int SAMPLES = 24;
    private final GeoTransform geo;

    public UsngGrid(GeoTransform geo) {
        this.geo = Objects.requireNonNull(geo, "geo");
    }

    /** Grid spacing in metres for a ground resolution in metres per pixel; 0 when too dense to draw. */
    public static int spacingFor(double metresPerPixel) {
        for (int s : new int[] {100, 1000, 10_000}) {
            if (s / metresPerPixel >= MIN_SPACING_PX) return s;
        }
        return 0;
    }

    /** Paints the grid for the context's viewport (as a {@link LayerPainter}). */
    public void paint(Graphics2D g, PaintContext ctx) {
        Viewport v = ctx.viewport();
        int spacing = spacingFor(ctx.metresPerPixel());
        if (spacing == 0) return;
        Point2D centre = geo.toLonLat(v.centerX(), v.centerY());
        if (!Double.isFinite(centre.getX()) || !Double.isFinite(centre.getY())
                || centre.getY() < -80 || centre.getY() > 84) return;
        GridReference ref = GridReference.of(centre.getX(), centre.getY());
        Reprojection utm = geo.utm(ref.zone(), centre.getY() < 0);
        double[] box = utmBounds(utm, v);
        if (box == null) return;
        MapStyle s = ctx.style();
        var pen = g.getColor();
        var stroke = g.getStroke();
        var font = g.getFont();
        g.setFont(s.font());
        g.setColor(s.grid());
        g.setStroke(new BasicStroke(1f));
        int digits = 5 - (int) Math.round(Math.log10(spacing));
        for (double e = Math.ceil(box[0] / spacing) * spacing; e <= box[2]; e += spacing) {
            Path2D line = trace(utm, v, e, box[1], e, box[3]);
            g.setColor(s.grid());
            g.draw(line);
            labelEasting(g, ctx, utm, e, box, label(e, spacing, digits));
        }
        for (double n = Math.ceil(box[1] / spacing) * spacing; n <= box[3]; n += spacing) {
            Path2D line = trace(utm, v, box[0], n, box[2], n);
            g.setColor(s.grid());
            g.draw(line);
            labelNorthing(g, ctx, utm, n, box, label(n, spacing, digits));
        }
        FontMetrics fm = g.getFontMetrics();
        String zoneLabel = ref.gridZone() + " " + ref.squareId();
        Symbols.haloText(g, s, zoneLabel, 4, 4 + fm.getAscent(), s.foreground());
        ctx.drew(LegendEntry.simple(LegendKind.GRID, "US National Grid, " + spacingText(spacing)));
        g.setColor(pen);
        g.setStroke(stroke);
        g.setFont(font);
    }

    static String spacingText(int spacing) {
        return spacing >= 1000 ? (spacing / 1000) + " km" : spacing + " m";
    }

    /** The digits of a grid coordinate within its 100 km square at the given spacing, e.g. 323000 at 1 km -> "23". */
    static String label(double coordinate, int spacing, int digits) {
        long inSquare = Math.floorMod(Math.round(coordinate), 100_000L);
        return String.format(Locale.ROOT, "%0" + digits + "d", inSquare / spacing);
    }

    /** UTM bounds {minE, minN, maxE, maxN} of the viewport, from points along its edges; null if any fails. */
    private static double[] utmBounds(Reprojection utm, Viewport v) {
        double minE = Double.POSITIVE_INFINITY, minN = Double.POSITIVE_INFINITY;
        double maxE = Double.NEGATIVE_INFINITY, maxN = Double.NEGATIVE_INFINITY;
        int k = 8;
        for (int i = 0; i <= k; i++) {
            double t = (double) i / k;
            double[][] pts = {
                {t * v.width(), 0}, {t * v.width(), v.height()}, {0, t * v.height()}, {v.width(), t * v.height()}};
            for (double[] p : pts) {
                double[] u = utm.forward(v.worldX(p[0]), v.worldY(p[1]));
                if (!Double.isFinite(u[0]) || !Double.isFinite(u[1])) return null;
                minE = Math.min(minE, u[0]);
                maxE = Math.max(maxE, u[0]);
                minN = Math.min(minN, u[1]);
                maxN = Math.max(maxN, u[1]);
            }
        }
        return new double[] {minE, minN, maxE, maxN};
    }

    private static Path2D trace(Reprojection utm, Viewport v, double e0, double n0, double e1, double n1) {
        Path2D.Double p = new Path2D.Double();
        for (int i = 0; i <= SAMPLES; i++) {
            double t = (double) i / SAMPLES;
            double[] w = utm.back(e0 + (e1 - e0) * t, n0 + (n1 - n0) * t);
            double x = v.screenX(w[0]);
            double y = v.screenY(w[1]);
            if (i == 0) p.moveTo(x, y);
            else p.lineTo(x, y);
        }
        return p;
    }

    private static void labelEasting(Graphics2D g, PaintContext ctx, Reprojection utm, double e, double[] box, String text) {
        Viewport v = ctx.viewport();
        FontMetrics fm = g.getFontMetrics();
        double baseline = v.height() - 3.0;
        double[] hit = crossing(utm, v, e, box[1], e, box[3], false, baseline - fm.getAscent() / 2.0);
        if (hit == null) return;
        float x = (float) (hit[0] - fm.stringWidth(text) / 2.0);
        if (x < 0 || x + fm.stringWidth(text) > v.width()) return;
        Symbols.haloText(g, ctx.style(), text, x, (float) baseline, ctx.style().foreground());
    }

    private static void labelNorthing(Graphics2D g, PaintContext ctx, Reprojection utm, double n, double[] box, String text) {
        Viewport v = ctx.viewport();
        FontMetrics fm = g.getFontMetrics();
        double[] hit = crossing(utm, v, box[0], n, box[2], n, true, 3.0 + fm.stringWidth(text) / 2.0);
        if (hit == null) return;
        float y = (float) (hit[1] + (fm.getAscent() - fm.getDescent()) / 2.0);
        if (y - fm.getAscent() < fm.getHeight() + 6 || y > v.height() - fm.getHeight() - 4) return;
        Symbols.haloText(g, ctx.style(), text, 3f, y, ctx.style().foreground());
    }

    /** Where the traced grid line crosses screen x = at (vertical == true) or y = at; null if it does not. */
    private static double[] crossing(Reprojection utm, Viewport v, double e0, double n0, double e1, double n1,
                                     boolean atX, double at) {
        double px = Double.NaN, py = Double.NaN;
        for (int i = 0; i <= SAMPLES; i++) {
            double t = (double) i / SAMPLES;
            double[] w = utm.back(e0 + (e1 - e0) * t, n0 + (n1 - n0) * t);
            double x = v.screenX(w[0]);
            double y = v.screenY(w[1]);
            if (i > 0) {
                double a = atX ? px : py;
                double b = atX ? x : y;
                if ((a - at) * (b - at) <= 0 && a != b) {
                    double f = (at - a) / (b - a);
                    return new double[] {px + (x - px) * f, py + (y - py) * f};
                }
            }
            px = x;
            py = y;
        }
        return null;
    }
}
