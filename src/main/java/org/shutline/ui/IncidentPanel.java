package org.shutline.ui;

import org.shutline.model.Plural;
import java.awt.BorderLayout;
import java.awt.FlowLayout;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JSpinner;
import javax.swing.JTextArea;
import javax.swing.JToggleButton;
import javax.swing.SpinnerNumberModel;
import org.locationtech.jts.geom.Geometry;
import org.shutline.analysis.Isolation;
import org.shutline.analysis.Placement;
import org.shutline.analysis.ResponseRates;
import org.shutline.analysis.ResponseSizing;
import org.shutline.model.Severity;
import org.shutline.model.Valve;
import org.shutline.render.HazardMark;
import org.shutline.render.MapOverlays;
import org.shutline.render.ValveToOperate;
import org.shutline.trace.ValveSegments;

/**
 * "Incident": with the pick button down, a click on the map is placed on the nearest
 * active main by {@link Placement} (the same rule as the commands: a click farther than
 * the refusal distance, default {@value Placement#DEFAULT_MAX_DISTANCE_M} m, from every
 * active main is refused with the distance and the network's extent) and the valve
 * segment placed on is isolated in the network as recorded ({@link Isolation}, in a
 * worker): the main placed on and the distance moved, valves to close in order, fallbacks for doubtful valves, services and
 * meters off, critical customers, stations to stop, and a crew estimate from
 * {@link ResponseSizing} (shut-off within 4 h, relight within 24 h, default rates).
 * The region is highlighted and the valves are numbered on the map.
 */
final class IncidentPanel extends JPanel {
    static final double SHUTOFF_TARGET_H = 4;
    static final double RELIGHT_TARGET_H = 24;

    private final MainWindow window;
    private final JToggleButton pick = new JToggleButton("Pick incident point");
    private final JSpinner crews = new JSpinner(new SpinnerNumberModel(4, 1, 200, 1));
    private final JSpinner maxDistance = new JSpinner(new SpinnerNumberModel(Placement.DEFAULT_MAX_DISTANCE_M, 1.0, 100_000.0, 10.0));
    private Placement placement;
    private Workspace placementFor;
    private final JTextArea text = new JTextArea();
    private Isolation isolation;
    private Workspace isolationFor;

    IncidentPanel(MainWindow window) {
        super(new BorderLayout());
        this.window = window;
        text.setEditable(false);
        text.setName("incidentText");
        JPanel top = new JPanel(new FlowLayout(FlowLayout.LEFT));
        top.add(pick);
        top.add(new JLabel("crews available:"));
        top.add(crews);
        top.add(new JLabel("refuse beyond (m):"));
        top.add(maxDistance);
        add(top, BorderLayout.NORTH);
        add(new JScrollPane(text), BorderLayout.CENTER);
        text.setText("Press \"Pick incident point\", then click a main or a point on the map.");
    }

    boolean picking() {
        return pick.isSelected();
    }

    void setPicking(boolean on) {
        pick.setSelected(on);
    }

    /** A click placed and isolated, or refused ({@code isolation} null). */
    record Outcome(Placement.Result placement, Isolation.Result isolation) {}

    /** Places (x, y) and isolates the segment placed on in a worker, and shows the result or the refusal. */
    void at(double x, double y) {
        Workspace ws = window.workspace();
        if (ws == null) return;
        int crewCount = (Integer) crews.getValue();
        double maxM = ((Number) maxDistance.getValue()).doubleValue();
        text.setText(String.format(Locale.ROOT, "Isolating at %.1f, %.1f ...", x, y));
        window.run(new Task<>("isolate", p -> {
            p.begin("isolate", 0);
            return locate(ws, x, y, maxM);
        }, o -> {
            if (o.placement() instanceof Placement.Refused f) {
                text.setText("Refused: " + f.reason() + ".\nClick on or near a main, or raise \"refuse beyond\".");
                window.status("Incident point refused: " + f.reason());
            } else {
                show(ws, o.isolation(), (Placement.Placed) o.placement(), crewCount);
            }
        }, t -> text.setText("Isolation failed: " + t.getMessage())));
    }

    /** The engine work behind a click: placement, then the isolation of the segment placed on (none when refused). */
    Outcome locate(Workspace ws, double x, double y, double maxM) {
        Placement.Result pr = placementFor(ws).point(x, y, null, maxM);
        if (pr instanceof Placement.Placed pl) return new Outcome(pl, isolationFor(ws).isolate(pl.zone()));
        return new Outcome(pr, null);
    }

