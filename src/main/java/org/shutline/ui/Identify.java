package org.shutline.ui;

import org.shutline.app.Workspace;
import org.shutline.model.Plural;
import java.util.ArrayList;
import java.util.BitSet;
import java.util.List;
import java.util.Locale;
import java.util.TreeSet;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Point;
import org.shutline.model.Feature;
import org.shutline.model.Main;
import org.shutline.model.Network;
import org.shutline.model.SenseTap;
import org.shutline.model.Service;
import org.shutline.model.Source;
import org.shutline.model.Station;
import org.shutline.model.Valve;
import org.shutline.model.Words;
import org.shutline.render.MapScene;
import org.shutline.topology.EdgeKind;
import org.shutline.trace.FeedTrace;
import org.shutline.trace.NetworkState;
import org.shutline.trace.ValveSegments;

/**
 * Picking, selecting and searching features of a workspace, and the facts shown for
 * one: its attributes and, from the network as recorded, its pressure system, valve
 * segment, the regulator stations feeding it and the valves bounding its segment.
 *
 * <p>{@link #at} returns the feature under the point within the tolerance by the order
 * the symbols are stacked on the map: regulator stations, then sources, valves, sensing
 * taps, services, and mains last (a station's symbol covers the valve under it, a valve
 * sits on its main); within one kind the nearest, exact ties to the first found. Candidates come from
 * the scene's spatial indexes, so the cost is that of the features near the point.
 * {@link #search} matches ids exactly (any case) in every layer, then addresses of
 * services containing the text.
 */
public final class Identify {
    private static final GeometryFactory GF = new GeometryFactory();

    private Identify() {}

    /** The feature nearest (x, y) within {@code tol} world units, or null. */
    public static Pick at(Workspace ws, double x, double y, double tol) {
        MapScene sc = ws.scene();
        Envelope env = new Envelope(x - tol, x + tol, y - tol, y + tol);
        Point p = GF.createPoint(new Coordinate(x, y));
        Pick best = null;
        double bestD = Double.POSITIVE_INFINITY;
        List<List<? extends Feature>> groups = List.of(sc.stationsIn(env), sc.sourcesIn(env), sc.valvesIn(env), sc.tapsIn(env),
                sc.servicesIn(env));
        Pick.Kind[] kinds = {Pick.Kind.STATION, Pick.Kind.SOURCE, Pick.Kind.VALVE, Pick.Kind.TAP, Pick.Kind.SERVICE};
        for (int k = 0; k < groups.size() && best == null; k++) {
            for (Feature f : groups.get(k)) {
                double d = f.geometry().distance(p);
                if (d <= tol && d < bestD) {
                    bestD = d;
                    best = new Pick(kinds[k], f, indexOf(ws, kinds[k], f.id()));
                }
            }
        }
        if (best != null) return best;
        for (Main m : sc.mainsIn(env)) {
            double d = m.geometry().distance(p);
            if (d <= tol && d < bestD) {
                bestD = d;
                best = new Pick(Pick.Kind.MAIN, m, ws.mainIndex(m.id()));
            }
        }
        return best;
    }

    /** Every network feature inside the envelope (points inside, mains that meet it). */
    public static List<Pick> in(Workspace ws, Envelope env) {
        MapScene sc = ws.scene();
        Geometry box = GF.toGeometry(env);
        List<Pick> out = new ArrayList<>();
        for (Station s : sc.stationsIn(env)) if (env.contains(s.geometry().getCoordinate())) out.add(pick(ws, Pick.Kind.STATION, s));
        for (Valve v : sc.valvesIn(env)) if (env.contains(v.geometry().getCoordinate())) out.add(pick(ws, Pick.Kind.VALVE, v));
        for (SenseTap t : sc.tapsIn(env)) if (env.contains(t.geometry().getCoordinate())) out.add(pick(ws, Pick.Kind.TAP, t));
        for (Source s : sc.sourcesIn(env)) if (env.contains(s.geometry().getCoordinate())) out.add(pick(ws, Pick.Kind.SOURCE, s));
        for (Service s : sc.servicesIn(env)) if (env.contains(s.geometry().getCoordinate())) out.add(pick(ws, Pick.Kind.SERVICE, s));
        for (Main m : sc.mainsIn(env)) if (m.geometry().intersects(box)) out.add(pick(ws, Pick.Kind.MAIN, m));
        return out;
    }

