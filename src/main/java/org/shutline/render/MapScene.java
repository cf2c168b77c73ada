package org.shutline.render;

import java.util.ArrayList;
import java.util.Collections;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.index.strtree.STRtree;
import org.shutline.model.ContextLayer;
import org.shutline.model.Feature;
import org.shutline.model.Main;
import org.shutline.model.Network;
import org.shutline.model.Station;

/**
 * A network prepared for drawing: one JTS {@link STRtree} per layer (built once, then
 * only queried, which is safe from several threads), the pressure-system ranks that
 * pick each system's colour and width, and the stations by id for control lines.
 *
 * <p>Systems are ranked by the highest {@code maop_kpa} of their mains, highest first
 * (systems without any MAOP last), ties by system id; rank 0 draws thickest.
 * Building costs O(n log n) for n features; a query costs O(log n + k).
 */
public final class MapScene {
    private final Network network;
    private final STRtree mains;
    private final STRtree valves;
    private final STRtree stations;
    private final STRtree taps;
    private final STRtree services;
    private final STRtree sources;
    private final List<STRtree> context;
    private final Map<String, Integer> systemRank;
    private final Map<String, Station> stationById;

    public MapScene(Network network) {
        this.network = network;
        this.mains = index(network.mains());
        this.valves = index(network.valves());
        this.stations = index(network.stations());
        this.taps = index(network.taps());
        this.services = index(network.services());
        this.sources = index(network.sources());
        List<STRtree> ctx = new ArrayList<>();
        for (ContextLayer layer : network.context()) {
            STRtree t = new STRtree();
            for (ContextLayer.Item item : layer.items()) {
                if (item.geometry() != null && !item.geometry().isEmpty()) {
                    t.insert(item.geometry().getEnvelopeInternal(), item);
                }
            }
            t.build();
            ctx.add(t);
        }
        this.context = List.copyOf(ctx);
        this.systemRank = rankSystems(network.mains());
        Map<String, Station> byId = new HashMap<>();
        for (Station s : network.stations()) {
            if (s.geometry() != null && !s.geometry().isEmpty()) byId.putIfAbsent(s.id(), s);
        }
        this.stationById = byId;
    }

    public Network network() {
        return network;
    }

    /** Extent of all network features and context, or a null envelope when there are none. */
    public Envelope extent() {
        Envelope e = new Envelope();
        for (STRtree t : List.of(mains, valves, stations, taps, services, sources)) expand(e, t);
        for (STRtree t : context) expand(e, t);
        return e;
    }

    /** Rank of a pressure system (0 = highest MAOP); systems with no main rank after all others. */
    public int rankOf(String systemId) {
        Integer r = systemRank.get(systemId == null ? "" : systemId);
        return r == null ? systemRank.size() : r;
    }

    /** System ids in rank order. */
    public List<String> systems() {
        String[] ids = new String[systemRank.size()];
        systemRank.forEach((id, r) -> ids[r] = id);
        return List.of(ids);
    }

    /** The first station with this id that has a location; null when there is none. */
    public Station station(String id) {
        return stationById.get(id);
    }

    public List<Main> mainsIn(Envelope e) {
        return query(mains, e);
    }

    public List<org.shutline.model.Valve> valvesIn(Envelope e) {
        return query(valves, e);
    }

    public List<Station> stationsIn(Envelope e) {
        return query(stations, e);
    }

    public List<org.shutline.model.SenseTap> tapsIn(Envelope e) {
        return query(taps, e);
    }

    public List<org.shutline.model.Service> servicesIn(Envelope e) {
        return query(services, e);
    }

    public List<org.shutline.model.Source> sourcesIn(Envelope e) {
        return query(sources, e);
    }

    /** Items of context layer {@code layer} (index into {@code network.context()}) in {@code e}. */
    public List<ContextLayer.Item> contextIn(int layer, Envelope e) {
        return query(context.get(layer), e);
    }

    private static STRtree index(List<? extends Feature> features) {
        STRtree t = new STRtree();
        for (Feature f : features) {
            if (f.geometry() != null && !f.geometry().isEmpty()) t.insert(f.geometry().getEnvelopeInternal(), f);
        }
        t.build();
        return t;
    }

    @SuppressWarnings("unchecked")
    private static <T> List<T> query(STRtree t, Envelope e) {
        if (t.isEmpty()) return List.of();
        return Collections.unmodifiableList((List<T>) t.query(e));
    }

    private static void expand(Envelope e, STRtree t) {
        if (t.isEmpty()) return;
        Object b = t.getRoot().getBounds();
        if (b instanceof Envelope env) e.expandToInclude(env);
    }

    private static Map<String, Integer> rankSystems(List<Main> mains) {
        Map<String, Double> maxMaop = new HashMap<>();
        for (Main m : mains) {
            String sys = m.systemId() == null ? "" : m.systemId();
            double v = m.maopKpa() == null ? Double.NEGATIVE_INFINITY : m.maopKpa();
            maxMaop.merge(sys, v, Math::max);
        }
        Set<String> ordered = new TreeSet<>((a, b) -> {
            int c = Double.compare(maxMaop.get(b), maxMaop.get(a));
            return c != 0 ? c : a.compareTo(b);
        });
        ordered.addAll(maxMaop.keySet());
        Map<String, Integer> rank = new HashMap<>();
        int i = 0;
        for (String s : ordered) rank.put(s, i++);
        return rank;
    }
}
