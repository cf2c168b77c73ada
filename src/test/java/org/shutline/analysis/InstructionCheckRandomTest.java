package org.shutline.analysis;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.shutline.testnet.RandomNet;
import org.shutline.topology.Topology;
import org.shutline.trace.FeedTrace;
import org.shutline.trace.NetworkState;
import org.shutline.trace.ValveSegments;

/**
 * Station stops and isolations on seeded random networks (both generators, whose
 * stations have no inlet valve, one or two station valves, or an inline station valve
 * that alone does not stop them), each re-traced by {@link InstructionCheck}; and the
 * check itself must catch a tampered answer.
 */
class InstructionCheckRandomTest {
    static final ValveDoubt.Settings OPTIONS = IsolationTest.OPTIONS;

    @Test
    void everyStopIsolationAndShutOffPassesTheReTraceOnRandomNetworks() {
        // by station valves, inline valve not enough, no station valve, not stoppable by valves,
        // isolations that stop a station by its valves, fallbacks for a doubtful stop valve
        int[] seen = new int[7];
        for (long seed = 1; seed <= 150; seed++) {
            checkAll(RandomNets.generate(seed, Set.of()), "RandomNets seed " + seed, seen);
            checkAll(RandomNet.build(seed).topology(), "RandomNet seed " + seed, seen);
        }
        assertThat(seen[0]).as("stops by the station's own valves").isGreaterThan(20);
        assertThat(seen[1]).as("stations whose station valves alone do not stop them").isGreaterThan(20);
        assertThat(seen[2]).as("stations with no station valve").isGreaterThan(20);
        assertThat(seen[4]).as("isolations that stop a station by closing its stop valves").isGreaterThan(50);
        assertThat(seen[5]).as("fallbacks for a doubtful valve of a station stop").isGreaterThan(20);
        assertThat(seen[6]).as("over-pressure fallbacks, re-traced against the whole shut-off").isGreaterThan(20);
    }

    private static void checkAll(Topology t, String label, int[] seen) {
        NetworkState s = NetworkState.of(t);
        ValveSegments segs = ValveSegments.build(s);
        Isolation iso = new Isolation(segs, OPTIONS);
        InstructionCheck check = new InstructionCheck(segs);
        for (int st = 0; st < s.stationCount(); st++) {
            StationStop.Result stop = iso.stationStop(st);
            String q = label + ", stop of " + stop.stationId();
            check.stationStop(stop, q);
            if (stop.isolation() == null) continue;
            if (!stop.stoppable()) {
                seen[3]++;
                continue;
            }
            if (stop.byStationValves()) seen[0]++;
            else if (StationStop.ownValveLinks(s, segs.graph(), t.network().stations().get(st)).isEmpty()) seen[2]++;
            else seen[1]++;
            // the plain feed trace (segment attribution) with the valves closed: the station feeds nothing
            NetworkState closed = s;
            for (Isolation.ValveStep v : stop.isolation().valves()) closed = closed.withValveClosed(v.valve(), true);
            assertThat(FeedTrace.run(closed).servicesFedThrough(st).cardinality()).as(q + " with " + stop.valves() + " closed").isZero();
        }
        for (int seg = 0; seg < segs.segmentCount(); seg++) {
            Isolation.Result r = iso.isolate(new Zone.OfSegments(new int[] {seg}));
            // the re-trace closes each stop's valves (not the station taken out whole): the inlet pipe between them counts
            check.isolation(r, label + ", segment " + seg);
            java.util.Set<String> stopValves = new java.util.HashSet<>();
            for (StationStop.Result stop : r.stationStops()) if (stop.stoppable()) stopValves.addAll(stop.valves());
            if (!stopValves.isEmpty()) seen[4]++;
            for (Isolation.Fallback f : r.fallbacks()) if (stopValves.contains(f.valveId()) && !r.valveIds().contains(f.valveId())) seen[5]++;
        }
        for (int sys = 0; sys < t.graph().systemCount(); sys++) {
            String id = t.graph().systemId(sys);
            OverpressureShutoff.Result op = OverpressureShutoff.of(segs, OPTIONS, id, ResponseSettings.DEFAULT);
            check.overpressure(op, label + ", over-pressure of " + id);
            for (OverpressureShutoff.Feed f : op.feeds()) seen[6] += f.fallbacks().size();
        }
    }

    @Test
    void aTamperedAnswerIsCaught() {
        int tested = 0;
        for (long seed = 1; seed <= 60 && tested < 20; seed++) {
            Topology t = RandomNets.generate(seed, Set.of());
            ValveSegments segs = ValveSegments.build(NetworkState.of(t));
            Isolation iso = new Isolation(segs, OPTIONS);
            InstructionCheck check = new InstructionCheck(segs);
            for (int seg = 0; seg < segs.segmentCount(); seg++) {
                Isolation.Result r = iso.isolate(new Zone.OfSegments(new int[] {seg}));
                if (!r.isolable() || r.valves().size() < 1 || r.servicesOff().isEmpty()) continue;
                String q = "seed " + seed + ", segment " + seg;
                // one valve left out: gas reaches the region again
                List<Isolation.ValveStep> fewer = new ArrayList<>(r.valves().subList(1, r.valves().size()));
                Isolation.Result dropped = copy(r, fewer, r.servicesOff(), r.metersOff());
                assertThatThrownBy(() -> check.isolation(dropped, q)).as(q).isInstanceOf(UnverifiedInstructionException.class)
                        .hasMessageContaining(q);
                // the right valves but one service fewer shown off
                java.util.BitSet less = r.servicesOff();
                less.clear(less.nextSetBit(0));
                Isolation.Result undercount = copy(r, r.valves(), less, r.metersOff());
                assertThatThrownBy(() -> check.isolation(undercount, q)).as(q).isInstanceOf(UnverifiedInstructionException.class);
                // the right valves and services but wrong meters
                Isolation.Result meters = copy(r, r.valves(), r.servicesOff(), r.metersOff() + 1);
                assertThatThrownBy(() -> check.isolation(meters, q)).as(q).isInstanceOf(UnverifiedInstructionException.class);
                tested++;
                break;
            }
        }
        assertThat(tested).isEqualTo(20);
    }

    private static Isolation.Result copy(Isolation.Result r, List<Isolation.ValveStep> valves, java.util.BitSet off, long meters) {
        return new Isolation.Result(r.isolable(), r.reason(), r.zoneSegments(), r.region(), r.unintended(), valves, r.closedBoundaryValves(),
                r.unlistedValves(), r.sourcesInRegion(), r.stationsToStop(), r.stationInletValves(), off, r.serviceIdsOff(), meters,
                r.criticalOff(), List.of(), java.util.Optional.empty(), List.of());
    }
}
