package org.shutline.render;

import java.util.ArrayList;
import java.util.Collections;
import java.util.IdentityHashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.operation.linemerge.LineMerger;
import org.shutline.model.Main;
import org.shutline.model.MainStatus;
import org.shutline.model.Network;
import org.shutline.model.NormalPosition;
import org.shutline.model.Valve;
import org.shutline.topology.EdgeKind;
import org.shutline.trace.NetworkState;

/**
 * The drawable features of one network state, read from the state itself (never from a
 * copy of the network): the one source for the window's map, the printed maps and the
 * exported layers of a plan step.
 * <ul>
 * <li>{@link #main(Main)}: a recorded main as it stands (its status in the state: an
 *     abandoned or activated main), the same object when unchanged;</li>
 * <li>{@link #valve(Valve)}: a recorded valve open or closed as in the state;</li>
 * <li>{@link #addedPipes()}: pipe the plan added and that is still in place: each main
 *     the state adds (a bypass: temporary pipe) as the line through its pipe edges, and each
 *     tie-in connection (an added pipe edge of a recorded main that joins two points apart);
 *     a bypass taken off (its edges removed) is not listed;</li>
 * <li>{@link #addedValves()}: valves the plan added (a bypass's valves) whose edge is in
 *     place, at their position, open or closed as in the state;</li>
 * <li>{@link #cuts()}: open cuts (cut and capped: the two pieces not joined again), with
 *     the pipe's direction there for the symbol.</li>
 * </ul>
 * Building costs O(mains + valves + k) for k overlay changes; no spatial index is built here.
 */
public final class StateFeatures {
    /** An open cut: the main cut, the point, and the pipe's direction there (radians, world axes). */
    public record Cut(String mainId, double x, double y, double angle) {}

    /** Pipe the plan added: drawn as pipe; {@code temporary} for a bypass, false for a tie-in connection. */
    public record AddedPipe(Main main, boolean temporary, String kind) {}

    /** A valve the plan added; {@code temporary} when it sits on temporary pipe. */
    public record AddedValve(Valve valve, boolean temporary) {}

    /** Nothing differs from the network as recorded. */
    public static final StateFeatures NONE = new StateFeatures(Map.of(), Map.of(), List.of(), List.of(), List.of());

    private final Map<Main, Main> mains;
    private final Map<Valve, Valve> valves;
    private final List<AddedPipe> pipes;
    private final List<AddedValve> addedValves;
    private final List<Cut> cuts;

    private StateFeatures(Map<Main, Main> mains, Map<Valve, Valve> valves, List<AddedPipe> pipes,
                          List<AddedValve> addedValves, List<Cut> cuts) {
        this.mains = mains;
        this.valves = valves;
        this.pipes = List.copyOf(pipes);
        this.addedValves = List.copyOf(addedValves);
        this.cuts = List.copyOf(cuts);
    }

