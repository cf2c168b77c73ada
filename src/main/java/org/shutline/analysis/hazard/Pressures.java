package org.shutline.analysis.hazard;

import org.shutline.model.Network;
import org.shutline.model.Pressure;
import org.shutline.model.PressureUnit;
import org.shutline.model.Source;
import org.shutline.model.Station;

/** Pressures of systems as the records give them, for messages. */
final class Pressures {
    private Pressures() {}

    /**
     * The pressure of system {@code sys}: the set pressure of a station feeding it, else the
     * pressure of a source in it; null when the records give none.
     */
    static Pressure ofSystem(Network net, String sys) {
        for (Station st : net.stations()) if (sys.equals(st.outSys()) && st.setKpa() != null) return Pressure.kpa(st.setKpa());
        for (Source so : net.sources()) if (sys.equals(so.systemId()) && so.kpa() != null) return Pressure.kpa(so.kpa());
        return null;
    }

    static String describe(Network net, String sys, PressureUnit unit) {
        Pressure p = ofSystem(net, sys);
        return p == null ? sys + " (pressure not recorded)" : sys + " (" + p.format(unit) + ")";
    }
}
