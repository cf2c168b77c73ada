package org.shutline.analysis;

import static org.assertj.core.api.Assertions.assertThat;

import java.time.LocalDate;
import java.util.Random;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.shutline.testnet.RandomNet;
import org.shutline.trace.NetworkState;
import org.shutline.trace.ValveSegments;

/**
 * The default isolation (fallback and alternative regions grown from the added segment
 * only, their listed valves found from the smaller side) against the plain computation
 * (every region grown from its whole seed, every boundary scanned) on random networks
 * and random zones: the whole result must be equal.
 */
class IsolationFastPathTest {

    static long[] seeds() {
        long[] s = new long[200];
        for (int i = 0; i < s.length; i++) s[i] = 7700 + i;
        return s;
    }

    @ParameterizedTest
    @MethodSource("seeds")
    void fastPathEqualsPlainPath(long seed) {
        NetworkState st = RandomNet.build(seed).state();
        Random rnd = new Random(seed);
        for (int k = 0; k < 3 && st.valveCount() > 0; k++) st = st.withValveClosed(rnd.nextInt(st.valveCount()), rnd.nextBoolean());
        ValveSegments segs = ValveSegments.build(st);
        Isolation.Options opt = Isolation.Options.defaults(LocalDate.of(2026, 12, 1));
        Isolation fast = new Isolation(segs, opt);
        Isolation plain = new Isolation(segs, opt, true);
        for (int seg = 0; seg < segs.segmentCount(); seg++) {
            Zone z = new Zone.OfSegments(new int[] {seg});
            assertThat(fast.isolate(z)).as("seed %d segment %d", seed, seg).isEqualTo(plain.isolate(z));
        }
        for (int k = 0; k < 5 && segs.segmentCount() > 1; k++) {
            int a = rnd.nextInt(segs.segmentCount()), b = rnd.nextInt(segs.segmentCount());
            Zone z = new Zone.OfSegments(new int[] {a, b});
            assertThat(fast.isolate(z)).as("seed %d segments %d+%d", seed, a, b).isEqualTo(plain.isolate(z));
        }
    }
}
