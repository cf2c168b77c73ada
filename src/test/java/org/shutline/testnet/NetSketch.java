package org.shutline.testnet;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;
import org.shutline.model.CrsInfo;
import org.shutline.model.Main;
import org.shutline.model.MainStatus;
import org.shutline.model.Network;
import org.shutline.model.NormalPosition;
import org.shutline.model.Operability;
import org.shutline.model.Service;
import org.shutline.model.ServiceClass;
import org.shutline.model.Source;
import org.shutline.model.Station;
import org.shutline.model.Tolerances;
import org.shutline.model.Valve;
import org.shutline.model.ValveKind;
import org.shutline.topology.GraphBuilder;
import org.shutline.topology.Topology;

/**
 * Test helper: builds a {@link Network} of model records and the matching
 * {@link org.shutline.topology.Graph} by hand, as the topology builder would, without
 * running it. Mains are paths of stops (nodes, and valves that split the main at their
 * point); stations link two nodes; services sit on a numbered pipe piece of a main.
 */
public final class NetSketch {
    static final GeometryFactory GF = new GeometryFactory();
    /** Inspection date given to valves unless said otherwise. */
    public static final LocalDate CHECKED = LocalDate.of(2026, 6, 1);

    record NodeDef(double x, double y) {}

    /** A stop on a main: a node index, or a valve at a point (node = -1). */
    public record Stop(int node, String valveId, double x, double y) {
        public static Stop node(int n) { return new Stop(n, null, 0, 0); }
        public static Stop valve(String id, double x, double y) { return new Stop(-1, id, x, y); }
    }

    record MainDef(String id, String sys, MainStatus status, List<Stop> stops) {}
    record ValveDef(String id, String sys, int a, int b, double x, double y) {}
    record StationDef(String id, String inSys, String outSys, int inlet, int outlet, double x, double y) {}
    record ServiceDef(String id, String mainId, int piece, int meters, String critical) {}
    record SourceDef(String id, int node) {}

    private final List<NodeDef> nodes = new ArrayList<>();
    private final List<MainDef> mains = new ArrayList<>();
    private final List<ValveDef> loose = new ArrayList<>();
    private final List<StationDef> stations = new ArrayList<>();
    private final List<ServiceDef> services = new ArrayList<>();
    private final List<SourceDef> sources = new ArrayList<>();
    private final Map<String, NormalPosition> normal = new LinkedHashMap<>();
    private final Map<String, Operability> operable = new LinkedHashMap<>();
    private final Map<String, ValveKind> kinds = new LinkedHashMap<>();
    private final Map<String, LocalDate> checked = new LinkedHashMap<>();
    private final Map<String, Boolean> neverChecked = new LinkedHashMap<>();
    private double pointTolerance = Tolerances.DEFAULT.pointM();

    public int node(double x, double y) {
        nodes.add(new NodeDef(x, y));
        return nodes.size() - 1;
    }

    public NetSketch main(String id, String sys, MainStatus status, List<Stop> stops) {
        mains.add(new MainDef(id, sys, status, List.copyOf(stops)));
        return this;
    }

    /** A valve directly between two nodes (no pipe between), at the first node's point. */
    public NetSketch valveBetween(String id, String sys, int a, int b) {
        loose.add(new ValveDef(id, sys, a, b, nodes.get(a).x(), nodes.get(a).y()));
        return this;
    }

    public NetSketch station(String id, String inSys, String outSys, int inlet, int outlet) {
        stations.add(new StationDef(id, inSys, outSys, inlet, outlet, nodes.get(inlet).x(), nodes.get(inlet).y()));
        return this;
    }

    public NetSketch source(String id, int node) {
        sources.add(new SourceDef(id, node));
        return this;
    }

    /** A service on pipe piece {@code piece} (0-based, along the main) of a main. */
    public NetSketch service(String id, String mainId, int piece, int meters, String critical) {
        services.add(new ServiceDef(id, mainId, piece, meters, critical));
        return this;
    }

    public NetSketch closed(String valveId) { normal.put(valveId, NormalPosition.CLOSED); return this; }
    public NetSketch operable(String valveId, Operability op) { operable.put(valveId, op); return this; }
    public NetSketch kind(String valveId, ValveKind k) { kinds.put(valveId, k); return this; }
    public NetSketch checked(String valveId, LocalDate d) { checked.put(valveId, d); return this; }
    public NetSketch neverChecked(String valveId) { neverChecked.put(valveId, true); return this; }
    public NetSketch pointTolerance(double m) { pointTolerance = m; return this; }

    public int nodeCountForTests() { return nodes.size(); }

    public double nodeX(int n) { return nodes.get(n).x(); }
    public double nodeY(int n) { return nodes.get(n).y(); }

