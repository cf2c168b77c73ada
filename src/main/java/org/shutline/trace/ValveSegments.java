package org.shutline.trace;

import java.util.Arrays;
import java.util.BitSet;
import java.util.List;
import org.shutline.model.Progress;
import org.shutline.model.Service;
import org.shutline.topology.Csr;
import org.shutline.topology.EdgeKind;

/**
 * Valve segments of one {@link NetworkState}: the connected pieces of pipe that closing
 * their adjacent valves isolates together (Jun and Loganathan, "Valve-controlled
 * segments in water distribution systems", J. Water Resources Planning and Management,
 * 2007, applied to gas mains).
 *
 * <p>A segment is a connected component of the nodes joined by pipe edges of
 * {@code ACTIVE} mains (removed edges excluded). Every valve, closed, inoperable or
 * unknown alike, and every station bounds segments: they are links between segments,
 * never inside one. Every node that touches an active pipe edge, a valve, a station or
 * a source belongs to exactly one segment; a node that touches none of those (only
 * abandoned or proposed pipe) belongs to none ({@code -1}).
 *
 * <p>A valve whose side has no active pipe (it sits on an abandoned or proposed main,
 * at a dead end, or back to back with another valve) links to an <em>empty segment</em>
 * on that side: a segment with no mains and no services. Empty segments keep chains of
 * valves and stations connected (gas passes valve-nipple-valve) and cost nothing in an
 * isolation: they hold nobody, and a valve whose far side is an empty segment with no
 * source beyond is never listed.
 *
 * <p>Per segment: the mains with at least one active edge in it, the services on its
 * pipe (services on inactive pipe belong to no segment), their meters, and its bounding
 * valves. Cost O(nodes + edges + services); cancellation checked every 4096 nodes.
 */
public final class ValveSegments {
    private final NetworkState state;
    private final int count;
    private final int[] nodeSegment;
    private final int[] edgeSegment;
    private final int[] serviceSegment;
    private final int[] mainStart, mainList;
    private final int[] serviceStart, serviceList;
    private final long[] meters;
    private final SegmentGraph graph;

    private ValveSegments(NetworkState state, int count, int[] nodeSegment, int[] edgeSegment, int[] serviceSegment,
                          Csr mains, Csr services, long[] meters) {
        this.state = state;
        this.count = count;
        this.nodeSegment = nodeSegment;
        this.edgeSegment = edgeSegment;
        this.serviceSegment = serviceSegment;
        this.mainStart = mains.start();
        this.mainList = mains.items();
        this.serviceStart = services.start();
        this.serviceList = services.items();
        this.meters = meters;
        this.graph = new SegmentGraph(state, this);
    }

    public static ValveSegments build(NetworkState s) {
        return build(s, Progress.NONE);
    }

    public static ValveSegments build(NetworkState s, Progress progress) {
        int n = s.nodeCount(), m = s.edgeCount();
        progress.begin("valve segments", n);
        boolean[] active = new boolean[s.mainCount()];
        for (int i = 0; i < active.length; i++) active[i] = Passage.isOpen(s, EdgeKind.PIPE, i); // pipe joins a segment when gas passes it
        boolean[] wanted = new boolean[n];
        for (int e = 0; e < m; e++) {
            if (s.isRemoved(e)) continue;
            if (s.edgeKind(e) != EdgeKind.PIPE || active[s.edgeFeature(e)]) {
                wanted[s.edgeFrom(e)] = true;
                wanted[s.edgeTo(e)] = true;
            }
        }
        for (int i = 0; i < s.sourceCount(); i++) if (s.sourceNode(i) >= 0) wanted[s.sourceNode(i)] = true;

        int[] nodeSeg = new int[n];
        Arrays.fill(nodeSeg, -1);
        int[] queue = new int[Math.max(1, n)];
        int[] buf = s.adjacencyBuffer();
        int segs = 0, steps = 0;
        for (int root = 0; root < n; root++) {
            if (!wanted[root] || nodeSeg[root] >= 0) continue;
            int head = 0, tail = 0;
            queue[tail++] = root;
            nodeSeg[root] = segs;
            while (head < tail) {
                int v = queue[head++];
                if ((++steps & 0xFFF) == 0) {
                    progress.checkCancelled();
                    progress.done(steps);
                }
                int c = s.incidentEdges(v, buf);
                for (int i = 0; i < c; i++) {
                    int e = buf[i];
                    if (s.edgeKind(e) != EdgeKind.PIPE || !active[s.edgeFeature(e)]) continue;
                    int w = s.opposite(e, v);
                    if (nodeSeg[w] < 0) {
                        nodeSeg[w] = segs;
                        queue[tail++] = w;
                    }
                }
            }
            segs++;
        }
        int[] edgeSeg = new int[m];
        Arrays.fill(edgeSeg, -1);
        for (int e = 0; e < m; e++) {
            if (!s.isRemoved(e) && s.edgeKind(e) == EdgeKind.PIPE && active[s.edgeFeature(e)]) {
                edgeSeg[e] = nodeSeg[s.edgeFrom(e)];
            }
        }
        int[] serviceSeg = new int[s.serviceCount()];
        List<Service> services = s.network().services();
        long[] meters = new long[segs];
        for (int i = 0; i < serviceSeg.length; i++) {
            int e = s.serviceEdge(i);
            serviceSeg[i] = e < 0 ? -1 : edgeSeg[e];
            if (serviceSeg[i] >= 0) meters[serviceSeg[i]] += services.get(i).meters();
        }
        Csr mainsCsr = mainsBySegment(s, edgeSeg, segs);
        Csr servicesCsr = Csr.group(serviceSeg, segs);
        return new ValveSegments(s, segs, nodeSeg, edgeSeg, serviceSeg, mainsCsr, servicesCsr, meters);
    }

