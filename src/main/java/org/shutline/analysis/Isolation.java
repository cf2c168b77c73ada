package org.shutline.analysis;

import java.time.Period;
import java.util.ArrayList;
import java.util.BitSet;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;
import org.shutline.model.Operability;
import org.shutline.model.Service;
import org.shutline.trace.NetworkState;
import org.shutline.trace.SegmentGraph;
import org.shutline.trace.ValveSegments;

/**
 * Valve isolation of a zone (work zone or incident point) in one network state, by the
 * isolation rules of the design:
 * <ol>
 * <li>The zone's segments ({@link Zone}) are grown across open valves with
 *     {@code operable = no}: the <em>region</em>. Valves already closed bound it and are
 *     not listed.</li>
 * <li>A source in the region, or an in-service station whose outlet is in the region and
 *     whose inlet segment is fed, means valves alone cannot isolate it:
 *     {@code isolable = false} with the reason; such stations are named with their
 *     {@link StationStop} (the valves that leave the station's inlet dead, verified on
 *     the segment graph, never found by nearness alone). The outcome is then computed
 *     as if those stations were stopped and those sources shut.</li>
 * <li>After: gas flows from the sources over the segment graph never entering the
 *     region. An open valve on the region's boundary is listed only if its far side is
 *     still fed after; the others lead to segments that lose every source
 *     (<em>unintended isolation</em>), which go off gas too.</li>
 * <li>Services off = services fed before and not fed after; meters likewise; critical
 *     customers are those with {@link Service#isCritical()}.</li>
 * <li>Listed valves are ordered from the feeding side: by the hop distance of their far
 *     side from the sources in the segment graph before closing (upstream feeds first),
 *     then by valve id.</li>
 * <li>Each listed valve that is doubtful by {@link ValveDoubt} (unknown, inoperable,
 *     never checked, past its interval or not checked in the previous calendar year,
 *     49 CFR 192.747) gets a
 *     fallback: the region grown across it (and on across inoperable valves) is isolated
 *     again; the fallback lists that full valve set, the valves to close in addition, and
 *     the services this adds.</li>
 * <li>An alternative: the region grown across one listed valve's far segment, when that
 *     needs fewer valves; the one with fewest valves, then fewest services off, is
 *     reported with the services it adds.</li>
 * </ol>
 * Cost: each isolation is O(segments + links) on the segment graph, plus the zone
 * lookup (see {@link ZoneSegments}); fallbacks and the alternative repeat it once per
 * listed valve. Services enter only at the end: services off, and those a fallback or
 * the alternative adds, are read from the per-segment service lists of the segments
 * off (every service lies in one segment), meters from the per-segment sums, so the
 * service work is proportional to the services reported. A station's stop is found
 * once per station and reused. Searches and boundary scans use only links
 * between two different segments ({@link SegmentGraph#crossStart}); the cores of
 * fallbacks and alternatives grow from the added segment only and find their listed
 * valves from the smaller side (region boundary or segments still fed). The result's
 * {@code serviceIdsOff}, {@code unlistedValves} and {@code closedBoundaryValves} are
 * immutable lists that look ids up when read, so an outcome of two million services
 * costs O(words of the set) until someone reads the ids.
 *
 * <p>Each outcome (the zone's, and each fallback or alternative tried) is an
 * {@link IsolationCore}; this class adds the fallbacks, the alternative, the station
 * stops and the result records.
 */
public final class Isolation {
    /** Inspection interval of 49 CFR 192.747: at most 15 months. */
    public static final Period DEFAULT_INSPECTION_INTERVAL = ValveDoubt.INTERVAL;

    /** One valve to close, in operating order (1 = first). */
    public record ValveStep(int order, String valveId, int valve, Operability operable, boolean overdue, int hops) {}

