package org.shutline.analysis;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.BitSet;
import java.util.List;
import org.shutline.trace.NetworkState;
import org.shutline.trace.SegmentGraph;

/**
 * The isolation of one region of segments, without fallbacks or alternatives: the core
 * that {@link Isolation} computes once for the zone and once per fallback or alternative
 * it tries. The region (already grown across open inoperable valves) is never entered;
 * sources in it and stations feeding it straight in ({@link SegmentGraph#feedsInto}) are
 * named, each station stopped by its {@link StationStop} valves when valves do it (its
 * inlet-side region then never entered either), else not crossed; {@code after} is the
 * reach from the sources, {@code off} the segments fed before and not after. The
 * region's bounding valves are then classified: open ones whose far side is fed after
 * are listed (with that far segment), closed ones and open ones leading to segments off
 * are kept apart. O(segments + links) per core.
 *
 * <p>Also here: region growth across open inoperable valves ({@link #growInto}).
 */
final class IsolationCore {
    private final Isolation iso;

    BitSet region;
    BitSet after;
    BitSet off;
    /** Services of the off segments; built only when asked for ({@link #offServices()}). */
    private BitSet offServices;
    final List<Integer> listed = new ArrayList<>();
    final List<Integer> far = new ArrayList<>();
    /** Links (not ids: only the plan's core is reported) of closed and of unlisted bounding valves. */
    int[] closedBounds = new int[8];
    int closedCount;
    int[] unlisted = new int[64];
    int unlistedCount;
    final List<String> sources = new ArrayList<>();
    final List<Integer> stations = new ArrayList<>();
    /** The stops of {@link #stations} that valves do (closed in this outcome); the others are stopped at the station. */
    final List<StationStop.Result> byValves = new ArrayList<>();

    /** The stop of each station to stop as this outcome does it (by valves, or at the station when none is listed). */
    List<StationStop.Result> stops() {
        List<StationStop.Result> out = new ArrayList<>(byValves);
        for (int st : stations) {
            boolean listed = false;
            for (StationStop.Result r : byValves) if (r.station() == st) listed = true;
            if (listed) continue;
            StationStop.Result r = st == replacedStation ? replacement : iso.stationStop(st);
            if (r != null) out.add(r);
        }
        return out;
    }

    int replacedStation = -1;
    StationStop.Result replacement;

    private IsolationCore(Isolation iso) {
        this.iso = iso;
    }

    /** Services off: those of the off segments (each service lies in one segment). */
    BitSet offServices() {
        if (offServices == null) offServices = iso.servicesOf(off);
        return offServices;
    }

    /**
     * The isolation of a region already grown across open inoperable valves. With
     * {@code report}, every bounding valve is classified (listed, already closed,
     * unlisted); without, only the listed ones are found (all that fallbacks and the
     * alternative need), from whichever side has fewer links to scan: the region's
     * boundary or the segments still fed after. Both give the listed valves in the
     * same order (region segment, then link index).
     */
    static IsolationCore of(Isolation iso, BitSet region, boolean report) {
        return of(iso, region, report, -1, null);
    }

    /**
     * As {@link #of(Isolation, BitSet, boolean)}, with station {@code replaced}'s stop taken to be
     * {@code replacement} (a stop grown because one of its valves will not close) when
     * that station feeds the region.
     */
    static IsolationCore of(Isolation iso, BitSet region, boolean report, int replaced, StationStop.Result replacement) {
        IsolationCore c = new IsolationCore(iso);
        SegmentGraph sg = iso.segmentGraph();
        NetworkState state = iso.segments().state();
        BitSet before = iso.before();
        c.region = region;
        c.replacedStation = replaced;
        c.replacement = replacement;
        for (int i = 0; i < sg.sourceCount(); i++) {
            int seg = sg.sourceSegment(i);
            if (seg >= 0 && c.region.get(seg)) c.sources.add(state.network().sources().get(i).id());
        }
        BitSet stopped = new BitSet(state.stationCount());
        BitSet blocked = c.region;
        for (int st = 0; st < state.stationCount(); st++) {
            if (sg.feedsInto(sg.stationLink(st), c.region, before)) {
                c.stations.add(st);
                StationStop.Result stop = st == replaced ? replacement : iso.stationStop(st);
                if (stop != null && stop.byValves()) {
                    // the instruction closes the stop's valves: its inlet-side region goes dead with everything fed only through it
                    if (blocked == c.region) blocked = (BitSet) c.region.clone();
                    blocked.or(stop.isolation().region());
                    c.byValves.add(stop);
                } else {
                    stopped.set(st);
                }
            }
        }
        c.after = sg.reachFromSourcesStopping(blocked, stopped);
        if (!report && crossLinks(sg, c.after) < crossLinks(sg, c.region)) {
            c.listedFromFedSide(sg);
        } else {
            c.scanBoundary(sg);
        }
        c.off = (BitSet) before.clone();
        c.off.andNot(c.after);
        return c;
    }

