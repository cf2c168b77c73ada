package org.shutline.ui;

import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.AffineTransform;
import java.awt.image.BufferedImage;
import java.util.ArrayList;
import java.util.List;
import org.shutline.app.Workspace;
import org.shutline.render.MapOverlays;
import org.shutline.render.MapStyle;
import org.shutline.render.Viewport;

/**
 * Simplified drawing of a large network when zoomed out: one picture of the whole
 * extent (at most {@link #MAX_PX} pixels on its long side) painted once by render's
 * painters with the current theme and layers, without the plan marks; a view coarser
 * than that picture's resolution is drawn by scaling the part of it in view
 * (bilinear), then the gas-off extent, the plan and incident marks and the highlights
 * are drawn live on top. Used only for networks of at least {@link #MIN_MAINS} mains;
 * smaller ones are always drawn in full. The picture is thinner-lined than a full
 * drawing at that scale (symbols shrink with the picture): it is an overview.
 */
final class Overview {
    static final int MIN_MAINS = 20_000;
    static final int MAX_PX = 4096;

    private final BufferedImage image;
    private final Viewport viewport;
    private final Workspace ws;
    private final MapStyle style;
    private final MapLayers layers;

    private Overview(BufferedImage image, Viewport viewport, Workspace ws, MapStyle style, MapLayers layers) {
        this.image = image;
        this.viewport = viewport;
        this.ws = ws;
        this.style = style;
        this.layers = layers;
    }

    static boolean wanted(Workspace ws) {
        return ws.network().mains().size() >= MIN_MAINS;
    }

    /** Paints the overview picture for these settings (seconds on a large network: call off the event thread). */
    static Overview build(Workspace ws, MapStyle style, MapLayers layers) {
        var ext = ws.scene().extent();
        double w = Math.max(ext.getWidth(), 1);
        double h = Math.max(ext.getHeight(), 1);
        int pw = w >= h ? MAX_PX : (int) Math.max(64, Math.round(MAX_PX * w / h));
        int ph = h > w ? MAX_PX : (int) Math.max(64, Math.round(MAX_PX * h / w));
        Viewport v = Viewport.fitting(ext, pw, ph, 8);
        BufferedImage img = MapView.render(v, ws, style, baseLayers(layers), MapOverlays.NONE, List.of(), true);
        return new Overview(img, v, ws, style, layers);
    }

    /** The layers without the live ones (gas-off extent, marks). */
    private static MapLayers baseLayers(MapLayers l) {
        List<MapLayers.Entry> e = new ArrayList<>();
        for (MapLayers.Entry x : l.entries()) {
            boolean live = x.net() == MapLayers.Net.GAS_OFF || x.net() == MapLayers.Net.OVERLAYS;
            e.add(live ? new MapLayers.Entry(x.name(), x.net(), x.context(), false) : x);
        }
        return new MapLayers(e);
    }

    /** The live layers only. */
    private static MapLayers liveLayers(MapLayers l) {
        List<MapLayers.Entry> e = new ArrayList<>();
        for (MapLayers.Entry x : l.entries()) {
            boolean live = x.net() == MapLayers.Net.GAS_OFF || x.net() == MapLayers.Net.OVERLAYS;
            e.add(live ? x : new MapLayers.Entry(x.name(), x.net(), x.context(), false));
        }
        return new MapLayers(e);
    }

    /** True when this picture was made for these settings and the view is at least as coarse as the picture. */
    boolean serves(Workspace w, MapStyle s, MapLayers l, Viewport v) {
        return w == ws && s.equals(style) && l.equals(layers) && v.scale() >= viewport.scale();
    }

    boolean matches(Workspace w, MapStyle s, MapLayers l) {
        return w == ws && s.equals(style) && l.equals(layers);
    }

    /** Draws the view from the overview picture plus the live layers and highlights. */
    BufferedImage render(Viewport v, MapOverlays overlays, List<MapComposer.Highlight> highlights) {
        BufferedImage out = new BufferedImage(v.width(), v.height(), BufferedImage.TYPE_INT_RGB);
        Graphics2D g = out.createGraphics();
        try {
            g.setColor(style.background());
            g.fillRect(0, 0, v.width(), v.height());
            g.setRenderingHint(RenderingHints.KEY_INTERPOLATION, RenderingHints.VALUE_INTERPOLATION_BILINEAR);
            AffineTransform t = v.toScreen();
            t.concatenate(viewport.toWorld());
            g.drawImage(image, t, null);
            MapLayers live = liveLayers(layers);
            List<MapLayers.Entry> noMains = new ArrayList<>(live.entries());
            noMains.removeIf(e -> e.net() == MapLayers.Net.MAINS);
            MapComposer.paint(g, v, ws, style, new MapLayers(noMains), overlays, highlights, true, false);
        } finally {
            g.dispose();
        }
        return out;
    }
}
