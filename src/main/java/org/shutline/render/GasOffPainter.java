package org.shutline.render;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.Paint;
import java.awt.RenderingHints;
import java.awt.TexturePaint;
import java.awt.geom.Path2D;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.util.List;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Polygonal;

/**
 * Draws gas-off areas under the mains: a light tint, diagonal hatching (lines at 45
 * degrees every {@value #HATCH_PX} pixels, anchored to the screen) and a solid outline,
 * all in {@link MapStyle#gasOff()}, so the area reads in black and white too.
 * Areas that do not meet the viewport are skipped.
 */
final class GasOffPainter implements LayerPainter {
    static final int HATCH_PX = 8;
    private final List<GasOffArea> areas;

    GasOffPainter(List<GasOffArea> areas) {
        this.areas = List.copyOf(areas);
    }

    @Override
    public void paint(Graphics2D g, PaintContext ctx) {
        if (areas.isEmpty()) return;
        MapStyle s = ctx.style();
        Envelope view = ctx.query(2);
        Paint oldPaint = g.getPaint();
        var stroke = g.getStroke();
        TexturePaint hatch = hatch(s.gasOff());
        Color tint = new Color(s.gasOff().getRed(), s.gasOff().getGreen(), s.gasOff().getBlue(), 40);
        for (GasOffArea a : areas) {
            if (a.area() == null || a.area().isEmpty() || !a.area().getEnvelopeInternal().intersects(view)) continue;
            Path2D path = ScreenPath.of(a.area(), ctx.viewport(), 0.5);
            if (a.area() instanceof Polygonal) {
                g.setPaint(tint);
                g.fill(path);
                g.setPaint(hatch);
                g.fill(path);
            }
            g.setPaint(s.gasOff());
            g.setStroke(new BasicStroke(2f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND));
            g.draw(path);
            ctx.drew(LegendEntry.simple(LegendKind.GAS_OFF, "Off gas (gas-off extent)"));
        }
        g.setPaint(oldPaint);
        g.setStroke(stroke);
    }

    /** A tile with one 45-degree line, drawn so that the tiles join into continuous lines. */
    static TexturePaint hatch(Color c) {
        BufferedImage tile = new BufferedImage(HATCH_PX, HATCH_PX, BufferedImage.TYPE_INT_ARGB);
        Graphics2D tg = tile.createGraphics();
        tg.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_OFF);
        tg.setColor(c);
        for (int i = 0; i < HATCH_PX; i++) {
            tg.fillRect(i, HATCH_PX - 1 - i, 1, 1);
            tg.fillRect((i + 1) % HATCH_PX, HATCH_PX - 1 - i, 1, 1);
        }
        tg.dispose();
        return new TexturePaint(tile, new Rectangle2D.Double(0, 0, HATCH_PX, HATCH_PX));
    }
}
