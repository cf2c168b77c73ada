package org.shutline.analysis;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.Comparator;
import java.util.List;
import java.util.Objects;
import org.locationtech.jts.geom.Point;
import org.shutline.model.Network;
import org.shutline.model.Operability;
import org.shutline.model.Station;
import org.shutline.model.Valve;
import org.shutline.model.ValveKind;
import org.shutline.trace.NetworkState;
import org.shutline.trace.SegmentGraph;
import org.shutline.trace.ValveSegments;

/**
 * The valves that stop a regulator station: close them and no gas reaches the
 * station's inlet, so it passes none. Computed as an isolation of the station's inlet
 * on its inlet system, never by nearness alone.
 *
 * <ol>
 * <li><b>Station valves first.</b> The station's own valves are the open, relied-on
 *     ({@code operable} not {@code no}) valves of kind {@code station} on its inlet
 *     system within the point tolerance of the station. If closing all of them leaves
 *     the inlet segment unreached from every live source (segment-graph search with
 *     those links blocked), the set is cut down to the valves needed (each dropped, in
 *     id order, when the inlet stays dead without it) and the stop is the
 *     {@link Isolation} of the inlet side they cut off: the inlet segment grown across
 *     every open valve except those (stations are not crossed).</li>
 * <li><b>Otherwise the inlet segment itself.</b> The {@link Isolation} of the inlet
 *     segment (grown across open inoperable valves as every isolation is). Any valve
 *     set that leaves the inlet dead (and closes no inoperable valve) leaves that whole
 *     region dead, so what it puts off contains what this isolation puts off: this is
 *     the stop with the fewest services off (other stations' districts included). The
 *     result says plainly that no station valve on record does it, and names the
 *     inlet-system mains the stop takes out of gas with it.</li>
 * </ol>
 * Either way the stop carries the isolation's operating order, a fallback per doubtful
 * valve (unknown, or past its inspection interval), and the alternative with fewer
 * valves where there is one. When a source lies in that region, or another station
 * feeds it straight in, valves alone cannot stop the station ({@code stoppable}
 * false, the reason said).
 *
 * <p><b>Other customers off</b>: the services the stop puts off minus the station's
 * own district, i.e. minus the services that lose gas when this station alone is out
 * of service (in a district fed by two stations that district is empty, so the whole
 * outage counts as other customers). Other stations stopped with it: those in
 * service whose inlet segment the stop puts off gas.
 *
 * <p>A station out of service, not attached, or whose inlet is not fed passes no gas
 * already: no valves, {@code isolation} null, said in {@code note}.
 *
 * <p>Cost: one or two segment-graph searches per station valve plus one isolation (see
 * {@link Isolation}); results are cached per {@link Isolation} instance
 * ({@link Isolation#stationStop}).
 */
public final class StationStop {
    /**
     * One station's stop. {@code valves} are in operating order; {@code byStationValves}
     * is true when they are the station's own valves (rule 1). {@code ownDistrict},
     * {@code otherOff} are service indices of the state.
     */
    public record Result(int station, String stationId, String name, String inSys, boolean stoppable, boolean byStationValves,
                         String note, List<String> valves, Isolation.Result isolation, List<String> alsoStopped,
                         List<String> inletMainsOff, BitSet ownDistrict, BitSet otherOff, long otherMeters) {
        public Result {
            valves = List.copyOf(valves);
            alsoStopped = List.copyOf(alsoStopped);
            inletMainsOff = List.copyOf(inletMainsOff);
            ownDistrict = (BitSet) ownDistrict.clone();
            otherOff = (BitSet) otherOff.clone();
        }

        @Override public BitSet ownDistrict() { return (BitSet) ownDistrict.clone(); }
        @Override public BitSet otherOff() { return (BitSet) otherOff.clone(); }

        /** True when closing {@link #valves()} stops the station (else it is stopped at the station itself). */
        public boolean byValves() {
            return stoppable && isolation != null && isolation.isolable();
        }

        /** The stop of station {@code id} in {@code stops}, or null. */
        public static Result of(List<Result> stops, String id) {
            Result found = null;
            for (Result r : stops) if (r.stationId().equals(id)) found = r;
            return found;
        }

        /** One line for an operator: what to close and what else it does. */
        public String summary() {
            if (isolation == null) return note;
            if (!stoppable) return note + (valves.isEmpty() ? "" : "; with that done, close " + String.join(", ", valves));
            StringBuilder sb = new StringBuilder();
            sb.append(valves.isEmpty() ? "no valve to close" : "close " + String.join(", ", valves));
            if (!alsoStopped.isEmpty()) sb.append("; also stops ").append(String.join(", ", alsoStopped));
            sb.append("; other customers off: ").append(otherOff.cardinality()).append(" services, ").append(otherMeters).append(" meters");
            if (!note.isEmpty()) sb.append(" (").append(note).append(')');
            return sb.toString();
        }
    }

