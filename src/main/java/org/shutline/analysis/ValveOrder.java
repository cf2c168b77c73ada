package org.shutline.analysis;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.shutline.model.Operability;
import org.shutline.model.Station;
import org.shutline.trace.NetworkState;
import org.shutline.trace.SegmentGraph;
import org.shutline.trace.ValveSegments;

/**
 * The one order in which the valves of an isolation are operated in the field, with
 * the crew of each valve and, under each doubtful valve, what to do if it will not
 * close. Every output (text, JSON, CSV, PDF, GeoPackage, GeoJSON, cards, map labels)
 * numbers valves with {@link Step#order()} from here.
 *
 * <ul>
 * <li>Valves: the isolation's listed valves, and, when valves alone cannot isolate,
 *     the inlet valves of the stations to stop (rank -1: the feed into the area).</li>
 * <li>Route and numbers: {@link ValveRoute#plan} with each valve's hop distance from
 *     the sources as rank and "doubtful" = operability unknown or past the inspection
 *     interval (the isolation's own rule for a fallback). Order numbers run 1..n along
 *     crew 1's run, then crew 2's; within a run doubtful valves first, then the feeding
 *     side first.</li>
 * <li>Fallback of a doubtful valve: the isolation's {@link Isolation.Fallback}; its
 *     extra valves join the same crew's route ({@link ValveRoute#detour}: driving order
 *     from the failed valve, extra minutes). When the fallback cannot be isolated by
 *     valves, the stations to stop and their inlet valves are those of the isolation of
 *     the same grown area (the region and both sides of the failed valve, isolated
 *     again with {@link Isolation#isolate}); the reason is given.</li>
 * </ul>
 * Cost: one route O(n^2) for n valves, plus one isolation per fallback that valves
 * alone cannot isolate.
 */
public final class ValveOrder {
    /** One valve in field order (1 = first); {@code fallback} is null for a valve not in doubt. */
    public record Step(int order, String valveId, int valve, int crew, Operability operable, boolean overdue,
                       boolean doubtful, boolean stationInlet, double x, double y, Fallback fallback, List<String> stopsStations) {
        public Step {
            stopsStations = List.copyOf(stopsStations);
        }

        public Step(int order, String valveId, int valve, int crew, Operability operable, boolean overdue,
                    boolean doubtful, boolean stationInlet, double x, double y, Fallback fallback) {
            this(order, valveId, valve, crew, operable, overdue, doubtful, stationInlet, x, y, fallback, List.of());
        }

        /** "stops station ST-N1" for a valve of a station stop (the stations whose stop it is part of); else empty. */
        public String stopLabel() {
            if (!stationInlet) return "";
            return stopsStations.isEmpty() ? "stops a station" : (stopsStations.size() == 1 ? "stops station " : "stops stations ")
                    + String.join(", ", stopsStations);
        }
    }