    private static int crossLinks(SegmentGraph sg, BitSet set) {
        int n = 0;
        for (int seg = set.nextSetBit(0); seg >= 0; seg = set.nextSetBit(seg + 1)) n += sg.crossEnd(seg) - sg.crossStart(seg);
        return n;
    }

    /**
     * Listed valves found from the fed side: open valve links from a segment fed after
     * into the region (the fed side never lies in the region). Sorted by (region
     * segment, link) as {@link #scanBoundary} finds them.
     */
    private void listedFromFedSide(SegmentGraph sg) {
        long[] keys = new long[16];
        int n = 0;
        for (int a = after.nextSetBit(0); a >= 0; a = after.nextSetBit(a + 1)) {
            for (int i = sg.crossStart(a); i < sg.crossEnd(a); i++) {
                int l = sg.crossLink(i);
                if (!sg.isValve(l) || !sg.isOpen(l)) continue;
                int r = sg.other(l, a);
                if (!region.get(r)) continue;
                if (n == keys.length) keys = Arrays.copyOf(keys, n * 2);
                keys[n++] = ((long) r << 32) | l;
            }
        }
        Arrays.sort(keys, 0, n);
        for (int k = 0; k < n; k++) {
            int l = (int) keys[k];
            listed.add(l);
            far.add(sg.other(l, (int) (keys[k] >>> 32)));
        }
    }

    /** Every open or closed valve on the region's boundary, by region segment then link index. */
    private void scanBoundary(SegmentGraph sg) {
        for (int seg = region.nextSetBit(0); seg >= 0; seg = region.nextSetBit(seg + 1)) {
            for (int i = sg.crossStart(seg); i < sg.crossEnd(seg); i++) {
                int l = sg.crossLink(i);
                if (!sg.isValve(l)) continue;
                int o = sg.other(l, seg);
                if (region.get(o)) continue;
                if (!sg.isOpen(l)) {
                    if (closedCount == closedBounds.length) closedBounds = Arrays.copyOf(closedBounds, closedCount * 2);
                    closedBounds[closedCount++] = l;
                } else if (after.get(o)) {
                    listed.add(l);
                    far.add(o);
                } else {
                    if (unlistedCount == unlisted.length) unlisted = Arrays.copyOf(unlisted, unlistedCount * 2);
                    unlisted[unlistedCount++] = l;
                }
            }
        }
    }

    /** Adds the seed and everything reached from it across open inoperable valves to {@code region}. */
    static BitSet growInto(SegmentGraph sg, BitSet region, BitSet seed) {
        region.or(seed);
        int[] stack = new int[Math.max(1, sg.segmentCount())];
        int top = 0;
        for (int s = seed.nextSetBit(0); s >= 0; s = seed.nextSetBit(s + 1)) stack[top++] = s;
        while (top > 0) {
            int u = stack[--top];
            for (int i = sg.crossStart(u); i < sg.crossEnd(u); i++) {
                int l = sg.crossLink(i);
                if (!sg.isOpenInoperable(l)) continue;
                int w = sg.other(l, u);
                if (!region.get(w)) {
                    region.set(w);
                    stack[top++] = w;
                }
            }
        }
        return region;
    }
}