    /** Builds the network records and the graph; node i of the sketch is graph node i. */
    public Topology build() {
        List<String> systems = new ArrayList<>();
        for (MainDef m : mains) if (!systems.contains(m.sys())) systems.add(m.sys());
        for (StationDef s : stations) {
            if (!systems.contains(s.inSys())) systems.add(s.inSys());
            if (!systems.contains(s.outSys())) systems.add(s.outSys());
        }
        int valveCount = loose.size();
        for (MainDef m : mains) for (Stop s : m.stops()) if (s.node() < 0) valveCount++;
        int[] mainSystem = new int[mains.size()];
        for (int i = 0; i < mains.size(); i++) mainSystem[i] = systems.indexOf(mains.get(i).sys());
        GraphBuilder gb = new GraphBuilder(systems.toArray(new String[0]), mainSystem, valveCount,
                stations.size(), sources.size(), services.size(), 0);
        for (NodeDef n : nodes) gb.addNode(n.x(), n.y());
        List<Main> mainRecs = new ArrayList<>();
        List<Valve> valveRecs = new ArrayList<>();
        Map<String, List<int[]>> pieces = new LinkedHashMap<>();
        Map<String, List<double[]>> pieceMeasures = new LinkedHashMap<>();
        for (int i = 0; i < mains.size(); i++) {
            MainDef m = mains.get(i);
            List<Coordinate> coords = new ArrayList<>();
            List<int[]> edges = new ArrayList<>();
            List<double[]> ms = new ArrayList<>();
            Stop first = m.stops().get(0);
            if (first.node() < 0) throw new IllegalArgumentException("main " + m.id() + " must start at a node");
            int cur = first.node();
            double cx = nodeX(cur), cy = nodeY(cur), meas = 0;
            coords.add(new Coordinate(cx, cy));
            for (int k = 1; k < m.stops().size(); k++) {
                Stop s = m.stops().get(k);
                double nx = s.node() >= 0 ? nodeX(s.node()) : s.x();
                double ny = s.node() >= 0 ? nodeY(s.node()) : s.y();
                double next = meas + Math.hypot(nx - cx, ny - cy);
                int to = s.node() >= 0 ? s.node() : gb.addNode(nx, ny);
                int e = gb.addPipe(cur, to, i, 0, meas, next);
                edges.add(new int[] {e});
                ms.add(new double[] {meas, next, (cx + nx) / 2, (cy + ny) / 2});
                if (s.node() < 0) {
                    int q = gb.addNode(nx, ny);
                    gb.addValve(to, q, valveRecs.size());
                    valveRecs.add(valve(s.valveId(), m.sys(), nx, ny));
                    to = q;
                }
                cur = to;
                cx = nx;
                cy = ny;
                meas = next;
                if (!coords.get(coords.size() - 1).equals2D(new Coordinate(nx, ny))) coords.add(new Coordinate(nx, ny));
            }
            if (coords.size() == 1) coords.add(new Coordinate(cx, cy));
            LineString line = GF.createLineString(coords.toArray(new Coordinate[0]));
            mainRecs.add(new Main(m.id(), m.sys(), m.status(), "PE", 100.0, 100.0, 2000, line));
            pieces.put(m.id(), edges);
            pieceMeasures.put(m.id(), ms);
        }
        for (ValveDef v : loose) {
            gb.addValve(v.a(), v.b(), valveRecs.size());
            valveRecs.add(valve(v.id(), v.sys(), v.x(), v.y()));
        }
        List<Station> stationRecs = new ArrayList<>();
        for (int i = 0; i < stations.size(); i++) {
            StationDef s = stations.get(i);
            gb.addStation(s.inlet(), s.outlet(), i);
            stationRecs.add(new Station(s.id(), s.inSys(), s.outSys(), 2.0, null, null, "station " + s.id(),
                    GF.createPoint(new Coordinate(s.x(), s.y()))));
        }
        List<Source> sourceRecs = new ArrayList<>();
        for (int i = 0; i < sources.size(); i++) {
            SourceDef s = sources.get(i);
            gb.attachSource(i, s.node());
            sourceRecs.add(new Source(s.id(), systemAt(s.node(), systems), 400.0,
                    GF.createPoint(new Coordinate(nodeX(s.node()), nodeY(s.node())))));
        }
        List<Service> serviceRecs = new ArrayList<>();
        for (int i = 0; i < services.size(); i++) {
            ServiceDef s = services.get(i);
            List<int[]> es = pieces.get(s.mainId());
            if (es == null) throw new IllegalArgumentException("service " + s.id() + ": no main " + s.mainId());
            double[] mm = pieceMeasures.get(s.mainId()).get(s.piece());
            gb.attachService(i, es.get(s.piece())[0], (mm[0] + mm[1]) / 2);
            String sys = mains.stream().filter(m -> m.id().equals(s.mainId())).findFirst().orElseThrow().sys();
            ServiceClass cls = s.critical() == null ? ServiceClass.RESIDENTIAL : ServiceClass.CRITICAL;
            serviceRecs.add(new Service(s.id(), sys, cls, s.meters(), s.critical() == null ? "" : s.critical(),
                    s.mainId(), "1 Test Row", GF.createPoint(new Coordinate(mm[2], mm[3]))));
        }
        Network net = new Network("sketch", CrsInfo.UNKNOWN_METRES, mainRecs, valveRecs, stationRecs, List.of(),
                serviceRecs, sourceRecs, List.of(), List.of());
        Tolerances tol = new Tolerances(0.5, pointTolerance, 60, 5);
        return new Topology(net, gb.freeze(), List.of(), tol);
    }

    private String systemAt(int node, List<String> systems) {
        for (MainDef m : mains) for (Stop s : m.stops()) if (s.node() == node) return m.sys();
        return systems.isEmpty() ? "HP" : systems.get(0);
    }

    private Valve valve(String id, String sys, double x, double y) {
        LocalDate d = neverChecked.containsKey(id) ? null : checked.getOrDefault(id, CHECKED);
        return new Valve(id, sys, kinds.getOrDefault(id, ValveKind.MAIN), normal.getOrDefault(id, NormalPosition.OPEN),
                operable.getOrDefault(id, Operability.YES), d, GF.createPoint(new Coordinate(x, y)));
    }
}
