package org.shutline.analysis.hazard;

import org.shutline.model.Finding;
import java.util.ArrayList;
import java.util.List;
import org.shutline.model.Network;
import org.shutline.model.SenseTap;
import org.shutline.model.Severity;
import org.shutline.model.Station;
import org.shutline.model.TapDevice;
import org.shutline.trace.NetworkState;
import org.shutline.trace.ValveSegments;

/**
 * (b) A station whose worker and monitor sense at one tap (a tap of device {@code both},
 * or a worker tap and a monitor tap on the same pipe edge) or on one valve segment:
 * one valve closure or one cut defeats both devices. Warning.
 */
public final class SensingCommonModeCheck implements HazardCheck {
    @Override public String code() { return "sensing-common-mode"; }

    @Override public boolean mitigatedByAttendance() { return true; }

    @Override public String description() {
        return "worker and monitor sense at one tap or one valve segment";
    }

    @Override
    public List<Finding> check(StepContext ctx) {
        NetworkState s = ctx.after();
        Network net = ctx.network();
        ValveSegments segs = null;
        List<Finding> out = new ArrayList<>();
        for (Station st : net.stations()) {
            List<Integer> taps = ctx.tapsOf(st.id());
            String found = null;
            List<String> ids = new ArrayList<>();
            ids.add(st.id());
            for (int t : taps) {
                if (net.taps().get(t).device() == TapDevice.BOTH) {
                    found = "worker and monitor both sense at tap " + net.taps().get(t).id();
                    ids.add(net.taps().get(t).id());
                    break;
                }
            }
            if (found == null) {
                for (int w : taps) {
                    if (net.taps().get(w).device() != TapDevice.WORKER) continue;
                    for (int m : taps) {
                        if (net.taps().get(m).device() != TapDevice.MONITOR) continue;
                        int ew = s.tapEdge(w), em = s.tapEdge(m);
                        if (ew < 0 || em < 0) continue;
                        if (segs == null) segs = ctx.afterSegments();
                        int sw = segs.edgeSegment(ew), sm = segs.edgeSegment(em);
                        if (ew == em || (sw >= 0 && sw == sm)) {
                            found = "worker tap " + net.taps().get(w).id() + " and monitor tap " + net.taps().get(m).id()
                                    + " lie on one valve segment";
                            ids.add(net.taps().get(w).id());
                            ids.add(net.taps().get(m).id());
                            break;
                        }
                    }
                    if (found != null) break;
                }
            }
            if (found != null) {
                SenseTap first = net.taps().get(taps.get(0));
                out.add(Finding.hazard(code(), Severity.WARNING, ctx.stepNumber(), ids, first.geometry().getX(), first.geometry().getY(),
                        "Station " + st.id() + TapOnDeadMainCheck.label(st) + ": " + found
                                + " at " + ctx.stepLabel() + "; a single valve closure or cut there defeats both the worker and the monitor.",
                        "Give the monitor its own sensing point on another valve segment of " + st.outSys()
                                + ", or staff the station during any work on that segment."));
            }
        }
        return out;
    }
}