    /**
     * What to do if valve {@code valveId} will not close: the crew closes
     * {@code thenClose} (in its driving order from the failed valve, {@code extraMinutes}
     * more); when {@code isolable} is false valves alone cannot do it and
     * {@code stopStations} must be stopped (closing {@code stationInletValves}).
     */
    public record Fallback(String valveId, String why, int crew, List<String> thenClose, double extraMinutes,
                           int addedServices, long addedMeters, boolean isolable, String reason, List<String> stopStations,
                           List<String> stationInletValves, int stayOnServices, long stayOnMeters) {
        public Fallback {
            thenClose = List.copyOf(thenClose);
            stopStations = List.copyOf(stopStations);
            stationInletValves = List.copyOf(stationInletValves);
        }

        /**
         * The full instruction in one line, for lists and tables, e.g. "crew 1 then closes
         * V-024, V-023 (+31 min); adds 124 services, 157 meters" or "valves alone cannot
         * isolate: stop station ST-S1 Weir Lane Station (close V-013); adds 387 services,
         * 497 meters".
         */
        public String text() {
            StringBuilder sb = new StringBuilder();
            if (!isolable) {
                sb.append("valves alone cannot isolate");
                if (!stopStations.isEmpty()) {
                    sb.append(": stop station").append(stopStations.size() > 1 ? "s " : " ").append(String.join(", ", stopStations));
                    if (!stationInletValves.isEmpty()) sb.append(" (close ").append(String.join(", ", stationInletValves)).append(')');
                }
                if (reason != null && !reason.isBlank()) sb.append(stopStations.isEmpty() ? ": " : "; ").append(reason);
                if (!thenClose.isEmpty()) sb.append("; crew ").append(crew).append(" also closes ").append(String.join(", ", thenClose));
            } else if (thenClose.isEmpty()) {
                sb.append("no further valve to close");
            } else {
                sb.append("crew ").append(crew).append(" then closes ").append(String.join(", ", thenClose))
                        .append(String.format(Locale.ROOT, " (+%.0f min)", extraMinutes));
            }
            sb.append("; adds ").append(addedServices).append(addedServices == 1 ? " service, " : " services, ")
                    .append(addedMeters).append(addedMeters == 1 ? " meter" : " meters");
            if (stayOnServices > 0 || stayOnMeters > 0) {
                sb.append("; ").append(stayOnServices).append(stayOnServices == 1 ? " service, " : " services, ")
                        .append(stayOnMeters).append(stayOnMeters == 1 ? " meter" : " meters").append(" of the shut-off stay on");
            }
            return sb.toString();
        }
    }

    /** Steps in field order, and the route they follow. */
    public record Result(List<Step> steps, ValveRoute.Result route) {
        public Result {
            steps = List.copyOf(steps);
        }

        /** Valve ids in field order. */
        public List<String> valveIds() {
            List<String> ids = new ArrayList<>(steps.size());
            for (Step s : steps) ids.add(s.valveId());
            return ids;
        }

        /** The step of a valve, or null. */
        public Step step(String valveId) {
            for (Step s : steps) if (s.valveId().equals(valveId)) return s;
            return null;
        }

        /** The fallbacks in field order (of the doubtful valves). */
        public List<Fallback> fallbacks() {
            List<Fallback> out = new ArrayList<>();
            for (Step s : steps) if (s.fallback() != null) out.add(s.fallback());
            return out;
        }
    }

    private ValveOrder() {}

    /**
     * @param iso the isolation that made {@code r} (used again for fallbacks that valves alone cannot isolate)
     * @param options the same options (the inspection rule for station inlet valves)
     */
    public static Result of(ValveSegments segs, Isolation iso, ValveDoubt.Settings options, Isolation.Result r, ResponseSettings settings) {
        NetworkState s = segs.state();
        Map<String, Integer> index = new HashMap<>();
        for (int v = 0; v < s.valveCount(); v++) index.putIfAbsent(s.valveId(v), v);
        double unit = s.network().crs().unit().toMetres(1.0);
        List<ValveRoute.Stop> stops = new ArrayList<>();
        Map<String, Isolation.ValveStep> steps = new HashMap<>();
        Set<String> listed = new HashSet<>();
        for (Isolation.ValveStep v : r.valves()) {
            double[] xy = IncidentResponse.valveXY(s, v.valve());
            boolean doubtful = ValveDoubt.of(s, v.valve(), options).doubtful();
            stops.add(new ValveRoute.Stop(v.valveId(), xy[0] * unit, xy[1] * unit, doubtful, v.hops()));
            steps.put(v.valveId(), v);
            listed.add(v.valveId());
        }
        List<String> inlets = new ArrayList<>();
        for (String id : r.stationInletValves()) {
            Integer v = index.get(id);
            if (v == null || !listed.add(id)) continue;
            double[] xy = IncidentResponse.valveXY(s, v);
            boolean doubtful = ValveDoubt.of(s, v, options).doubtful();
            stops.add(new ValveRoute.Stop(id, xy[0] * unit, xy[1] * unit, doubtful, -1));
            inlets.add(id);
        }
        ValveRoute.Result route = ValveRoute.plan(stops, settings.crews(), settings.valves());
        Map<String, ValveRoute.Stop> stopOf = new HashMap<>();
        for (ValveRoute.Stop st : stops) stopOf.put(st.valveId(), st);
        Map<String, Isolation.Fallback> fallbackOf = new HashMap<>();
        for (Isolation.Fallback f : r.fallbacks()) fallbackOf.put(f.valveId(), f);
        List<Step> out = new ArrayList<>();
        int order = 0;
        for (String id : route.fieldOrder()) {
            order++;
            int v = index.get(id);
            double[] xy = IncidentResponse.valveXY(s, v);
            int crew = route.crewOf(id);
            Isolation.ValveStep vs = steps.get(id);
            Fallback fb = null;
            Isolation.Fallback f = fallbackOf.get(id);
            if (f != null) fb = fallback(segs, iso, r, v, f, stopOf.get(id), route, settings, index, unit);
            if (vs != null) {
                out.add(new Step(order, id, v, crew, vs.operable(), vs.overdue(), stopOf.get(id).doubtful(), false, xy[0], xy[1], fb));
            } else {
                List<String> stopsStations = new ArrayList<>();
                for (StationStop.Result st : r.stationStops()) if (st.valves().contains(id)) stopsStations.add(st.stationId());
                out.add(new Step(order, id, v, crew, s.valveOperability(v), ValveDoubt.of(s, v, options).overdue(), stopOf.get(id).doubtful(), true,
                        xy[0], xy[1], fb, stopsStations));
            }
        }
        return new Result(out, route);
    }

