package org.shutline.topology;

import java.util.ArrayList;
import java.util.List;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Point;
import org.locationtech.jts.io.ParseException;
import org.locationtech.jts.io.WKTReader;
import org.shutline.model.CrsInfo;
import org.shutline.model.Finding;
import org.shutline.model.LinearUnit;
import org.shutline.model.Main;
import org.shutline.model.MainStatus;
import org.shutline.model.Network;
import org.shutline.model.NormalPosition;
import org.shutline.model.Operability;
import org.shutline.model.SenseTap;
import org.shutline.model.Service;
import org.shutline.model.ServiceClass;
import org.shutline.model.Source;
import org.shutline.model.Station;
import org.shutline.model.TapDevice;
import org.shutline.model.Tolerances;
import org.shutline.model.Valve;
import org.shutline.model.ValveKind;

/** A small hand-built network for tests: features from WKT and coordinates, built with the default tolerances. */
final class TestNet {
    static final GeometryFactory GF = new GeometryFactory();
    private static final WKTReader WKT = new WKTReader(GF);

    final List<Main> mains = new ArrayList<>();
    final List<Valve> valves = new ArrayList<>();
    final List<Station> stations = new ArrayList<>();
    final List<SenseTap> taps = new ArrayList<>();
    final List<Service> services = new ArrayList<>();
    final List<Source> sources = new ArrayList<>();
    final List<Finding> read = new ArrayList<>();
    LinearUnit unit = LinearUnit.METRE;

    static Geometry wkt(String s) {
        try {
            return WKT.read(s);
        } catch (ParseException e) {
            throw new IllegalArgumentException(s, e);
        }
    }

    static Point pt(double x, double y) {
        return GF.createPoint(new Coordinate(x, y));
    }

    TestNet main(String id, String sys, String wkt) {
        return main(id, sys, MainStatus.ACTIVE, wkt);
    }

    TestNet main(String id, String sys, MainStatus status, String wkt) {
        return main(id, sys, status, wkt == null ? null : wkt(wkt));
    }

    TestNet main(String id, String sys, MainStatus status, Geometry g) {
        mains.add(new Main(id, sys, status, "PE", 110.0, 400.0, 2001, g));
        return this;
    }

    TestNet valve(String id, String sys, double x, double y) {
        valves.add(new Valve(id, sys, ValveKind.MAIN, NormalPosition.OPEN, Operability.YES, null, pt(x, y)));
        return this;
    }

    TestNet station(String id, String in, String out, double x, double y) {
        stations.add(new Station(id, in, out, 200.0, 220.0, null, "Station " + id, pt(x, y)));
        return this;
    }

    TestNet tap(String id, String station, double x, double y) {
        taps.add(new SenseTap(id, station, TapDevice.WORKER, pt(x, y)));
        return this;
    }

    TestNet service(String id, String sys, String mainId, double x, double y) {
        services.add(new Service(id, sys, ServiceClass.RESIDENTIAL, 1, "", mainId, "1 Test Row", pt(x, y)));
        return this;
    }

    TestNet source(String id, String sys, double x, double y) {
        sources.add(new Source(id, sys, 700.0, pt(x, y)));
        return this;
    }

    Network network() {
        CrsInfo crs = unit == LinearUnit.METRE ? CrsInfo.UNKNOWN_METRES : new CrsInfo("test feet", 0, null, unit);
        return new Network("test", crs, mains, valves, stations, taps, services, sources, List.of(), read);
    }

    Topology build() {
        return NetworkBuilder.build(network(), Tolerances.DEFAULT);
    }

    // ---- graph helpers used by the tests ----

    static List<Finding> findings(Topology t, String code) {
        return t.findings().stream().filter(f -> f.code().equals(code)).toList();
    }

    static int countKind(Graph g, byte kind) {
        int c = 0;
        for (int e = 0; e < g.edgeCount(); e++) if (g.edgeKind(e) == kind) c++;
        return c;
    }

    /** Pipe edges of main index i in part-then-measure order. */
    static int[] pipes(Graph g, int main) {
        int[] r = new int[g.mainEdgeEnd(main) - g.mainEdgeStart(main)];
        for (int i = 0; i < r.length; i++) r[i] = g.mainEdge(g.mainEdgeStart(main) + i);
        return r;
    }

    /** Component label of each node over all edges (stations included, as undirected links). */
    static int[] components(Graph g) {
        UnionFind uf = new UnionFind(g.nodeCount());
        for (int e = 0; e < g.edgeCount(); e++) uf.union(g.edgeFrom(e), g.edgeTo(e));
        int[] c = new int[g.nodeCount()];
        for (int v = 0; v < c.length; v++) c[v] = uf.find(v);
        return c;
    }

    /** Component labels over pipe edges only (valves and stations cut). */
    static int[] pipeComponents(Graph g) {
        UnionFind uf = new UnionFind(g.nodeCount());
        for (int e = 0; e < g.edgeCount(); e++) {
            if (g.edgeKind(e) == EdgeKind.PIPE) uf.union(g.edgeFrom(e), g.edgeTo(e));
        }
        int[] c = new int[g.nodeCount()];
        for (int v = 0; v < c.length; v++) c[v] = uf.find(v);
        return c;
    }

    /** True when the pipes of mains a and b lie in one connected piece of the whole graph. */
    static boolean connected(Graph g, int a, int b) {
        int[] c = components(g);
        return c[g.edgeFrom(pipes(g, a)[0])] == c[g.edgeFrom(pipes(g, b)[0])];
    }

    /** The node at (x, y) exactly, or -1. */
    static int nodeAt(Graph g, double x, double y) {
        for (int v = 0; v < g.nodeCount(); v++) if (g.nodeX(v) == x && g.nodeY(v) == y) return v;
        return -1;
    }
}