    private StationStop() {}

    /** The stop of station {@code st} with the segments and options of {@code iso}. */
    static Result compute(Isolation iso, int st) {
        ValveSegments segs = iso.segments();
        SegmentGraph sg = segs.graph();
        NetworkState s = segs.state();
        Station station = s.network().stations().get(st);
        int l = sg.stationLink(st);
        BitSet before = iso.fedSegments();
        BitSet none = new BitSet();
        if (l < 0 || !sg.isOpen(l) || !before.get(sg.linkA(l))) {
            String why = l < 0 ? "not attached to the network" : !sg.isOpen(l) ? "out of service" : "its inlet has no gas";
            return new Result(st, station.id(), station.name(), station.inSys(), true, false, "passes no gas: " + why,
                    List.of(), null, List.of(), List.of(), none, none, 0);
        }
        int inlet = sg.linkA(l);
        List<Integer> own = ownValveLinks(s, sg, station);
        BitSet cut = new BitSet(sg.linkCount());
        for (int v : own) cut.set(v);
        Isolation.Result r = null;
        boolean byStation = false;
        if (!own.isEmpty() && !sg.reachFromSources(null, cut).get(inlet)) {
            for (int v : own) {
                cut.clear(v);
                if (sg.reachFromSources(null, cut).get(inlet)) cut.set(v);
            }
            r = iso.isolate(new Zone.OfSegments(sideOf(sg, inlet, cut).stream().toArray()));
            byStation = true;
            for (Isolation.ValveStep step : r.valves()) if (!cut.get(sg.valveLink(step.valve()))) byStation = false;
        }
        if (r == null || !byStation) r = iso.isolate(new Zone.OfSegments(new int[] {inlet}));
        String note;
        if (!r.isolable()) {
            note = "valves alone cannot stop it: " + r.reason();
        } else if (byStation) {
            note = "";
        } else if (own.isEmpty()) {
            note = "no station valve on record; the smallest stop shuts inlet " + mainsText(inletMains(segs, r.region(), station.inSys()));
        } else {
            note = "its station valve" + (own.size() > 1 ? "s" : "") + " " + ids(s, sg, own)
                    + (own.size() > 1 ? " leave" : " leaves") + " the inlet fed from another side; the smallest stop shuts inlet "
                    + mainsText(inletMains(segs, r.region(), station.inSys()));
        }
        return of(iso, st, r, byStation, note);
    }

    /**
     * The stop of {@code stop}'s station when valve {@code v} of it will not close: its
     * region grown across that valve (and on across inoperable valves), isolated again.
     * Not done by valves when the grown region holds a source or is fed straight in by
     * another station: the station is then to be stopped at the station itself.
     */
    static Result grownBy(Isolation iso, Result stop, int v) {
        Isolation.Result r = iso.isolate(new Zone.OfSegments(iso.grownAcross(stop.isolation().region(), v).stream().toArray()));
        String failed = iso.segments().state().valveId(v);
        String note = r.isolable()
                ? "with " + failed + " not closing, the stop grows to inlet " + mainsText(inletMains(iso.segments(), r.region(), stop.inSys()))
                : "with " + failed + " not closing, valves alone cannot stop it: stop it at the station (" + r.reason() + ")";
        return of(iso, stop.station(), r, false, note);
    }

