package org.shutline.ui;

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
import org.shutline.analysis.ResponseSettings;
import org.shutline.analysis.ResponseSizing;
import org.shutline.analysis.ValveOrder;
import org.shutline.analysis.WorkPackages;
import org.shutline.analysis.Zone;
import org.shutline.model.Severity;
import org.shutline.model.Valve;
import org.shutline.render.GridReference;
import org.shutline.render.HazardMark;
import org.shutline.render.MapOverlays;
import org.shutline.render.ValveToOperate;
import org.shutline.trace.ValveSegments;

/**
 * "Incident": with the pick button down, a click on the map isolates the main nearest
 * the point in the network as recorded ({@link IncidentResponse#leak} with
 * {@link Zone.AtPoint}, in a worker), with the command line's defaults
 * ({@link ResponseSettings#DEFAULT}: crews computed from the 4 h shut-off target, relight
 * sized for 24 h, default rates) unless a crew count is set: valves to close in field
 * order (crew 1's route, then crew 2's; doubtful valves first in each) with, under each
 * doubtful valve, the whole instruction if it will not close; stations to stop; services
 * and meters off, critical customers; the sizing and one shut-off work package per
 * crew ({@link WorkPackages}, by 1 km US National Grid square when the CRS has a
 * transform). The region is highlighted and the valves are numbered on the map with the
 * same numbers.
 */
final class IncidentPanel extends JPanel {
    private final MainWindow window;
    private final JToggleButton pick = new JToggleButton("Pick incident point");
    /** 0 = crews computed from the target (the command line's default). */
    private final JSpinner crews = new JSpinner(new SpinnerNumberModel(0, 0, 200, 1));
    private final JTextArea text = new JTextArea();

    IncidentPanel(MainWindow window) {
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

    /** Isolates at (x, y) in a worker and shows the result. */
    void at(double x, double y) {
        Workspace ws = window.workspace();
        if (ws == null) return;
        ResponseSettings settings = settings();
        text.setText(String.format(Locale.ROOT, "Isolating at %.1f, %.1f ...", x, y));
        Isolation.Options opt = Isolation.Options.defaults(LocalDate.now());
        window.run(new Task<>("isolate", p -> {
            p.begin("isolate", 0);
            IncidentResponse.Result r = IncidentResponse.leak(ws.segments(), opt, new Zone.AtPoint(x, y, null), settings);
            // never shown unless its re-trace confirms it (a mismatch fails the task with the query named)
            org.shutline.analysis.InstructionCheck.verify(ws.segments(), r.isolation(), String.format(Locale.ROOT, "incident at %.1f, %.1f", x, y));
            WorkPackages.Result wp = WorkPackages.build(ws.network(), r.restoration().shutOff(), sheetKey(ws),
                    r.restoration().sizing().crews(), r.restoration().sizing().crewsComputed(), settings);
            return new Outcome(r, wp);
        }, o -> show(ws, o, x, y, settings), t -> text.setText("Isolation failed: " + t.getMessage())));
    }

    private record Outcome(IncidentResponse.Result response, WorkPackages.Result packages) {}

    private static WorkPackages.SheetKey sheetKey(Workspace ws) {
        var geo = ws.geo().orElse(null);
        if (geo == null) return WorkPackages.SheetKey.NONE;
        return (x, y) -> {
            try {
                return geo.gridReference(x, y).format(GridReference.Precision.KM1);
            } catch (IllegalArgumentException e) {
                return "(outside the grid)";
            }
        };
    }

    /** The text shown for an incident (also read by the tests). */
    static String describe(IncidentResponse.Result resp, WorkPackages.Result wp, double x, double y, ResponseSettings s) {
        Isolation.Result r = resp.isolation();
        StringBuilder sb = new StringBuilder();
        sb.append(String.format(Locale.ROOT, "Incident at %.1f, %.1f%n", x, y));
        if (!r.isolable()) sb.append("Valves alone cannot isolate it: ").append(r.reason()).append('\n');
        sb.append("Valves to close, in field order (crew 1's route, then crew 2's; doubtful valves first):\n");
        for (ValveOrder.Step v : resp.order().steps()) {
            sb.append(String.format(Locale.ROOT, "  %d. %s  crew %d  (operable: %s%s)%s%n", v.order(), v.valveId(), v.crew(),
                    org.shutline.model.Words.word(v.operable()), v.overdue() ? ", inspection overdue" : "",
                    v.stationInlet() ? "  station inlet" : ""));
            if (v.fallback() != null) {
                sb.append("      if it will not close (").append(v.fallback().why()).append("): ").append(v.fallback().text()).append('\n');
            }
        }
        if (!r.stationsToStop().isEmpty()) {
            sb.append("Stations to stop: ").append(String.join(", ", r.stationsToStop()))
                    .append("; their inlet valves: ").append(String.join(", ", r.stationInletValves())).append('\n');
        }
        sb.append(String.format(Locale.ROOT, "Services off: %d, meters off: %d%n", r.serviceIdsOff().size(), r.metersOff()));
        sb.append("Critical customers off: ").append(r.criticalOff().isEmpty() ? "none" : String.join(", ", r.criticalOff())).append('\n');
        ResponseSizing.Result z = resp.restoration().sizing();
        int n = wp.packages().isEmpty() ? z.crews() : wp.packages().size();
        double techs = n * (double) s.rates().techsPerCrew();
        sb.append(String.format(Locale.ROOT,
                "Shut-off: %.1f technician-hours, %d crews needed for %.0f h; crews: %d (%s); %.1f h with them.%n"
                        + "Relight: %.1f technician-hours, %d relight crews for %.0f h; %.1f h with %d crews.%n",
                z.shutoffTechHours(), z.shutoffCrews(), s.targetHours(), n, z.crewsComputed() ? "computed from the target" : "as set",
                z.shutoffTechHours() / techs, z.relightTechHours(), z.relightCrews(), s.relightTargetHours(), z.relightTechHours() / techs, n));
        if (!wp.packages().isEmpty()) {
            sb.append(String.format(Locale.ROOT, "Work packages (one per crew, longest %.1f h):%n", wp.maxHours()));
            for (WorkPackages.Package p : wp.packages()) {
                sb.append(String.format(Locale.ROOT, "  crew %d: %d services, %d meters, %.1f h; %s%s%n", p.crew(), p.visits().size(),
                        p.meters(), p.hours(), String.join(", ", p.streets()),
                        p.criticalCount() > 0 ? " (" + p.criticalCount() + " critical first)" : ""));
            }
        }
        return sb.toString();
    }

    private void show(Workspace ws, Outcome o, double x, double y, ResponseSettings s) {
        IncidentResponse.Result resp = o.response();
        Isolation.Result r = resp.isolation();
        text.setText(describe(resp, o.packages(), x, y, s));
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
        window.status(String.format(Locale.ROOT, "Incident: %d valves to close, %d services off", resp.order().steps().size(), r.serviceIdsOff().size()));
    }
}