    private synchronized Placement placementFor(Workspace ws) {
        if (placementFor != ws) {
            placement = new Placement(ws.segments());
            placementFor = ws;
        }
        return placement;
    }

    private synchronized Isolation isolationFor(Workspace ws) {
        if (isolationFor != ws) {
            isolation = new Isolation(ws.segments(), new Isolation.Options(LocalDate.now(), Isolation.DEFAULT_INSPECTION_INTERVAL, true));
            isolationFor = ws;
        }
        return isolation;
    }

    private void show(Workspace ws, Isolation.Result r, Placement.Placed placed, int crewCount) {
        double x = placed.x(), y = placed.y();
        StringBuilder sb = new StringBuilder();
        sb.append(String.format(Locale.ROOT, "Incident at %.1f, %.1f%n", x, y));
        sb.append("Placed ").append(placed.describe())
                .append(String.format(Locale.ROOT, " to %.1f, %.1f%n", placed.snappedX(), placed.snappedY()));
        if (!r.isolable()) sb.append("Valves alone cannot isolate it: ").append(r.reason()).append('\n');
        sb.append("Valves to close, in order:\n");
        List<ValveToOperate> marks = new ArrayList<>();
        for (Isolation.ValveStep v : r.valves()) {
            sb.append(String.format(Locale.ROOT, "  %d. %s (operable: %s%s)%n", v.order(), v.valveId(),
                    org.shutline.model.Words.word(v.operable()), v.overdue() ? ", inspection overdue" : ""));
            int vi = ws.valveIndex(v.valveId());
            Valve valve = vi < 0 ? null : ws.network().valves().get(vi);
            if (valve != null && valve.geometry() != null) {
                marks.add(ValveToOperate.of(v.order(), v.valveId(), valve.geometry().getX(), valve.geometry().getY(), true));
            }
        }
        for (Isolation.Fallback f : r.fallbacks()) {
            sb.append("  if ").append(f.valveId()).append(" will not close (").append(f.why()).append("): close ")
                    .append(f.thenClose().isEmpty() ? "(nothing more)" : String.join(", ", f.thenClose()))
                    .append(", adding ").append(Plural.of(f.addedServices().size(), "service")).append("\n");
        }
        if (!r.stationsToStop().isEmpty()) {
            sb.append("Stations to stop: ").append(String.join(", ", r.stationsToStop()))
                    .append("; their inlet valves: ").append(String.join(", ", r.stationInletValves())).append('\n');
        }
        sb.append(String.format(Locale.ROOT, "Services off: %d, meters off: %d%n", r.serviceIdsOff().size(), r.metersOff()));
        sb.append("Critical customers off: ").append(r.criticalOff().isEmpty() ? "none" : String.join(", ", r.criticalOff())).append('\n');
        int meters = (int) Math.min(Integer.MAX_VALUE, r.metersOff());
        ResponseSizing.Result z = ResponseSizing.size(meters, meters, SHUTOFF_TARGET_H, RELIGHT_TARGET_H, crewCount, ResponseRates.DEFAULT);
        sb.append(String.format(Locale.ROOT,
                "Crew estimate (default rates): shut-off %.1f tech-hours, %s to finish in %.0f h; relight %.1f tech-hours, %s in %.0f h.%n"
                        + "With %s: shut-off %.1f h, relight %.1f h.%n",
                z.shutoffTechHours(), Plural.of(z.shutoffCrews(), "crew"), SHUTOFF_TARGET_H, z.relightTechHours(),
                Plural.of(z.relightCrews(), "crew"), RELIGHT_TARGET_H, Plural.of(crewCount, "crew"), z.shutoffHoursWithCrews(),
                z.relightHoursWithCrews()));
        text.setText(sb.toString());
        text.setCaretPosition(0);
        List<Geometry> region = new ArrayList<>();
        ValveSegments segs = ws.segments();
        var reg = r.region();
        reg.or(r.unintended());
        for (int s = reg.nextSetBit(0); s >= 0; s = reg.nextSetBit(s + 1)) {
            for (int m : segs.mains(s)) if (m < ws.network().mains().size()) region.add(ws.network().mains().get(m).geometry());
        }
        MapOverlays o = MapOverlays.NONE.withValvesToOperate(marks)
                .withHazards(List.of(HazardMark.of(x, y, Severity.CRITICAL, "incident")));
        window.showPanelMarks(o, region);
        window.status("Incident: " + Plural.of(r.valves().size(), "valve") + " to close, " + Plural.of(r.serviceIdsOff().size(), "service") + " off");
    }
}