    /**
     * What to do if valve {@code valveId} fails to close. When not {@code isolable},
     * {@code stationsToStop} and {@code sourcesInRegion} name what must be stopped or shut
     * besides the valves (the outcome is computed as if they were).
     */
    public record Fallback(String valveId, String why, boolean isolable, List<String> valves, List<String> thenClose,
                           List<String> addedServices, long addedMeters, List<String> stationsToStop, List<String> sourcesInRegion,
                           List<StationStop.Result> stationStops, List<String> stayOnServices, long stayOnMeters) {
        public Fallback {
            stayOnServices = stayOnServices instanceof ServiceIdList ? stayOnServices : List.copyOf(stayOnServices);
            valves = List.copyOf(valves);
            thenClose = List.copyOf(thenClose);
            addedServices = addedServices instanceof ServiceIdList ? addedServices : List.copyOf(addedServices);
            stationsToStop = List.copyOf(stationsToStop);
            sourcesInRegion = List.copyOf(sourcesInRegion);
            stationStops = List.copyOf(stationStops);
        }

        /** A fallback that valves alone achieve (nothing to stop or shut besides). */
        public Fallback(String valveId, String why, boolean isolable, List<String> valves, List<String> thenClose,
                        List<String> addedServices, long addedMeters) {
            this(valveId, why, isolable, valves, thenClose, addedServices, addedMeters, List.of(), List.of(), List.of(), List.of(), 0);
        }
    }

    /** A smaller valve set at the cost of more services off. */
    public record Alternative(List<String> valves, List<String> addedServices, long addedMeters, List<String> stationsToStop,
                              List<String> sourcesInRegion, List<StationStop.Result> stationStops, List<String> stayOnServices,
                              long stayOnMeters) {
        public Alternative {
            stayOnServices = stayOnServices instanceof ServiceIdList ? stayOnServices : List.copyOf(stayOnServices);
            valves = List.copyOf(valves);
            addedServices = addedServices instanceof ServiceIdList ? addedServices : List.copyOf(addedServices);
            stationsToStop = List.copyOf(stationsToStop);
            sourcesInRegion = List.copyOf(sourcesInRegion);
            stationStops = List.copyOf(stationStops);
        }

        public Alternative(List<String> valves, List<String> addedServices, long addedMeters) {
            this(valves, addedServices, addedMeters, List.of(), List.of(), List.of(), List.of(), 0);
        }
    }

    /** The outcome of one isolation. Segment and service sets are indices of the segments and state used. */
    public record Result(boolean isolable, String reason, BitSet zoneSegments, BitSet region, BitSet unintended,
                         List<ValveStep> valves, List<String> closedBoundaryValves, List<String> unlistedValves,
                         List<String> sourcesInRegion, List<String> stationsToStop, List<String> stationInletValves,
                         BitSet servicesOff, List<String> serviceIdsOff, long metersOff, List<String> criticalOff,
                         List<Fallback> fallbacks, Optional<Alternative> alternative, List<StationStop.Result> stationStops) {
        public Result {
            stationStops = List.copyOf(stationStops);
            zoneSegments = (BitSet) zoneSegments.clone();
            region = (BitSet) region.clone();
            unintended = (BitSet) unintended.clone();
            valves = List.copyOf(valves);
            closedBoundaryValves = closedBoundaryValves instanceof ValveIdList ? closedBoundaryValves : List.copyOf(closedBoundaryValves);
            unlistedValves = unlistedValves instanceof ValveIdList ? unlistedValves : List.copyOf(unlistedValves);
            sourcesInRegion = List.copyOf(sourcesInRegion);
            stationsToStop = List.copyOf(stationsToStop);
            stationInletValves = List.copyOf(stationInletValves);
            servicesOff = (BitSet) servicesOff.clone();
            serviceIdsOff = serviceIdsOff instanceof ServiceIdList ? serviceIdsOff : List.copyOf(serviceIdsOff);
            criticalOff = List.copyOf(criticalOff);
            fallbacks = List.copyOf(fallbacks);
        }

        /** Without station stops (a result whose stations, if any, are named without their stop). */
        public Result(boolean isolable, String reason, BitSet zoneSegments, BitSet region, BitSet unintended,
                      List<ValveStep> valves, List<String> closedBoundaryValves, List<String> unlistedValves,
                      List<String> sourcesInRegion, List<String> stationsToStop, List<String> stationInletValves,
                      BitSet servicesOff, List<String> serviceIdsOff, long metersOff, List<String> criticalOff,
                      List<Fallback> fallbacks, Optional<Alternative> alternative) {
            this(isolable, reason, zoneSegments, region, unintended, valves, closedBoundaryValves, unlistedValves, sourcesInRegion,
                    stationsToStop, stationInletValves, servicesOff, serviceIdsOff, metersOff, criticalOff, fallbacks, alternative, List.of());
        }

        @Override public BitSet zoneSegments() { return (BitSet) zoneSegments.clone(); }
        @Override public BitSet region() { return (BitSet) region.clone(); }
        @Override public BitSet unintended() { return (BitSet) unintended.clone(); }
        @Override public BitSet servicesOff() { return (BitSet) servicesOff.clone(); }

        /** Listed valve ids in operating order. */
        public List<String> valveIds() {
            List<String> ids = new ArrayList<>(valves.size());
            for (ValveStep v : valves) ids.add(v.valveId());
            return ids;
        }
    }

