package org.shutline.cli;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.Shape;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Path;
import javax.imageio.ImageIO;
import org.locationtech.jts.awt.ShapeWriter;
import org.locationtech.jts.geom.Geometry;
import org.shutline.analysis.RiskTables;
import org.shutline.io.AtomicFiles;
import org.shutline.model.Caution;
import org.shutline.model.Network;
import org.shutline.render.MapOverlays;
import org.shutline.render.MapPainter;
import org.shutline.render.MapScene;
import org.shutline.render.MapStyle;
import org.shutline.render.Viewport;

/**
 * A PNG map of the segment outage table: the base map ({@link MapPainter}, light
 * style), then every valve segment's pipe drawn over it in a colour of a sequential
 * ramp by the services an isolation there puts off (classes 0, 1-9, 10-49, 50-199,
 * 200 and more; pale to dark, and wider with the class so the order reads without
 * colour), a legend and the caution. Written to a temporary file and moved into place.
 */
final class RiskMap {
    static final long[] BREAKS = {1, 10, 50, 200};
    static final Color[] RAMP = {new Color(0xD8, 0xD0, 0x90), new Color(0xF0, 0xC0, 0x60), new Color(0xE0, 0x80, 0x30),
        new Color(0xB8, 0x40, 0x20), new Color(0x6A, 0x10, 0x18)};
    static final String[] LABELS = {"0", "1 - 9", "10 - 49", "50 - 199", "200 and more"};

    private RiskMap() {}

    static int classOf(long servicesOff) {
        int c = 0;
        while (c < BREAKS.length && servicesOff >= BREAKS[c]) c++;
        return c;
    }

    static void write(Network net, RiskTables tables, int width, int height, Path out) throws IOException {
        BufferedImage img = new BufferedImage(width, height, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        try {
            MapScene scene = new MapScene(net);
            int mapH = height - 40;
            Viewport v = Viewport.fitting(scene.extent(), width, mapH, 30);
            new MapPainter(scene, MapStyle.LIGHT).paint(g, v, MapOverlays.NONE);
            g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
            ShapeWriter sw = new ShapeWriter((src, dest) -> dest.setLocation(v.screenX(src.x), v.screenY(src.y)));
            for (int k = 0; k < RAMP.length; k++) {
                g.setColor(RAMP[k]);
                g.setStroke(new BasicStroke(2f + k, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND));
                for (RiskTables.SegmentRow r : tables.segments()) {
                    if (classOf(r.servicesOff()) != k) continue;
                    Geometry geom = tables.segmentGeometry(r.segment());
                    Shape shape = sw.toShape(geom);
                    g.draw(shape);
                }
            }
            legend(g);
            g.setColor(Color.WHITE);
            g.fillRect(0, mapH, width, height - mapH);
            g.setColor(Color.DARK_GRAY);
            g.setFont(new Font(Font.SANS_SERIF, Font.PLAIN, 11));
            g.drawString(Caution.SHORT, 10, mapH + 24);
        } finally {
            g.dispose();
        }
        AtomicFiles.write(out, os -> {
            if (!ImageIO.write(img, "png", os)) throw new IOException("no PNG writer in this Java runtime");
        });
    }

    private static void legend(Graphics2D g) {
        int x = 12, y = 12, w = 230, h = 26 + 18 * RAMP.length;
        g.setColor(new Color(255, 255, 255, 230));
        g.fillRect(x, y, w, h);
        g.setColor(Color.DARK_GRAY);
        g.drawRect(x, y, w, h);
        g.setFont(new Font(Font.SANS_SERIF, Font.BOLD, 11));
        g.drawString("Services off if the segment is isolated", x + 8, y + 16);
        g.setFont(new Font(Font.SANS_SERIF, Font.PLAIN, 11));
        for (int k = 0; k < RAMP.length; k++) {
            int yy = y + 30 + 18 * k;
            g.setColor(RAMP[k]);
            g.setStroke(new BasicStroke(2f + k, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND));
            g.drawLine(x + 10, yy, x + 50, yy);
            g.setColor(Color.DARK_GRAY);
            g.drawString(LABELS[k], x + 60, yy + 4);
        }
    }
}
