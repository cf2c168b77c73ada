package org.shutline.analysis.hazard;

import org.shutline.model.Finding;
import java.util.ArrayList;
import java.util.List;
import org.shutline.analysis.OverpressureLimit;
import org.shutline.model.Network;
import org.shutline.model.SenseTap;
import org.shutline.model.Severity;
import org.shutline.model.Station;
import org.shutline.model.TapDevice;
import org.shutline.plan.StepAction;
import org.shutline.trace.FeedTrace;
import org.shutline.trace.NetworkState;

/**
 * A {@code move_tap} step on a station in service with gas at its inlet (in the state the
 * step is carried out in): while the control line is open the device that senses there
 * sees no outlet pressure and opens wide (49 CFR 192.195-201; US safety board
 * recommendation of 2019: over-pressure protection a single failure cannot defeat).
 * Critical when nothing else limits the outlet: no monitor ({@code monitor_kpa}) sensing
 * at another tap of device {@code monitor} that lies on live pipe, and no relief recorded
 * as full-capacity ({@code relief_full = yes}); otherwise a warning. The message states
 * the failed-open pressure against the 192.201(a) limit ({@link OverpressureLimit}).
 * Mitigated by an attending person.
 */
public final class MoveTapCheck implements HazardCheck {
    @Override public String code() { return "move-tap"; }

    @Override public String description() {
        return "sensing tap moved while its station is in service";
    }

    @Override public boolean mitigatedByAttendance() { return true; }

    @Override
    public List<Finding> check(StepContext ctx) {
        List<Finding> out = new ArrayList<>();
        if (ctx.step() == null || !(ctx.step().step().action() instanceof StepAction.MoveTap m)) return out;
        Network net = ctx.network();
        NetworkState s = ctx.before();
        FeedTrace.Result tr = ctx.beforeTrace();
        int t = -1;
        for (int i = 0; i < net.taps().size(); i++) if (net.taps().get(i).id().equals(m.tap())) t = i;
        if (t < 0) return out;
        SenseTap tap = net.taps().get(t);
        int st = -1;
        for (int i = 0; i < net.stations().size(); i++) if (net.stations().get(i).id().equals(tap.stationId())) st = i;
        if (st < 0) return out;
        if (!tr.stationPasses(s, st)) return out;
        Station station = net.stations().get(st);
        String monitor = independentMonitor(ctx, s, tr, station, t);
        boolean full = station.hasFullRelief();
        String others;
        if (monitor != null) others = "its monitor still senses at tap " + monitor;
        else if (full) others = "its relief is recorded full-capacity";
        else others = "nothing else limits the outlet: no monitor sensing at another tap"
                + (station.reliefKpa() == null ? ", no relief" : ", and its relief is of "
                + (station.reliefFull() == null ? "unrecorded" : "token") + " capacity (relief_full not yes), which does not limit a failed-open regulator");
        Severity sev = monitor == null && !full ? Severity.CRITICAL : Severity.WARNING;
        String msg = "At " + ctx.stepLabel() + ", sensing tap " + tap.id() + " (" + tap.device().name().toLowerCase() + ") of station "
                + station.id() + TapOnDeadMainCheck.label(station) + " is moved while the station is in service: while the line is open "
                + "the " + (tap.device() == TapDevice.BOTH ? "worker and monitor see" : tap.device().name().toLowerCase() + " sees")
                + " no outlet pressure and open" + (tap.device() == TapDevice.BOTH ? "" : "s") + " wide; " + others + ". "
                + OverpressureLimit.judge(net, station, ctx.settings().pressureUnit(), ctx.settings().lowPressureLimit());
        String action = "Staff station " + station.id() + " with a qualified person able to shut it down and watching its outlet pressure "
                + "while the line is moved (an attend step), or take the station out of service or onto a manually controlled bypass "
                + "for the move (49 CFR 192.195-201).";
        out.add(Finding.hazard(code(), sev, ctx.stepNumber(), List.of(station.id(), tap.id()), tap.geometry().getX(), tap.geometry().getY(),
                msg, action));
        return out;
    }

    /** A monitor tap of the station other than {@code moved}, on live pipe, when a monitor is recorded; else null. */
    private static String independentMonitor(StepContext ctx, NetworkState s, FeedTrace.Result tr, Station station, int moved) {
        if (station.monitorKpa() == null) return null;
        for (int t : ctx.tapsOf(station.id())) {
            if (t == moved || ctx.network().taps().get(t).device() != TapDevice.MONITOR) continue;
            int te = s.tapEdge(t);
            if (te >= 0 && tr.isEdgeLive(te)) return ctx.network().taps().get(t).id();
        }
        return null;
    }
}
