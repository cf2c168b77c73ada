package org.shutline.render;

import java.awt.Graphics2D;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.shutline.model.Main;
import org.shutline.model.MainStatus;

/**
 * Draws mains in their system's colour and width (see {@link Symbols#mainWidth}) with a
 * line pattern by status: active solid, proposed dashed, abandoned thin and dotted.
 * Abandoned mains are drawn first, then proposed, then active; within a status the
 * lower-pressure systems first, so high-pressure mains lie on top.
 */
final class MainPainter implements LayerPainter {
    @Override
    public void paint(Graphics2D g, PaintContext ctx) {
        MapScene scene = ctx.scene();
        MapStyle style = ctx.style();
        List<Main> mains = new ArrayList<>(scene.mainsIn(ctx.query(4)));
        mains.sort(Comparator.comparingInt((Main m) -> statusOrder(m.status()))
                .thenComparing(Comparator.comparingInt((Main m) -> scene.rankOf(m.systemId())).reversed()));
        var pen = g.getColor();
        var stroke = g.getStroke();
        for (Main m : mains) {
            int rank = scene.rankOf(m.systemId());
            MainStatus status = m.status() == null ? MainStatus.DEFAULT : m.status();
            g.setColor(style.systemColour(rank));
            g.setStroke(Symbols.mainStroke(style, rank, status));
            g.draw(ScreenPath.of(m.geometry(), ctx.viewport(), style.decimatePx()));
            ctx.drew(LegendEntry.main(rank, m.systemId(), status));
        }
        g.setColor(pen);
        g.setStroke(stroke);
    }

    private static int statusOrder(MainStatus s) {
        if (s == null) return 2;
        return switch (s) {
            case ABANDONED -> 0;
            case PROPOSED -> 1;
            case ACTIVE -> 2;
        };
    }
}