    /** Features whose id equals {@code text} (any case), then services whose address contains it; at most 200. */
    public static List<Pick> search(Workspace ws, String text) {
        String q = text.trim().toLowerCase(Locale.ROOT);
        List<Pick> out = new ArrayList<>();
        if (q.isEmpty()) return out;
        Network n = ws.network();
        for (Station s : n.stations()) if (s.id().equalsIgnoreCase(q)) out.add(pick(ws, Pick.Kind.STATION, s));
        for (Valve v : n.valves()) if (v.id().equalsIgnoreCase(q)) out.add(pick(ws, Pick.Kind.VALVE, v));
        for (SenseTap t : n.taps()) if (t.id().equalsIgnoreCase(q)) out.add(pick(ws, Pick.Kind.TAP, t));
        for (Source s : n.sources()) if (s.id().equalsIgnoreCase(q)) out.add(pick(ws, Pick.Kind.SOURCE, s));
        for (Main m : n.mains()) if (m.id().equalsIgnoreCase(q)) out.add(pick(ws, Pick.Kind.MAIN, m));
        for (Service s : n.services()) {
            if (out.size() >= 200) break;
            boolean id = s.id().equalsIgnoreCase(q);
            boolean addr = s.address() != null && s.address().toLowerCase(Locale.ROOT).contains(q);
            if (id || addr) out.add(pick(ws, Pick.Kind.SERVICE, s));
        }
        out.removeIf(p -> p.geometry() == null);
        return out;
    }

    private static Pick pick(Workspace ws, Pick.Kind k, Feature f) {
        return new Pick(k, f, indexOf(ws, k, f.id()));
    }

    private static int indexOf(Workspace ws, Pick.Kind k, String id) {
        Network n = ws.network();
        return switch (k) {
            case MAIN -> ws.mainIndex(id);
            case VALVE -> ws.valveIndex(id);
            case SERVICE -> ws.serviceIndex(id);
            case STATION -> ws.stationIndex(id);
            case TAP -> indexIn(n.taps(), id);
            case SOURCE -> indexIn(n.sources(), id);
        };
    }

    private static int indexIn(List<? extends Feature> l, String id) {
        for (int i = 0; i < l.size(); i++) if (l.get(i).id().equals(id)) return i;
        return -1;
    }

    /** Attribute lines of the feature ("field: value"). */
    public static List<String> attributes(Pick p) {
        List<String> a = new ArrayList<>();
        a.add(p.label());
        Feature f = p.feature();
        if (f instanceof Main m) {
            add(a, "system", m.systemId());
            add(a, "status", Words.word(m.status()));
            add(a, "material", m.material());
            add(a, "diameter", m.diamMm() == null ? null : String.format(Locale.ROOT, "%.0f mm", m.diamMm()));
            add(a, "MAOP", m.maopKpa() == null ? null : String.format(Locale.ROOT, "%.2f kPa", m.maopKpa()));
            add(a, "installed", m.installYr() == null ? null : m.installYr().toString());
            add(a, "length", String.format(Locale.ROOT, "%.1f", m.geometry().getLength()));
        } else if (f instanceof Valve v) {
            add(a, "system", v.systemId());
            add(a, "kind", Words.word(v.kind()));
            add(a, "normal", Words.word(v.normal()));
            add(a, "operable", Words.word(v.operable()));
            add(a, "checked", v.checked() == null ? "never recorded" : v.checked().toString());
        } else if (f instanceof Station s) {
            add(a, "name", s.name());
            add(a, "inlet system", s.inSys());
            add(a, "outlet system", s.outSys());
            add(a, "set", kpa(s.setKpa()));
            add(a, "monitor", kpa(s.monitorKpa()));
            add(a, "relief", kpa(s.reliefKpa()));
        } else if (f instanceof Service s) {
            add(a, "system", s.systemId());
            add(a, "class", Words.word(s.serviceClass()));
            add(a, "meters", Integer.toString(s.meters()));
            add(a, "critical", s.critical());
            add(a, "main", s.mainId());
            add(a, "address", s.address());
        } else if (f instanceof SenseTap t) {
            add(a, "station", t.stationId());
            add(a, "device", Words.word(t.device()));
        } else if (f instanceof Source s) {
            add(a, "system", s.systemId());
            add(a, "pressure", kpa(s.kpa()));
        }
        Point c = f.geometry() == null ? null : f.geometry().getInteriorPoint();
        if (c != null) add(a, "position", String.format(Locale.ROOT, "%.1f, %.1f", c.getX(), c.getY()));
        return a;
    }

