package org.shutline.render;

import java.awt.Graphics2D;
import java.awt.geom.Line2D;
import org.shutline.model.NormalPosition;
import org.shutline.model.Operability;
import org.shutline.model.SenseTap;
import org.shutline.model.Service;
import org.shutline.model.Source;
import org.shutline.model.Station;
import org.shutline.model.Valve;

/**
 * Draws the point layers as {@link Symbols}: one painter per layer, chosen by
 * {@link Layer}. Services: ordinary ones only while the ground resolution is at most
 * {@link MapStyle#servicesMaxMetresPerPixel()}, critical customers always. Control lines
 * (a dashed straight line from a sensing tap to its station, when the station exists)
 * are a layer of their own drawn under the mains, so a control line that runs along a
 * main never makes that main look dashed; it shows where it leaves the pipe.
 */
final class PointPainter implements LayerPainter {
    /** Which point layer a painter draws. */
    enum Layer { CONTROL_LINES, SERVICES, TAPS, VALVES, STATIONS, SOURCES }

    private final Layer layer;

    PointPainter(Layer layer) {
        this.layer = layer;
    }

    @Override
    public void paint(Graphics2D g, PaintContext ctx) {
        switch (layer) {
            case CONTROL_LINES -> controlLines(g, ctx);
            case SERVICES -> services(g, ctx);
            case TAPS -> taps(g, ctx);
            case VALVES -> valves(g, ctx);
            case STATIONS -> stations(g, ctx);
            case SOURCES -> sources(g, ctx);
        }
    }

    private static void services(Graphics2D g, PaintContext ctx) {
        MapStyle s = ctx.style();
        boolean ordinary = ctx.metresPerPixel() <= s.servicesMaxMetresPerPixel();
        Viewport v = ctx.viewport();
        for (Service svc : ctx.scene().servicesIn(ctx.query(s.symbolPx()))) {
            double x = v.screenX(svc.geometry().getX());
            double y = v.screenY(svc.geometry().getY());
            if (svc.isCritical()) {
                Symbols.criticalService(g, s, x, y, s.symbolPx());
                ctx.drew(LegendEntry.simple(LegendKind.CRITICAL_SERVICE, "Critical customer"));
            } else if (ordinary) {
                Symbols.service(g, s, x, y, s.symbolPx());
                ctx.drew(LegendEntry.simple(LegendKind.SERVICE, "Service"));
            }
        }
    }

    private static void controlLines(Graphics2D g, PaintContext ctx) {
        MapStyle s = ctx.style();
        Viewport v = ctx.viewport();
        var pen = g.getColor();
        var stroke = g.getStroke();
        g.setColor(s.tap());
        g.setStroke(Symbols.controlLineStroke());
        for (SenseTap t : ctx.scene().tapsIn(ctx.query(s.symbolPx()))) {
            Station st = ctx.scene().station(t.stationId());
            if (st == null) continue;
            g.draw(new Line2D.Double(v.screenX(st.geometry().getX()), v.screenY(st.geometry().getY()),
                    v.screenX(t.geometry().getX()), v.screenY(t.geometry().getY())));
            ctx.drew(LegendEntry.simple(LegendKind.CONTROL_LINE, "Sensing (control) line"));
        }
        g.setColor(pen);
        g.setStroke(stroke);
    }

    private static void taps(Graphics2D g, PaintContext ctx) {
        MapStyle s = ctx.style();
        Viewport v = ctx.viewport();
        for (SenseTap t : ctx.scene().tapsIn(ctx.query(s.symbolPx()))) {
            Symbols.tap(g, s, v.screenX(t.geometry().getX()), v.screenY(t.geometry().getY()), s.symbolPx());
            ctx.drew(LegendEntry.simple(LegendKind.SENSE_TAP, "Sensing tap"));
        }
    }

    private static void valves(Graphics2D g, PaintContext ctx) {
        MapStyle s = ctx.style();
        Viewport v = ctx.viewport();
        var font = g.getFont();
        for (Valve valve : ctx.scene().valvesIn(ctx.query(s.symbolPx()))) {
            NormalPosition n = valve.normal() == null ? NormalPosition.DEFAULT : valve.normal();
            Operability o = valve.operable() == null ? Operability.DEFAULT : valve.operable();
            double x = v.screenX(valve.geometry().getX());
            double y = v.screenY(valve.geometry().getY());
            Symbols.valve(g, s, x, y, s.symbolPx(), n, o);
            ctx.drew(LegendEntry.valve(n, o));
            if (ctx.scene().isAdded(valve) && valve.id() != null) {
                // a valve the plan adds (a bypass valve) is on no record: its id is written beside it
                g.setFont(s.font().deriveFont(java.awt.Font.BOLD));
                Symbols.haloText(g, s, valve.id(), (float) (x + s.symbolPx()), (float) (y + s.symbolPx() * 1.6),
                        s.foreground());
                g.setFont(font);
            }
        }
    }

    private static void stations(Graphics2D g, PaintContext ctx) {
        MapStyle s = ctx.style();
        Viewport v = ctx.viewport();
        for (Station st : ctx.scene().stationsIn(ctx.query(s.symbolPx() * 1.5))) {
            Symbols.station(g, s, v.screenX(st.geometry().getX()), v.screenY(st.geometry().getY()), s.symbolPx() * 1.3);
            ctx.drew(LegendEntry.simple(LegendKind.STATION, "District regulator station"));
        }
    }

    private static void sources(Graphics2D g, PaintContext ctx) {
        MapStyle s = ctx.style();
        Viewport v = ctx.viewport();
        for (Source src : ctx.scene().sourcesIn(ctx.query(s.symbolPx() * 1.5))) {
            Symbols.source(g, s, v.screenX(src.geometry().getX()), v.screenY(src.geometry().getY()), s.symbolPx() * 1.5);
            ctx.drew(LegendEntry.simple(LegendKind.SOURCE, "Supply source"));
        }
    }
}
