package org.shutline.analysis;

import java.util.BitSet;
import org.shutline.trace.SegmentGraph;
import org.shutline.trace.ValveSegments;

/**
 * The plain reference for {@link OutageTables}: one traversal of the segment graph
 * from the sources per case. Isolating segment s: the region is s grown across open
 * inoperable valves, never entered. A station out: its link never crossed. Valve v
 * failing: the region is both its sides grown across open inoperable valves. A station
 * that feeds a region straight in (outlet in it, fed inlet outside) is stopped as the
 * instruction says: its {@link StationStop} region never entered when valves do it
 * (the stop itself is checked by re-trace in {@link InstructionCheck}), else its link
 * never crossed. Services off = services in segments fed before and not reached.
 * O(cases x (segments + links)). Test code: the reference of the outage and risk table
 * tests and the baseline that {@code bench.OutageBenchmark} times the tables against.
 */
public final class BruteForceOutages {
    private final ValveSegments segs;
    private final SegmentGraph sg;
    private final BitSet before;

    private final Isolation stops;

    public BruteForceOutages(ValveSegments segs) {
        this.segs = segs;
        this.sg = segs.graph();
        this.before = sg.reachFromSources(null, null);
        this.stops = new Isolation(segs, ValveDoubt.Settings.defaults(java.time.LocalDate.of(2000, 1, 1)));
    }

    public long servicesOffWhenIsolated(int segment) {
        return off(region(segment, -1), null)[0];
    }

    public long metersOffWhenIsolated(int segment) {
        return off(region(segment, -1), null)[1];
    }

    public long servicesOffWhenStationOut(int station) {
        return stationOut(station)[0];
    }

    public long metersOffWhenStationOut(int station) {
        return stationOut(station)[1];
    }

    /** Services off when valve v fails while its sides are isolated; 0 when v is closed, inoperable or unattached. */
    public long servicesOffWhenFails(int valve) {
        return fails(valve)[0];
    }

    public long metersOffWhenFails(int valve) {
        return fails(valve)[1];
    }

    private long[] fails(int valve) {
        int l = sg.valveLink(valve);
        if (l < 0 || !sg.isOpen(l) || sg.isOpenInoperable(l)) return new long[2];
        return off(region(sg.linkA(l), sg.linkB(l)), null);
    }

    private long[] stationOut(int station) {
        int l = sg.stationLink(station);
        if (l < 0) return new long[2];
        BitSet links = new BitSet(sg.linkCount());
        links.set(l);
        return off(new BitSet(), links);
    }

    private BitSet region(int a, int b) {
        BitSet r = new BitSet(sg.segmentCount());
        int[] stack = new int[sg.segmentCount() + 2];
        int top = 0;
        r.set(a);
        stack[top++] = a;
        if (b >= 0 && !r.get(b)) {
            r.set(b);
            stack[top++] = b;
        }
        while (top > 0) {
            int u = stack[--top];
            for (int i = sg.adjStart(u); i < sg.adjEnd(u); i++) {
                int l = sg.adjLink(i);
                if (!sg.isOpenInoperable(l)) continue;
                int w = sg.other(l, u);
                if (!r.get(w)) {
                    r.set(w);
                    stack[top++] = w;
                }
            }
        }
        return r;
    }

    private long[] off(BitSet region, BitSet blockedLinks) {
        BitSet blocked = (BitSet) region.clone();
        for (int st = 0; st < segs.state().stationCount(); st++) {
            int l = sg.stationLink(st);
            if (!sg.feedsInto(l, region, before)) continue;
            StationStop.Result stop = stops.stationStop(st);
            if (stop.byValves()) {
                blocked.or(stop.isolation().region());
            } else {
                if (blockedLinks == null) blockedLinks = new BitSet(sg.linkCount());
                blockedLinks.set(l);
            }
        }
        BitSet after = sg.reachFromSources(blocked, blockedLinks);
        BitSet lost = (BitSet) before.clone();
        lost.andNot(after);
        long[] out = new long[2];
        for (int s = lost.nextSetBit(0); s >= 0; s = lost.nextSetBit(s + 1)) {
            out[0] += segs.serviceCount(s);
            out[1] += segs.meters(s);
        }
        return out;
    }
}
