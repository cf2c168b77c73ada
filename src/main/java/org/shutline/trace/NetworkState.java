package org.shutline.trace;

import java.time.LocalDate;
import java.util.Arrays;
import java.util.BitSet;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.linearref.LengthIndexedLine;
import org.shutline.model.MainStatus;
import org.shutline.model.Network;
import org.shutline.model.NormalPosition;
import org.shutline.model.Operability;
import org.shutline.model.ValveKind;
import org.shutline.topology.EdgeKind;
import org.shutline.topology.Graph;
import org.shutline.topology.Topology;

/**
 * One state of a network: the frozen base {@link Graph} of a {@link Topology} seen
 * through an overlay of changes. The base is never edited or copied.
 *
 * <p>What an overlay can hold: valve positions other than {@link org.shutline.model.Valve#normal()};
 * main status changes (activate a proposed main, abandon a main); stations out of
 * service; removed edges; added nodes, mains, pipe edges and valves (indices continue
 * after the base counts: nodes {@code n..}, edges {@code m..}, mains and valves
 * likewise, so callers learn the index of a thing they add by reading the count
 * before adding it); cuts (a pipe edge replaced by two pieces that no longer meet);
 * service and sensing-tap re-attachments.
 *
 * <p>States are immutable values. Each {@code with...} method returns a new state
 * that shares the base and everything derived from it once (base valve positions,
 * main statuses, maximum degree); only the overlay's small arrays are copied, so a
 * change costs O(k) for k changes made so far, never O(network). Reads of an
 * override are binary searches, O(log k).
 *
 * <p>Traversal reads adjacency with {@link #incidentEdges(int, int[])} into a
 * caller-owned buffer from {@link #adjacencyBuffer()}: base CSR entries minus removed
 * edges, then the added edges touching the node. No boxing, no allocation per visit.
 *
 * <p>Services and taps attached to an edge that was later cut resolve to the piece
 * holding their measure (a measure exactly at the cut goes to the first piece).
 */
public final class NetworkState {

    /** What is derived from the base once and shared by every state built on it. */
    private static final class Base {
        final Topology topology;
        final Graph g;
        final Network net;
        final BitSet valveNormallyClosed;
        final byte[] mainStatus;
        final int maxDegree;

        Base(Topology t) {
            topology = t;
            g = t.graph();
            net = t.network();
            valveNormallyClosed = new BitSet(g.valveCount());
            for (int v = 0; v < g.valveCount(); v++) {
                if (net.valves().get(v).normal() == NormalPosition.CLOSED) valveNormallyClosed.set(v);
            }
            mainStatus = new byte[g.mainCount()];
            for (int i = 0; i < g.mainCount(); i++) mainStatus[i] = (byte) net.mains().get(i).status().ordinal();
            int md = 0;
            for (int v = 0; v < g.nodeCount(); v++) md = Math.max(md, g.degree(v));
            maxDegree = md;
        }

        /** See {@link NetworkState#baseFlowAdjacency()}; built on first use. */
        private volatile long[] flowAdjacency;

        long[] flowAdjacency() {
            long[] a = flowAdjacency;
            if (a == null) {
                a = buildFlowAdjacency(g);
                flowAdjacency = a;
            }
            return a;
        }
    }

    /** Largest feature index the packed adjacency holds (30 bits). */
    static final int FLOW_FEATURE_LIMIT = 1 << 30;
    static final int FLOW_PIPE = 0, FLOW_VALVE = 1, FLOW_STATION_OUT = 2, FLOW_NONE = 3;
    /** The edge kind of each flow code ({@link #FLOW_NONE}: none, never passes). */
    static final byte[] FLOW_KIND = {EdgeKind.PIPE, EdgeKind.VALVE, EdgeKind.STATION, -1};

