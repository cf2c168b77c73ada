package org.shutline.trace;

import java.util.Arrays;
import java.util.BitSet;
import org.shutline.model.Operability;
import org.shutline.topology.Csr;
import org.shutline.topology.EdgeKind;

/**
 * The valve-segment graph of one {@link NetworkState}: segments of {@link ValveSegments}
 * as nodes; every attached, present valve as an undirected link between the segments
 * of its two nodes; every attached, present station as a directed link from its inlet
 * segment to its outlet segment. Sources are attached to the segment of their node.
 *
 * <p>Links carry the state's facts: {@link #isOpen} (valve open, or station in service),
 * the valve's operability. {@link #canFlow} answers whether gas passes a link leaving a
 * given segment, by the one rule of {@link Passage}. Adjacency is CSR over int arrays: each valve link is listed at both its
 * segments (once when both sides are the same segment), each station link likewise (the
 * direction is tested with {@link #canFlow}).
 *
 * <p>Links are numbered valves first, in valve index order of the attached ones, then
 * stations; {@link #valveLink} and {@link #stationLink} map back.
 */
public final class SegmentGraph {
    private final ValveSegments segments;
    private final int segmentCount;
    private final byte[] linkKind;
    private final int[] linkFeature, linkA, linkB;
    private final boolean[] linkOpen;
    private final byte[] linkOperability;
    private final int[] adjStart, adjLink;
    /** Adjacency without the links whose two sides are one segment (they never change a reach). */
    private final int[] crossStart, crossLink;
    private final int[] valveLink, stationLink;
    private final int[] sourceSegment;
    private final BitSet sourceSegments;

    SegmentGraph(NetworkState s, ValveSegments seg) {
        this.segments = seg;
        this.segmentCount = seg.segmentCount();
        int nv = s.valveCount(), ns = s.stationCount();
        valveLink = new int[nv];
        stationLink = new int[ns];
        Arrays.fill(valveLink, -1);
        Arrays.fill(stationLink, -1);
        int links = 0;
        for (int v = 0; v < nv; v++) if (present(s, s.valveEdge(v))) valveLink[v] = links++;
        for (int st = 0; st < ns; st++) if (present(s, s.stationEdge(st))) stationLink[st] = links++;
        linkKind = new byte[links];
        linkFeature = new int[links];
        linkA = new int[links];
        linkB = new int[links];
        linkOpen = new boolean[links];
        linkOperability = new byte[links];
        for (int v = 0; v < nv; v++) {
            int l = valveLink[v];
            if (l < 0) continue;
            int e = s.valveEdge(v);
            set(l, EdgeKind.VALVE, v, seg.nodeSegment(s.edgeFrom(e)), seg.nodeSegment(s.edgeTo(e)),
                    Passage.isOpen(s, EdgeKind.VALVE, v));
            linkOperability[l] = (byte) s.valveOperability(v).ordinal();
        }
        for (int st = 0; st < ns; st++) {
            int l = stationLink[st];
            if (l < 0) continue;
            int e = s.stationEdge(st);
            set(l, EdgeKind.STATION, st, seg.nodeSegment(s.edgeFrom(e)), seg.nodeSegment(s.edgeTo(e)),
                    Passage.isOpen(s, EdgeKind.STATION, st));
            linkOperability[l] = (byte) Operability.YES.ordinal();
        }
        Csr adj = Csr.incidence(segmentCount, linkA, linkB, links);
        adjStart = adj.start();
        adjLink = adj.items();
        Csr cross = Csr.build(segmentCount, sink -> {
            for (int u = 0; u < segmentCount; u++) {
                for (int i = adjStart[u]; i < adjStart[u + 1]; i++) if (linkA[adjLink[i]] != linkB[adjLink[i]]) sink.add(u, adjLink[i]);
            }
        });
        crossStart = cross.start();
        crossLink = cross.items();
        sourceSegment = new int[s.sourceCount()];
        sourceSegments = new BitSet(segmentCount);
        for (int i = 0; i < sourceSegment.length; i++) {
            int node = s.sourceNode(i);
            sourceSegment[i] = node < 0 ? -1 : seg.nodeSegment(node);
            if (sourceSegment[i] >= 0) sourceSegments.set(sourceSegment[i]);
        }
    }

