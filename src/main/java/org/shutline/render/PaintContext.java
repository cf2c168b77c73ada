package org.shutline.render;

import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import org.locationtech.jts.geom.Envelope;
import org.shutline.model.LinearUnit;

/**
 * What one paint pass shares between its layer painters: the scene, the style, the
 * viewport, the CRS unit, and the legend entries collected from what was actually
 * drawn. One instance per paint pass; not thread-safe.
 */
public final class PaintContext {
    private final MapScene scene;
    private final MapStyle style;
    private final Viewport viewport;
    private final Set<LegendEntry> legend = new TreeSet<>(LegendEntry.ORDER);

    public PaintContext(MapScene scene, MapStyle style, Viewport viewport) {
        this.scene = scene;
        this.style = style;
        this.viewport = viewport;
    }

    public MapScene scene() {
        return scene;
    }

    public MapStyle style() {
        return style;
    }

    public Viewport viewport() {
        return viewport;
    }

    public LinearUnit unit() {
        return scene.network().crs().unit();
    }

    /** Ground metres per screen pixel. */
    public double metresPerPixel() {
        return unit().toMetres(viewport.scale());
    }

    /** The viewport's world envelope grown by {@code padPx} pixels on every side (for symbols at the edge). */
    public Envelope query(double padPx) {
        Envelope e = viewport.worldEnvelope();
        e.expandBy(padPx * viewport.scale());
        return e;
    }

    /** Records that a symbol was drawn. */
    public void drew(LegendEntry entry) {
        legend.add(entry);
    }

    /** The legend entries of everything drawn so far, in legend order. */
    public List<LegendEntry> legend() {
        return List.copyOf(legend);
    }
}