    private final ValveSegments segs;
    private final SegmentGraph sg;
    private final NetworkState state;
    private final ValveDoubt.Settings options;
    private final ValveDoubt.Settings doubt;
    private final BitSet before;
    private final int[] hops;
    /** Services with a critical customer, once per instance. */
    private final BitSet critical;
    /** Station stops, found on first use, then reused. */
    private final java.util.concurrent.atomic.AtomicReferenceArray<StationStop.Result> stopCache;
    /** Built on the first point or polygon zone, then reused. */
    private EdgeIndex index;

    public Isolation(ValveSegments segments, ValveDoubt.Settings options) {
        this.segs = segments;
        this.sg = segments.graph();
        this.state = segments.state();
        this.options = options;
        this.doubt = options;
        this.before = sg.reachFromSources(null, null);
        this.hops = sg.hopsFromSources();
        List<Service> all = state.network().services();
        this.critical = new BitSet(all.size());
        for (int i = 0; i < all.size(); i++) if (all.get(i).isCritical()) critical.set(i);
        this.stopCache = new java.util.concurrent.atomic.AtomicReferenceArray<>(state.stationCount());
    }

    /** Isolation on the valve segments of a state (built here, O(nodes + edges)). */
    public static Isolation of(NetworkState state, ValveDoubt.Settings options) {
        return new Isolation(ValveSegments.build(state), options);
    }

    /** Segments fed in the state before any closing. */
    public BitSet fedSegments() {
        return (BitSet) before.clone();
    }

    public Result isolate(Zone zone) {
        if (index == null && !(zone instanceof Zone.OfSegments) && !(zone instanceof Zone.OfMains)) index = new EdgeIndex(segs);
        BitSet zoneSegs = ZoneSegments.of(zone, segs, index);
        IsolationCore core = IsolationCore.of(this, grow(zoneSegs), true);
        List<Fallback> fallbacks = new ArrayList<>();
        Alternative alt = null;
        for (int i = 0; i < core.listed.size(); i++) {
            int l = core.listed.get(i);
            int v = sg.linkFeature(l);
            IsolationCore grown = grownCore(core, i);
            String why = whyFallback(v);
            if (why != null) fallbacks.add(fallback(v, why, core, grown));
            boolean noWorse = grown.sources.size() <= core.sources.size()
                    && grown.stations.size() <= core.stations.size();
            if (noWorse && grown.listed.size() < core.listed.size()
                    && (alt == null || grown.listed.size() < alt.valves().size()
                        || (grown.listed.size() == alt.valves().size()
                            && addedCount(core, grown) < alt.addedServices().size()))) {
                BitSet addedSegs = addedSegments(core, grown);
                BitSet stayOn = addedSegments(grown, core);
                alt = new Alternative(ordered(grown), ServiceIdList.owning(state.network().services(), servicesOf(addedSegs)), metersOf(addedSegs),
                        stationIds(grown.stations), grown.sources, grown.stops(),
                        ServiceIdList.owning(state.network().services(), servicesOf(stayOn)), metersOf(stayOn));
            }
        }
        if (stopFallbacks.get() == 0) {
            stopFallbacks.set(1);
            try {
                for (StationStop.Result stop : core.byValves) stopValveFallbacks(core, stop, fallbacks);
            } finally {
                stopFallbacks.set(0);
            }
        }
        return result(zoneSegs, core, fallbacks, alt);
    }