    private static boolean present(NetworkState s, int e) {
        return e >= 0 && !s.isRemoved(e);
    }

    private void set(int l, byte kind, int feature, int a, int b, boolean open) {
        linkKind[l] = kind;
        linkFeature[l] = feature;
        linkA[l] = a;
        linkB[l] = b;
        linkOpen[l] = open;
    }

    public ValveSegments segments() { return segments; }
    public int segmentCount() { return segmentCount; }
    public int linkCount() { return linkKind.length; }
    /** {@link EdgeKind#VALVE} or {@link EdgeKind#STATION}. */
    public byte linkKind(int l) { return linkKind[l]; }
    public boolean isValve(int l) { return linkKind[l] == EdgeKind.VALVE; }
    /** Valve or station index of a link. */
    public int linkFeature(int l) { return linkFeature[l]; }
    /** Segment of the valve's from node, or the station's inlet segment. */
    public int linkA(int l) { return linkA[l]; }
    /** Segment of the valve's to node, or the station's outlet segment. */
    public int linkB(int l) { return linkB[l]; }
    public int other(int l, int seg) { return linkA[l] == seg ? linkB[l] : linkA[l]; }
    /** Valve open, or station in service, in the state this graph was built from. */
    public boolean isOpen(int l) { return linkOpen[l]; }
    /** Operability of a valve link ({@code YES} for stations). */
    public Operability operability(int l) { return Operability.values()[linkOperability[l]]; }
    /** True for an open valve with {@code operable = no}: it cannot be relied on to close. */
    public boolean isOpenInoperable(int l) {
        return linkKind[l] == EdgeKind.VALVE && linkOpen[l] && linkOperability[l] == Operability.NO.ordinal();
    }

    /**
     * Whether gas passes link l leaving segment {@code from} by the {@link Passage} rule:
     * open valve, or in-service station from its inlet segment to another segment.
     */
    public boolean canFlow(int l, int from) {
        return Passage.passes(linkKind[l], linkOpen[l], linkA[l], linkB[l], from);
    }

    /**
     * Whether station link l feeds {@code region} straight in: gas passes it
     * ({@link #canFlow} from its inlet) from an inlet segment outside the region that is
     * in {@code fed} to an outlet segment inside it. False for valve links and for -1.
     */
    public boolean feedsInto(int l, BitSet region, BitSet fed) {
        if (l < 0 || linkKind[l] != EdgeKind.STATION) return false;
        int a = linkA[l], b = linkB[l];
        return canFlow(l, a) && region.get(b) && !region.get(a) && fed.get(a);
    }

    public int adjStart(int seg) { return adjStart[seg]; }
    public int adjEnd(int seg) { return adjStart[seg + 1]; }
    public int adjLink(int i) { return adjLink[i]; }

    /**
     * Like {@link #adjStart}, over the links of a segment whose other side is another
     * segment (same order as the full adjacency, the one-segment links left out). In a
     * meshed grid most valves have the one large segment on both sides; searches and
     * boundary scans skip them this way.
     */
    public int crossStart(int seg) { return crossStart[seg]; }
    public int crossEnd(int seg) { return crossStart[seg + 1]; }
    public int crossLink(int i) { return crossLink[i]; }

    /** Link of a valve, or -1 when the valve is not attached or its edge is removed. */
    public int valveLink(int valve) { return valveLink[valve]; }
    public int stationLink(int station) { return stationLink[station]; }
    public int sourceCount() { return sourceSegment.length; }
    public int sourceSegment(int source) { return sourceSegment[source]; }
    public boolean hasSource(int seg) { return sourceSegments.get(seg); }

