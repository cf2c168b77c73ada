package org.shutline.analysis;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.shutline.model.LinearUnit;
import org.shutline.trace.NetworkState;
import org.shutline.trace.ValveSegments;

/**
 * The response to a leak or damage at a place: the valves that stop gas there, how
 * long closing them takes, and the shut-off and relight work behind them.
 *
 * <ul>
 * <li>Valves: {@link Isolation} of the zone (for a point, the segment of the nearest
 *     active pipe: the smallest isolable area containing it, grown only across
 *     inoperable valves), with operating order, per doubtful valve the fallback, and
 *     the alternative with fewer valves where there is one.</li>
 * <li>Order and time: {@link ValveOrder} (crews' routes, doubtful valves first in each,
 *     fallbacks joining the same crew's route) over the listed valves and the inlet
 *     valves of stations to stop; {@link ValveRoute} separately over the alternative's
 *     valves; positions in the network, lengths converted from the CRS unit to metres.</li>
 * <li>Work: {@link Restoration} over the services put off gas, with dead districts
 *     purged and relit whole.</li>
 * </ul>
 * {@link #INITIAL_ISOLATION_M} is the initial isolation distance for natural gas of
 * the Emergency Response Guidebook, Guide 115 (100 m in all directions). Cost: one
 * isolation (see {@link Isolation}) plus O(v^2) for v valves.
 */
public final class IncidentResponse {
    /** ERG Guide 115: initial isolation of at least 100 m (330 ft) in all directions. */
    public static final double INITIAL_ISOLATION_M = 100.0;

    /**
     * The answer; {@code order} is the field order of the valves (numbers, crews,
     * fallbacks), {@code route} its route; {@code alternativeRoute} is present when the
     * isolation has an alternative.
     */
    public record Result(Isolation.Result isolation, ValveOrder.Result order, ValveRoute.Result route,
                         Optional<ValveRoute.Result> alternativeRoute, Restoration.Result restoration, String systemId,
                         List<String> stationsCutOff) {
        public Result {
            stationsCutOff = List.copyOf(stationsCutOff);
        }
    }

    private IncidentResponse() {}

    public static Result leak(ValveSegments segs, ValveDoubt.Settings options, Zone zone, ResponseSettings settings) {
        Isolation iso = new Isolation(segs, options);
        Isolation.Result r = iso.isolate(zone);
        BitSet before = iso.fedSegments();
        BitSet after = (BitSet) before.clone();
        after.andNot(r.region());
        after.andNot(r.unintended());
        Restoration.Result rest = Restoration.of(segs, before, after, r.servicesOff(), settings);
        ValveOrder.Result order = ValveOrder.of(segs, iso, options, r, settings.withCrews(rest.sizing().crews()));
        Optional<ValveRoute.Result> alt = r.alternative()
                .map(a -> ValveRoute.plan(stops(segs.state(), a.valves()), rest.sizing().crews(), settings.valves()));
        List<String> cut = new ArrayList<>();
        for (int st : iso.stationsCutOff(r)) {
            var station = segs.state().network().stations().get(st);
            cut.add(station.id() + (station.name() == null || station.name().isBlank() ? "" : " " + station.name())
                    + " (feeds " + station.outSys() + ")");
        }
        return new Result(r, order, order.route(), alt, rest, systemOf(segs, zone), cut);
    }

    /** Valve positions (metres) in the order given; a valve id the state does not hold is a broken contract. */
    public static List<ValveRoute.Stop> stops(NetworkState s, List<String> valveIds) {
        Map<String, Integer> index = new HashMap<>();
        for (int v = 0; v < s.valveCount(); v++) index.putIfAbsent(s.valveId(v), v);
        LinearUnit unit = s.network().crs().unit();
        List<ValveRoute.Stop> out = new ArrayList<>();
        for (String id : valveIds) {
            Integer v = index.get(id);
            if (v == null) throw new IllegalArgumentException("no valve " + id + " in this state");
            double[] xy = valveXY(s, v);
            out.add(new ValveRoute.Stop(id, unit.toMetres(xy[0]), unit.toMetres(xy[1])));
        }
        return out;
    }

    /** A valve's position in the CRS: its node (the from node of its edge), or NaN when it is not attached. */
    public static double[] valveXY(NetworkState s, int valve) {
        int e = s.valveEdge(valve);
        if (e < 0) return new double[] {Double.NaN, Double.NaN};
        int n = s.edgeFrom(e);
        return new double[] {s.nodeX(n), s.nodeY(n)};
    }

    /** The pressure system of the first zone segment that has pipe, or null when the zone touches none. */
    public static String systemOf(ValveSegments segs, Zone zone) {
        BitSet z = ZoneSegments.of(zone, segs);
        for (int s = z.nextSetBit(0); s >= 0; s = z.nextSetBit(s + 1)) {
            int sys = Restoration.segmentSystem(segs, s);
            if (sys >= 0) return segs.state().graph().systemId(sys);
        }
        return null;
    }
}
