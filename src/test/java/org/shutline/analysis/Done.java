package org.shutline.analysis;

import org.shutline.trace.NetworkState;

/** A network state with an isolation carried out as it is written: its valves closed, each station stopped as it says. */
final class Done {
    private Done() {}

    static NetworkState isolation(NetworkState s, Isolation.Result r) {
        for (Isolation.ValveStep v : r.valves()) s = s.withValveClosed(v.valve(), true);
        for (String id : r.stationsToStop()) {
            StationStop.Result how = StationStop.Result.of(r.stationStops(), id);
            if (how != null && how.byValves()) {
                for (Isolation.ValveStep v : how.isolation().valves()) s = s.withValveClosed(v.valve(), true);
            } else {
                for (int st = 0; st < s.stationCount(); st++) if (s.stationId(st).equals(id)) s = s.withStationInService(st, false);
            }
        }
        return s;
    }

    /**
     * Services {@code a}'s station stops put off, for stations {@code b} does not stop the
     * same way: when a valve turns inoperable the region may grow over a station's inlet
     * (the station then needs no stop and its inlet pipe beyond the region stays on), or
     * the stop can no longer be done by valves (the station is stopped at the station).
     */
    static java.util.BitSet byStopsNotNeeded(Isolation.Result a, Isolation.Result b) {
        java.util.BitSet out = new java.util.BitSet();
        for (StationStop.Result st : a.stationStops()) {
            if (st.isolation() == null) continue;
            StationStop.Result same = null;
            for (StationStop.Result x : b.stationStops()) if (x.stationId().equals(st.stationId())) same = x;
            boolean byValves = same != null && b.stationsToStop().contains(same.stationId()) && same.stoppable()
                    && same.isolation() != null && same.isolation().isolable();
            if (!byValves || !same.valves().containsAll(st.valves())) out.or(st.isolation().servicesOff());
        }
        return out;
    }
}
