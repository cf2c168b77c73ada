package org.shutline.ui;

import java.awt.event.MouseEvent;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;
import javax.swing.JTable;
import javax.swing.ListSelectionModel;
import javax.swing.table.AbstractTableModel;
import org.shutline.model.Finding;
import org.shutline.report.FindingSection;

/**
 * The one list of findings in the window (data findings, hazards of plan steps): the
 * columns and cell text of {@link FindingSection}, the same as every report; sortable;
 * a cell's tooltip gives its whole text; selecting a row hands its finding to
 * {@code onSelect}. Continuing findings (raised at an earlier step and still there) may
 * be added with a mark.
 */
final class FindingTable extends JTable {
    private static final int[] WIDTHS = {60, 130, 40, 120, 420, 260, 160};
    private final List<Finding> findings = new ArrayList<>();
    private final List<Boolean> continuing = new ArrayList<>();
    private final Model model = new Model();

    FindingTable(Consumer<Finding> onSelect) {
        setModel(model);
        setSelectionMode(ListSelectionModel.SINGLE_SELECTION);
        setAutoCreateRowSorter(true);
        setAutoResizeMode(JTable.AUTO_RESIZE_LAST_COLUMN);
        for (int c = 0; c < WIDTHS.length; c++) getColumnModel().getColumn(c).setPreferredWidth(WIDTHS[c]);
        getSelectionModel().addListSelectionListener(e -> {
            if (e.getValueIsAdjusting()) return;
            Finding f = selected();
            if (f != null) onSelect.accept(f);
        });
    }

    /** Shows {@code now}, then {@code still} marked "(continuing)". */
    void show(List<Finding> now, List<Finding> still) {
        findings.clear();
        continuing.clear();
        for (Finding f : now) {
            findings.add(f);
            continuing.add(false);
        }
        for (Finding f : still) {
            findings.add(f);
            continuing.add(true);
        }
        model.fireTableDataChanged();
    }

    void show(List<Finding> now) {
        show(now, List.of());
    }

    /** The selected finding, or null. */
    Finding selected() {
        int r = getSelectedRow();
        return r < 0 ? null : findings.get(convertRowIndexToModel(r));
    }

    /** The rows as shown, cells joined by " | " (for tests and the clipboard). */
    List<String> rowTexts() {
        List<String> out = new ArrayList<>();
        for (int r = 0; r < getRowCount(); r++) {
            StringBuilder b = new StringBuilder();
            for (int c = 0; c < getColumnCount(); c++) {
                if (c > 0) b.append(" | ");
                b.append(getValueAt(r, c));
            }
            out.add(b.toString());
        }
        return out;
    }

    @Override
    public String getToolTipText(MouseEvent e) {
        int r = rowAtPoint(e.getPoint()), c = columnAtPoint(e.getPoint());
        if (r < 0 || c < 0) return null;
        Object v = getValueAt(r, c);
        return v == null || v.toString().isEmpty() ? null : v.toString();
    }

    private final class Model extends AbstractTableModel {
        @Override public int getRowCount() { return findings.size(); }
        @Override public int getColumnCount() { return FindingSection.HEADER.size(); }
        @Override public String getColumnName(int c) { return FindingSection.HEADER.get(c); }

        @Override public Object getValueAt(int r, int c) {
            String v = FindingSection.row(findings.get(r)).get(c);
            return c == 0 && continuing.get(r) ? v + " (continuing)" : v;
        }
    }
}
