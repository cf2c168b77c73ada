package org.shutline.ui;

import org.shutline.analysis.ValveDoubt;
import org.shutline.app.Workspace;
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
import org.shutline.analysis.IncidentResponse;
import org.shutline.analysis.Isolation;
import org.shutline.analysis.Placement;
import org.shutline.analysis.ResponseSettings;
import org.shutline.analysis.ResponseSizing;
import org.shutline.analysis.ValveOrder;
import org.shutline.analysis.WorkPackages;
import org.shutline.model.Severity;
import org.shutline.model.Valve;
import org.shutline.render.GridReference;
import org.shutline.render.HazardMark;
import org.shutline.render.MapOverlays;
import org.shutline.render.ValveToOperate;
import org.shutline.trace.ValveSegments;

/**
 * "Incident": with the pick button down, a click on the map is placed on the nearest
 * active main by {@link Placement} (the same rule as the commands: a click farther than
 * the refusal distance, default {@value Placement#DEFAULT_MAX_DISTANCE_M} m, from every
 * active main is refused with the distance and the network's extent) and the valve
 * segment placed on is isolated in the network as recorded ({@link IncidentResponse#leak},
 * in a worker), with the command line's defaults ({@link ResponseSettings#DEFAULT}: crews
 * computed from the 4 h shut-off target, relight sized for 24 h, default rates) unless a
 * crew count is set: the main placed on and the distance moved, valves to close in field
 * order (crew 1's route, then crew 2's; doubtful valves first in each) with, under each
 * doubtful valve, the whole instruction if it will not close; stations to stop; services
 * and meters off, critical customers; the sizing and one shut-off work package per
 * crew ({@link WorkPackages}, by 1 km US National Grid square when the CRS has a
 * transform). Every answer is re-traced ({@code InstructionCheck}) before it is shown.
 * The region is highlighted and the valves are numbered on the map with the same numbers.
 */
final class IncidentPanel extends JPanel {
    private final WindowContext window;
    private final JToggleButton pick = new JToggleButton("Pick incident point");
    /** 0 = crews computed from the target (the command line's default). */
    private final JSpinner crews = new JSpinner(new SpinnerNumberModel(0, 0, 200, 1));
    private final JSpinner maxDistance = new JSpinner(new SpinnerNumberModel(Placement.DEFAULT_MAX_DISTANCE_M, 1.0, 100_000.0, 10.0));
    private Placement placement;
    private Workspace placementFor;
    private final JTextArea text = new JTextArea();