    private static long[] buildFlowAdjacency(Graph g) {
        int total = g.nodeCount() == 0 ? 0 : g.adjEnd(g.nodeCount() - 1);
        long[] a = new long[total];
        for (int v = 0; v < g.nodeCount(); v++) {
            for (int i = g.adjStart(v), end = g.adjEnd(v); i < end; i++) {
                int e = g.adjEdge(i);
                int f = g.edgeFeature(e);
                byte kind = g.edgeKind(e);
                int code;
                if (!Passage.entersFrom(kind, g.edgeFrom(e), g.edgeTo(e), v)) code = FLOW_NONE;
                else if (kind == EdgeKind.PIPE) code = FLOW_PIPE;
                else if (kind == EdgeKind.VALVE) code = FLOW_VALVE;
                else code = FLOW_STATION_OUT;
                if (f < 0 || f >= FLOW_FEATURE_LIMIT) return null;
                a[i] = ((long) f << 34) | ((long) code << 32) | (g.opposite(e, v) & 0xFFFFFFFFL);
            }
        }
        return a;
    }

    /**
     * The base graph's adjacency packed for gas flow, one long per CSR entry of
     * {@link Graph#adjEdge} (same order): bits 0-31 the node across the edge, bits 32-33
     * {@link #FLOW_PIPE}, {@link #FLOW_VALVE}, {@link #FLOW_STATION_OUT} (a station edge
     * seen from its inlet, the only way gas passes it) or {@link #FLOW_NONE} (no gas enters
     * the edge at this node by {@link Passage#entersFrom}), bits 34-63 the
     * edge's feature (main, valve or station index). Built once per base, O(edges), and
     * shared by every state; null when a feature index does not fit in 30 bits. A search
     * then reads one sequential array per node instead of four edge arrays at random.
     */
    long[] baseFlowAdjacency() {
        return base.flowAdjacency();
    }

    private static final MainStatus[] STATUSES = MainStatus.values();
    private static final Operability[] OPERABILITY = Operability.values();
    private static final ValveKind[] KINDS = ValveKind.values();

    private final Base base;
    private final SparseMap valveClosed;     // valve -> 1 closed / 0 open
    private final SparseMap mainStatus;      // main -> status ordinal
    private final SparseMap stationOut;      // station -> 1 out of service
    private final SparseMap removed;         // edge -> (unused)
    private final SparseMap splits;          // edge -> first piece edge (second = first + 1), measure
    private final SparseMap serviceAttach;   // service -> edge, measure
    private final SparseMap tapAttach;       // tap -> edge, measure
    private final Additions add;

    private NetworkState(Base base, SparseMap valveClosed, SparseMap mainStatus, SparseMap stationOut,
                         SparseMap removed, SparseMap splits, SparseMap serviceAttach, SparseMap tapAttach,
                         Additions add) {
        this.base = base;
        this.valveClosed = valveClosed;
        this.mainStatus = mainStatus;
        this.stationOut = stationOut;
        this.removed = removed;
        this.splits = splits;
        this.serviceAttach = serviceAttach;
        this.tapAttach = tapAttach;
        this.add = add;
    }

    /** The state of the network as recorded: every valve in its normal position, every station in service. */
    public static NetworkState of(Topology topology) {
        SparseMap e = SparseMap.EMPTY;
        return new NetworkState(new Base(topology), e, e, e, e, e, e, e, Additions.EMPTY);
    }

    public Topology topology() { return base.topology; }
    public Graph graph() { return base.g; }
    public Network network() { return base.net; }

    /** True when nothing differs from the base. */
    public boolean isBase() {
        return valveClosed.isEmpty() && mainStatus.isEmpty() && stationOut.isEmpty() && removed.isEmpty()
                && splits.isEmpty() && serviceAttach.isEmpty() && tapAttach.isEmpty() && add == Additions.EMPTY;
    }

    // ---- nodes and edges ----

    public int nodeCount() { return base.g.nodeCount() + add.nodes; }

    public double nodeX(int v) {
        int n = base.g.nodeCount();
        return v < n ? base.g.nodeX(v) : add.nodeX[v - n];
    }

    public double nodeY(int v) {
        int n = base.g.nodeCount();
        return v < n ? base.g.nodeY(v) : add.nodeY[v - n];
    }

    public int edgeCount() { return base.g.edgeCount() + add.edges; }

    /** True for an edge added by this state's overlay (index at or above the base edge count). */
    public boolean isAddedEdge(int e) { return e >= base.g.edgeCount(); }

