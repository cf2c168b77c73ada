package org.shutline.analysis;

import java.util.Locale;
import org.shutline.model.Main;
import org.shutline.model.MainStatus;
import org.shutline.model.Network;
import org.shutline.model.Pressure;
import org.shutline.model.PressureUnit;
import org.shutline.model.Source;
import org.shutline.model.Station;

/**
 * Over-pressure judged against 49 CFR 192.201(a), the pressure relief or limiting
 * devices must keep a system below:
 * <ul>
 * <li>(a)(1) a low-pressure distribution system: no pressure that makes connected,
 *     properly adjusted gas appliances unsafe. Taken as a setting, default 0.5 psig
 *     (14 in w.c.; common practice, see trade-facts.md);</li>
 * <li>(a)(2) other systems: MAOP 60 psig or more: MAOP + 10 %; 12 to 60 psig: MAOP + 6 psi;
 *     below 12 psig: MAOP + 50 %. The cap of (a)(2)(i) at the pressure giving 75 % of SMYS
 *     is <em>not</em> checked (pipe grade and wall are not in the data).</li>
 * </ul>
 * A system counts as a <em>low-pressure distribution system</em> when the highest
 * {@code maop_kpa} of its mains is at or below 14 in w.c. (3.487 kPa, the customary top of
 * low-pressure systems, 0.5 psig rounded up: common practice); when none of its mains
 * records an MAOP, when a station feeding it is set below 1 psig; otherwise it is not
 * known and no limit is judged. The pressure a failed-open station passes into its
 * outlet system is its inlet system's maximum: the highest {@code maop_kpa} of the
 * inlet system's mains, or a source's pressure in it when that is higher.
 */
public final class OverpressureLimit {
    /** Default limit of a low-pressure distribution system, 192.201(a)(1): 0.5 psig (common practice). */
    public static final Pressure DEFAULT_LOW_PRESSURE_LIMIT = Pressure.psi(0.5);
    /** Highest MAOP of a system counted as low-pressure: 14 in w.c. (common practice). */
    public static final Pressure LOW_PRESSURE_SYSTEM_MAX = Pressure.inchesWaterColumn(14);
    private static final Pressure ONE_PSI = Pressure.psi(1);

    /** The limit, the clause it comes from, and how it was worked. */
    public record Limit(Pressure limit, String clause, String basis) {
    }

    private OverpressureLimit() {}

    /** The 192.201(a)(2) limit for a system of MAOP {@code maop} (not low-pressure). */
    public static Limit ofMaop(Pressure maop) {
        double psi = maop.psi();
        if (psi >= 60) {
            return new Limit(Pressure.psi(psi * 1.10), "49 CFR 192.201(a)(2)(i)", "MAOP " + format(maop) + " + 10 % (the 75 % SMYS cap of (a)(2)(i) is not checked)");
        }
        if (psi >= 12) return new Limit(Pressure.psi(psi + 6), "49 CFR 192.201(a)(2)(ii)", "MAOP " + format(maop) + " + 6 psi");
        return new Limit(Pressure.psi(psi * 1.5), "49 CFR 192.201(a)(2)(iii)", "MAOP " + format(maop) + " + 50 %");
    }

    /** The 192.201(a)(1) limit of a low-pressure distribution system. */
    public static Limit lowPressure(Pressure setting) {
        return new Limit(setting, "49 CFR 192.201(a)(1)", "low-pressure distribution system: no pressure that makes connected, "
                + "properly adjusted appliances unsafe, taken as " + format(setting) + (Math.abs(setting.pascals() - DEFAULT_LOW_PRESSURE_LIMIT.pascals()) < 1e-6 ? " (common practice default; the operator sets its own)" : " (as set for this run)"));
    }

    /** The limit of system {@code sys}, or null when its MAOP and pressure class are not recorded. */
    public static Limit ofSystem(Network net, String sys, Pressure lowSetting) {
        Boolean low = isLowPressure(net, sys);
        if (low == null) return null;
        if (low) return lowPressure(lowSetting);
        Pressure maop = maop(net, sys);
        return maop == null ? null : ofMaop(maop);
    }

    /** True/false when the records tell whether {@code sys} is a low-pressure distribution system; null when not. */
    public static Boolean isLowPressure(Network net, String sys) {
        Pressure maop = maop(net, sys);
        if (maop != null) return maop.compareTo(LOW_PRESSURE_SYSTEM_MAX) <= 0;
        for (Station st : net.stations()) {
            if (sys.equals(st.outSys()) && st.setKpa() != null) return Pressure.kpa(st.setKpa()).compareTo(ONE_PSI) < 0;
        }
        return null;
    }

    /** The highest {@code maop_kpa} of the system's mains that are not abandoned; null when none records one. */
    public static Pressure maop(Network net, String sys) {
        Double best = null;
        for (Main m : net.mains()) {
            if (!sys.equals(m.systemId()) || m.maopKpa() == null || m.status() == MainStatus.ABANDONED) continue;
            if (best == null || m.maopKpa() > best) best = m.maopKpa();
        }
        return best == null ? null : Pressure.kpa(best);
    }

    /** What a failed-open station passes into its outlet: its inlet system's maximum; null when not recorded. */
    public static Pressure failedOpen(Network net, Station st) {
        Pressure p = maop(net, st.inSys());
        for (Source so : net.sources()) {
            if (st.inSys().equals(so.systemId()) && so.kpa() != null) {
                Pressure q = Pressure.kpa(so.kpa());
                if (p == null || q.compareTo(p) > 0) p = q;
            }
        }
        return p;
    }

    /**
     * One sentence for messages: what the failed-open station passes into its outlet
     * system and the 192.201(a) limit there, both figures given.
     */
    public static String judge(Network net, Station st, PressureUnit unit, Pressure lowSetting) {
        Pressure in = failedOpen(net, st);
        Limit lim = ofSystem(net, st.outSys(), lowSetting);
        String inText = in == null ? "its inlet system " + st.inSys() + "'s maximum (not recorded)"
                : "up to " + format(in, unit) + " (the maximum of its inlet system " + st.inSys() + ")";
        String sentence = "Failed open, station " + st.id() + " passes " + inText + " into " + st.outSys();
        if (lim == null) return sentence + "; the 49 CFR 192.201(a) limit of " + st.outSys() + " cannot be judged (no MAOP or set pressure recorded).";
        sentence += ", whose limit under " + lim.clause() + " is " + format(lim.limit(), unit) + " (" + lim.basis() + ")";
        if (in == null) return sentence + ".";
        return sentence + (in.compareTo(lim.limit()) > 0 ? ": the limit is exceeded." : ": within the limit.");
    }

    /** In psig at or above 1 psig, in inches of water column below. */
    public static String format(Pressure p) {
        if (p.compareTo(ONE_PSI) >= 0) return String.format(Locale.ROOT, "%.2f psig", p.psi());
        return String.format(Locale.ROOT, "%.1f in w.c.", p.inchesWaterColumn());
    }

    /**
     * As {@link #format(Pressure)}, followed by the figure in {@code unit} when that is
     * another unit (kPa, or psi below 1 psig); never in inches of water column for a
     * pressure of 1 psig or more.
     */
    public static String format(Pressure p, PressureUnit unit) {
        String us = format(p);
        // inches of water column are for low pressures only: a figure of 1 psig or more is not repeated in them
        boolean same = (unit == PressureUnit.PSI && p.compareTo(ONE_PSI) >= 0) || unit == PressureUnit.IN_WC;
        return unit == null || same ? us : us + " (" + p.format(unit) + ")";
    }
}