    /** Set while stop-valve fallbacks are computed on this thread: the grown stops they isolate get none of their own. */
    private static final ThreadLocal<Integer> stopFallbacks = ThreadLocal.withInitial(() -> 0);

    /**
     * A fallback for each doubtful valve of a station stop the isolation relies on: the
     * stop grown across that valve ({@link StationStop#grownBy}), the whole outcome
     * recomputed with it; what it adds is counted against the whole isolation, and the
     * station is stopped at the station itself when the grown stop is not done by valves.
     */
    private void stopValveFallbacks(IsolationCore core, StationStop.Result stop, List<Fallback> out) {
        Result stopIso = stop.isolation();
        for (Fallback sf : stopIso.fallbacks()) {
            int v = -1;
            for (ValveStep step : stopIso.valves()) if (step.valveId().equals(sf.valveId())) v = step.valve();
            if (v < 0) continue;
            boolean known = false;
            for (Fallback f : out) if (f.valveId().equals(sf.valveId())) known = true;
            if (known) continue;
            StationStop.Result grown = StationStop.grownBy(this, stop, v);
            IsolationCore g = IsolationCore.of(this, core.region, true, stop.station(), grown);
            List<String> then = new ArrayList<>();
            List<String> already = new ArrayList<>(ordered(core));
            for (StationStop.Result st : core.stops()) already.addAll(st.valves());
            for (String id : ordered(g)) if (!already.contains(id) && !then.contains(id)) then.add(id);
            for (StationStop.Result st : g.stops()) for (String id : st.valves()) if (!already.contains(id) && !then.contains(id)) then.add(id);
            BitSet addedSegs = addedSegments(core, g);
            BitSet stayOn = addedSegments(g, core);
            out.add(new Fallback(sf.valveId(), sf.why(), g.sources.isEmpty() && g.stations.isEmpty(), ordered(g), then,
                    ServiceIdList.owning(state.network().services(), servicesOf(addedSegs)), metersOf(addedSegs),
                    stationIds(g.stations), g.sources, g.stops(),
                    ServiceIdList.owning(state.network().services(), servicesOf(stayOn)), metersOf(stayOn)));
        }
    }

    /**
     * The outcome of {@code core}'s region grown across its i-th listed valve, as the
     * fallback and the alternative use it: the region is already closed under growth
     * across open inoperable valves, so the union only needs a search from the far
     * segment ({@link #grownBy}); only the listed valves are found, from the smaller side.
     * The tests compare it with the region grown from the whole seed and the whole
     * boundary scanned.
     */
    IsolationCore grownCore(IsolationCore core, int i) {
        return IsolationCore.of(this, grownBy(core.region, core.far.get(i)), false);
    }

    /** {@code region} grown across valve {@code v}: both its sides, and on across open inoperable valves. */
    BitSet grownAcross(BitSet region, int v) {
        int l = sg.valveLink(v);
        BitSet seed = new BitSet(sg.segmentCount());
        if (l >= 0) {
            seed.set(sg.linkA(l));
            seed.set(sg.linkB(l));
        }
        return IsolationCore.growInto(sg, (BitSet) region.clone(), seed);
    }

    /** {@code region} (closed under growth) grown across segment {@code seg}: a search from seg, the region counted as visited. */
    private BitSet grownBy(BitSet region, int seg) {
        BitSet seed = new BitSet(sg.segmentCount());
        seed.set(seg);
        return IsolationCore.growInto(sg, (BitSet) region.clone(), seed);
    }

    /** Services of a set of segments ({@link ValveSegments#servicesOf}). */
    BitSet servicesOf(BitSet segments) {
        return segs.servicesOf(segments);
    }

    private long metersOf(BitSet segments) {
        return segs.metersOf(segments);
    }

    /**
     * The counts of one isolation without its valve lists, fallbacks or ids: services,
     * meters and critical services off, the valves to close, whether valves alone do it.
     */
    record Counts(long services, long meters, long critical, int valves, boolean isolable, List<String> stationsToStop) {}