    IncidentPanel(WindowContext window) {
        super(new BorderLayout());
        this.window = window;
        text.setEditable(false);
        text.setLineWrap(true);
        text.setWrapStyleWord(true);
        text.setName("incidentText");
        JPanel top = new JPanel(new FlowLayout(FlowLayout.LEFT));
        top.add(pick);
        top.add(new JLabel("crews (0 = from the 4 h target):"));
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

    /** The settings used: the command line's defaults, with the crew count when one is set. */
    ResponseSettings settings() {
        int n = (Integer) crews.getValue();
        return n <= 0 ? ResponseSettings.DEFAULT : ResponseSettings.DEFAULT.withCrews(n);
    }

    /** Places (x, y) and isolates the segment placed on in a worker, and shows the result or the refusal. */
    void at(double x, double y) {
        Workspace ws = window.workspace();
        if (ws == null) return;
        ResponseSettings settings = settings();
        double maxM = ((Number) maxDistance.getValue()).doubleValue();
        text.setText(String.format(Locale.ROOT, "Isolating at %.1f, %.1f ...", x, y));
        ValveDoubt.Settings opt = ValveDoubt.Settings.defaults(LocalDate.now());
        window.run(new Task<>("isolate", p -> {
            p.begin("isolate", 0);
            return locate(ws, x, y, maxM, opt, settings);
        }, o -> {
            if (o.placement() instanceof Placement.Refused f) {
                text.setText("Refused: " + f.reason() + ".\nClick on or near a main, or raise \"refuse beyond\".");
                window.status("Incident point refused: " + f.reason());
            } else {
                show(ws, o, settings);
            }
        }, t -> text.setText("Isolation failed: " + t.getMessage())));
    }

    /**
     * The engine work behind a click: placement, then the response for the segment placed
     * on, re-traced before it is returned (none when refused).
     */
    Outcome locate(Workspace ws, double x, double y, double maxM) {
        return locate(ws, x, y, maxM, ValveDoubt.Settings.defaults(LocalDate.now()), ResponseSettings.DEFAULT);
    }

    /** As {@link #locate(Workspace, double, double, double)} with the given options and settings. */
    Outcome locate(Workspace ws, double x, double y, double maxM, ValveDoubt.Settings opt, ResponseSettings settings) {
        Placement.Result pr = placementFor(ws).point(x, y, null, maxM);
        if (!(pr instanceof Placement.Placed pl)) return new Outcome(pr, null, null);
        IncidentResponse.Result r = IncidentResponse.leak(ws.segments(), opt, pl.zone(), settings);
        // never shown unless its re-trace confirms it (a mismatch fails the task with the query named)
        org.shutline.analysis.InstructionCheck.verify(ws.segments(), r.isolation(), String.format(Locale.ROOT, "incident at %.1f, %.1f", x, y));
        WorkPackages.Result wp = WorkPackages.build(ws.network(), r.restoration().shutOff(), sheetKey(ws),
                r.restoration().sizing().crews(), r.restoration().sizing().crewsComputed(), settings);
        return new Outcome(pl, r, wp);
    }

    private synchronized Placement placementFor(Workspace ws) {
        if (placementFor != ws) {
            placement = new Placement(ws.segments());
            placementFor = ws;
        }
        return placement;
    }

    /** A click placed and answered, or refused ({@code response} and {@code packages} null). */
    record Outcome(Placement.Result placement, IncidentResponse.Result response, WorkPackages.Result packages) {
        /** The isolation answered; null when refused. */
        Isolation.Result isolation() {
            return response == null ? null : response.isolation();
        }
    }

    private static WorkPackages.SheetKey sheetKey(Workspace ws) {
        return org.shutline.render.GridSheetKey.of(ws.geo().orElse(null));
    }

    /** The text shown for an incident (also read by the tests). */
    static String describe(IncidentResponse.Result resp, WorkPackages.Result wp, Placement.Placed placed, ResponseSettings s) {
        Isolation.Result r = resp.isolation();
        double x = placed.x(), y = placed.y();
        StringBuilder sb = new StringBuilder();
        sb.append(String.format(Locale.ROOT, "Incident at %.1f, %.1f%n", x, y));
        sb.append("Placed ").append(placed.describe())
                .append(String.format(Locale.ROOT, " to %.1f, %.1f%n", placed.snappedX(), placed.snappedY()));
        if (!r.isolable()) sb.append("Valves alone cannot isolate it: ").append(r.reason()).append('\n');
        sb.append("Valves to close, in field order (crew 1's route, then crew 2's; doubtful valves first):\n");
        for (ValveOrder.Step v : resp.order().steps()) {
            sb.append(String.format(Locale.ROOT, "  %d. %s  crew %d  (operable: %s%s)%s%n", v.order(), v.valveId(), v.crew(),
                    org.shutline.model.Words.word(v.operable()), v.overdue() ? ", inspection overdue" : "",
                    v.stationInlet() ? "  " + v.stopLabel() : ""));
            if (v.fallback() != null) {
                sb.append("      if it will not close (").append(v.fallback().why()).append("): ").append(v.fallback().text()).append('\n');
            }
        }
        if (!r.stationsToStop().isEmpty()) {
            sb.append("Stations to stop: ").append(String.join(", ", r.stationsToStop()))
                    .append("; their inlet valves: ").append(String.join(", ", r.stationInletValves())).append('\n');
        }
        if (!resp.stationsCutOff().isEmpty()) {
            sb.append("Stations left with no gas at the inlet: ").append(String.join("; ", resp.stationsCutOff())).append('\n');
        }
        sb.append(String.format(Locale.ROOT, "Services off: %d, meters off: %d%n", r.serviceIdsOff().size(), r.metersOff()));
        sb.append("Critical customers off: ").append(r.criticalOff().isEmpty() ? "none" : String.join(", ", r.criticalOff())).append('\n');
        ResponseSizing.Result z = resp.restoration().sizing();
        int n = wp.packages().isEmpty() ? z.crews() : wp.packages().size();
        double techs = n * (double) s.rates().techsPerCrew();
        sb.append(String.format(Locale.ROOT,
                "Shut-off: %.1f technician-hours, %s needed for %.0f h; crews: %d (%s); %.1f h with them.%n"
                        + "Relight: %.1f technician-hours, %d relight %s for %.0f h; %.1f h with %s.%n",
                z.shutoffTechHours(), Plural.of(z.shutoffCrews(), "crew"), s.targetHours(), n, z.crewsComputed() ? "computed from the target" : "as set",
                z.shutoffTechHours() / techs, z.relightTechHours(), z.relightCrews(), Plural.noun(z.relightCrews(), "crew"), s.relightTargetHours(), z.relightTechHours() / techs, Plural.of(n, "crew")));
        if (!wp.packages().isEmpty()) {
            sb.append(String.format(Locale.ROOT, "Work packages (one per crew, longest %.1f h):%n", wp.maxHours()));
            for (WorkPackages.Package p : wp.packages()) {
                sb.append(String.format(Locale.ROOT, "  crew %d: %s, %s, %.1f h; %s%s%n", p.crew(), Plural.of(p.visits().size(), "service"),
                        Plural.of(p.meters(), "meter"), p.hours(), String.join(", ", p.streets()),
                        p.criticalCount() > 0 ? " (" + p.criticalCount() + " critical first)" : ""));
            }
        }
        return sb.toString();
    }

    private void show(Workspace ws, Outcome o, ResponseSettings s) {
        IncidentResponse.Result resp = o.response();
        Isolation.Result r = resp.isolation();
        Placement.Placed placed = (Placement.Placed) o.placement();
        double x = placed.x(), y = placed.y();
        text.setText(describe(resp, o.packages(), placed, s));
        text.setCaretPosition(0);
        List<ValveToOperate> marks = new ArrayList<>();
        for (ValveOrder.Step v : resp.order().steps()) {
            int vi = ws.valveIndex(v.valveId());
            Valve valve = vi < 0 ? null : ws.network().valves().get(vi);
            if (valve != null && valve.geometry() != null) {
                marks.add(ValveToOperate.of(v.order(), v.valveId(), valve.geometry().getX(), valve.geometry().getY(), true));
            }
        }
        List<Geometry> region = new ArrayList<>();
        ValveSegments segs = ws.segments();
        var reg = r.region();
        reg.or(r.unintended());
        for (int sg = reg.nextSetBit(0); sg >= 0; sg = reg.nextSetBit(sg + 1)) {
            for (int m : segs.mains(sg)) if (m < ws.network().mains().size()) region.add(ws.network().mains().get(m).geometry());
        }
        MapOverlays ov = MapOverlays.NONE.withValvesToOperate(marks)
                .withHazards(List.of(HazardMark.of(x, y, Severity.CRITICAL, "incident")));
        window.showPanelMarks(ov, region);
        window.status("Incident: " + Plural.of(resp.order().steps().size(), "valve") + " to close, " + Plural.of(r.serviceIdsOff().size(), "service") + " off");
    }
}
