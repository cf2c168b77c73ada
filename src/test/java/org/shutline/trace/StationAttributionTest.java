package org.shutline.trace;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Random;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.shutline.model.MainStatus;
import org.shutline.model.Progress;
import org.shutline.testnet.RandomNet;
import org.shutline.topology.EdgeKind;

/**
 * {@link FeedTrace#run} (segment-graph attribution) against the plain node-graph method
 * {@link NodeSearchTrace} (test code) on random networks, in the base state and with
 * random overlays: valves closed, stations out, mains abandoned, edges cut or removed,
 * a bypass pipe added. Every field of the result must be equal, and
 * {@link FeedTrace#fedServices} must give the same fed set (on the base state it uses the
 * packed adjacency of {@code NetworkState.baseFlowAdjacency}).
 */
class StationAttributionTest {

    static long[] seeds() {
        long[] s = new long[150];
        for (int i = 0; i < s.length; i++) s[i] = 9100 + i;
        return s;
    }

    @ParameterizedTest
    @MethodSource("seeds")
    void segmentAttributionEqualsNodeSearch(long seed) {
        NetworkState base = RandomNet.build(seed).state();
        same(seed, "base", base);
        Random rnd = new Random(seed);
        NetworkState s = base;
        for (int k = 0; k < 6; k++) {
            int what = rnd.nextInt(6);
            if (what == 0 && s.valveCount() > 0) s = s.withValveClosed(rnd.nextInt(s.valveCount()), rnd.nextBoolean());
            else if (what == 1 && s.stationCount() > 0) s = s.withStationInService(rnd.nextInt(s.stationCount()), false);
            else if (what == 2 && s.mainCount() > 0) s = s.withMainStatus(rnd.nextInt(s.mainCount()), MainStatus.ABANDONED);
            else if (what == 3) {
                int e = rnd.nextInt(s.edgeCount());
                if (s.edgeKind(e) == EdgeKind.PIPE && !s.isRemoved(e) && s.edgeLength(e) > 0) {
                    s = s.withCut(e, Math.min(s.edgeM0(e), s.edgeM1(e)) + s.edgeLength(e) / 2);
                }
            } else if (what == 4) {
                int e = rnd.nextInt(s.edgeCount());
                if (!s.isRemoved(e)) s = s.withEdgeRemoved(e);
            } else if (s.mainCount() > 0) {
                int a = rnd.nextInt(s.nodeCount()), b = rnd.nextInt(s.nodeCount());
                int main = rnd.nextInt(s.mainCount());
                s = s.withPipe(a, b, main, 0, 0, 1);
            }
            same(seed, "overlay step " + k, s);
        }
    }

    private static void same(long seed, String step, NetworkState s) {
        FeedTrace.Result fast = FeedTrace.run(s);
        FeedTrace.Result ref = NodeSearchTrace.run(s, Progress.NONE);
        String at = "seed " + seed + ", " + step + ": ";
        assertThat(fast.liveNodes()).as(at + "live nodes").isEqualTo(ref.liveNodes());
        assertThat(fast.fedServices()).as(at + "fed").isEqualTo(ref.fedServices());
        assertThat(fast.liveEdges()).as(at + "live edges").isEqualTo(ref.liveEdges());
        assertThat(fast.stationServices()).as(at + "station services").isEqualTo(ref.stationServices());
        assertThat(fast.stationExclusive()).as(at + "station exclusive").isEqualTo(ref.stationExclusive());
        assertThat(fast.stationEdges()).as(at + "station edges").isEqualTo(ref.stationEdges());
        assertThat(fast.stationMeters()).as(at + "station meters").isEqualTo(ref.stationMeters());
        assertThat(fast.stationExclusiveMeters()).as(at + "exclusive meters").isEqualTo(ref.stationExclusiveMeters());
        assertThat(fast.multiFed()).as(at + "multi-fed").isEqualTo(ref.multiFed());
        assertThat(fast.unfedServices()).as(at + "unfed").isEqualTo(ref.unfedServices());
        assertThat(fast.deadMains()).as(at + "dead mains").isEqualTo(ref.deadMains());
        assertThat(fast.metersFed()).as(at + "meters fed").isEqualTo(ref.metersFed());
        // the live-only trace (packed-adjacency search on the base state, overlay search otherwise)
        assertThat(FeedTrace.fedServices(s)).as(at + "fedServices").isEqualTo(ref.fedServices());
    }
}
