package org.shutline.ui;

import org.shutline.app.Workspace;
import java.awt.event.MouseEvent;
import java.util.List;
import java.util.Locale;
import org.locationtech.jts.geom.Envelope;

/**
 * What the window does with the map's mouse: a click identifies the feature under it
 * (or, with the Incident panel's pick down, is an incident point); a shift-drag selects
 * the features in the rectangle (in a background task); the cursor position goes to the
 * status line.
 */
final class MapMouse implements MapView.Listener {
    private final WindowContext ctx;
    private final IncidentPanel incident;
    private final StatusBar status;

    MapMouse(WindowContext ctx, IncidentPanel incident, StatusBar status) {
        this.ctx = ctx;
        this.incident = incident;
        this.status = status;
    }

    @Override public void clicked(double x, double y, double tol, MouseEvent e) {
        Workspace ws = ctx.workspace();
        if (ws == null) return;
        if (incident.picking()) {
            incident.at(x, y);
            return;
        }
        Pick p = Identify.at(ws, x, y, tol);
        if (p == null) {
            ctx.select(null, List.of());
            ctx.status(String.format(Locale.ROOT, "Nothing here (%.1f, %.1f)", x, y));
        } else {
            ctx.select(p, List.of(p));
            ctx.status(p.label());
        }
    }

    @Override public void rectangle(Envelope env) {
        Workspace w0 = ctx.workspace();
        if (w0 == null) return;
        ctx.run(new Task<>("select", p -> Identify.in(w0, env), in -> {
            if (ctx.workspace() != w0) return;
            ctx.select(in.isEmpty() ? null : in.get(0), in);
            ctx.status(in.size() + " features selected");
        }, t -> ctx.failed("Select", t)));
    }

    @Override public void cursor(double x, double y) {
        Workspace ws = ctx.workspace();
        if (ws != null) status.cursor(ws, x, y);
    }
}