    /** {@link Counts} of isolating {@code seed} (grown across open inoperable valves); same rules as {@link #isolate}. */
    Counts counts(BitSet seed) {
        IsolationCore c = IsolationCore.of(this, grow(seed), false);
        long n = 0;
        for (int seg = c.off.nextSetBit(0); seg >= 0; seg = c.off.nextSetBit(seg + 1)) n += segs.serviceCount(seg);
        BitSet off = c.offServices();
        long crit = 0;
        for (int i = critical.nextSetBit(0); i >= 0; i = critical.nextSetBit(i + 1)) if (off.get(i)) crit++;
        return new Counts(n, metersOf(c.off), crit, c.listed.size(), c.sources.isEmpty() && c.stations.isEmpty(), stationIds(c.stations));
    }

    /**
     * In-service stations an isolation leaves with no gas at the inlet (inlet segment fed
     * before, off after, station not named to stop): their districts go off with it
     * unless another station feeds them. Station indices, in index order.
     */
    public List<Integer> stationsCutOff(Result r) {
        BitSet off = r.region();
        off.or(r.unintended());
        off.and(before);
        List<Integer> out = new ArrayList<>();
        for (int st = 0; st < state.stationCount(); st++) {
            int l = sg.stationLink(st);
            if (l < 0 || !sg.isOpen(l) || !off.get(sg.linkA(l))) continue;
            if (r.stationsToStop().contains(state.stationId(st))) continue;
            out.add(st);
        }
        return out;
    }

    /** The seed grown across open valves with operable = no; O(segments + links). */
    BitSet grow(BitSet seed) {
        return IsolationCore.growInto(sg, new BitSet(sg.segmentCount()), seed);
    }

    /** Null when the valve is relied on without doubt; else why it needs a fallback. */
    private String whyFallback(int v) {
        return ValveDoubt.of(state, v, doubt).why();
    }

    private boolean overdue(int v) {
        return ValveDoubt.of(state, v, doubt).overdue();
    }

    private Fallback fallback(int v, String why, IsolationCore core, IsolationCore grown) {
        List<String> all = ordered(grown);
        List<String> before = new ArrayList<>();
        for (int l : core.listed) before.add(state.valveId(sg.linkFeature(l)));
        List<String> then = new ArrayList<>();
        for (String id : all) if (!before.contains(id)) then.add(id);
        BitSet addedSegs = addedSegments(core, grown);
        BitSet stayOn = addedSegments(grown, core);
        boolean isolable = grown.sources.isEmpty() && grown.stations.isEmpty();
        return new Fallback(state.valveId(v), why, isolable, all, then, ServiceIdList.owning(state.network().services(), servicesOf(addedSegs)), metersOf(addedSegs),
                stationIds(grown.stations), grown.sources, grown.stops(),
                ServiceIdList.owning(state.network().services(), servicesOf(stayOn)), metersOf(stayOn));
    }

    /**
     * Segments off in {@code grown} but not in {@code core}. Services off are the union of
     * the services of the off segments and every service lies in one segment, so the
     * services added are exactly those of these segments. Swapped, the segments the
     * plan puts off that {@code grown} leaves fed: a grown region that takes in a
     * station's inlet no longer needs that station's stop, so pipe the stop would have
     * shut stays on.
     */
    private static BitSet addedSegments(IsolationCore core, IsolationCore grown) {
        BitSet add = (BitSet) grown.off.clone();
        add.andNot(core.off);
        return add;
    }

    private int addedCount(IsolationCore core, IsolationCore grown) {
        BitSet add = addedSegments(core, grown);
        int n = 0;
        for (int seg = add.nextSetBit(0); seg >= 0; seg = add.nextSetBit(seg + 1)) n += segs.serviceCount(seg);
        return n;
    }

    private List<ValveStep> steps(IsolationCore c) {
        List<ValveStep> out = new ArrayList<>();
        List<int[]> order = new ArrayList<>();
        for (int i = 0; i < c.listed.size(); i++) order.add(new int[] {c.listed.get(i), hops[c.far.get(i)]});
        order.sort(Comparator.<int[]>comparingInt(a -> a[1]).thenComparing(a -> state.valveId(sg.linkFeature(a[0]))));
        int n = 1;
        for (int[] a : order) {
            int v = sg.linkFeature(a[0]);
            out.add(new ValveStep(n++, state.valveId(v), v, state.valveOperability(v), overdue(v), a[1]));
        }
        return out;
    }

