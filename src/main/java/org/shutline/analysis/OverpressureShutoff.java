package org.shutline.analysis;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.List;
import java.util.Objects;
import org.locationtech.jts.geom.Point;
import org.shutline.model.Network;
import org.shutline.model.Service;
import org.shutline.model.Station;
import org.shutline.model.Valve;
import org.shutline.model.ValveKind;
import org.shutline.trace.NetworkState;
import org.shutline.trace.SegmentGraph;
import org.shutline.trace.ValveSegments;

/**
 * The shut-off for an over-pressure of one pressure system: what stops the inflow, who
 * is at risk, and what the shut-off puts off gas.
 *
 * <ul>
 * <li>Feeds: every in-service station whose outlet segment is on the system and whose
 *     inlet segment is fed (the one-way link that brings gas in), with its inlet valves
 *     (kind {@code station}, on the station's inlet system, within the point tolerance
 *     of the station: the rule {@link Isolation} uses) and, as the upstream fallback
 *     when an inlet valve will not close or there is none, the {@link Isolation} of the
 *     station's inlet segment grown across its inlet valves (as if they will not close:
 *     the valves beyond them, their own fallbacks, what it adds); and every
 *     source on the system's pipe (the supply must be shut there).</li>
 * <li>At risk: every service on the system's pipe fed in the state (the normal state
 *     when given the base state), critical customers first; every one of them is to be
 *     checked for damage (meter, regulator, appliances) before relight.</li>
 * <li>Off after the shut-off: with no gas entering the system, the system is dead, and
 *     so is every district fed only through it: services fed before and not after, by
 *     one traversal of the segment graph with the system's segments blocked.</li>
 * <li>Work: {@link Restoration} over the services off (the dead districts purged and
 *     relit whole).</li>
 * </ul>
 * An unknown system id gives a result with no feeds and nobody at risk. Cost O(segments
 * + links + services) plus one isolation per feeding station.
 */
public final class OverpressureShutoff {
    /** One way gas enters the system: a station ({@code upstream} non-null) or a source ({@code upstream} null). */
    public record Feed(String kind, String id, String name, String fromSystem, List<String> inletValves,
                       Isolation.Result upstream) {
        public Feed {
            inletValves = List.copyOf(inletValves);
        }

        public boolean isStation() {
            return kind.equals("station");
        }
    }

    /** The answer; {@code atRisk} and {@code off} are service indices. */
    public record Result(String systemId, List<Feed> feeds, BitSet atRisk, List<String> atRiskOrdered, long atRiskMeters,
                         List<String> criticalAtRisk, BitSet off, long metersOff, Restoration.Result restoration) {
        public Result {
            feeds = List.copyOf(feeds);
            atRisk = (BitSet) atRisk.clone();
            atRiskOrdered = List.copyOf(atRiskOrdered);
            criticalAtRisk = List.copyOf(criticalAtRisk);
            off = (BitSet) off.clone();
        }

        @Override public BitSet atRisk() { return (BitSet) atRisk.clone(); }
        @Override public BitSet off() { return (BitSet) off.clone(); }
    }

    private OverpressureShutoff() {}

    public static Result of(ValveSegments segs, Isolation.Options options, String systemId, ResponseSettings settings) {
        NetworkState s = segs.state();
        SegmentGraph sg = segs.graph();
        int sys = s.graph().systemIndex(systemId);
        BitSet onSystem = new BitSet(segs.segmentCount());
        if (sys >= 0) {
            for (int seg = 0; seg < segs.segmentCount(); seg++) if (Restoration.segmentSystem(segs, seg) == sys) onSystem.set(seg);
        }
        Isolation iso = new Isolation(segs, options);
        BitSet before = iso.fedSegments();
        List<Feed> feeds = new ArrayList<>();
        Network net = s.network();
        for (int st = 0; st < s.stationCount(); st++) {
            int l = sg.stationLink(st);
            if (l < 0 || !sg.isOpen(l) || !onSystem.get(sg.linkB(l)) || onSystem.get(sg.linkA(l)) || !before.get(sg.linkA(l))) continue;
            Station station = net.stations().get(st);
            List<String> inlet = inletValves(s, station);
            Isolation.Result up = iso.isolate(new Zone.OfSegments(upstreamSeed(s, sg, sg.linkA(l), inlet)));
            feeds.add(new Feed("station", station.id(), station.name(), station.inSys(), inlet, up));
        }
        for (int i = 0; i < sg.sourceCount(); i++) {
            int seg = sg.sourceSegment(i);
            if (seg >= 0 && onSystem.get(seg)) {
                var src = net.sources().get(i);
                feeds.add(new Feed("source", src.id(), src.id(), src.systemId(), List.of(), null));
            }
        }
        BitSet atRisk = new BitSet(s.serviceCount());
        for (int seg = onSystem.nextSetBit(0); seg >= 0; seg = onSystem.nextSetBit(seg + 1)) {
            if (before.get(seg)) for (int sv : segs.services(seg)) atRisk.set(sv);
        }
        BitSet after = sg.reachFromSources(onSystem, null);
        BitSet lost = (BitSet) before.clone();
        lost.andNot(after);
        BitSet off = new BitSet(s.serviceCount());
        for (int seg = lost.nextSetBit(0); seg >= 0; seg = lost.nextSetBit(seg + 1)) for (int sv : segs.services(seg)) off.set(sv);
        List<Service> all = net.services();
        List<String> ordered = new ArrayList<>(), critical = new ArrayList<>(), rest = new ArrayList<>();
        for (int i = atRisk.nextSetBit(0); i >= 0; i = atRisk.nextSetBit(i + 1)) (all.get(i).isCritical() ? critical : rest).add(all.get(i).id());
        ordered.addAll(critical);
        ordered.addAll(rest);
        Restoration.Result r = Restoration.of(segs, before, after, off, settings);
        return new Result(systemId, feeds, atRisk, ordered, Restoration.meters(all, atRisk), critical, off,
                Restoration.meters(all, off), r);
    }

    /** The station's inlet segment and both sides of each of its inlet valves (the region if they will not close). */
    private static int[] upstreamSeed(NetworkState s, SegmentGraph sg, int inletSegment, List<String> inletValves) {
        BitSet seed = new BitSet(sg.segmentCount());
        seed.set(inletSegment);
        for (int v = 0; v < s.valveCount(); v++) {
            int l = sg.valveLink(v);
            if (l < 0 || !inletValves.contains(s.valveId(v))) continue;
            seed.set(sg.linkA(l));
            seed.set(sg.linkB(l));
        }
        return seed.stream().toArray();
    }

    /** Valves of kind station on the station's inlet system within the point tolerance of it (as {@link Isolation}). */
    static List<String> inletValves(NetworkState state, Station station) {
        double tol = state.topology().tolerances().pointM();
        List<String> out = new ArrayList<>();
        Point at = station.geometry();
        for (Valve v : state.network().valves()) {
            if (v.kind() != ValveKind.STATION || !Objects.equals(v.systemId(), station.inSys())) continue;
            if (at != null && v.geometry() != null && v.geometry().distance(at) <= tol) out.add(v.id());
        }
        return out;
    }
}