    public static StateFeatures of(NetworkState s) {
        if (s.isBase()) return NONE;
        Network n = s.network();
        int baseMains = s.graph().mainCount();
        int baseValves = s.graph().valveCount();
        int baseEdges = s.graph().edgeCount();
        Map<Main, Main> mains = new IdentityHashMap<>();
        for (int i = 0; i < baseMains && i < n.mains().size(); i++) {
            Main m = n.mains().get(i);
            MainStatus now = s.mainStatus(i);
            if (now != m.status()) mains.put(m, m.withStatus(now));
        }
        Map<Valve, Valve> valves = new IdentityHashMap<>();
        for (int v = 0; v < baseValves && v < n.valves().size(); v++) {
            Valve valve = n.valves().get(v);
            NormalPosition now = s.valveClosed(v) ? NormalPosition.CLOSED : NormalPosition.OPEN;
            NormalPosition was = valve.normal() == null ? NormalPosition.DEFAULT : valve.normal();
            if (now != was) {
                valves.put(valve, new Valve(valve.id(), valve.systemId(), valve.kind(), now, valve.operable(),
                        valve.checked(), valve.geometry()));
            }
        }
        GeometryFactory gf = new GeometryFactory();
        Map<Integer, List<LineString>> addedMainLines = new LinkedHashMap<>();
        List<AddedPipe> pipes = new ArrayList<>();
        for (int e = baseEdges; e < s.edgeCount(); e++) {
            if (s.isRemoved(e) || s.edgeKind(e) != EdgeKind.PIPE) continue;
            int a = s.edgeFrom(e), b = s.edgeTo(e);
            boolean apart = s.nodeX(a) != s.nodeX(b) || s.nodeY(a) != s.nodeY(b);
            int main = s.edgeFeature(e);
            LineString seg = gf.createLineString(new Coordinate[] {
                    new Coordinate(s.nodeX(a), s.nodeY(a)), new Coordinate(s.nodeX(b), s.nodeY(b))});
            if (main >= baseMains) {
                if (apart) addedMainLines.computeIfAbsent(main, k -> new ArrayList<>()).add(seg);
            } else if (apart && s.edgeM0(e) == s.edgeM1(e)) {
                // a tie-in connection: an added edge of a recorded main with no length along it
                // (cut pieces span measures and follow the main's own line, so they are not listed)
                Main m = n.mains().get(main);
                pipes.add(new AddedPipe(new Main(m.id(), m.systemId(), s.mainStatus(main), m.material(), m.diamMm(),
                        m.maopKpa(), m.installYr(), seg), false, "tie-in"));
            }
        }
        Set<Integer> temporaryMains = addedMainLines.keySet();
        for (Map.Entry<Integer, List<LineString>> en : addedMainLines.entrySet()) {
            int i = en.getKey();
            LineMerger lm = new LineMerger();
            lm.add(en.getValue());
            @SuppressWarnings("unchecked")
            List<LineString> merged = new ArrayList<>((java.util.Collection<LineString>) lm.getMergedLineStrings());
            Geometry g = merged.size() == 1 ? merged.get(0)
                    : gf.createMultiLineString(merged.toArray(new LineString[0]));
            String system = s.graph().systemId(s.mainSystem(i));
            pipes.add(new AddedPipe(new Main(s.mainId(i), system, s.mainStatus(i), null, null, null, null, g),
                    true, "bypass"));
        }
        List<AddedValve> added = new ArrayList<>();
        int[] buf = s.adjacencyBuffer();
        for (int v = baseValves; v < s.valveCount(); v++) {
            int e = s.valveEdge(v);
            if (e < 0 || s.isRemoved(e)) continue;
            int a = s.edgeFrom(e);
            String system = null;
            boolean temporary = false;
            for (int end : new int[] {a, s.edgeTo(e)}) {
                int k = s.incidentEdges(end, buf);
                for (int j = 0; j < k; j++) {
                    int p = buf[j];
                    if (s.edgeKind(p) != EdgeKind.PIPE) continue;
                    int main = s.edgeFeature(p);
                    if (system == null) system = s.graph().systemId(s.mainSystem(main));
                    if (temporaryMains.contains(main)) temporary = true;
                }
            }
            Valve valve = new Valve(s.valveId(v), system, s.valveKind(v),
                    s.valveClosed(v) ? NormalPosition.CLOSED : NormalPosition.OPEN, s.valveOperability(v), null,
                    gf.createPoint(new Coordinate(s.nodeX(a), s.nodeY(a))));
            added.add(new AddedValve(valve, temporary));
        }
        List<Cut> cuts = new ArrayList<>();
        for (int c = 0; c < s.cutCount(); c++) {
            int first = s.cutFirstPiece(c);
            int c1 = s.edgeTo(first), c2 = s.edgeFrom(first + 1);
            if (joined(s, c1, c2, buf)) continue;
            int edge = s.cutEdge(c);
            double m = s.cutMeasure(c);
            double lo = Math.min(s.edgeM0(edge), s.edgeM1(edge)), hi = Math.max(s.edgeM0(edge), s.edgeM1(edge));
            double d = Math.max((hi - lo) * 0.01, 1e-6);
            Coordinate p0 = s.pointAt(edge, Math.max(lo, m - d));
            Coordinate p1 = s.pointAt(edge, Math.min(hi, m + d));
            Coordinate at = s.pointAt(edge, m);
            cuts.add(new Cut(s.mainId(s.edgeFeature(edge)), at.x, at.y, Math.atan2(p1.y - p0.y, p1.x - p0.x)));
        }
        return new StateFeatures(Collections.unmodifiableMap(mains), Collections.unmodifiableMap(valves), pipes, added, cuts);
    }

    /** True when a live edge joins nodes a and b (a tee: the cut was made to connect, not to part). */
    private static boolean joined(NetworkState s, int a, int b, int[] buf) {
        int k = s.incidentEdges(a, buf);
        for (int j = 0; j < k; j++) {
            if (s.opposite(buf[j], a) == b) return true;
        }
        return false;
    }

    /** True when the state changes nothing that is drawn. */
    public boolean isEmpty() {
        return mains.isEmpty() && valves.isEmpty() && pipes.isEmpty() && addedValves.isEmpty() && cuts.isEmpty();
    }

    /** A recorded main as it stands in the state (the same object when unchanged). */
    public Main main(Main recorded) {
        Main m = mains.get(recorded);
        return m == null ? recorded : m;
    }

    /** A recorded valve as it stands in the state (the same object when unchanged). */
    public Valve valve(Valve recorded) {
        Valve v = valves.get(recorded);
        return v == null ? recorded : v;
    }

    /** Recorded mains whose status differs in the state, as they stand now. */
    public List<Main> changedMains() {
        List<Main> out = new ArrayList<>(mains.values());
        out.sort(java.util.Comparator.comparing(Main::id, java.util.Comparator.nullsFirst(String::compareTo)));
        return out;
    }

    /** Recorded valves whose position differs in the state, as they stand now. */
    public List<Valve> changedValves() {
        List<Valve> out = new ArrayList<>(valves.values());
        out.sort(java.util.Comparator.comparing(Valve::id, java.util.Comparator.nullsFirst(String::compareTo)));
        return out;
    }

    public List<AddedPipe> addedPipes() {
        return pipes;
    }

    public List<AddedValve> addedValves() {
        return addedValves;
    }

    public List<Cut> cuts() {
        return cuts;
    }
}
