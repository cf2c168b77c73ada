package org.shutline.analysis;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.List;
import org.shutline.model.Network;
import org.shutline.model.Service;
import org.shutline.model.Station;
import org.shutline.trace.NetworkState;
import org.shutline.trace.SegmentGraph;
import org.shutline.trace.ValveSegments;

/**
 * The shut-off for an over-pressure of one pressure system: what stops the inflow, who
 * is at risk, and what the shut-off puts off gas.
 *
 * <ul>
 * <li>Feeds: every in-service station whose outlet segment is on the system and whose
 *     inlet segment is fed (the one-way link that brings gas in), with its
 *     {@link StationStop}: the valves that leave its inlet dead (its own station valves
 *     when they do, else the isolation of its inlet segment), with operating order, a
 *     fallback per doubtful valve, the other stations stopped with it and the other
 *     customers it puts off; and every source on the system's pipe (the supply must be
 *     shut there).</li>
 * <li>At risk: every service on the system's pipe fed in the state (the normal state
 *     when given the base state), critical customers first; every one of them is to be
 *     checked for damage (meter, regulator, appliances) before relight.</li>
 * <li>Off after the shut-off: what doing it puts off gas: the services fed before and
 *     not after one traversal of the segment graph with every stop's valves closed,
 *     the stations a stop could not cut off by valves stopped, and the system's sources
 *     (and sources a stop must shut) shut. The system is then dead, and so is every
 *     district fed only through it or through the stopped inlets.</li>
 * <li>Work: {@link Restoration} over the services off (the dead districts purged and
 *     relit whole).</li>
 * </ul>
 * An unknown system id gives a result with no feeds and nobody at risk. Cost O(segments
 * + links + services) plus one station stop per feeding station.
 */
