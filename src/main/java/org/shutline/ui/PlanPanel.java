package org.shutline.ui;

import org.shutline.app.Workspace;
import org.shutline.model.Plural;
import java.awt.BorderLayout;
import java.awt.Color;
import java.awt.Dimension;
import java.awt.FlowLayout;
import java.awt.GridLayout;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import javax.swing.BorderFactory;
import javax.swing.DefaultListModel;
import javax.swing.JButton;
import javax.swing.JLabel;
import javax.swing.JList;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JSplitPane;
import javax.swing.JTextArea;
import javax.swing.ListSelectionModel;
import org.jfree.chart.ChartPanel;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.CategoryMarker;
import org.jfree.chart.plot.CategoryPlot;
import org.shutline.analysis.Isolation;
import org.shutline.analysis.PlanEvaluation;
import org.shutline.plan.Plan;
import org.shutline.plan.PlanException;
import org.shutline.plan.StepAction;
import org.shutline.render.MapOverlays;
import org.shutline.report.Charts;
import org.locationtech.jts.geom.Envelope;

/**
 * "Work plan": the steps of the open plan as a list (phase and step number, action,
 * services off, hazards); selecting a step shows that state on the map (gas-off
 * extent, valves numbered in order, hazards) and its figures and hazards here, with a
 * chart of services and meters off per step (the selected step marked).
 *
 * <p>Editing: the buttons add a step for the feature selected on the map (close or
 * open a valve, abandon or activate a main, take a station out or return it), remove
 * the selected step or move it. After every edit the plan is validated, applied and
 * evaluated again in a worker; a problem shows on the error line in red. Save writes the
 * YAML file atomically ({@link org.shutline.plan.PlanWriter}).
 */
final class PlanPanel extends JPanel {
    private final WindowContext window;
    private final JLabel title = new JLabel("No work plan open");
    private final JLabel error = new JLabel(" ");
    private final DefaultListModel<String> stepRows = new DefaultListModel<>();
    private final JList<String> steps = new JList<>(stepRows);
    private final JLabel summary = new JLabel(" ");
    private final FindingTable hazards;
    private final JTextArea details = new JTextArea(6, 40);
    private final ChartPanel chart = new ChartPanel(null);
    private PlanDraft draft;
    private Path file;
    private boolean dirty;
    private PlanEvaluation.Result result;
    private long edits;
    private long evaluatedEdit = -1;
    private Task<PlanEvaluation.Result> running;

    /** @param save what the Save button does (the window's {@link SavePlanAction}) */
    PlanPanel(WindowContext window, Runnable save) {
        super(new BorderLayout());
        this.window = window;
        hazards = new FindingTable(h -> {
            if (h.hasLocation()) window.zoomToPoint(h.x(), h.y(), h.code() + ": " + h.message());
        });
        steps.setName("planSteps");
        summary.setName("planSummary");
        hazards.setName("planHazards");
        error.setName("planError");
        error.setForeground(new Color(0xB0, 0x30, 0x00));
        steps.setSelectionMode(ListSelectionModel.SINGLE_SELECTION);
        steps.addListSelectionListener(e -> {
            if (!e.getValueIsAdjusting()) showStep(steps.getSelectedIndex());
        });
        details.setEditable(false);
        details.setLineWrap(true);
        details.setWrapStyleWord(true);
        JPanel head = new JPanel(new GridLayout(2, 1));
        head.add(title);
        head.add(error);
        add(head, BorderLayout.NORTH);
        JPanel edit = new JPanel(new GridLayout(2, 5, 3, 2));
        button(edit, "Close valve", () -> addForSelection("close"));
        button(edit, "Open valve", () -> addForSelection("open"));
        button(edit, "Abandon main", () -> addForSelection("abandon"));
        button(edit, "Activate main", () -> addForSelection("activate"));
        button(edit, "Station out", () -> addForSelection("station_out"));
        button(edit, "Station in", () -> addForSelection("station_in"));
        button(edit, "Remove", this::removeStep);
        button(edit, "Up", () -> move(true));
        button(edit, "Down", () -> move(false));
        button(edit, "Save", save);
        JPanel listSide = new JPanel(new BorderLayout());
        listSide.add(new JScrollPane(steps), BorderLayout.CENTER);
        listSide.add(edit, BorderLayout.SOUTH);
        JPanel info = new JPanel(new BorderLayout());
        info.add(summary, BorderLayout.NORTH);
        JScrollPane hz = new JScrollPane(hazards);
        hz.setBorder(BorderFactory.createTitledBorder("Hazards at this step"));
        JSplitPane hd = new JSplitPane(JSplitPane.VERTICAL_SPLIT, hz, new JScrollPane(details));
        hd.setResizeWeight(0.5);
        info.add(hd, BorderLayout.CENTER);
        chart.setPreferredSize(new Dimension(300, 180));
        chart.setMinimumSize(new Dimension(100, 120));
        JSplitPane lower = new JSplitPane(JSplitPane.VERTICAL_SPLIT, info, chart);
        lower.setResizeWeight(0.6);
        JSplitPane all = new JSplitPane(JSplitPane.VERTICAL_SPLIT, listSide, lower);
        all.setResizeWeight(0.35);
        add(all, BorderLayout.CENTER);
    }

