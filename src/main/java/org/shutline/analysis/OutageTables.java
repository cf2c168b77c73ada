package org.shutline.analysis;

import org.shutline.topology.Csr;
import java.util.Arrays;
import org.shutline.model.Progress;
import org.shutline.trace.SegmentGraph;
import org.shutline.trace.ValveSegments;

/**
 * All-cases outage tables of one network state, without re-tracing per case:
 * services and meters off when each segment is isolated, when each station is out,
 * and when each relied-on valve fails to close.
 *
 * <p>Method. <em>Isolation units</em> are the valve segments merged across open valves
 * with {@code operable = no} (union-find); closed valves and stations out of service
 * are left out. A directed graph is built on: a virtual super-source (node 0) linked to
 * every unit holding a source; the units; and one node per in-service station, split
 * out of its link (inlet unit -> station node -> outlet unit), so that a station is a
 * node the tree can speak of. Each open relied-on valve between two units gives arcs
 * both ways. One dominator tree from the super-source ({@link Dominators}: Cooper,
 * Harvey and Kennedy 2001, iterative) then answers:
 * <ul>
 * <li>isolating unit u puts off exactly the units u dominates (every other unit keeps
 *     a path from a source avoiding u): the sum over u's dominator subtree;</li>
 * <li>a station out puts off its station node's subtree;</li>
 * <li>valve v between units a and b failing to close turns the region a (or b) into
 *     a+b. When one dominates the other, the answer is the dominator's subtree. Else it
 *     is computed exactly by {@link PairCut}: the two subtrees plus the nodes every
 *     source path reaches only through a or b, found by a local search (forward from the
 *     two subtrees over lost nodes only, each candidate decided by a backward search
 *     that stops at a node whose path in a BFS spanning tree avoids a and b), capped and
 *     falling back to a BFS inside the subtree of their nearest common dominator.</li>
 * </ul>
 * Only units fed in the state count (unfed ones belong to no subtree).
 *
 * <p>Cost. Units and graph O(segments + links) with near-constant union-find; the
 * dominator tree O(N + E) per pass, a few passes; subtree sums O(N). Per valve: O(1) when
 * one side dominates the other; else typically O(|sub(a)| + |sub(b)| and their arcs) in
 * meshed layouts, never more than O(size of the common dominator's subtree and its
 * arcs), so the valve table is O(V (N + E)) in the worst case. Measured on a 200 x 200
 * grid (151 414 nodes, 55 707 valves): all tables in about 0.14 s against about 53 s for
 * the brute force (docs/engine.md). The plain per-case reference, one traversal per
 * case, is test code ({@code BruteForceOutages}, timed by {@code bench.OutageBenchmark}).
 */
public final class OutageTables {
    private final ValveSegments segs;
    private final int[] unitOf;
    private final int units;
    private final long[] segServicesOff, segMetersOff;
    private final long[] stationServicesOff, stationMetersOff;
    private final long[] valveServicesOff, valveMetersOff;
    private final boolean[] valveRelied;
    private final int[] valveUnitA, valveUnitB;
    private final long[] unitServicesOff;
    /** The dominator tree over super-source, units and station nodes (shared with {@link RiskTables}). */
    private final Dominators dom;
    /** Units fed straight in by a station: isolating them stops the station by its valves (per-case counts). */
    private final java.util.Map<Integer, Isolation.Counts> stationFed = new java.util.HashMap<>();