    private static Fallback fallback(ValveSegments segs, Isolation iso, Isolation.Result r, int v, Isolation.Fallback f,
                                     ValveRoute.Stop at, ValveRoute.Result route, ResponseSettings settings,
                                     Map<String, Integer> index, double unit) {
        NetworkState s = segs.state();
        List<ValveRoute.Stop> extra = new ArrayList<>();
        for (String id : f.thenClose()) {
            Integer e = index.get(id);
            if (e == null) continue;
            double[] xy = IncidentResponse.valveXY(s, e);
            extra.add(new ValveRoute.Stop(id, xy[0] * unit, xy[1] * unit));
        }
        ValveRoute.Detour d = ValveRoute.detour(route, at, extra, settings.valves());
        List<String> stations = List.of(), inlet = List.of();
        String reason = "";
        if (!f.isolable()) {
            stations = named(s, f.stationsToStop());
            List<String> valves = new ArrayList<>();
            List<String> atStation = new ArrayList<>();
            for (String id : f.stationsToStop()) {
                StationStop.Result stop = StationStop.Result.of(f.stationStops(), id);
                if (stop != null && stop.byValves()) {
                    for (String vid : stop.valves()) if (!valves.contains(vid)) valves.add(vid);
                } else {
                    atStation.add(id);
                }
            }
            inlet = valves;
            List<String> why = new ArrayList<>();
            if (!f.sourcesInRegion().isEmpty()) {
                why.add("source " + String.join(", ", f.sourcesInRegion()) + " feeds the area directly: shut the supply");
            }
            if (!atStation.isEmpty()) {
                why.add("no valve on record stops station " + String.join(", ", atStation) + ": stop it at the station");
            }
            reason = String.join("; ", why);
        }
        return new Fallback(f.valveId(), f.why(), d.crew(), d.valves(), d.extraMinutes(), f.addedServices().size(), f.addedMeters(),
                f.isolable(), reason, stations, inlet, f.stayOnServices().size(), f.stayOnMeters());
    }

    /** Station ids with their names: "ST-S1 Weir Lane Station". */
    private static List<String> named(NetworkState s, List<String> ids) {
        List<String> out = new ArrayList<>();
        for (String id : ids) {
            String name = null;
            for (Station st : s.network().stations()) if (st.id().equals(id)) name = st.name();
            out.add(name == null || name.isBlank() ? id : id + " " + name);
        }
        return out;
    }
}