    private static void button(JPanel p, String text, Runnable r) {
        JButton b = new JButton(text);
        b.setMargin(new java.awt.Insets(1, 4, 1, 4));
        b.addActionListener(e -> r.run());
        p.add(b);
    }

    /** Opens a plan (null file for a new one) and evaluates it. */
    void open(Plan plan, Path planFile) {
        draft = new PlanDraft(plan);
        file = planFile;
        dirty = false;
        result = null;
        edits++;
        refreshList(0);
        evaluate();
    }

    /** Starts a new empty plan for the open network. */
    void newPlan() {
        Workspace ws = window.workspace();
        if (ws == null) return;
        draft = PlanDraft.empty("New work plan", ws.network().sourceName());
        file = null;
        dirty = true;
        result = null;
        edits++;
        refreshList(-1);
        evaluate();
    }

    boolean hasPlan() { return draft != null; }
    boolean isDirty() { return dirty; }
    Path file() { return file; }
    Plan plan() { return draft == null ? null : draft.plan(); }
    PlanEvaluation.Result result() { return evaluatedEdit == edits ? result : null; }

    void saved(Path f) {
        file = f;
        dirty = false;
        updateTitle();
    }

    int stepCount() { return draft == null ? 0 : draft.size(); }

    void selectStep(int i) {
        if (i >= 0 && i < stepRows.size()) {
            steps.setSelectedIndex(i);
            steps.ensureIndexIsVisible(i);
        }
    }

    int selectedStep() { return steps.getSelectedIndex(); }

    private void updateTitle() {
        if (draft == null) {
            title.setText("No work plan open");
            return;
        }
        Plan p = draft.plan();
        title.setText(" " + p.project() + " - " + (file == null ? "not saved yet" : file.getFileName()) + (dirty ? " (changed)" : ""));
    }

    private void refreshList(int select) {
        updateTitle();
        stepRows.clear();
        if (draft == null) return;
        Plan p = draft.plan();
        PlanEvaluation.Result r = result();
        for (var s : p.steps()) {
            StringBuilder row = new StringBuilder(String.format(Locale.ROOT, "%d.%d  %s", s.phase() + 1, s.number(), s.describe()));
            if (r != null && s.number() - 1 < r.steps().size()) {
                PlanEvaluation.StepResult sr = r.steps().get(s.number() - 1);
                row.append(String.format(Locale.ROOT, "   [%d off", sr.servicesOff()));
                if (!sr.hazards().isEmpty()) row.append(", ").append(sr.hasCritical() ? "CRITICAL hazard" : sr.hazards().size() + " hazard(s)");
                row.append(']');
            }
            stepRows.addElement(row.toString());
        }
        if (select >= 0 && select < stepRows.size()) steps.setSelectedIndex(select);
    }

    private void edited(int select) {
        dirty = true;
        edits++;
        refreshList(select);
        evaluate();
    }

    /** Validates and evaluates the draft in a worker; a newer edit cancels an older run. */
    private void evaluate() {
        Workspace ws = window.workspace();
        if (ws == null || draft == null) return;
        if (running != null) running.cancel();
        Plan plan = draft.plan();
        long edit = edits;
        String name = file == null ? "new plan" : file.getFileName().toString();
        error.setText("evaluating...");
        running = new Task<>("evaluate plan", p -> PlanRun.evaluate(ws, plan, name, LocalDate.now(), p), r -> {
            if (edit != edits) return;
            result = r;
            evaluatedEdit = edit;
            error.setText(" ");
            int sel = Math.max(0, steps.getSelectedIndex());
            refreshList(Math.min(sel, stepRows.size() - 1));
            showChart(r, steps.getSelectedIndex());
            showStep(steps.getSelectedIndex());
            window.planEvaluated(r);
        }, t -> {
            if (edit != edits) return;
            if (t instanceof java.util.concurrent.CancellationException) {
                error.setText("evaluation cancelled");
            } else {
                error.setText(t instanceof PlanException ? t.getMessage() : "cannot evaluate: " + t);
                window.planEvaluated(null);
            }
        });
        window.run(running);
    }

    /** Builds the chart for a new evaluation (report's chart of services and meters off per step). */
    private void showChart(PlanEvaluation.Result r, int selected) {
        List<Charts.StepFigure> figs = new ArrayList<>();
        for (PlanEvaluation.StepResult s : r.steps()) figs.add(new Charts.StepFigure(s.step().number(), s.servicesOff(), (int) s.metersOff()));
        chart.setChart(Charts.offPerStep("Off gas per step", figs));
        markChart(selected);
    }