    public byte edgeKind(int e) {
        int m = base.g.edgeCount();
        return e < m ? base.g.edgeKind(e) : add.edgeKind[e - m];
    }

    public int edgeFrom(int e) {
        int m = base.g.edgeCount();
        return e < m ? base.g.edgeFrom(e) : add.edgeFrom[e - m];
    }

    public int edgeTo(int e) {
        int m = base.g.edgeCount();
        return e < m ? base.g.edgeTo(e) : add.edgeTo[e - m];
    }

    /** Main index of a pipe edge, valve index of a valve edge, station index of a station edge. */
    public int edgeFeature(int e) {
        int m = base.g.edgeCount();
        return e < m ? base.g.edgeFeature(e) : add.edgeFeature[e - m];
    }

    public int edgePart(int e) {
        int m = base.g.edgeCount();
        return e < m ? base.g.edgePart(e) : add.edgePart[e - m];
    }

    public double edgeM0(int e) {
        int m = base.g.edgeCount();
        return e < m ? base.g.edgeM0(e) : add.edgeM0[e - m];
    }

    public double edgeM1(int e) {
        int m = base.g.edgeCount();
        return e < m ? base.g.edgeM1(e) : add.edgeM1[e - m];
    }

    /** Length of a pipe edge along its main (CRS units); 0 for valves and stations. */
    public double edgeLength(int e) {
        return Math.abs(edgeM1(e) - edgeM0(e));
    }

    public int opposite(int e, int v) {
        int f = edgeFrom(e);
        return f == v ? edgeTo(e) : f;
    }

    /** Number of cuts in this state (pipe edges replaced by two pieces), ordered by the cut edge. */
    public int cutCount() { return splits.size(); }

    /** The pipe edge cut by cut {@code i}; its pieces are {@link #cutFirstPiece} and the edge after it. */
    public int cutEdge(int i) { return splits.keyAt(i); }

    /** The first piece of cut {@code i} (ending at the cut); the second piece is the next edge index. */
    public int cutFirstPiece(int i) { return splits.intAt(i); }

    /** Measure of cut {@code i} along its edge's main. */
    public double cutMeasure(int i) { return splits.doubleAt(i); }

    /** True when the edge was removed (cut out, or an added bypass taken off). */
    public boolean isRemoved(int e) {
        return !removed.isEmpty() && removed.contains(e);
    }

    /** Upper bound of {@link #incidentEdges} over all nodes of this state. */
    public int maxDegree() { return base.maxDegree + add.edges * 2; }

    /** A buffer large enough for {@link #incidentEdges} on any node of this state. */
    public int[] adjacencyBuffer() { return new int[Math.max(1, maxDegree())]; }

    /**
     * Writes the edges incident to node {@code v} that are not removed into {@code buf}
     * (from index 0) and returns their count. A self-loop appears once.
     */
    public int incidentEdges(int v, int[] buf) {
        Graph g = base.g;
        int c = 0;
        if (v < g.nodeCount()) {
            boolean anyRemoved = !removed.isEmpty();
            for (int i = g.adjStart(v), end = g.adjEnd(v); i < end; i++) {
                int e = g.adjEdge(i);
                if (anyRemoved && removed.contains(e)) continue;
                buf[c++] = e;
            }
        }
        if (add.edges > 0) {
            long[] inc = add.incidence;
            int i = lowerBound(inc, (long) v << 32);
            for (; i < inc.length && (int) (inc[i] >>> 32) == v; i++) {
                int e = (int) inc[i];
                if (!removed.isEmpty() && removed.contains(e)) continue;
                buf[c++] = e;
            }
        }
        return c;
    }

    private static int lowerBound(long[] a, long key) {
        int lo = 0, hi = a.length;
        while (lo < hi) {
            int mid = (lo + hi) >>> 1;
            if (a[mid] < key) lo = mid + 1; else hi = mid;
        }
        return lo;
    }

    // ---- mains ----

    public int mainCount() { return base.g.mainCount() + add.mains; }

    public String mainId(int i) {
        int n = base.g.mainCount();
        return i < n ? base.net.mains().get(i).id() : add.mainId[i - n];
    }