    private OutageTables(ValveSegments segs, Progress progress, boolean localPairs) {
        this.segs = segs;
        SegmentGraph sg = segs.graph();
        int nseg = sg.segmentCount();
        progress.begin("outage tables", sg.linkCount());
        unitOf = units(sg);
        units = Arrays.stream(unitOf).max().orElse(-1) + 1;
        int nst = segs.state().stationCount();
        int nodes = 1 + units + nst;
        long[] svc = new long[nodes];
        long[] met = new long[nodes];
        for (int s = 0; s < nseg; s++) {
            svc[1 + unitOf[s]] += segs.serviceCount(s);
            met[1 + unitOf[s]] += segs.meters(s);
        }
        int[][] csr = arcs(sg, nodes);
        dom = new Dominators(nodes, csr[0], csr[1]);
        long[] subSvc = dom.subtreeSums(svc);
        long[] subMet = dom.subtreeSums(met);
        unitServicesOff = new long[units];
        for (int u = 0; u < units; u++) if (dom.isReachable(1 + u)) unitServicesOff[u] = subSvc[1 + u];
        segServicesOff = new long[nseg];
        segMetersOff = new long[nseg];
        for (int s = 0; s < nseg; s++) {
            int u = 1 + unitOf[s];
            if (dom.isReachable(u)) {
                segServicesOff[s] = subSvc[u];
                segMetersOff[s] = subMet[u];
            }
        }
        stationServicesOff = new long[nst];
        stationMetersOff = new long[nst];
        for (int st = 0; st < nst; st++) {
            int x = 1 + units + st;
            if (dom.isReachable(x)) {
                stationServicesOff[st] = subSvc[x];
                stationMetersOff[st] = subMet[x];
            }
        }
        int nv = segs.state().valveCount();
        valveServicesOff = new long[nv];
        valveMetersOff = new long[nv];
        valveRelied = new boolean[nv];
        valveUnitA = new int[nv];
        valveUnitB = new int[nv];
        Arrays.fill(valveUnitA, -1);
        Arrays.fill(valveUnitB, -1);
        PairCut loss = new PairCut(dom, csr[0], csr[1], svc, met, subSvc, subMet);
        loss.localAllowed = localPairs;
        for (int v = 0; v < nv; v++) {
            int l = sg.valveLink(v);
            if (l < 0 || !sg.isOpen(l) || sg.isOpenInoperable(l)) continue;
            if ((v & 0x3FF) == 0) progress.checkCancelled();
            valveRelied[v] = true;
            int a = 1 + unitOf[sg.linkA(l)], b = 1 + unitOf[sg.linkB(l)];
            valveUnitA[v] = a - 1;
            valveUnitB[v] = b - 1;
            loss.compute(a, b);
            valveServicesOff[v] = loss.services;
            valveMetersOff[v] = loss.meters;
        }
        stationFedCases(sg);
    }

    /**
     * The cases the dominator tree does not answer. Isolating a unit that an in-service
     * station feeds straight in (outlet in the unit, fed inlet outside it) stops that
     * station by closing its stop valves ({@link StationStop}), which takes the inlet pipe
     * between them, and whatever hangs on it, off gas as well: a set of units, not one
     * node. These units (a few per station), and the failure of each relied-on valve
     * beside one, are counted by a per-case {@link Isolation}.
     */
    private void stationFedCases(SegmentGraph sg) {
        int nst = segs.state().stationCount();
        java.util.BitSet fed = new java.util.BitSet(units);
        for (int st = 0; st < nst; st++) {
            int l = sg.stationLink(st);
            if (l < 0 || !sg.isOpen(l)) continue;
            int a = unitOf[sg.linkA(l)], b = unitOf[sg.linkB(l)];
            if (a != b && dom.isReachable(1 + a)) fed.set(b);
        }
        if (fed.isEmpty()) return;
        // only the counts are read: they do not depend on the inspection date
        Isolation iso = new Isolation(segs, ValveDoubt.Settings.defaults(java.time.LocalDate.of(2000, 1, 1)));
        java.util.Map<Integer, java.util.BitSet> unitSegs = new java.util.HashMap<>();
        for (int s = 0; s < unitOf.length; s++) if (fed.get(unitOf[s])) unitSegs.computeIfAbsent(unitOf[s], k -> new java.util.BitSet()).set(s);
        for (var e : unitSegs.entrySet()) {
            int u = e.getKey();
            Isolation.Counts c = iso.counts(e.getValue());
            stationFed.put(u, c);
            unitServicesOff[u] = c.services();
            for (int s = e.getValue().nextSetBit(0); s >= 0; s = e.getValue().nextSetBit(s + 1)) {
                segServicesOff[s] = c.services();
                segMetersOff[s] = c.meters();
            }
        }
        for (int v = 0; v < valveRelied.length; v++) {
            if (!valveRelied[v] || !(fed.get(valveUnitA[v]) || fed.get(valveUnitB[v]))) continue;
            java.util.BitSet seed = new java.util.BitSet();
            int l = sg.valveLink(v);
            seed.set(sg.linkA(l));
            seed.set(sg.linkB(l));
            Isolation.Counts c = iso.counts(seed);
            valveServicesOff[v] = c.services();
            valveMetersOff[v] = c.meters();
        }
    }

    /** The per-case counts of a unit a station feeds straight in, or null for any other unit. */
    Isolation.Counts stationFedCounts(int unit) {
        return stationFed.get(unit);
    }

    public static OutageTables build(ValveSegments segs) {
        return new OutageTables(segs, Progress.NONE, true);
    }