    /** Valves bounding a segment (state valve indices, ascending). */
    public int[] valvesOf(int seg) {
        int c = 0;
        int[] out = new int[adjStart[seg + 1] - adjStart[seg]];
        for (int i = adjStart[seg]; i < adjStart[seg + 1]; i++) {
            int l = adjLink[i];
            if (linkKind[l] == EdgeKind.VALVE) out[c++] = linkFeature[l];
        }
        out = Arrays.copyOf(out, c);
        Arrays.sort(out);
        return out;
    }

    /**
     * Segments reached from the source segments, gas flowing by {@link #canFlow}, never
     * entering a segment in {@code blocked} (may be null) nor crossing a link in
     * {@code blockedLinks} (may be null). O(segments + links).
     */
    public BitSet reachFromSources(BitSet blocked, BitSet blockedLinks) {
        return reach(blocked, blockedLinks, null, null);
    }

    /**
     * Segments reached from the source segments, gas flowing by {@link #canFlow}, never
     * entering a segment in {@code blocked} (may be null) nor passing a station in
     * {@code stoppedStations} (station indices; may be null). O(segments + links).
     */
    public BitSet reachFromSourcesStopping(BitSet blocked, BitSet stoppedStations) {
        return reach(blocked, null, stoppedStations, null);
    }

    /**
     * The search behind the others, every restriction optional (null for none): gas
     * starts at the segments of the sources not in {@code shutSources} (source indices),
     * flows by {@link #canFlow}, never enters a segment in {@code blocked}, never crosses
     * a link in {@code blockedLinks} nor a station in {@code stoppedStations} (station
     * indices). Breadth-first over the links between two different segments,
     * O(segments + links).
     */
    public BitSet reach(BitSet blocked, BitSet blockedLinks, BitSet stoppedStations, BitSet shutSources) {
        BitSet seen = new BitSet(segmentCount);
        int[] queue = new int[Math.max(1, segmentCount)];
        int head = 0, tail = 0;
        for (int i = 0; i < sourceSegment.length; i++) {
            int seg = sourceSegment[i];
            if (seg >= 0 && !seen.get(seg) && (blocked == null || !blocked.get(seg)) && (shutSources == null || !shutSources.get(i))) {
                seen.set(seg);
                queue[tail++] = seg;
            }
        }
        while (head < tail) {
            int u = queue[head++];
            for (int i = crossStart[u]; i < crossStart[u + 1]; i++) {
                int l = crossLink[i];
                if (!canFlow(l, u) || (blockedLinks != null && blockedLinks.get(l))) continue;
                if (stoppedStations != null && linkKind[l] == EdgeKind.STATION && stoppedStations.get(linkFeature[l])) continue;
                int w = other(l, u);
                if (seen.get(w) || (blocked != null && blocked.get(w))) continue;
                seen.set(w);
                queue[tail++] = w;
            }
        }
        return seen;
    }

    /**
     * Breadth-first hop counts from the source segments, gas flowing by {@link #canFlow}
     * before any closing ({@link Integer#MAX_VALUE} for a segment not reached); a fresh
     * array. O(segments + links).
     */
    public int[] hopsFromSources() {
        int[] d = new int[segmentCount];
        Arrays.fill(d, Integer.MAX_VALUE);
        int[] queue = new int[Math.max(1, segmentCount)];
        int head = 0, tail = 0;
        for (int seg : sourceSegment) {
            if (seg >= 0 && d[seg] != 0) {
                d[seg] = 0;
                queue[tail++] = seg;
            }
        }
        while (head < tail) {
            int u = queue[head++];
            for (int i = adjStart[u]; i < adjStart[u + 1]; i++) {
                int l = adjLink[i];
                if (!canFlow(l, u)) continue;
                int w = other(l, u);
                if (d[w] == Integer.MAX_VALUE) {
                    d[w] = d[u] + 1;
                    queue[tail++] = w;
                }
            }
        }
        return d;
    }
}
