package org.shutline.render;

import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.Shape;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * Paints a network map for a viewport into a {@link Graphics2D} whose transform maps
 * one unit to one pixel with the viewport's top-left corner at (0, 0): the background,
 * context layers, the US National Grid (when one is given), gas-off areas, control
 * lines, mains, services, sensing taps, valves, stations, sources, then the
 * isolation circles, valves to operate and hazard markers. Drawing is clipped to the
 * viewport rectangle; each layer draws only what its spatial index returns for the
 * viewport envelope (grown by the symbol size).
 *
 * <p>{@link #paint} returns the legend entries of the symbols actually drawn, in legend
 * order, for {@link Legend}. The painter holds no per-pass state: one instance may
 * paint from several threads into different targets.
 */
public final class MapPainter {
    private final MapScene scene;
    private final MapStyle style;
    private final UsngGrid grid;
    private final boolean antialias;

    public MapPainter(MapScene scene, MapStyle style) {
        this(scene, style, null, true);
    }

    private MapPainter(MapScene scene, MapStyle style, UsngGrid grid, boolean antialias) {
        this.scene = Objects.requireNonNull(scene, "scene");
        this.style = Objects.requireNonNull(style, "style");
        this.grid = grid;
        this.antialias = antialias;
    }

    /** The same painter drawing the given grid (null for none). */
    public MapPainter withGrid(UsngGrid g) {
        return new MapPainter(scene, style, g, antialias);
    }

    /** The same painter with anti-aliasing on or off (off gives exact colours, for tests and bitmaps). */
    public MapPainter withAntialias(boolean on) {
        return new MapPainter(scene, style, grid, on);
    }

    public MapStyle style() {
        return style;
    }

    public MapScene scene() {
        return scene;
    }

    /** Paints the map and the overlays; returns the legend entries of what was drawn. */
    public List<LegendEntry> paint(Graphics2D g, Viewport v, MapOverlays overlays) {
        Objects.requireNonNull(overlays, "overlays");
        PaintContext ctx = new PaintContext(scene, style, v);
        Shape oldClip = g.getClip();
        Object oldAa = g.getRenderingHint(RenderingHints.KEY_ANTIALIASING);
        Object oldTextAa = g.getRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING);
        var pen = g.getPaint();
        g.clipRect(0, 0, v.width(), v.height());
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING,
                antialias ? RenderingHints.VALUE_ANTIALIAS_ON : RenderingHints.VALUE_ANTIALIAS_OFF);
        g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING,
                antialias ? RenderingHints.VALUE_TEXT_ANTIALIAS_ON : RenderingHints.VALUE_TEXT_ANTIALIAS_OFF);
        g.setRenderingHint(RenderingHints.KEY_STROKE_CONTROL, RenderingHints.VALUE_STROKE_PURE);
        g.setPaint(style.background());
        g.fillRect(0, 0, v.width(), v.height());
        g.setPaint(pen);
        for (LayerPainter layer : layers(overlays)) layer.paint(g, ctx);
        g.setClip(oldClip);
        if (oldAa != null) g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, oldAa);
        if (oldTextAa != null) g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, oldTextAa);
        return ctx.legend();
    }

    /** The layer painters in drawing order, lowest first. */
    public List<LayerPainter> layers(MapOverlays overlays) {
        List<LayerPainter> list = new ArrayList<>();
        list.add(new ContextPainter());
        if (grid != null) list.add(grid::paint);
        list.add(new GasOffPainter(overlays.gasOff()));
        list.add(new PointPainter(PointPainter.Layer.CONTROL_LINES));
        list.add(new MainPainter());
        list.add(new PointPainter(PointPainter.Layer.SERVICES));
        list.add(new PointPainter(PointPainter.Layer.TAPS));
        list.add(new PointPainter(PointPainter.Layer.VALVES));
        list.add(new PointPainter(PointPainter.Layer.STATIONS));
        list.add(new PointPainter(PointPainter.Layer.SOURCES));
        list.add(new OverlayPainter(overlays));
        return List.copyOf(list);
    }
}
