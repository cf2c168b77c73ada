package org.shutline.analysis;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.List;
import java.util.TreeSet;
import org.shutline.model.Service;
import org.shutline.trace.ValveSegments;

/**
 * The shut-off and relight work after an outage, and the crews it needs.
 *
 * <p>Meters shut off: the meters of the services put off gas. A pressure system is
 * <em>dead</em> when it had at least one fed segment with pipe before and has none
 * after; its mains are purged and every service it fed is relit, so the relight set is
 * the services off plus every service fed before on a dead system's pipe (equal to the
 * services off when the whole district is among them, larger when, for example, an
 * over-pressure shut-off is sized on part of a district). Technician-hours and crews
 * follow {@link ResponseSizing} with the settings' rates and targets. Critical
 * customers ({@link Service#isCritical()}) are listed first in the work lists.
 * Cost O(segments + services).
 */
public final class Restoration {
    /** The sizing of one outage; service sets are indices of the network's services. */
    public record Result(List<String> deadSystems, BitSet shutOff, BitSet relight, long metersShutOff, long metersRelight,
                         List<String> criticalShutOff, boolean purge, ResponseSizing.Result sizing) {
        public Result {
            deadSystems = List.copyOf(deadSystems);
            shutOff = (BitSet) shutOff.clone();
            relight = (BitSet) relight.clone();
            criticalShutOff = List.copyOf(criticalShutOff);
        }

        @Override public BitSet shutOff() { return (BitSet) shutOff.clone(); }
        @Override public BitSet relight() { return (BitSet) relight.clone(); }
    }

    private Restoration() {}

    /**
     * @param liveBefore segments fed before the outage
     * @param liveAfter segments fed after it
     * @param servicesOff services put off gas
     */
    public static Result of(ValveSegments segs, BitSet liveBefore, BitSet liveAfter, BitSet servicesOff, ResponseSettings settings) {
        var state = segs.state();
        int systems = state.graph().systemCount();
        boolean[] hadLive = new boolean[systems];
        boolean[] hasLive = new boolean[systems];
        for (int s = liveBefore.nextSetBit(0); s >= 0; s = liveBefore.nextSetBit(s + 1)) {
            int sys = segmentSystem(segs, s);
            if (sys < 0) continue;
            hadLive[sys] = true;
            if (liveAfter.get(s)) hasLive[sys] = true;
        }
        TreeSet<String> dead = new TreeSet<>();
        boolean[] isDead = new boolean[systems];
        for (int i = 0; i < systems; i++) {
            if (hadLive[i] && !hasLive[i]) {
                isDead[i] = true;
                dead.add(state.graph().systemId(i));
            }
        }
        BitSet relight = (BitSet) servicesOff.clone();
        for (int s = liveBefore.nextSetBit(0); s >= 0; s = liveBefore.nextSetBit(s + 1)) {
            int sys = segmentSystem(segs, s);
            if (sys >= 0 && isDead[sys]) for (int sv : segs.services(s)) relight.set(sv);
        }
        List<Service> all = state.network().services();
        long shutMeters = meters(all, servicesOff), relightMeters = meters(all, relight);
        List<String> critical = new ArrayList<>();
        for (int i = servicesOff.nextSetBit(0); i >= 0; i = servicesOff.nextSetBit(i + 1)) {
            if (all.get(i).isCritical()) critical.add(all.get(i).id());
        }
        ResponseSizing.Result sizing = ResponseSizing.size((int) shutMeters, (int) relightMeters, settings.targetHours(),
                settings.relightTargetHours(), settings.crewsGiven() ? settings.crews() : 0, settings.rates());
        return new Result(List.copyOf(dead), servicesOff, relight, shutMeters, relightMeters, critical, !dead.isEmpty(), sizing);
    }

    /** The pressure system (graph system index) of a segment's pipe, or -1 for an empty segment. */
    static int segmentSystem(ValveSegments segs, int seg) {
        if (segs.mainCount(seg) == 0) return -1;
        return segs.state().mainSystem(segs.mains(seg)[0]);
    }

    static long meters(List<Service> all, BitSet set) {
        long m = 0;
        for (int i = set.nextSetBit(0); i >= 0; i = set.nextSetBit(i + 1)) m += all.get(i).meters();
        return m;
    }
}
