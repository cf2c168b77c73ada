package org.shutline.ui;

import java.awt.BorderLayout;
import java.util.List;
import java.util.Locale;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JTable;
import javax.swing.ListSelectionModel;
import javax.swing.table.AbstractTableModel;
import org.shutline.model.Finding;
import org.shutline.model.Severity;
import org.shutline.model.Words;

/** "Network check": the read and connectivity findings; selecting one zooms the map to it. */
final class FindingsPanel extends JPanel {
    private final WindowContext window;
    private final JLabel summary = new JLabel(" ");
    private List<Finding> findings = List.of();
    private final Model model = new Model();
    private final JTable table = new JTable(model);

    FindingsPanel(WindowContext window) {
        super(new BorderLayout());
        this.window = window;
        table.setSelectionMode(ListSelectionModel.SINGLE_SELECTION);
        table.setAutoCreateRowSorter(true);
        table.getColumnModel().getColumn(0).setPreferredWidth(70);
        table.getColumnModel().getColumn(1).setPreferredWidth(150);
        table.getColumnModel().getColumn(2).setPreferredWidth(110);
        table.getColumnModel().getColumn(3).setPreferredWidth(420);
        table.getSelectionModel().addListSelectionListener(e -> {
            if (e.getValueIsAdjusting()) return;
            int r = table.getSelectedRow();
            if (r < 0) return;
            Finding f = findings.get(table.convertRowIndexToModel(r));
            if (f.hasLocation()) window.zoomToPoint(f.x(), f.y(), f.code() + ": " + f.message());
            else window.status(f.code() + ": " + f.message());
        });
        add(summary, BorderLayout.NORTH);
        add(new JScrollPane(table), BorderLayout.CENTER);
    }

    void show(List<Finding> all) {
        findings = List.copyOf(all);
        long err = all.stream().filter(f -> f.severity() == Severity.ERROR).count();
        long warn = all.stream().filter(f -> f.severity() == Severity.WARNING).count();
        summary.setText(String.format(Locale.ROOT, " %d findings: %d errors, %d warnings, %d notes. Select one to zoom to it.",
                all.size(), err, warn, all.size() - err - warn));
        model.fireTableDataChanged();
    }

    private final class Model extends AbstractTableModel {
        private final String[] cols = {"severity", "code", "features", "message"};

        @Override public int getRowCount() { return findings.size(); }
        @Override public int getColumnCount() { return cols.length; }
        @Override public String getColumnName(int c) { return cols[c]; }

        @Override public Object getValueAt(int r, int c) {
            Finding f = findings.get(r);
            return switch (c) {
                case 0 -> Words.word(f.severity());
                case 1 -> f.code();
                case 2 -> String.join(" ", f.features());
                default -> f.message();
            };
        }
    }
}