    /** The result for station {@code st} stopped by isolation {@code r}: what else goes off with it. */
    private static Result of(Isolation iso, int st, Isolation.Result r, boolean byStation, String note) {
        ValveSegments segs = iso.segments();
        SegmentGraph sg = segs.graph();
        NetworkState s = segs.state();
        Station station = s.network().stations().get(st);
        BitSet before = iso.fedSegments();
        BitSet offSegs = r.region();
        offSegs.or(r.unintended());
        offSegs.and(before);
        List<String> also = new ArrayList<>();
        for (int o = 0; o < s.stationCount(); o++) {
            int ol = sg.stationLink(o);
            if (o == st || ol < 0 || !sg.isOpen(ol) || !before.get(sg.linkA(ol))) continue;
            if (offSegs.get(sg.linkA(ol))) also.add(s.stationId(o));
        }
        BitSet stopped = new BitSet();
        stopped.set(st);
        BitSet lostAlone = (BitSet) before.clone();
        lostAlone.andNot(sg.reachFromSourcesStopping(null, stopped));
        BitSet ownDistrict = segs.servicesOf(lostAlone);
        BitSet other = r.servicesOff();
        other.andNot(ownDistrict);
        long otherMeters = 0;
        for (int i = other.nextSetBit(0); i >= 0; i = other.nextSetBit(i + 1)) otherMeters += s.network().services().get(i).meters();
        List<String> inletMains = inletMains(segs, r.region(), station.inSys());
        return new Result(st, station.id(), station.name(), station.inSys(), r.isolable(), byStation, note, r.valveIds(), r,
                also, inletMains, ownDistrict, other, otherMeters);
    }

    /** Links of the station's own valves: open, relied-on, kind station, on the inlet system, within the point tolerance. */
    static List<Integer> ownValveLinks(NetworkState s, SegmentGraph sg, Station station) {
        List<Integer> out = new ArrayList<>();
        Network net = s.network();
        double tol = s.topology().tolerances().pointM();
        Point at = station.geometry();
        if (at == null) return out;
        int base = net.valves().size();
        for (int v = 0; v < Math.min(base, s.valveCount()); v++) {
            Valve valve = net.valves().get(v);
            int l = sg.valveLink(v);
            if (l < 0 || !sg.isOpen(l) || valve.kind() != ValveKind.STATION || s.valveOperability(v) == Operability.NO) continue;
            if (!Objects.equals(valve.systemId(), station.inSys())) continue;
            if (valve.geometry() != null && valve.geometry().distance(at) <= tol) out.add(l);
        }
        out.sort(Comparator.comparing(l -> s.valveId(sg.linkFeature(l))));
        return out;
    }

    /** The inlet segment grown across every open valve not in {@code cut}; stations are not crossed. */
    private static BitSet sideOf(SegmentGraph sg, int inlet, BitSet cut) {
        BitSet side = new BitSet(sg.segmentCount());
        side.set(inlet);
        int[] stack = new int[Math.max(1, sg.segmentCount())];
        int top = 0;
        stack[top++] = inlet;
        while (top > 0) {
            int u = stack[--top];
            for (int i = sg.crossStart(u); i < sg.crossEnd(u); i++) {
                int l = sg.crossLink(i);
                if (!sg.isValve(l) || !sg.canFlow(l, u) || cut.get(l)) continue;
                int w = sg.other(l, u);
                if (!side.get(w)) {
                    side.set(w);
                    stack[top++] = w;
                }
            }
        }
        return side;
    }

    /** Mains of the inlet system in the stop's region. */
    private static List<String> inletMains(ValveSegments segs, BitSet region, String inSys) {
        NetworkState s = segs.state();
        int sys = s.graph().systemIndex(inSys);
        List<String> out = new ArrayList<>();
        for (int g = region.nextSetBit(0); g >= 0; g = region.nextSetBit(g + 1)) {
            for (int m : segs.mains(g)) if (s.mainSystem(m) == sys && !out.contains(s.mainId(m))) out.add(s.mainId(m));
        }
        out.sort(null);
        return out;
    }

    private static String mainsText(List<String> mains) {
        if (mains.isEmpty()) return "pipe: none (valves only)";
        int shown = Math.min(6, mains.size());
        return (mains.size() == 1 ? "main " : "mains ") + String.join(", ", mains.subList(0, shown))
                + (mains.size() > shown ? " and " + (mains.size() - shown) + " more" : "");
    }

    private static String ids(NetworkState s, SegmentGraph sg, List<Integer> links) {
        List<String> out = new ArrayList<>();
        for (int l : links) out.add(s.valveId(sg.linkFeature(l)));
        return String.join(", ", out);
    }
}
