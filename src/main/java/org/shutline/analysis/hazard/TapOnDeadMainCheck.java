package org.shutline.analysis.hazard;

import org.shutline.model.Finding;
import org.shutline.model.Plural;
import java.util.ArrayList;
import java.util.List;
import org.shutline.analysis.OverpressureLimit;
import org.shutline.model.MainStatus;
import org.shutline.model.Network;
import org.shutline.model.SenseTap;
import org.shutline.model.Severity;
import org.shutline.model.Station;
import org.shutline.topology.EdgeKind;
import org.shutline.trace.FeedTrace;
import org.shutline.trace.NetworkState;

/**
 * (a) A station in service, with gas at its inlet, whose sensing tap lies on a main
 * that is abandoned, cut away from the station's own outlet (no path through pipe of
 * active mains and open valves from the outlet to the tap), or not live (inside an
 * isolated or dead part). The station then senses no (or foreign) pressure, opens to
 * full inlet pressure and over-pressures its outlet system: critical.
 */
public final class TapOnDeadMainCheck implements HazardCheck {
    @Override public String code() { return "tap-on-dead-main"; }

    @Override public boolean mitigatedByAttendance() { return true; }

    @Override public String description() {
        return "station sensing tap on an abandoned, cut-away or dead main: the station opens wide";
    }

    @Override
    public List<Finding> check(StepContext ctx) {
        NetworkState s = ctx.after();
        Network net = ctx.network();
        FeedTrace.Result tr = ctx.afterTrace();
        List<Finding> out = new ArrayList<>();
        for (int st = 0; st < s.stationCount(); st++) {
            int e = s.stationEdge(st);
            if (!tr.stationPasses(s, st)) continue;
            Station station = net.stations().get(st);
            for (int t : ctx.tapsOf(station.id())) {
                int te = s.tapEdge(t);
                if (te < 0 || s.edgeKind(te) != EdgeKind.PIPE) continue;
                String why = null;
                if (s.mainStatus(s.edgeFeature(te)) == MainStatus.ABANDONED) {
                    why = "is on main " + s.mainId(s.edgeFeature(te)) + ", which is abandoned";
                } else if (!tr.isEdgeLive(te)) {
                    why = "is on main " + s.mainId(s.edgeFeature(te)) + ", which is isolated (no gas) in this state";
                } else {
                    int[] piece = ctx.afterPieces();
                    if (!StateWalk.passable(s, te) || piece[s.edgeFrom(te)] != piece[s.edgeTo(e)]) {
                        why = "is on main " + s.mainId(s.edgeFeature(te)) + ", which is cut away from the station's outlet";
                    }
                }
                if (why != null) out.add(hazard(ctx, station, net.taps().get(t), st, why, tr));
            }
        }
        return out;
    }

    private Finding hazard(StepContext ctx, Station station, SenseTap tap, int st, String why, FeedTrace.Result tr) {
        int atRisk = tr.servicesFedThrough(st).cardinality();
        String msg = "At " + ctx.stepLabel() + ", station " + station.id() + label(station) + " sensing tap " + tap.id()
                + " (" + tap.device().name().toLowerCase() + ") " + why + ". The station will sense no outlet pressure, open wide"
                + " and over-pressure its outlet system " + Pressures.describe(ctx.network(), station.outSys(), ctx.settings().pressureUnit())
                + ": " + Plural.of(atRisk, "service") + " downstream at risk. "
                + OverpressureLimit.judge(ctx.network(), station, ctx.settings().pressureUnit(), ctx.settings().lowPressureLimit());
        String action = "Move sensing tap " + tap.id() + " to a live main of " + station.outSys() + " connected to the station outlet before "
                + ctx.stepLabel() + "; otherwise staff station " + station.id()
                + " with a qualified person able to shut it down, and watch its outlet pressure throughout " + ctx.stepLabel() + ".";
        return Finding.hazard(code(), Severity.CRITICAL, ctx.stepNumber(), List.of(station.id(), tap.id()),
                tap.geometry().getX(), tap.geometry().getY(), msg, action);
    }

    static String label(Station s) {
        return s.name() == null || s.name().isBlank() ? "" : " (" + s.name() + ")";
    }
}
