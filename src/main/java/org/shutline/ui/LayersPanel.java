package org.shutline.ui;

import java.awt.BorderLayout;
import java.awt.Component;
import java.awt.Dimension;
import java.awt.FlowLayout;
import java.awt.Graphics;
import java.awt.Graphics2D;
import java.awt.event.MouseAdapter;
import java.awt.event.MouseEvent;
import java.awt.geom.Rectangle2D;
import javax.swing.BorderFactory;
import javax.swing.DefaultListModel;
import javax.swing.JButton;
import javax.swing.JCheckBox;
import javax.swing.JList;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.ListCellRenderer;
import javax.swing.ListSelectionModel;
import org.shutline.model.MainStatus;
import org.shutline.model.NormalPosition;
import org.shutline.model.Operability;
import org.shutline.render.Legend;
import org.shutline.render.LegendEntry;
import org.shutline.render.LegendKind;
import org.shutline.render.MapStyle;

/**
 * The layers list: top of the list is drawn last (on top). Each row has a visibility
 * box, a legend swatch drawn by render's {@link Legend#sample} and the layer name.
 * Buttons raise or lower the selected layer and add a context layer from a file.
 */
final class LayersPanel extends JPanel {
    private final WindowContext window;
    private final DefaultListModel<Integer> rows = new DefaultListModel<>();
    private final JList<Integer> list = new JList<>(rows);

    /** @param addLayer the action behind the Add... button ({@link AddContextLayerAction}) */
    LayersPanel(WindowContext window, javax.swing.Action addLayer) {
        super(new BorderLayout());
        this.window = window;
        setBorder(BorderFactory.createTitledBorder("Layers"));
        list.setSelectionMode(ListSelectionModel.SINGLE_SELECTION);
        list.setCellRenderer(new Row());
        list.addMouseListener(new MouseAdapter() {
            @Override public void mouseClicked(MouseEvent e) {
                int i = list.locationToIndex(e.getPoint());
                if (i >= 0 && e.getX() < 24) toggle(rows.get(i));
            }
        });
        add(new JScrollPane(list), BorderLayout.CENTER);
        JPanel b = new JPanel(new java.awt.GridLayout(1, 3, 3, 0));
        JButton up = new JButton("Raise");
        up.addActionListener(e -> move(true));
        JButton down = new JButton("Lower");
        down.addActionListener(e -> move(false));
        JButton add = new JButton(addLayer);
        add.setText("Add...");
        add.setToolTipText("Add context layers from a GeoPackage or a shapefile folder");
        b.add(up);
        b.add(down);
        b.add(add);
        add(b, BorderLayout.SOUTH);
        setPreferredSize(new Dimension(260, 300));
    }

    /** Shows the map's layers, top first. */
    void refresh() {
        MapLayers l = window.map().layers();
        Integer sel = list.getSelectedValue();
        rows.clear();
        for (int i = l.entries().size() - 1; i >= 0; i--) rows.addElement(i);
        if (sel != null) list.setSelectedValue(sel, true);
    }

    private void toggle(int index) {
        MapLayers l = window.map().layers();
        window.map().setLayers(l.withVisible(index, !l.entries().get(index).visible()));
        refresh();
    }

    private void move(boolean raise) {
        Integer sel = list.getSelectedValue();
        if (sel == null) return;
        MapLayers l = window.map().layers();
        MapLayers n = raise ? l.raised(sel) : l.lowered(sel);
        window.map().setLayers(n);
        int now = raise ? Math.min(sel + 1, l.entries().size() - 1) : Math.max(sel - 1, 0);
        refresh();
        list.setSelectedValue(now, true);
    }

    static LegendEntry swatch(MapLayers.Entry e) {
        if (e.isContext()) return LegendEntry.simple(LegendKind.STREET, e.name());
        return switch (e.net()) {
            case GRID -> LegendEntry.simple(LegendKind.GRID, e.name());
            case GAS_OFF -> LegendEntry.simple(LegendKind.GAS_OFF, e.name());
            case CONTROL_LINES -> LegendEntry.simple(LegendKind.CONTROL_LINE, e.name());
            case MAINS -> LegendEntry.main(0, "", MainStatus.ACTIVE);
            case SERVICES -> LegendEntry.simple(LegendKind.SERVICE, e.name());
            case TAPS -> LegendEntry.simple(LegendKind.SENSE_TAP, e.name());
            case VALVES -> LegendEntry.valve(NormalPosition.OPEN, Operability.YES);
            case STATIONS -> LegendEntry.simple(LegendKind.STATION, e.name());
            case SOURCES -> LegendEntry.simple(LegendKind.SOURCE, e.name());
            case OVERLAYS -> LegendEntry.simple(LegendKind.VALVE_TO_CLOSE, e.name());
        };
    }

    private final class Row implements ListCellRenderer<Integer> {
        @Override
        public Component getListCellRendererComponent(JList<? extends Integer> l, Integer index, int i, boolean selected, boolean focus) {
            MapLayers.Entry e = window.map().layers().entries().get(index);
            JPanel p = new JPanel(new BorderLayout(4, 0));
            p.setOpaque(true);
            p.setBackground(selected ? l.getSelectionBackground() : l.getBackground());
            JCheckBox mark = new JCheckBox();
            mark.setSelected(e.visible());
            mark.setOpaque(false);
            p.add(mark, BorderLayout.WEST);
            JPanel right = new JPanel(new BorderLayout(6, 0));
            right.setOpaque(false);
            right.add(new SwatchLabel(swatch(e), window.map().style()), BorderLayout.WEST);
            javax.swing.JLabel name = new javax.swing.JLabel(e.name());
            name.setForeground(selected ? l.getSelectionForeground() : l.getForeground());
            right.add(name, BorderLayout.CENTER);
            p.add(right, BorderLayout.CENTER);
            return p;
        }
    }

    /** A 28 x 16 legend swatch. */
    private static final class SwatchLabel extends javax.swing.JComponent {
        private final LegendEntry entry;
        private final MapStyle style;

        SwatchLabel(LegendEntry entry, MapStyle style) {
            this.entry = entry;
            this.style = style;
            setPreferredSize(new Dimension(30, 18));
        }

        @Override protected void paintComponent(Graphics g) {
            Graphics2D g2 = (Graphics2D) g.create();
            g2.setColor(style.background());
            g2.fillRect(1, 1, 28, 16);
            g2.setRenderingHint(java.awt.RenderingHints.KEY_ANTIALIASING, java.awt.RenderingHints.VALUE_ANTIALIAS_ON);
            Legend.sample(g2, new Rectangle2D.Double(2, 2, 26, 14), entry, style);
            g2.dispose();
        }
    }
}