    public int mainSystem(int i) {
        int n = base.g.mainCount();
        return i < n ? base.g.mainSystem(i) : add.mainSystem[i - n];
    }

    public MainStatus mainStatus(int i) {
        int o = mainStatus.getInt(i, -1);
        if (o >= 0) return STATUSES[o];
        int n = base.g.mainCount();
        return STATUSES[i < n ? base.mainStatus[i] : add.mainStatus[i - n]];
    }

    public boolean mainActive(int i) { return mainStatus(i) == MainStatus.ACTIVE; }

    /** Status of every main as a fresh array of ordinals of {@link MainStatus}; O(mains + k). */
    public byte[] mainStatusOrdinals() {
        int n = base.g.mainCount();
        byte[] s = Arrays.copyOf(base.mainStatus, mainCount());
        for (int i = 0; i < add.mains; i++) s[n + i] = add.mainStatus[i];
        for (int i = 0; i < mainStatus.size(); i++) s[mainStatus.keyAt(i)] = (byte) mainStatus.intAt(i);
        return s;
    }

    /** True when pipe edge e carries gas in this state: present and its main active. */
    public boolean pipeLive(int e) {
        return edgeKind(e) == EdgeKind.PIPE && Passage.passesBothWays(this, e);
    }

    // ---- valves ----

    public int valveCount() { return base.g.valveCount() + add.valves; }

    public String valveId(int v) {
        int n = base.g.valveCount();
        return v < n ? base.net.valves().get(v).id() : add.valveId[v - n];
    }

    /** The valve's edge in this state, or -1 when it is not attached. */
    public int valveEdge(int v) {
        int n = base.g.valveCount();
        return v < n ? base.g.valveEdge(v) : add.valveEdge[v - n];
    }

    public boolean valveClosed(int v) {
        int o = valveClosed.getInt(v, -1);
        if (o >= 0) return o == 1;
        int n = base.g.valveCount();
        return v < n ? base.valveNormallyClosed.get(v) : add.valveNormallyClosed[v - n];
    }

    /** Closed positions of every valve as a fresh BitSet; O(valves + k). */
    public BitSet closedValves() {
        BitSet b = (BitSet) base.valveNormallyClosed.clone();
        int n = base.g.valveCount();
        for (int i = 0; i < add.valves; i++) if (add.valveNormallyClosed[i]) b.set(n + i);
        for (int i = 0; i < valveClosed.size(); i++) b.set(valveClosed.keyAt(i), valveClosed.intAt(i) == 1);
        return b;
    }

    public Operability valveOperability(int v) {
        int n = base.g.valveCount();
        return v < n ? base.net.valves().get(v).operable() : OPERABILITY[add.valveOperability[v - n]];
    }

    public ValveKind valveKind(int v) {
        int n = base.g.valveCount();
        return v < n ? base.net.valves().get(v).kind() : KINDS[add.valveKind[v - n]];
    }

    /** Last inspection date, null when unknown (added valves: null). */
    public LocalDate valveChecked(int v) {
        int n = base.g.valveCount();
        return v < n ? base.net.valves().get(v).checked() : null;
    }

    // ---- stations, sources, services, taps ----

    public int stationCount() { return base.g.stationCount(); }
    public int stationEdge(int st) { return base.g.stationEdge(st); }
    public String stationId(int st) { return base.net.stations().get(st).id(); }
    public boolean stationInService(int st) { return !stationOut.contains(st); }

    public int sourceCount() { return base.g.sourceCount(); }
    public int sourceNode(int s) { return base.g.sourceNode(s); }

    public int serviceCount() { return base.g.serviceCount(); }

    /** The pipe edge service s sits on in this state (re-attachments and cuts applied), or -1. */
    public int serviceEdge(int s) {
        int i = serviceAttach.indexOf(s);
        if (i >= 0) return resolve(serviceAttach.intAt(i), serviceAttach.doubleAt(i));
        int e = base.g.serviceEdge(s);
        return e < 0 ? -1 : resolve(e, base.g.serviceMeasure(s));
    }

    public double serviceMeasure(int s) {
        int i = serviceAttach.indexOf(s);
        return i >= 0 ? serviceAttach.doubleAt(i) : base.g.serviceMeasure(s);
    }