    /** CSR of the distinct mains per segment (a main may span several segments), mains ascending. */
    private static Csr mainsBySegment(NetworkState s, int[] edgeSeg, int segs) {
        long[] pairs = new long[edgeSeg.length];
        int c = 0;
        for (int e = 0; e < edgeSeg.length; e++) {
            if (edgeSeg[e] >= 0) pairs[c++] = ((long) edgeSeg[e] << 32) | s.edgeFeature(e);
        }
        Arrays.sort(pairs, 0, c);
        int n = c;
        return Csr.build(segs, sink -> {
            for (int i = 0; i < n; i++) if (i == 0 || pairs[i] != pairs[i - 1]) sink.add((int) (pairs[i] >>> 32), (int) pairs[i]);
        });
    }

    public NetworkState state() { return state; }
    public int segmentCount() { return count; }
    /** Segment of a node, or -1 (node only on inactive pipe). */
    public int nodeSegment(int node) { return nodeSegment[node]; }
    /** Segment of an active pipe edge, or -1 (not a pipe, removed, or its main not active). */
    public int edgeSegment(int edge) { return edgeSegment[edge]; }
    /** Segment of a service, or -1 (unattached or on inactive pipe). */
    public int serviceSegment(int service) { return serviceSegment[service]; }

    public int[] mains(int seg) { return Arrays.copyOfRange(mainList, mainStart[seg], mainStart[seg + 1]); }
    public int mainCount(int seg) { return mainStart[seg + 1] - mainStart[seg]; }
    public int[] services(int seg) { return Arrays.copyOfRange(serviceList, serviceStart[seg], serviceStart[seg + 1]); }
    public int serviceCount(int seg) { return serviceStart[seg + 1] - serviceStart[seg]; }
    public long meters(int seg) { return meters[seg]; }
    /** First index into {@link #serviceAt} of segment seg's services (CSR, services ascending). */
    public int serviceStart(int seg) { return serviceStart[seg]; }
    /** One past the last index into {@link #serviceAt} of segment seg's services. */
    public int serviceEnd(int seg) { return serviceStart[seg + 1]; }
    /** The i-th entry of the services-by-segment list (use with {@link #serviceStart}/{@link #serviceEnd}); no copy. */
    public int serviceAt(int i) { return serviceList[i]; }
    /**
     * The services of a set of segments (every service lies in at most one segment), a
     * fresh set: from the per-segment lists, or, for more than half of the segments, from
     * every service in a segment minus those of the others; O(services reported) either way.
     */
    public BitSet servicesOf(BitSet segments) {
        if (segments.cardinality() * 2 > count) {
            BitSet out = inSegment();
            for (int seg = segments.nextClearBit(0); seg < count; seg = segments.nextClearBit(seg + 1)) {
                for (int i = serviceStart[seg]; i < serviceStart[seg + 1]; i++) out.clear(serviceList[i]);
            }
            return out;
        }
        BitSet out = new BitSet(); // grows to the highest service set: few words for a small set
        for (int seg = segments.nextSetBit(0); seg >= 0; seg = segments.nextSetBit(seg + 1)) {
            for (int i = serviceStart[seg]; i < serviceStart[seg + 1]; i++) out.set(serviceList[i]);
        }
        return out;
    }

    /** The meters of a set of segments, from the per-segment sums. */
    public long metersOf(BitSet segments) {
        long m = 0;
        for (int seg = segments.nextSetBit(0); seg >= 0; seg = segments.nextSetBit(seg + 1)) m += meters[seg];
        return m;
    }

    /** Services that lie in a segment; built on first use and shared (a copy is returned). */
    private volatile BitSet inSegment;

    private BitSet inSegment() {
        BitSet b = inSegment;
        if (b == null) {
            b = new BitSet(serviceSegment.length);
            for (int i = 0; i < serviceSegment.length; i++) if (serviceSegment[i] >= 0) b.set(i);
            inSegment = b;
        }
        return (BitSet) b.clone();
    }

    /** True for a segment with no active pipe (see class comment). */
    public boolean isEmpty(int seg) { return mainCount(seg) == 0; }
    /** Valves (state indices) on the boundary of a segment. */
    public int[] boundingValves(int seg) { return graph.valvesOf(seg); }
    public SegmentGraph graph() { return graph; }
}
