package org.shutline.ui;

import org.shutline.app.Workspace;
import java.awt.BorderLayout;
import java.awt.Color;
import java.awt.Dimension;
import java.awt.FlowLayout;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import javax.swing.BorderFactory;
import javax.swing.JButton;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JProgressBar;
import javax.swing.Timer;
import org.shutline.analysis.PlanEvaluation;
import org.shutline.model.Caution;
import org.shutline.render.GridReference;

/**
 * The status line: a message; the cursor position in the network CRS (E, N) and as a
 * US National Grid reference (1 m); a progress bar and Cancel while background tasks
 * run (the newest task's progress, polled every 120 ms; Cancel asks every running task
 * to stop); and, in red, the caution when the open plan raises a critical hazard.
 */
final class StatusBar extends JPanel {
    private final JLabel message = new JLabel("Ready");
    private final JLabel coords = new JLabel(" ");
    private final JLabel grid = new JLabel(" ");
    private final JLabel caution = new JLabel(" ");
    private final JProgressBar bar = new JProgressBar();
    private final JButton cancel = new JButton("Cancel");
    private final List<Task<?>> tasks = new ArrayList<>();
    private boolean critical;

    StatusBar() {
        super(new BorderLayout(8, 0));
        JPanel east = new JPanel(new FlowLayout(FlowLayout.RIGHT, 8, 0));
        coords.setName("coords");
        grid.setName("gridRef");
        caution.setName("caution");
        east.add(coords);
        east.add(grid);
        bar.setPreferredSize(new Dimension(180, 16));
        bar.setVisible(false);
        cancel.setVisible(false);
        cancel.addActionListener(e -> cancelAll());
        east.add(bar);
        east.add(cancel);
        message.setName("message");
        add(message, BorderLayout.CENTER);
        add(east, BorderLayout.EAST);
        add(caution, BorderLayout.SOUTH);
        setBorder(BorderFactory.createEmptyBorder(2, 6, 2, 6));
        new Timer(120, e -> updateProgress()).start();
    }

    void message(String text) {
        message.setText(text);
    }

    /** Starts a task; its progress shows here until it is done. */
    void run(Task<?> t) {
        tasks.add(t);
        t.execute();
        updateProgress();
    }

    /** Asks every running task to stop. */
    void cancelAll() {
        for (Task<?> t : tasks) t.cancel();
    }

    private void updateProgress() {
        tasks.removeIf(Task::isDone);
        if (tasks.isEmpty()) {
            bar.setVisible(false);
            cancel.setVisible(false);
            return;
        }
        Task<?> t = tasks.get(tasks.size() - 1);
        bar.setVisible(true);
        cancel.setVisible(true);
        double f = t.fraction();
        bar.setIndeterminate(f < 0);
        if (f >= 0) bar.setValue((int) Math.round(f * 100));
        bar.setStringPainted(true);
        bar.setString(t.task());
    }

    /** Shows the cursor position (x, y in the network CRS) and its grid reference when the CRS has a transform. */
    void cursor(Workspace ws, double x, double y) {
        coords.setText(String.format(Locale.ROOT, "E %.1f  N %.1f", x, y));
        ws.geo().ifPresent(g -> {
            try {
                GridReference r = g.gridReference(x, y);
                grid.setText(r == null ? " " : r.format(GridReference.Precision.M1));
            } catch (IllegalArgumentException ex) {
                grid.setText("outside the grid");
            }
        });
    }

    /** The caution line for an evaluated plan (null: none or not evaluated). */
    void planEvaluated(PlanEvaluation.Result r) {
        critical = r != null && r.hasCritical();
        caution.setText(critical ? "CRITICAL hazards in this plan. " + Caution.SHORT : " ");
        caution.setForeground(new Color(0xB0, 0x30, 0x00));
    }

    /** Whether the open plan raises a critical hazard. */
    boolean critical() {
        return critical;
    }

    String cautionText() {
        return caution.getText();
    }
}