    public int tapCount() { return base.g.tapCount(); }

    public int tapEdge(int t) {
        int i = tapAttach.indexOf(t);
        if (i >= 0) return resolve(tapAttach.intAt(i), tapAttach.doubleAt(i));
        int e = base.g.tapEdge(t);
        return e < 0 ? -1 : resolve(e, base.g.tapMeasure(t));
    }

    public double tapMeasure(int t) {
        int i = tapAttach.indexOf(t);
        return i >= 0 ? tapAttach.doubleAt(i) : base.g.tapMeasure(t);
    }

    /** The piece of (possibly cut) edge e that holds measure m. */
    private int resolve(int e, double m) {
        while (!splits.isEmpty()) {
            int i = splits.indexOf(e);
            if (i < 0) break;
            e = m <= splits.doubleAt(i) ? splits.intAt(i) : splits.intAt(i) + 1;
        }
        return e;
    }

    // ---- changes ----

    private NetworkState copy(SparseMap vc, SparseMap ms, SparseMap so, SparseMap rm, SparseMap sp,
                              SparseMap sa, SparseMap ta, Additions ad) {
        return new NetworkState(base, vc, ms, so, rm, sp, sa, ta, ad);
    }

    public NetworkState withValveClosed(int valve, boolean closed) {
        checkIndex(valve, valveCount(), "valve");
        return copy(valveClosed.with(valve, closed ? 1 : 0), mainStatus, stationOut, removed, splits,
                serviceAttach, tapAttach, add);
    }

    public NetworkState withMainStatus(int main, MainStatus status) {
        checkIndex(main, mainCount(), "main");
        return copy(valveClosed, mainStatus.with(main, status.ordinal()), stationOut, removed, splits,
                serviceAttach, tapAttach, add);
    }

    public NetworkState withStationInService(int station, boolean inService) {
        checkIndex(station, stationCount(), "station");
        SparseMap so = inService ? stationOut.without(station) : stationOut.with(station, 1);
        return copy(valveClosed, mainStatus, so, removed, splits, serviceAttach, tapAttach, add);
    }

    public NetworkState withEdgeRemoved(int edge) {
        checkIndex(edge, edgeCount(), "edge");
        return copy(valveClosed, mainStatus, stationOut, removed.with(edge, 1), splits, serviceAttach, tapAttach, add);
    }

    /** Puts back an edge removed earlier (a cut piece stays cut: its pieces are separate edges). */
    public NetworkState withEdgeRestored(int edge) {
        checkIndex(edge, edgeCount(), "edge");
        if (splits.contains(edge)) throw new IllegalArgumentException("edge " + edge + " was cut; restore its pieces");
        return copy(valveClosed, mainStatus, stationOut, removed.without(edge), splits, serviceAttach, tapAttach, add);
    }

    /** Adds a node; its index is {@link #nodeCount()} of this state. */
    public NetworkState withNode(double x, double y) {
        return copy(valveClosed, mainStatus, stationOut, removed, splits, serviceAttach, tapAttach, add.node(x, y));
    }

    /** Adds a main (e.g. a temporary bypass hose); its index is {@link #mainCount()} of this state. */
    public NetworkState withMain(String id, int system, MainStatus status) {
        checkIndex(system, base.g.systemCount(), "system");
        return copy(valveClosed, mainStatus, stationOut, removed, splits, serviceAttach, tapAttach,
                add.main(id, system, status));
    }

    /** Adds a pipe edge of main {@code main}; its index is {@link #edgeCount()} of this state. */
    public NetworkState withPipe(int from, int to, int main, int part, double m0, double m1) {
        checkIndex(from, nodeCount(), "node");
        checkIndex(to, nodeCount(), "node");
        checkIndex(main, mainCount(), "main");
        return copy(valveClosed, mainStatus, stationOut, removed, splits, serviceAttach, tapAttach,
                add.edge(EdgeKind.PIPE, from, to, main, part, m0, m1, edgeCount()));
    }