public final class OverpressureShutoff {
    /**
     * One way gas enters the system: a station ({@code stop} non-null) or a source
     * ({@code stop} and {@code upstream} null). {@code inletValves} are the stop's valves
     * (operating order) and {@code upstream} the stop's isolation (with its fallbacks).
     */
    public record Feed(String kind, String id, String name, String fromSystem, List<String> inletValves,
                       Isolation.Result upstream, StationStop.Result stop, List<Isolation.Fallback> fallbacks) {
        public Feed {
            inletValves = List.copyOf(inletValves);
            fallbacks = List.copyOf(fallbacks);
        }

        Feed withFallbacks(List<Isolation.Fallback> f) {
            return new Feed(kind, id, name, fromSystem, inletValves, upstream, stop, f);
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

    public static Result of(ValveSegments segs, ValveDoubt.Settings options, String systemId, ResponseSettings settings) {
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
        BitSet closedLinks = new BitSet(sg.linkCount());
        BitSet stopped = new BitSet(s.stationCount());
        BitSet shutSources = new BitSet(sg.sourceCount());
        for (int st = 0; st < s.stationCount(); st++) {
            if (!sg.feedsInto(sg.stationLink(st), onSystem, before)) continue;
            Station station = net.stations().get(st);
            StationStop.Result stop = iso.stationStop(st);
            Isolation.Result up = stop.isolation();
            for (Isolation.ValveStep v : up.valves()) closedLinks.set(sg.valveLink(v.valve()));
            if (!up.isolable()) {
                stopped.set(st);
                for (String id : up.stationsToStop()) stopped.set(stationIndex(s, id));
                for (String id : up.sourcesInRegion()) shutSources.set(sourceIndex(net, id));
            }
            feeds.add(new Feed("station", station.id(), station.name(), station.inSys(), stop.valves(), up, stop, List.of()));
        }
        for (int i = 0; i < sg.sourceCount(); i++) {
            int seg = sg.sourceSegment(i);
            if (seg >= 0 && onSystem.get(seg)) {
                var src = net.sources().get(i);
                feeds.add(new Feed("source", src.id(), src.id(), src.systemId(), List.of(), null, null, List.of()));
                shutSources.set(i);
            }
        }
        BitSet atRisk = new BitSet(s.serviceCount());
        for (int seg = onSystem.nextSetBit(0); seg >= 0; seg = onSystem.nextSetBit(seg + 1)) {
            if (before.get(seg)) for (int sv : segs.services(seg)) atRisk.set(sv);
        }
        BitSet after = sg.reach(null, closedLinks, stopped, shutSources);
        BitSet lost = (BitSet) before.clone();
        lost.andNot(after);
        BitSet off = segs.servicesOf(lost);
        for (int i = 0; i < feeds.size(); i++) {
            if (feeds.get(i).isStation()) feeds.set(i, feeds.get(i).withFallbacks(fallbacks(segs, feeds, i, stopped, shutSources, before, lost)));
        }
        List<Service> all = net.services();
        List<String> ordered = new ArrayList<>(), critical = new ArrayList<>(), rest = new ArrayList<>();
        for (int i = atRisk.nextSetBit(0); i >= 0; i = atRisk.nextSetBit(i + 1)) (all.get(i).isCritical() ? critical : rest).add(all.get(i).id());
        ordered.addAll(critical);
        ordered.addAll(rest);
        Restoration.Result r = Restoration.of(segs, before, after, off, settings);
        return new Result(systemId, feeds, atRisk, ordered, Restoration.meters(all, atRisk), critical, off,
                Restoration.meters(all, off), r);
    }

    /**
     * The whole shut-off's fallback for each doubtful valve of feed {@code i}'s stop: when
     * the stop's own fallback is done by valves, the feed closes that grown set instead;
     * otherwise the feed's other stop valves stay closed and the station is stopped at
     * the station. What it adds, and what of the shut-off it leaves on, are counted
     * against the whole shut-off (every other feed stopped as planned).
     */
    private static List<Isolation.Fallback> fallbacks(ValveSegments segs, List<Feed> feeds, int i, BitSet stopped, BitSet shutSources,
                                                      BitSet before, BitSet lost) {
        SegmentGraph sg = segs.graph();
        NetworkState s = segs.state();
        Feed feed = feeds.get(i);
        BitSet others = new BitSet(sg.linkCount());
        for (int j = 0; j < feeds.size(); j++) {
            if (j == i || !feeds.get(j).isStation()) continue;
            for (Isolation.ValveStep v : feeds.get(j).upstream().valves()) others.set(sg.valveLink(v.valve()));
        }
        int st = stationIndex(s, feed.id());
        java.util.Map<String, List<Integer>> valveIndex = new java.util.HashMap<>();
        for (Isolation.Fallback f : feed.upstream().fallbacks()) for (String id : f.valves()) valveIndex.putIfAbsent(id, new ArrayList<>());
        for (String id : feed.upstream().valveIds()) valveIndex.putIfAbsent(id, new ArrayList<>());
        for (int v = 0; v < s.valveCount(); v++) {
            List<Integer> at = valveIndex.get(s.valveId(v));
            if (at != null) at.add(v);
        }
        List<Isolation.Fallback> out = new ArrayList<>();
        for (Isolation.Fallback f : feed.upstream().fallbacks()) {
            BitSet closed = (BitSet) others.clone();
            BitSet stop = (BitSet) stopped.clone();
            List<String> valves = new ArrayList<>();
            if (f.isolable()) {
                valves.addAll(f.valves());
            } else {
                for (String id : feed.upstream().valveIds()) if (!id.equals(f.valveId())) valves.add(id);
                stop.set(st);
            }
            for (String id : valves) for (int v : valveIndex.get(id)) if (sg.valveLink(v) >= 0) closed.set(sg.valveLink(v));
            BitSet lostF = (BitSet) before.clone();
            lostF.andNot(sg.reach(null, closed, stop, shutSources));
            BitSet add = (BitSet) lostF.clone();
            add.andNot(lost);
            BitSet stays = (BitSet) lost.clone();
            stays.andNot(lostF);
            List<String> then = new ArrayList<>();
            for (String id : valves) if (!feed.upstream().valveIds().contains(id)) then.add(id);
            out.add(new Isolation.Fallback(f.valveId(), f.why(), f.isolable(), valves, then, serviceIds(segs, add), segs.metersOf(add),
                    f.isolable() ? List.of() : List.of(feed.id()), List.of(), List.of(), serviceIds(segs, stays), segs.metersOf(stays)));
        }
        return out;
    }

    private static List<String> serviceIds(ValveSegments segs, BitSet segments) {
        List<String> out = new ArrayList<>();
        List<Service> all = segs.state().network().services();
        for (int g = segments.nextSetBit(0); g >= 0; g = segments.nextSetBit(g + 1)) for (int sv : segs.services(g)) out.add(all.get(sv).id());
        return out;
    }

    private static int stationIndex(NetworkState s, String id) {
        for (int st = 0; st < s.stationCount(); st++) if (s.stationId(st).equals(id)) return st;
        throw new IllegalStateException("no station " + id);
    }

    private static int sourceIndex(Network net, String id) {
        for (int i = 0; i < net.sources().size(); i++) if (net.sources().get(i).id().equals(id)) return i;
        throw new IllegalStateException("no source " + id);
    }

    /**
     * The station's verified stop valves in this state (see {@link StationStop}); empty
     * when it passes no gas already or valves alone cannot stop it.
     */
    static List<String> inletValves(ValveSegments segs, ValveDoubt.Settings options, int station) {
        StationStop.Result r = new Isolation(segs, options).stationStop(station);
        return r.stoppable() ? r.valves() : List.of();
    }
}
