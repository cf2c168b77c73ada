package org.shutline.analysis.hazard;

import org.shutline.model.Finding;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.shutline.model.Severity;
import org.shutline.model.Station;
import org.shutline.trace.FeedTrace;
import org.shutline.trace.NetworkState;

/**
 * (d) A district (the outlet system of one or more stations) left with one feeding
 * station where the network as recorded has two or more (warning: no back-up feed),
 * or with none where it had some (critical: the whole district goes off and must be
 * purged and relit). A station feeds when it is in service and its inlet is live.
 */
public final class DistrictFeedCheck implements HazardCheck {
    @Override public String code() { return "district-feed"; }

    @Override public String description() {
        return "district left with one feeding station, or none";
    }

    @Override
    public List<Finding> check(StepContext ctx) {
        Map<String, List<Integer>> districts = new LinkedHashMap<>();
        List<Station> sts = ctx.network().stations();
        for (int i = 0; i < sts.size(); i++) districts.computeIfAbsent(sts.get(i).outSys(), k -> new ArrayList<>()).add(i);
        List<Finding> out = new ArrayList<>();
        for (Map.Entry<String, List<Integer>> d : districts.entrySet()) {
            List<String> baseFeeds = feeding(ctx.base(), ctx.baseTrace(), d.getValue(), sts);
            List<String> nowFeeds = feeding(ctx.after(), ctx.afterTrace(), d.getValue(), sts);
            Station first = sts.get(d.getValue().get(0));
            if (nowFeeds.isEmpty() && !baseFeeds.isEmpty()) {
                out.add(Finding.hazard(code(), Severity.CRITICAL, ctx.stepNumber(), withDistrict(d.getKey(), baseFeeds),
                        first.geometry().getX(), first.geometry().getY(),
                        "At " + ctx.stepLabel() + ", district " + d.getKey() + " has no feeding station (normally fed by "
                                + String.join(", ", baseFeeds) + "): the whole district goes off gas and must be purged and relit.",
                        "Keep at least one station feeding " + d.getKey() + " through this step, or plan the district shut-down, purge and relight."));
            } else if (nowFeeds.size() == 1 && baseFeeds.size() >= 2) {
                out.add(Finding.hazard(code(), Severity.WARNING, ctx.stepNumber(), withDistrict(d.getKey(), nowFeeds),
                        first.geometry().getX(), first.geometry().getY(),
                        "At " + ctx.stepLabel() + ", district " + d.getKey() + " is fed by one station only (" + nowFeeds.get(0)
                                + "; normally " + String.join(", ", baseFeeds) + "): a failure there takes the district off gas.",
                        "Watch the outlet pressure of " + nowFeeds.get(0) + " and keep a qualified person on call to attend it during this step."));
            }
        }
        return out;
    }

    private static List<String> withDistrict(String d, List<String> stations) {
        List<String> ids = new ArrayList<>();
        ids.add(d);
        ids.addAll(stations);
        return ids;
    }

    static List<String> feeding(NetworkState s, FeedTrace.Result tr, List<Integer> stations, List<Station> sts) {
        List<String> out = new ArrayList<>();
        for (int st : stations) {
            if (tr.stationPasses(s, st)) out.add(sts.get(st).id());
        }
        return out;
    }
}