    /** Tables whose valve cases all use the BFS in the common dominator's subtree (tests). */
    static OutageTables buildWithoutLocalPairs(ValveSegments segs) {
        return new OutageTables(segs, Progress.NONE, false);
    }

    public static OutageTables build(ValveSegments segs, Progress progress) {
        return new OutageTables(segs, progress, true);
    }

    /** Union-find of segments across open inoperable valves; units numbered 0.. in segment order. */
    private static int[] units(SegmentGraph sg) {
        int n = sg.segmentCount();
        int[] parent = new int[n];
        for (int i = 0; i < n; i++) parent[i] = i;
        for (int l = 0; l < sg.linkCount(); l++) {
            if (!sg.isOpenInoperable(l)) continue;
            int a = find(parent, sg.linkA(l)), b = find(parent, sg.linkB(l));
            if (a != b) parent[Math.max(a, b)] = Math.min(a, b);
        }
        int[] id = new int[n];
        Arrays.fill(id, -1);
        int[] unit = new int[n];
        int c = 0;
        for (int i = 0; i < n; i++) {
            int r = find(parent, i);
            if (id[r] < 0) id[r] = c++;
            unit[i] = id[r];
        }
        return unit;
    }

    private static int find(int[] p, int x) {
        while (p[x] != x) {
            p[x] = p[p[x]];
            x = p[x];
        }
        return x;
    }

    /** CSR successor lists: 0 = super-source, 1..units = units, then one node per station. */
    private int[][] arcs(SegmentGraph sg, int nodes) {
        int[] from = new int[sg.linkCount() * 2 + sg.sourceCount() + 1];
        int[] to = new int[from.length];
        int c = 0;
        for (int i = 0; i < sg.sourceCount(); i++) {
            int s = sg.sourceSegment(i);
            if (s < 0) continue;
            from[c] = 0;
            to[c++] = 1 + unitOf[s];
        }
        for (int l = 0; l < sg.linkCount(); l++) {
            if (!sg.isOpen(l)) continue;
            int a = 1 + unitOf[sg.linkA(l)], b = 1 + unitOf[sg.linkB(l)];
            if (sg.isValve(l)) {
                if (a == b) continue;
                from[c] = a;
                to[c++] = b;
                from[c] = b;
                to[c++] = a;
            } else {
                int x = 1 + units + sg.linkFeature(l);
                from[c] = a;
                to[c++] = x;
                from[c] = x;
                to[c++] = b;
            }
        }
        int arcs = c;
        Csr g = Csr.build(nodes, sink -> {
            for (int i = 0; i < arcs; i++) sink.add(from[i], to[i]);
        });
        return new int[][] {g.start(), g.items()};
    }

    public ValveSegments segments() { return segs; }
    /** The dominator tree: node 0 the super-source, 1..units the units, then one node per station. */
    Dominators dominators() { return dom; }
    public int unitCount() { return units; }
    /** Isolation unit of a segment. */
    public int unitOf(int segment) { return unitOf[segment]; }

    /** Services off when segment s is isolated (its unit's dominator subtree); 0 when s is not fed. */
    public long servicesOffWhenIsolated(int segment) { return segServicesOff[segment]; }
    public long metersOffWhenIsolated(int segment) { return segMetersOff[segment]; }

    /** Services off when station st is out of service; 0 when it feeds nothing. */
    public long servicesOffWhenStationOut(int station) { return stationServicesOff[station]; }
    public long metersOffWhenStationOut(int station) { return stationMetersOff[station]; }

    /** True for an open valve that is relied on (operable yes or unknown) and attached. */
    public boolean isRelied(int valve) { return valveRelied[valve]; }

    /** Services off when the region on both sides of valve v is off (v failed to close); 0 when not relied on. */
    public long servicesOffWhenFails(int valve) { return valveServicesOff[valve]; }
    public long metersOffWhenFails(int valve) { return valveMetersOff[valve]; }

    /**
     * How many more services go off when isolating the unit on side A of valve v (its
     * from node) and v fails to close: off(a+b) - off(a). Side B: {@link #growthFromSideB}.
     */
    public long growthFromSideA(int valve) {
        return valveRelied[valve] ? valveServicesOff[valve] - unitOff(valveUnitA[valve]) : 0;
    }

    public long growthFromSideB(int valve) {
        return valveRelied[valve] ? valveServicesOff[valve] - unitOff(valveUnitB[valve]) : 0;
    }

    private long unitOff(int unit) {
        return unitServicesOff[unit];
    }
}
