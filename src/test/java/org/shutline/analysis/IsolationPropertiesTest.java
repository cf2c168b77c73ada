package org.shutline.analysis;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.List;
import java.util.Random;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Envelope;
import org.shutline.model.Main;
import org.shutline.topology.Topology;
import org.shutline.trace.FeedTrace;
import org.shutline.trace.NetworkState;
import org.shutline.trace.ValveSegments;

/**
 * Properties of isolation on seeded random networks ({@link RandomNets}), checked with an
 * independent feed trace of the network state with the listed valves closed and the
 * named stations stopped. The seed is in every failure message.
 */
class IsolationPropertiesTest {
    static final int SEEDS = 200;

    record Case(Topology t, ValveSegments segs, Zone zone, Isolation.Result r, String label) {}

    /** Random zones per seed: three points in the network's extent and two segments. */
    static List<Case> cases(long seed, Set<String> inoperable) {
        Topology t = RandomNets.generate(seed, inoperable);
        ValveSegments segs = ValveSegments.build(NetworkState.of(t));
        Isolation iso = new Isolation(segs, IsolationTest.OPTIONS);
        Random rnd = new Random(seed * 31 + 7);
        Envelope env = new Envelope();
        for (Main m : t.network().mains()) env.expandToInclude(m.geometry().getEnvelopeInternal());
        List<Case> out = new ArrayList<>();
        for (int k = 0; k < 5; k++) {
            Zone z = k < 3 ? Zone.point(env.getMinX() + rnd.nextDouble() * env.getWidth(), env.getMinY() + rnd.nextDouble() * env.getHeight())
                    : new Zone.OfSegments(new int[] {rnd.nextInt(Math.max(1, segs.segmentCount()))});
            out.add(new Case(t, segs, z, iso.isolate(z), "seed " + seed + ", zone " + k + " " + z));
        }
        return out;
    }

    /** The state after the isolation: listed valves closed, stations to stop out of service. */
    static NetworkState closed(Case c) {
        return Done.isolation(c.segs().state(), c.r());
    }

    @Test
    void anIsolatedZoneIsNeverConnectedToALiveSource() {
        int checked = 0;
        for (long seed = 1; seed <= SEEDS; seed++) {
            for (Case c : cases(seed, Set.of())) {
                if (!c.r().sourcesInRegion().isEmpty() || c.r().zoneSegments().isEmpty()) continue;
                FeedTrace.Result after = FeedTrace.run(closed(c));
                BitSet zone = c.r().zoneSegments();
                for (int e = 0; e < c.segs().state().edgeCount(); e++) {
                    int seg = c.segs().edgeSegment(e);
                    if (seg >= 0 && zone.get(seg)) assertThat(after.isEdgeLive(e)).as(c.label() + ": edge " + e + " still live").isFalse();
                }
                checked++;
            }
        }
        assertThat(checked).as("zones checked").isGreaterThan(SEEDS);
    }

    @Test
    void everyServiceOffIsInTheZoneOrCutOffFromEverySource() {
        int withUnintended = 0;
        for (long seed = 1; seed <= SEEDS; seed++) {
            for (Case c : cases(seed, Set.of())) {
                if (!c.r().sourcesInRegion().isEmpty()) continue;
                FeedTrace.Result before = FeedTrace.run(c.segs().state());
                FeedTrace.Result after = FeedTrace.run(closed(c));
                BitSet region = c.r().region();
                BitSet off = c.r().servicesOff();
                for (int sv = off.nextSetBit(0); sv >= 0; sv = off.nextSetBit(sv + 1)) {
                    int seg = c.segs().serviceSegment(sv);
                    boolean inZone = seg >= 0 && region.get(seg);
                    assertThat(inZone || !after.isFed(sv)).as(c.label() + ": service " + sv + " off but still fed").isTrue();
                    assertThat(before.isFed(sv)).as(c.label() + ": service " + sv + " off but never fed").isTrue();
                }
                // and exactly those: fed after = fed before minus the services off
                BitSet expect = before.fedServices();
                expect.andNot(off);
                assertThat(after.fedServices()).as(c.label() + ": fed after").isEqualTo(expect);
                if (!c.r().unintended().isEmpty()) withUnintended++;
            }
        }
        assertThat(withUnintended).as("cases with unintended isolation").isGreaterThan(10);
    }

    @Test
    void makingAValveInoperableNeverShrinksAnOutage() {
        int grew = 0;
        for (long seed = 1; seed <= SEEDS; seed++) {
            List<Case> base = cases(seed, Set.of());
            Random rnd = new Random(seed);
            for (int k = 0; k < base.size(); k++) {
                Case c = base.get(k);
                List<Isolation.ValveStep> listed = c.r().valves();
                if (listed.isEmpty()) continue;
                String v = listed.get(rnd.nextInt(listed.size())).valveId();
                Case worse = cases(seed, Set.of(v)).get(k);
                String at = c.label() + ", " + v + " made inoperable";
                // every service off stays off, but for the pipe of a station stop the grown region no longer needs
                java.util.BitSet shrunk = c.r().servicesOff();
                shrunk.andNot(worse.r().servicesOff());
                shrunk.andNot(Done.byStopsNotNeeded(c.r(), worse.r()));
                assertThat(shrunk.isEmpty()).as(at + ": " + shrunk).isTrue();
                if (c.r().stationsToStop().isEmpty()) assertThat(worse.r().metersOff()).as(at).isGreaterThanOrEqualTo(c.r().metersOff());
                if (worse.r().serviceIdsOff().size() > c.r().serviceIdsOff().size()) grew++;
                RiskTables a = RiskTables.build(c.segs()), b = RiskTables.build(worse.segs());
                for (RiskTables.SegmentRow row : a.segments()) {
                    if (!row.isolable()) continue; // a station stop's pipe may no longer be needed (above)
                    long after = b.outageTables().servicesOffWhenIsolated(row.segment());
                    assertThat(after).as(at + ": segment " + row.segment()).isGreaterThanOrEqualTo(row.servicesOff());
                }
            }
        }
        assertThat(grew).as("cases where the outage grew").isGreaterThan(20);
    }

    private static Set<String> ids(Case c) {
        return Set.copyOf(c.r().serviceIdsOff());
    }
}
