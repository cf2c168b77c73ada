package org.shutline.analysis;

import static org.assertj.core.api.Assertions.assertThat;

import java.time.LocalDate;
import java.util.BitSet;
import java.util.Random;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.shutline.model.Operability;
import org.shutline.testnet.RandomNet;
import org.shutline.testnet.TestNet;
import org.shutline.trace.FeedTrace;
import org.shutline.trace.NetworkState;
import org.shutline.trace.ValveSegments;

/** Properties of isolation on seeded random networks (seed in every failure message). */
class IsolationPropertyTest {
    static final ValveDoubt.Settings OPTIONS = ValveDoubt.Settings.defaults(LocalDate.of(2026, 12, 1));

    static long[] seeds() {
        long[] s = new long[150];
        for (int i = 0; i < s.length; i++) s[i] = 7000 + i;
        return s;
    }

    /** The state after carrying out an isolation: listed valves closed, named stations stopped as it says. */
    private static NetworkState after(NetworkState s, TestNet t, Isolation.Result r) {
        return Done.isolation(s, r);
    }

    @ParameterizedTest
    @MethodSource("seeds")
    void afterIsolationNoSourceReachesTheRegionAndOffMatchesTheTrace(long seed) {
        TestNet t = RandomNet.build(seed);
        NetworkState base = t.state();
        ValveSegments vs = ValveSegments.build(base);
        Isolation iso = new Isolation(vs, OPTIONS);
        OutageTables tab = OutageTables.build(vs);
        BitSet fedBefore = FeedTrace.run(base).fedServices();
        for (int seg = 0; seg < vs.segmentCount(); seg++) {
            Isolation.Result r = iso.isolate(new Zone.OfSegments(new int[] {seg}));
            assertThat((long) r.serviceIdsOff().size()).as("seed %d segment %d: table", seed, seg)
                    .isEqualTo(tab.servicesOffWhenIsolated(seg));
            for (Isolation.Fallback f : r.fallbacks()) {
                // a listed valve's fallback region is both sides of the failed valve: the valve table's case
                // (a station stop's valve grows the stop instead: checked by re-trace in InstructionCheckRandomTest)
                if (r.valveIds().stream().noneMatch(f.valveId()::equals)) continue;
                assertThat((long) r.serviceIdsOff().size() + f.addedServices().size() - f.stayOnServices().size())
                        .as("seed %d segment %d fallback %s", seed, seg, f.valveId())
                        .isEqualTo(tab.servicesOffWhenFails(t.valve(f.valveId())));
            }
            if (!r.sourcesInRegion().isEmpty()) continue;
            FeedTrace.Result post = FeedTrace.run(after(base, t, r));
            BitSet region = r.region();
            for (int v = 0; v < base.nodeCount(); v++) {
                int sv = vs.nodeSegment(v);
                if (sv >= 0 && region.get(sv)) {
                    assertThat(post.isLive(v)).as("seed %d segment %d: node %d of the region is live", seed, seg, v)
                            .isFalse();
                }
            }
            BitSet expected = (BitSet) fedBefore.clone();
            expected.andNot(post.fedServices());
            assertThat(r.servicesOff()).as("seed %d segment %d: off vs trace", seed, seg).isEqualTo(expected);
            BitSet off = r.servicesOff();
            for (int s = off.nextSetBit(0); s >= 0; s = off.nextSetBit(s + 1)) {
                boolean inRegion = vs.serviceSegment(s) >= 0 && region.get(vs.serviceSegment(s));
                assertThat(inRegion || !post.isFed(s)).as("seed %d segment %d service %d", seed, seg, s).isTrue();
            }
        }
    }

    /** Services without gas after isolating a segment: off, or not fed to begin with. */
    private static BitSet withoutGas(NetworkState s, ValveSegments vs, int seg) {
        Isolation.Result r = new Isolation(vs, OPTIONS).isolate(new Zone.OfSegments(new int[] {seg}));
        BitSet without = FeedTrace.run(s).unfedServices();
        without.or(r.servicesOff());
        return without;
    }

    @ParameterizedTest
    @MethodSource("seeds")
    void closingOneMoreValveNeverPutsFewerServicesOff(long seed) {
        TestNet t = RandomNet.build(seed);
        Random rnd = new Random(seed);
        NetworkState base = t.state();
        int valves = base.valveCount();
        if (valves == 0) return;
        // a valve that can be closed: an inoperable one stays open (closing it in the state
        // would make it a bound and shrink the region, which no crew can do)
        int v = -1;
        for (int tries = 0; tries < 20 && v < 0; tries++) {
            int c = rnd.nextInt(valves);
            if (base.valveOperability(c) != Operability.NO) v = c;
        }
        if (v < 0) return;
        NetworkState closed = base.withValveClosed(v, true);
        ValveSegments vs = ValveSegments.build(base);
        ValveSegments vs2 = ValveSegments.build(closed);
        assertThat(vs2.segmentCount()).isEqualTo(vs.segmentCount());
        for (int seg = 0; seg < vs.segmentCount(); seg++) {
            BitSet a = withoutGas(base, vs, seg);
            BitSet b = withoutGas(closed, vs2, seg);
            BitSet lost = (BitSet) a.clone();
            lost.andNot(b);
            assertThat(lost.isEmpty()).as("seed %d valve %d segment %d: %s", seed, v, seg, lost).isTrue();
        }
    }

    @ParameterizedTest
    @MethodSource("seeds")
    void inoperableValveNeverShrinksAnOutage(long seed) {
        RandomNet.Generated g = RandomNet.sketch(seed);
        TestNet before = g.net();
        Random rnd = new Random(seed);
        if (g.valveIds().isEmpty()) return;
        String vid = g.valveIds().get(rnd.nextInt(g.valveIds().size()));
        g.sketch().operable(vid, Operability.NO);
        TestNet worse = g.net();
        ValveSegments vs = ValveSegments.build(before.state());
        ValveSegments vs2 = ValveSegments.build(worse.state());
        for (int seg = 0; seg < vs.segmentCount(); seg++) {
            Isolation.Result ra = new Isolation(vs, OPTIONS).isolate(new Zone.OfSegments(new int[] {seg}));
            Isolation.Result rb = new Isolation(vs2, OPTIONS).isolate(new Zone.OfSegments(new int[] {seg}));
            assertThat(rb.region()).as("seed %d valve %s segment %d: region", seed, vid, seg).matches(r -> {
                BitSet x = ra.region();
                x.andNot(r);
                return x.isEmpty();
            });
            BitSet a = ra.servicesOff();
            a.andNot(rb.servicesOff());
            a.andNot(Done.byStopsNotNeeded(ra, rb));
            assertThat(a.isEmpty()).as("seed %d valve %s segment %d: %s", seed, vid, seg, a).isTrue();
        }
    }
}
