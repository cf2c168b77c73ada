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
 * lower-pressure systems first, so high-pressure mains lie on top. Mains are read from
 * the scene as they stand in the state it draws ({@link MapScene#withState}); pipe the
 * plan lays as temporary (a bypass) is drawn last with {@link Symbols#temporaryPipe} and
 * labelled with its id, and open cuts get the cut symbol on top.
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
        List<Main> temporary = new ArrayList<>();
        for (Main m : mains) {
            if (scene.isTemporary(m)) {
                temporary.add(m);
                continue;
            }
            int rank = scene.rankOf(m.systemId());
            MainStatus status = m.status() == null ? MainStatus.DEFAULT : m.status();
            g.setColor(style.systemColour(rank));
            g.setStroke(Symbols.mainStroke(style, rank, status));
            g.draw(ScreenPath.of(m.geometry(), ctx.viewport(), style.decimatePx()));
            ctx.drew(LegendEntry.main(rank, m.systemId(), status));
        }
        for (Main m : temporary) {
            int rank = scene.rankOf(m.systemId());
            Symbols.temporaryPipe(g, style, ScreenPath.of(m.geometry(), ctx.viewport(), style.decimatePx()),
                    style.systemColour(rank), Symbols.mainWidth(style, rank));
            ctx.drew(new LegendEntry(LegendKind.TEMPORARY_PIPE, rank, null, null, null, "Temporary pipe (bypass), " + m.systemId()));
        }
        var font = g.getFont();
        g.setFont(style.font().deriveFont(java.awt.Font.BOLD));
        for (Main m : temporary) label(g, ctx, m);
        g.setFont(font);
        for (StateFeatures.Cut c : scene.cutsIn(ctx.query(style.symbolPx()))) {
            Viewport v = ctx.viewport();
            Symbols.cut(g, style, v.screenX(c.x()), v.screenY(c.y()), -c.angle(), style.symbolPx());
            ctx.drew(LegendEntry.simple(LegendKind.CUT, "Cut and capped"));
        }
        g.setColor(pen);
        g.setStroke(stroke);
    }

    /**
     * The pipe's id below and left of the middle of its line, clear of the valve labels
     * (below right) and of the order badges (above right).
     */
    private static void label(Graphics2D g, PaintContext ctx, Main m) {
        if (m.id() == null || m.id().isBlank() || m.geometry() == null || m.geometry().isEmpty()) return;
        Viewport v = ctx.viewport();
        var mid = m.geometry().getCentroid();
        double x = v.screenX(mid.getX());
        double y = v.screenY(mid.getY());
        String text = m.id() + " (temporary)";
        int w = g.getFontMetrics().stringWidth(text);
        float tx = (float) (x - ctx.style().symbolPx() - 4 - w);
        if (tx < 0) tx = (float) (x + ctx.style().symbolPx() + 4);
        Symbols.haloText(g, ctx.style(), text, tx, (float) (y + ctx.style().symbolPx() * 1.6), ctx.style().foreground());
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
