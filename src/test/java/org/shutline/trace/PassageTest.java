package org.shutline.trace;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.BitSet;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.shutline.model.MainStatus;
import org.shutline.testnet.RandomNet;
import org.shutline.topology.EdgeKind;

/**
 * The one passage rule: its table by hand, its two forms (read once into arrays, read
 * from the state) equal on seeded random states, and the segment graph's links obeying
 * it as the node-graph edges they stand for do.
 */
class PassageTest {

    @Test
    void ruleTableByHand() {
        // pipe and valve: either end when open, never when shut
        for (byte k : new byte[] {EdgeKind.PIPE, EdgeKind.VALVE}) {
            assertThat(Passage.passes(k, true, 3, 4, 3)).isTrue();
            assertThat(Passage.passes(k, true, 3, 4, 4)).isTrue();
            assertThat(Passage.passes(k, false, 3, 4, 3)).isFalse();
            assertThat(Passage.twoWay(k)).isTrue();
        }
        // station (from = inlet 3, to = outlet 4): inlet to outlet only, in service only
        assertThat(Passage.passes(EdgeKind.STATION, true, 3, 4, 3)).isTrue();
        assertThat(Passage.passes(EdgeKind.STATION, true, 3, 4, 4)).isFalse();
        assertThat(Passage.passes(EdgeKind.STATION, false, 3, 4, 3)).isFalse();
        // a station whose outlet is its inlet passes nothing (it would change no reach anyway)
        assertThat(Passage.passes(EdgeKind.STATION, true, 3, 3, 3)).isFalse();
        assertThat(Passage.twoWay(EdgeKind.STATION)).isFalse();
        // an unknown kind passes nothing
        assertThat(Passage.passes((byte) 9, true, 3, 4, 3)).isFalse();
    }

    @ParameterizedTest
    @ValueSource(longs = {11, 12, 13, 14, 15, 16, 17, 18, 19, 20, 21, 22, 23, 24, 25, 26, 27, 28, 29, 30})
    void bothFormsAgreeAndSegmentLinksFollowTheRule(long seed) {
        NetworkState s = changed(RandomNet.build(seed).state(), new Random(seed));
        Passage p = Passage.of(s);
        for (int e = 0; e < s.edgeCount(); e++) {
            byte k = s.edgeKind(e);
            int f = s.edgeFeature(e);
            assertThat(p.isOpen(k, f)).as("seed %d edge %d", seed, e).isEqualTo(Passage.isOpen(s, k, f));
            for (int at : new int[] {s.edgeFrom(e), s.edgeTo(e)}) {
                assertThat(p.passes(e, at)).as("seed %d edge %d at %d", seed, e, at).isEqualTo(Passage.passes(s, e, at));
            }
            assertThat(p.passesBothWays(e)).isEqualTo(Passage.passesBothWays(s, e));
            boolean present = !s.isRemoved(e);
            // spelled out once more, independently of the class
            boolean open = present && switch (k) {
                case EdgeKind.PIPE -> s.mainStatus(f) == MainStatus.ACTIVE;
                case EdgeKind.VALVE -> !s.valveClosed(f);
                case EdgeKind.STATION -> s.stationInService(f);
                default -> false;
            };
            boolean stationOneWay = s.edgeFrom(e) != s.edgeTo(e);
            assertThat(Passage.passes(s, e, s.edgeFrom(e))).as("seed %d edge %d", seed, e)
                    .isEqualTo(open && (k != EdgeKind.STATION || stationOneWay));
            assertThat(Passage.passes(s, e, s.edgeTo(e))).as("seed %d edge %d back", seed, e)
                    .isEqualTo(open && k != EdgeKind.STATION);
        }
        ValveSegments vs = ValveSegments.build(s);
        SegmentGraph sg = vs.graph();
        for (int l = 0; l < sg.linkCount(); l++) {
            int e = sg.isValve(l) ? s.valveEdge(sg.linkFeature(l)) : s.stationEdge(sg.linkFeature(l));
            if (sg.linkA(l) == sg.linkB(l)) continue; // a link within one segment: no node-graph counterpart to compare
            assertThat(sg.canFlow(l, sg.linkA(l))).as("seed %d link %d", seed, l).isEqualTo(Passage.passes(s, e, s.edgeFrom(e)));
            assertThat(sg.canFlow(l, sg.linkB(l))).as("seed %d link %d back", seed, l).isEqualTo(Passage.passes(s, e, s.edgeTo(e)));
        }
    }

    @ParameterizedTest
    @ValueSource(longs = {41, 42, 43, 44, 45, 46, 47, 48})
    void stationPassesWhenInServiceWithLiveInlet(long seed) {
        NetworkState s = changed(RandomNet.build(seed).state(), new Random(seed));
        FeedTrace.Result tr = FeedTrace.run(s);
        BitSet live = tr.liveNodes();
        for (int st = 0; st < s.stationCount(); st++) {
            int e = s.stationEdge(st);
            boolean expected = e >= 0 && !s.isRemoved(e) && s.stationInService(st) && live.get(s.edgeFrom(e));
            assertThat(tr.stationPasses(s, st)).as("seed %d station %d", seed, st).isEqualTo(expected);
        }
    }

    /** A few random changes: valves shut, stations out, mains abandoned, an edge removed. */
    private static NetworkState changed(NetworkState s, Random rnd) {
        for (int i = 0; i < 4 && s.valveCount() > 0; i++) s = s.withValveClosed(rnd.nextInt(s.valveCount()), rnd.nextBoolean());
        if (s.stationCount() > 0) s = s.withStationInService(rnd.nextInt(s.stationCount()), false);
        if (s.mainCount() > 0) s = s.withMainStatus(rnd.nextInt(s.mainCount()), MainStatus.ABANDONED);
        if (s.edgeCount() > 0) s = s.withEdgeRemoved(rnd.nextInt(s.edgeCount()));
        return s;
    }
}
