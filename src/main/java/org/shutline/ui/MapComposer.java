package org.shutline.ui;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.Shape;
import java.awt.Stroke;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Path2D;
import java.util.List;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.Point;
import org.locationtech.jts.geom.Polygon;
import org.shutline.app.Workspace;
import org.shutline.render.LayerPainter;
import org.shutline.render.MapOverlays;
import org.shutline.render.MapPainter;
import org.shutline.render.MapScene;
import org.shutline.render.MapStyle;
import org.shutline.render.PaintContext;
import org.shutline.render.UsngGrid;
import org.shutline.render.Viewport;

/**
 * Draws one map picture for the window: the background, then the layers of a
 * {@link MapLayers} in their order, skipping hidden ones, each through render's own
 * painter (the same code as the exported maps); context layer {@code i} through a
 * scene of that layer alone. The selection and feed highlights ({@link Highlight}) are
 * drawn as a wide translucent band just under the mains, so the symbols stay readable
 * on top. Stateless and thread-safe: the map view calls it from its render thread,
 * tests call it directly.
 */
final class MapComposer {
    /** Geometries to highlight (network CRS) and the colour to use. */
    record Highlight(List<Geometry> shapes, Color colour) {
        static final Highlight NONE = new Highlight(List.of(), Color.BLACK);

        Highlight {
            shapes = List.copyOf(shapes);
        }
    }

    private MapComposer() {}

    /** Selection colour per theme: our own pick, sky blue on light, yellow on dark, both translucent. */
    static Color selectionColour(MapStyle s) {
        Color base = s.background().getRed() > 128 ? MapStyle.OI_SKY_BLUE : MapStyle.OI_YELLOW;
        return new Color(base.getRed(), base.getGreen(), base.getBlue(), 150);
    }

    static void paint(Graphics2D g, Viewport v, Workspace ws, MapStyle style, MapLayers layers, MapOverlays overlays,
                      List<Highlight> highlights, boolean antialias) {
        paint(g, v, ws, style, layers, overlays, highlights, antialias, true);
    }

    /** As above; without {@code background} the picture is drawn over what {@code g} holds (the overview case). */
    static void paint(Graphics2D g, Viewport v, Workspace ws, MapStyle style, MapLayers layers, MapOverlays overlays,
                      List<Highlight> highlights, boolean antialias, boolean background) {
        paint(g, v, ws, ws.scene(), style, layers, overlays, highlights, antialias, background);
    }

    /**
     * As above, drawing {@code scene}: the workspace's scene, or that scene seen through a
     * network state ({@link org.shutline.render.MapScene#withState}), so a plan step's map
     * shows the pipe and valves the plan added, its cuts, and what it closed and abandoned.
     */
    static void paint(Graphics2D g, Viewport v, Workspace ws, MapScene scene, MapStyle style, MapLayers layers,
                      MapOverlays overlays, List<Highlight> highlights, boolean antialias, boolean background) {
        MapPainter net = new MapPainter(scene, style).withAntialias(antialias);
        List<LayerPainter> painters = net.layers(overlays);
        if (painters.size() != 10) throw new IllegalStateException("render's layer list changed: " + painters.size() + " layers");
        Shape oldClip = g.getClip();
        g.clipRect(0, 0, v.width(), v.height());
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, antialias ? RenderingHints.VALUE_ANTIALIAS_ON : RenderingHints.VALUE_ANTIALIAS_OFF);
        g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING,
                antialias ? RenderingHints.VALUE_TEXT_ANTIALIAS_ON : RenderingHints.VALUE_TEXT_ANTIALIAS_OFF);
        g.setRenderingHint(RenderingHints.KEY_STROKE_CONTROL, RenderingHints.VALUE_STROKE_PURE);
        if (background) {
            g.setColor(style.background());
            g.fillRect(0, 0, v.width(), v.height());
        }
        PaintContext ctx = new PaintContext(scene, style, v);
        boolean highlighted = layers.entries().stream().noneMatch(e -> e.net() == MapLayers.Net.MAINS);
        if (highlighted) for (Highlight h : highlights) highlight(g, v, h);
        for (MapLayers.Entry e : layers.entries()) {
            if (!highlighted && e.net() == MapLayers.Net.MAINS) {
                for (Highlight h : highlights) highlight(g, v, h);
                highlighted = true;
            }
            if (!e.visible()) continue;
            if (e.isContext()) {
                if (e.context() >= ws.context().size()) continue;
                var cs = ws.contextScene(e.context());
                new MapPainter(cs, style).layers(MapOverlays.NONE).get(0).paint(g, new PaintContext(cs, style, v));
                continue;
            }
            switch (e.net()) {
                case GRID -> ws.geo().ifPresent(geo -> new UsngGrid(geo).paint(g, ctx));
                case GAS_OFF -> painters.get(1).paint(g, ctx);
                case CONTROL_LINES -> painters.get(2).paint(g, ctx);
                case MAINS -> painters.get(3).paint(g, ctx);
                case SERVICES -> painters.get(4).paint(g, ctx);
                case TAPS -> painters.get(5).paint(g, ctx);
                case VALVES -> painters.get(6).paint(g, ctx);
                case STATIONS -> painters.get(7).paint(g, ctx);
                case SOURCES -> painters.get(8).paint(g, ctx);
                case OVERLAYS -> painters.get(9).paint(g, ctx);
                default -> throw new IllegalStateException("unknown layer " + e.net());
            }
        }
        g.setClip(oldClip);
    }

    /** Draws the highlight band: lines 9 px wide, points as 18 px discs, polygons filled; culled to the viewport. */
    static void highlight(Graphics2D g, Viewport v, Highlight h) {
        if (h.shapes().isEmpty()) return;
        Envelope view = v.worldEnvelope();
        double pad = 12 * v.scale();
        view.expandBy(pad);
        Color pen = g.getColor();
        Stroke st = g.getStroke();
        g.setColor(h.colour());
        g.setStroke(new BasicStroke(9f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND));
        for (Geometry geom : h.shapes()) {
            if (geom == null || geom.isEmpty() || !view.intersects(geom.getEnvelopeInternal())) continue;
            for (int i = 0; i < geom.getNumGeometries(); i++) {
                Geometry part = geom.getGeometryN(i);
                if (part instanceof Point p) {
                    double x = v.screenX(p.getX());
                    double y = v.screenY(p.getY());
                    g.fill(new Ellipse2D.Double(x - 9, y - 9, 18, 18));
                } else if (part instanceof LineString l) {
                    g.draw(path(l.getCoordinates(), v, false));
                } else if (part instanceof Polygon poly) {
                    Color c = h.colour();
                    g.setColor(new Color(c.getRed(), c.getGreen(), c.getBlue(), 60));
                    g.fill(path(poly.getExteriorRing().getCoordinates(), v, true));
                    g.setColor(c);
                }
            }
        }
        g.setColor(pen);
        g.setStroke(st);
    }

    private static Path2D path(Coordinate[] cs, Viewport v, boolean close) {
        Path2D.Double p = new Path2D.Double();
        double lx = Double.NaN;
        double ly = Double.NaN;
        for (int i = 0; i < cs.length; i++) {
            double x = v.screenX(cs[i].x);
            double y = v.screenY(cs[i].y);
            if (i == 0) p.moveTo(x, y);
            else if (i == cs.length - 1 || Math.abs(x - lx) + Math.abs(y - ly) >= 1) p.lineTo(x, y);
            else continue;
            lx = x;
            ly = y;
        }
        if (close) p.closePath();
        return p;
    }
}