    private static String kpa(Double d) {
        return d == null ? null : String.format(Locale.ROOT, "%.2f kPa", d);
    }

    private static void add(List<String> a, String k, String v) {
        if (v != null && !v.isBlank()) a.add(k + ": " + v);
    }

    /** Network facts of the feature in the network as recorded: system, segment, feeding stations, bounding valves. */
    public static List<String> facts(Workspace ws, Pick p) {
        List<String> out = new ArrayList<>();
        NetworkState s = ws.base();
        ValveSegments segs = ws.segments();
        FeedTrace.Result tr = ws.trace();
        BitSet segments = new BitSet();
        BitSet edges = new BitSet();
        int idx = p.index();
        switch (p.kind()) {
            case MAIN -> {
                if (idx >= 0) {
                    var g = s.graph();
                    for (int i = g.mainEdgeStart(idx); i < g.mainEdgeEnd(idx); i++) edges.set(g.mainEdge(i));
                }
            }
            case VALVE -> {
                int e = idx < 0 ? -1 : s.valveEdge(idx);
                if (e >= 0) {
                    addSeg(segments, segs.nodeSegment(s.edgeFrom(e)));
                    addSeg(segments, segs.nodeSegment(s.edgeTo(e)));
                } else {
                    out.add("not attached to a main (see the network check)");
                }
            }
            case SERVICE -> {
                int e = idx < 0 ? -1 : s.serviceEdge(idx);
                if (e >= 0) edges.set(e);
                else out.add("not attached to a main (see the network check)");
                if (idx >= 0) out.add(tr.fedServices().get(idx) ? "fed in the network as recorded" : "NOT fed in the network as recorded");
            }
            case TAP -> {
                int e = idx < 0 ? -1 : s.tapEdge(idx);
                if (e >= 0) edges.set(e);
            }
            case STATION -> {
                int e = idx < 0 ? -1 : s.stationEdge(idx);
                if (e >= 0) {
                    out.add("feeds " + Plural.of(tr.stationServices().get(idx).cardinality(), "service") + " ("
                            + Plural.of(tr.stationMeters()[idx], "meter") + "), " + tr.stationExclusive().get(idx).cardinality() + " of them alone");
                    out.add(s.stationInService(idx) ? "in service" : "out of service");
                } else {
                    out.add("not attached to its inlet and outlet mains");
                }
            }
            case SOURCE -> { }
        }
        for (int e = edges.nextSetBit(0); e >= 0; e = edges.nextSetBit(e + 1)) {
            if (s.edgeKind(e) == EdgeKind.PIPE) addSeg(segments, segs.edgeSegment(e));
        }
        if (!segments.isEmpty()) {
            List<String> segIds = new ArrayList<>();
            TreeSet<String> valves = new TreeSet<>();
            long meters = 0;
            int services = 0;
            for (int g = segments.nextSetBit(0); g >= 0; g = segments.nextSetBit(g + 1)) {
                segIds.add("#" + g);
                for (int v : segs.boundingValves(g)) valves.add(s.valveId(v));
                meters += segs.meters(g);
                services += segs.serviceCount(g);
            }
            out.add("valve segment " + String.join(", ", segIds) + ": " + org.shutline.model.Plural.of(services, "service") + ", " + org.shutline.model.Plural.of(meters, "meter"));
            out.add("valves bounding it: " + (valves.isEmpty() ? "none" : String.join(", ", valves)));
        }
        TreeSet<String> feeding = new TreeSet<>();
        List<BitSet> stEdges = tr.stationEdges();
        List<BitSet> stServices = tr.stationServices();
        for (int st = 0; st < s.stationCount(); st++) {
            BitSet se = stEdges.get(st);
            if (p.kind() == Pick.Kind.SERVICE && idx >= 0 && stServices.get(st).get(idx)) feeding.add(s.stationId(st));
            else if (edges.intersects(se)) feeding.add(s.stationId(st));
        }
        if (p.kind() != Pick.Kind.STATION && p.kind() != Pick.Kind.SOURCE) {
            out.add("fed through: " + (feeding.isEmpty() ? "no regulator station" : String.join(", ", feeding)));
        }
        return out;
    }

    private static void addSeg(BitSet b, int seg) {
        if (seg >= 0) b.set(seg);
    }
}
