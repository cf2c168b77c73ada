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
    private final StateFeatures state;
    private final STRtree added;
    private final Set<Main> temporary;
    private final Set<org.shutline.model.Valve> addedValves;

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
        this.state = StateFeatures.NONE;
        this.added = new STRtree();
        this.temporary = Set.of();
        this.addedValves = Set.of();
    }

    /** The base scene's indexes shared, seen through a state's features (see {@link #withState}). */
    private MapScene(MapScene base, StateFeatures f) {
        this.network = base.network;
        this.mains = base.mains;
        this.valves = base.valves;
        this.stations = base.stations;
        this.taps = base.taps;
        this.services = base.services;
        this.sources = base.sources;
        this.context = base.context;
        this.systemRank = base.systemRank;
        this.stationById = base.stationById;
        this.state = f;
        STRtree t = new STRtree();
        Set<Main> temp = java.util.Collections.newSetFromMap(new java.util.IdentityHashMap<>());
        Set<org.shutline.model.Valve> av = java.util.Collections.newSetFromMap(new java.util.IdentityHashMap<>());
        for (StateFeatures.AddedPipe p : f.addedPipes()) {
            t.insert(p.main().geometry().getEnvelopeInternal(), p.main());
            if (p.temporary()) temp.add(p.main());
        }
        for (StateFeatures.AddedValve v : f.addedValves()) {
            t.insert(v.valve().geometry().getEnvelopeInternal(), v.valve());
            av.add(v.valve());
        }
        for (StateFeatures.Cut c : f.cuts()) t.insert(new Envelope(c.x(), c.x(), c.y(), c.y()), c);
        t.build();
        this.added = t;
        this.temporary = temp;
        this.addedValves = av;
    }

    /**
     * This scene drawing a network state: recorded mains and valves as they stand in the
     * state (status, open or closed), plus the pipe and valves the plan added and its open
     * cuts ({@link StateFeatures}). The recorded layers' indexes are shared, so this costs
     * O(mains + valves + k log k) for k added features. The state must be of this scene's network (the same main
     * and valve lists: a scene of the network without its context layers is fine).
     */
    public MapScene withState(org.shutline.trace.NetworkState s) {
        if (s.network().mains() != network.mains() || s.network().valves() != network.valves()) {
            throw new IllegalArgumentException("the state is of another network than the scene");
        }
        StateFeatures f = StateFeatures.of(s);
        return f.isEmpty() && state.isEmpty() ? this : new MapScene(this, f);
    }

    /** The state's features this scene draws ({@link StateFeatures#NONE} for the network as recorded). */
    public StateFeatures state() {
        return state;
    }

    /** True for pipe the plan added as temporary (a bypass): drawn with its own look and labelled. */
    public boolean isTemporary(Main m) {
        return temporary.contains(m);
    }

    /** True for a valve the plan added (drawn labelled with its id). */
    public boolean isAdded(org.shutline.model.Valve v) {
        return addedValves.contains(v);
    }

    /** Open cuts (cut and capped) in {@code e}. */
    public List<StateFeatures.Cut> cutsIn(Envelope e) {
        if (state.cuts().isEmpty()) return List.of();
        List<StateFeatures.Cut> out = new ArrayList<>();
        for (Object o : query(added, e)) if (o instanceof StateFeatures.Cut c) out.add(c);
        return out;
    }

    public Network network() {
        return network;
    }

    /** Extent of all network features and context, or a null envelope when there are none. */
    public Envelope extent() {
        Envelope e = new Envelope();
        for (STRtree t : List.of(mains, valves, stations, taps, services, sources, added)) expand(e, t);
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

    /** Mains in {@code e}: as they stand in the state drawn, then the pipe the plan added. */
    public List<Main> mainsIn(Envelope e) {
        List<Main> base = query(mains, e);
        if (state == StateFeatures.NONE) return base;
        List<Main> out = new ArrayList<>(base.size() + 4);
        for (Main m : base) out.add(state.main(m));
        for (Object o : query(added, e)) if (o instanceof Main m) out.add(m);
        return Collections.unmodifiableList(out);
    }

    /** Valves in {@code e}: open or closed as in the state drawn, then the valves the plan added. */
    public List<org.shutline.model.Valve> valvesIn(Envelope e) {
        List<org.shutline.model.Valve> base = query(valves, e);
        if (state == StateFeatures.NONE) return base;
        List<org.shutline.model.Valve> out = new ArrayList<>(base.size() + 4);
        for (org.shutline.model.Valve v : base) out.add(state.valve(v));
        for (Object o : query(added, e)) if (o instanceof org.shutline.model.Valve v) out.add(v);
        return Collections.unmodifiableList(out);
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
