package org.shutline.ui;

import org.shutline.app.Workspace;
import org.shutline.model.Plural;
import java.awt.BorderLayout;
import java.awt.FlowLayout;
import java.util.ArrayList;
import java.util.BitSet;
import java.util.List;
import javax.swing.JButton;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JTable;
import javax.swing.ListSelectionModel;
import javax.swing.table.AbstractTableModel;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.shutline.model.Station;
import org.shutline.topology.EdgeKind;
import org.shutline.trace.FeedTrace;
import org.shutline.trace.NetworkState;

/**
 * "Station feeds": per regulator station the services and meters it feeds (alone and
 * shared) in the network as recorded; selecting a station draws its shed (the live
 * mains it feeds) highlighted on the map. The services fed by more than one station
 * can be shown too.
 */
final class FeedsPanel extends JPanel {
    private final WindowContext window;
    private final Model model = new Model();
    private final JTable table = new JTable(model);
    private final JLabel multi = new JLabel(" ");
    private Workspace ws;
    private List<BitSet> services = List.of();
    private List<BitSet> exclusive = List.of();
    private long[] meters = new long[0];

    FeedsPanel(WindowContext window) {
        super(new BorderLayout());
        this.window = window;
        table.setSelectionMode(ListSelectionModel.SINGLE_SELECTION);
        table.getSelectionModel().addListSelectionListener(e -> {
            if (!e.getValueIsAdjusting() && table.getSelectedRow() >= 0) showShed(table.getSelectedRow());
        });
        JPanel top = new JPanel(new FlowLayout(FlowLayout.LEFT));
        top.add(multi);
        JButton show = new JButton("Show on map");
        show.addActionListener(e -> showMultiFed());
        top.add(show);
        add(top, BorderLayout.NORTH);
        add(new JScrollPane(table), BorderLayout.CENTER);
    }

    void show(Workspace w) {
        ws = w;
        FeedTrace.Result t = w.trace();
        services = t.stationServices();
        exclusive = t.stationExclusive();
        meters = t.stationMeters();
        multi.setText(" Customers fed by more than one station: " + Plural.of(t.multiFed().cardinality(), "service"));
        model.fireTableDataChanged();
    }

    private void showShed(int st) {
        NetworkState s = ws.base();
        BitSet edges = ws.trace().stationEdges().get(st);
        BitSet mains = new BitSet();
        for (int e = edges.nextSetBit(0); e >= 0; e = edges.nextSetBit(e + 1)) {
            if (e < s.graph().edgeCount() && s.edgeKind(e) == EdgeKind.PIPE) mains.set(s.edgeFeature(e));
        }
        List<Geometry> g = new ArrayList<>();
        Envelope env = new Envelope();
        for (int m = mains.nextSetBit(0); m >= 0; m = mains.nextSetBit(m + 1)) {
            if (m < ws.network().mains().size()) {
                Geometry geom = ws.network().mains().get(m).geometry();
                g.add(geom);
                env.expandToInclude(geom.getEnvelopeInternal());
            }
        }
        Station station = ws.network().stations().get(st);
        if (station.geometry() != null) g.add(station.geometry());
        window.showPanelMarks(org.shutline.render.MapOverlays.NONE, g);
        window.status("Shed of " + station.id() + ": " + mains.cardinality() + " mains fed through it");
        if (!env.isNull()) window.map().zoomTo(env, 50);
    }

    private void showMultiFed() {
        if (ws == null) return;
        BitSet m = ws.trace().multiFed();
        List<Geometry> g = new ArrayList<>();
        for (int i = m.nextSetBit(0); i >= 0; i = m.nextSetBit(i + 1)) {
            Geometry p = ws.network().services().get(i).geometry();
            if (p != null) g.add(p);
        }
        window.showPanelMarks(org.shutline.render.MapOverlays.NONE, g);
        window.status(Plural.of(m.cardinality(), "service") + " fed by more than one station highlighted");
    }

    private final class Model extends AbstractTableModel {
        private final String[] cols = {"station", "name", "outlet system", "services", "meters", "fed by it alone"};

        @Override public int getRowCount() { return ws == null ? 0 : ws.network().stations().size(); }
        @Override public int getColumnCount() { return cols.length; }
        @Override public String getColumnName(int c) { return cols[c]; }

        @Override public Object getValueAt(int r, int c) {
            Station s = ws.network().stations().get(r);
            return switch (c) {
                case 0 -> s.id();
                case 1 -> s.name();
                case 2 -> s.outSys();
                case 3 -> r < services.size() ? services.get(r).cardinality() : 0;
                case 4 -> r < meters.length ? meters[r] : 0;
                default -> r < exclusive.size() ? exclusive.get(r).cardinality() : 0;
            };
        }
    }
}