    /**
     * Adds a valve between nodes a and b: a new valve index ({@link #valveCount()} of this
     * state) and a new edge ({@link #edgeCount()} of this state).
     */
    public NetworkState withValve(int a, int b, String id, ValveKind kind, Operability operable, boolean closed) {
        checkIndex(a, nodeCount(), "node");
        checkIndex(b, nodeCount(), "node");
        int edge = edgeCount();
        Additions ad = add.valve(id, kind, operable, closed, edge).edge(EdgeKind.VALVE, a, b, valveCount(), 0, 0, 0, edge);
        return copy(valveClosed, mainStatus, stationOut, removed, splits, serviceAttach, tapAttach, ad);
    }

    /**
     * Cut and cap: pipe edge {@code edge} is replaced by two pieces that no longer meet,
     * {@code from -> c1} (edge index {@link #edgeCount()} of this state, measures m0..m)
     * and {@code c2 -> to} (the next edge index, m..m1), where c1 and c2 are two new nodes
     * at the cut point ({@link #nodeCount()} and the next one). Services and taps on the
     * old edge resolve to the piece holding their measure.
     */
    public NetworkState withCut(int edge, double measure) {
        checkIndex(edge, edgeCount(), "edge");
        if (edgeKind(edge) != EdgeKind.PIPE) throw new IllegalArgumentException("edge " + edge + " is not a pipe");
        if (isRemoved(edge)) throw new IllegalArgumentException("edge " + edge + " is removed");
        double m0 = edgeM0(edge), m1 = edgeM1(edge);
        if (measure < Math.min(m0, m1) || measure > Math.max(m0, m1)) {
            throw new IllegalArgumentException("measure " + measure + " outside edge " + edge);
        }
        Coordinate p = pointAt(edge, measure);
        int c1 = nodeCount();
        int first = edgeCount();
        int main = edgeFeature(edge), part = edgePart(edge);
        Additions ad = add.node(p.x, p.y).node(p.x, p.y)
                .edge(EdgeKind.PIPE, edgeFrom(edge), c1, main, part, m0, measure, first)
                .edge(EdgeKind.PIPE, c1 + 1, edgeTo(edge), main, part, measure, m1, first + 1);
        return copy(valveClosed, mainStatus, stationOut, removed.with(edge, 1), splits.with(edge, first, measure),
                serviceAttach, tapAttach, ad);
    }

    /** The point at {@code measure} along pipe edge e: on the main's geometry when known, else between the nodes. */
    public Coordinate pointAt(int e, double measure) {
        int main = edgeFeature(e);
        if (main < base.g.mainCount()) {
            Geometry geom = base.net.mains().get(main).geometry();
            if (geom != null && edgePart(e) < geom.getNumGeometries()) {
                return new LengthIndexedLine(geom.getGeometryN(edgePart(e))).extractPoint(measure);
            }
        }
        double m0 = edgeM0(e), m1 = edgeM1(e);
        double t = m1 == m0 ? 0 : (measure - m0) / (m1 - m0);
        int a = edgeFrom(e), b = edgeTo(e);
        return new Coordinate(nodeX(a) + t * (nodeX(b) - nodeX(a)), nodeY(a) + t * (nodeY(b) - nodeY(a)));
    }

    /** Transfer: service s now sits on pipe edge {@code edge} at {@code measure}. */
    public NetworkState withServiceAttachment(int service, int edge, double measure) {
        checkIndex(service, serviceCount(), "service");
        checkIndex(edge, edgeCount(), "edge");
        return copy(valveClosed, mainStatus, stationOut, removed, splits, serviceAttach.with(service, edge, measure),
                tapAttach, add);
    }

    /** Move of a sensing tap to pipe edge {@code edge} at {@code measure}. */
    public NetworkState withTapAttachment(int tap, int edge, double measure) {
        checkIndex(tap, tapCount(), "tap");
        checkIndex(edge, edgeCount(), "edge");
        return copy(valveClosed, mainStatus, stationOut, removed, splits, serviceAttach,
                tapAttach.with(tap, edge, measure), add);
    }

    private static void checkIndex(int i, int n, String what) {
        if (i < 0 || i >= n) throw new IndexOutOfBoundsException(what + " index " + i + " of " + n);
    }
}
