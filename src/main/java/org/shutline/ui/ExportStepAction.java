package org.shutline.ui;

import org.shutline.analysis.ValveDoubt;
import org.shutline.app.Workspace;
import java.awt.event.ActionEvent;
import java.nio.file.Path;
import java.time.LocalDate;
import org.shutline.analysis.PlanEvaluation;
import org.shutline.report.ReportBuilder;
import org.shutline.report.ReportView;

/**
 * File &gt; Export selected step...: writes the selected plan step (PDF report with map,
 * map book, lists and charts; PNG, SVG, GeoPackage and GeoJSON result layers, CSV lists)
 * into a chosen folder in a background task: the same code as {@code shutline export}.
 */
final class ExportStepAction extends WindowAction {
    private final WindowContext ctx;
    private final FileAsk ask;
    private final PlanPanel plan;

    ExportStepAction(WindowContext ctx, FileAsk ask, PlanPanel plan) {
        super("Export selected step...", null);
        this.ctx = ctx;
        this.ask = ask;
        this.plan = plan;
    }

    @Override public void actionPerformed(ActionEvent e) {
        int index = plan.selectedStep();
        if (ctx.workspace() == null || plan.result() == null || index < 0) {
            ctx.status("Export: open a work plan and select a step first");
            return;
        }
        Path dir = ask.ask("lastExportDir", "Export step " + (index + 1) + " into folder", FileAsk.Mode.SAVE_FOLDER, null);
        if (dir != null) exportTo(dir);
    }

    /** Exports the selected step into {@code dir} in a background task (nothing when no step is selected). */
    void exportTo(Path dir) {
        PlanEvaluation.Result r = plan.result();
        int index = plan.selectedStep();
        Workspace ws = ctx.workspace();
        if (ws == null || r == null || index < 0) return;
        Path netFile = ws.file();
        Path planFile = plan.file();
        int step = r.steps().get(index).step().number();
        ctx.run(new Task<>("export step " + step, p -> {
            ReportView view = ReportView.ofStep(r, step, ValveDoubt.Settings.defaults(LocalDate.now()));
            ReportBuilder b = ReportBuilder.of(view, netFile, ReportBuilder.Options.defaults());
            if (planFile != null) b = b.withPlan(r, planFile);
            return b.write(dir, p);
        }, files -> ctx.status("Exported step " + step + ": " + files.size() + " files in " + dir),
                t -> ctx.failed("Export of step " + step, t)));
    }
}
