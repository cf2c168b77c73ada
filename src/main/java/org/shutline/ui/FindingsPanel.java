package org.shutline.ui;

import java.awt.BorderLayout;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import org.shutline.analysis.PlanEvaluation;
import org.shutline.model.Finding;
import org.shutline.model.Severity;

/**
 * "Findings": the read and connectivity findings of the network and, once a work plan
 * has been evaluated, the hazards it raises at every step, in one {@link FindingTable};
 * selecting one zooms the map to it.
 */
final class FindingsPanel extends JPanel {
    private final JLabel summary = new JLabel(" ");
    private final FindingTable table;
    private List<Finding> data = List.of();
    private List<Finding> plan = List.of();

    FindingsPanel(WindowContext window) {
        super(new BorderLayout());
        table = new FindingTable(f -> {
            if (f.hasLocation()) window.zoomToPoint(f.x(), f.y(), f.code() + ": " + f.message());
            else window.status(f.code() + ": " + f.message());
        });
        table.setName("findingsTable");
        add(summary, BorderLayout.NORTH);
        add(new JScrollPane(table), BorderLayout.CENTER);
    }

    /** The findings of a newly opened network (the plan's hazards are cleared). */
    void show(List<Finding> all) {
        data = List.copyOf(all);
        plan = List.of();
        refresh();
    }

    /** Adds the hazards of an evaluated plan (as recorded, then every step's new ones); null clears them. */
    void showPlan(PlanEvaluation.Result r) {
        List<Finding> hz = new ArrayList<>();
        if (r != null) {
            hz.addAll(r.recordedHazards());
            for (PlanEvaluation.StepResult s : r.steps()) hz.addAll(s.hazards());
        }
        plan = hz;
        refresh();
    }

    private void refresh() {
        List<Finding> all = new ArrayList<>(data);
        all.addAll(plan);
        table.show(all);
        long crit = all.stream().filter(f -> f.severity() == Severity.CRITICAL).count();
        long err = all.stream().filter(f -> f.severity() == Severity.ERROR).count();
        long warn = all.stream().filter(f -> f.severity() == Severity.WARNING).count();
        summary.setText(String.format(Locale.ROOT, " %d findings (%d of the network, %d of the plan): %d critical, %d errors, %d warnings,"
                + " %d notes. Select one to zoom to it.", all.size(), data.size(), plan.size(), crit, err, warn,
                all.size() - crit - err - warn));
    }

    List<String> rowTexts() {
        return table.rowTexts();
    }
}