    /** Marks the selected step's bars. */
    private void markChart(int selected) {
        JFreeChart c = chart.getChart();
        if (c == null || !(c.getPlot() instanceof CategoryPlot cp)) return;
        cp.clearDomainMarkers();
        if (selected >= 0) {
            CategoryMarker m = new CategoryMarker(Integer.toString(selected + 1));
            m.setPaint(new Color(0x56, 0xB4, 0xE9, 90));
            m.setDrawAsLine(false);
            cp.addDomainMarker(m, org.jfree.chart.ui.Layer.BACKGROUND);
        }
    }

    private void showStep(int i) {
        PlanEvaluation.Result r = result();
        hazards.show(List.of());
        if (r == null || i < 0 || i >= r.steps().size()) {
            summary.setText(" ");
            details.setText("");
            window.showPanelMarks(org.shutline.render.MapOverlays.NONE, List.of());
            return;
        }
        PlanEvaluation.StepResult s = r.steps().get(i);
        summary.setText(" Step " + s.step().number() + ": " + Plural.of(s.servicesOff(), "service") + " off, " + Plural.of(s.metersOff(), "meter")
                + " off, " + Plural.of(s.criticalOff().size(), "critical customer") + " off");
        hazards.show(s.hazards(), s.continuing());
        StringBuilder d = new StringBuilder(s.step().describe()).append('\n');
        if (s.step().note() != null) d.append("note: ").append(s.step().note()).append('\n');
        for (PlanEvaluation.CriticalOff c : s.criticalOff()) {
            d.append("critical customer off: ").append(c.serviceId()).append(' ').append(c.kind())
                    .append(c.address() == null ? "" : ", " + c.address()).append('\n');
        }
        if (s.suggestion() != null) {
            d.append("suggested order: ").append(String.join(", ", s.suggestion().order())).append('\n');
            for (Isolation.Fallback f : s.suggestion().fallbacks()) {
                d.append("if ").append(f.valveId()).append(" will not close (").append(f.why()).append("): close ")
                        .append(f.thenClose().isEmpty() ? "(nothing more)" : String.join(", ", f.thenClose())).append('\n');
            }
        }
        for (String n : s.notices()) d.append("note: ").append(n).append('\n');
        details.setText(d.toString());
        details.setCaretPosition(0);
        markChart(i);
        MapOverlays o = PlanRun.overlays(window.workspace(), s);
        // the map draws the step's state: the bypass laid, the cuts, the valves closed, the mains abandoned
        window.showPanelMarks(o, List.of(), r.states().steps().get(i).after());
        followStep(o);
        window.status("Step " + s.step().number() + ": " + s.step().describe());
    }

    /** Brings the step's marks into view when some lie outside it (keeps the zoom otherwise). */
    private void followStep(MapOverlays o) {
        Envelope env = new Envelope();
        for (var g : o.gasOff()) env.expandToInclude(g.area().getEnvelopeInternal());
        for (var v : o.valvesToOperate()) env.expandToInclude(v.x(), v.y());
        for (var h : o.hazards()) env.expandToInclude(h.x(), h.y());
        if (env.isNull() || window.map().viewport().worldEnvelope().contains(env)) return;
        window.map().zoomTo(env, 300);
    }

    /** Adds a step of this kind ("close", "open", "abandon", "activate", "station_out", "station_in") for the selected feature. */
    void addForSelection(String kind) {
        Workspace ws = window.workspace();
        if (ws == null) return;
        if (draft == null) newPlan();
        Pick p = window.selected();
        Pick.Kind need = switch (kind) {
            case "close", "open" -> Pick.Kind.VALVE;
            case "abandon", "activate" -> Pick.Kind.MAIN;
            default -> Pick.Kind.STATION;
        };
        if (p == null || p.kind() != need) {
            error.setText("Pick a " + need.word() + " on the map first (click it), then press the button again.");
            return;
        }
        StepAction a = switch (kind) {
            case "close" -> new StepAction.CloseValves(List.of(p.id()), true);
            case "open" -> new StepAction.OpenValves(List.of(p.id()));
            case "abandon" -> new StepAction.AbandonMain(p.id());
            case "activate" -> new StepAction.ActivateMain(p.id());
            case "station_out" -> new StepAction.StationOut(p.id());
            default -> new StepAction.StationIn(p.id());
        };
        int at = draft.add(steps.getSelectedIndex() < 0 ? draft.size() - 1 : steps.getSelectedIndex(), a);
        edited(at);
    }

    /** The error line (empty when the plan evaluates). */
    String errorText() {
        return error.getText().trim();
    }

    void removeStep() {
        int i = steps.getSelectedIndex();
        if (draft == null || i < 0) return;
        draft.remove(i);
        edited(Math.min(i, draft.size() - 1));
    }

    private void move(boolean up) {
        int i = steps.getSelectedIndex();
        if (draft == null || i < 0) return;
        int j = up ? draft.moveUp(i) : draft.moveDown(i);
        edited(j);
    }
}