    private List<String> ordered(IsolationCore c) {
        List<String> ids = new ArrayList<>();
        for (ValveStep s : steps(c)) ids.add(s.valveId());
        return ids;
    }

    private List<String> valveIds(int[] links, int n) {
        return new ValveIdList(state, sg, links, n);
    }

    private List<String> ids(BitSet services) {
        List<String> out = new ArrayList<>();
        List<Service> all = state.network().services();
        for (int i = services.nextSetBit(0); i >= 0; i = services.nextSetBit(i + 1)) out.add(all.get(i).id());
        return out;
    }


    private Result result(BitSet zoneSegs, IsolationCore c, List<Fallback> fallbacks, Alternative alt) {
        List<String> stationIds = stationIds(c.stations);
        List<String> inletValves = new ArrayList<>();
        List<StationStop.Result> stops = new ArrayList<>();
        List<String> stopTexts = new ArrayList<>();
        for (int st : c.stations) {
            StationStop.Result stop = stationStop(st);
            if (stop == null) {
                stopTexts.add(state.stationId(st));
                continue;
            }
            stops.add(stop);
            for (String v : stop.valves()) if (!inletValves.contains(v)) inletValves.add(v);
            stopTexts.add(state.stationId(st) + (stop.valves().isEmpty() ? " (" + stop.note() + ")"
                    : " (close " + String.join(", ", stop.valves()) + ")"));
        }
        StringBuilder reason = new StringBuilder();
        if (zoneSegs.isEmpty()) reason.append("the zone touches no active pipe");
        if (!c.sources.isEmpty()) {
            reason.append(reason.length() > 0 ? "; " : "")
                    .append("source ").append(String.join(", ", c.sources))
                    .append(" feeds the region directly: shut the supply, valves alone cannot isolate it");
        }
        if (!c.stations.isEmpty()) {
            reason.append(reason.length() > 0 ? "; " : "")
                    .append("valves alone cannot isolate: station ").append(String.join(", ", stationIds))
                    .append(" feeds the region directly: stop station ").append(String.join("; stop station ", stopTexts));
        }
        BitSet unintended = (BitSet) c.off.clone();
        unintended.andNot(c.region);
        BitSet offServices = c.offServices();
        BitSet criticalOff = new BitSet();
        for (int i = critical.nextSetBit(0); i >= 0; i = critical.nextSetBit(i + 1)) if (offServices.get(i)) criticalOff.set(i);
        boolean isolable = reason.length() == 0;
        return new Result(isolable, reason.toString(), zoneSegs, c.region, unintended, steps(c), valveIds(c.closedBounds, c.closedCount),
                valveIds(c.unlisted, c.unlistedCount), c.sources, stationIds, inletValves, offServices, ServiceIdList.owning(state.network().services(), offServices),
                metersOf(c.off), ids(criticalOff), fallbacks, Optional.ofNullable(alt), stops);
    }

    private List<String> stationIds(List<Integer> stations) {
        List<String> out = new ArrayList<>(stations.size());
        for (int st : stations) out.add(state.stationId(st));
        return out;
    }

    /**
     * The verified-by-construction stop of a station in this state ({@link StationStop}),
     * found on first use and reused; null while that station's own stop is being
     * computed on this thread (a cascade that leads back to it).
     */
    public StationStop.Result stationStop(int st) {
        StationStop.Result cached = stopCache.get(st);
        if (cached != null) return cached;
        BitSet busy = STOPPING.get();
        if (busy.get(st)) return null;
        busy.set(st);
        try {
            cached = StationStop.compute(this, st);
        } finally {
            busy.clear(st);
        }
        stopCache.compareAndSet(st, null, cached);
        return stopCache.get(st);
    }

    private static final ThreadLocal<BitSet> STOPPING = ThreadLocal.withInitial(BitSet::new);

    ValveSegments segments() { return segs; }

    SegmentGraph segmentGraph() { return sg; }

    /** Segments fed before any closing (the instance's own set: not to be changed). */
    BitSet before() { return before; }

    ValveDoubt.Settings options() { return options; }
}
