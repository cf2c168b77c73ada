package org.shutline.analysis;

import static org.assertj.core.api.Assertions.assertThat;

import java.time.LocalDate;
import java.util.BitSet;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.shutline.testnet.RandomNet;
import org.shutline.trace.NetworkState;
import org.shutline.trace.ValveSegments;

/**
 * The default isolation's fallback and alternative outcomes ({@link Isolation#grownCore}:
 * the region grown from the added segment only, the listed valves found from the smaller
 * side) against the plain computation (the region grown from its whole seed by
 * {@link Isolation#grow}, the whole boundary scanned) on random networks and random
 * zones, for every listed valve of the zone's isolation.
 *
 * <p>Why comparing the outcomes is enough: {@link Isolation#isolate} reads a grown
 * outcome only through its region, segments fed after and off, listed valves with their
 * far segments, sources, stations to stop and the stops done by valves; all of them must
 * be equal. (The plain path is composed here from the engine's own pieces; it is not
 * kept in the engine.)
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
        compareAll(seed);
    }

    /** The random networks have valves to fail: the comparisons above are not empty. */
    @Test
    void theComparisonsTakePlace() {
        int compared = 0;
        for (long seed = 7700; seed < 7720; seed++) compared += compareAll(seed);
        assertThat(compared).isGreaterThan(50);
    }

    private static int compareAll(long seed) {
        NetworkState st = RandomNet.build(seed).state();
        Random rnd = new Random(seed);
        for (int k = 0; k < 3 && st.valveCount() > 0; k++) st = st.withValveClosed(rnd.nextInt(st.valveCount()), rnd.nextBoolean());
        ValveSegments segs = ValveSegments.build(st);
        Isolation iso = new Isolation(segs, ValveDoubt.Settings.defaults(LocalDate.of(2026, 12, 1)));
        int compared = 0;
        for (int seg = 0; seg < segs.segmentCount(); seg++) {
            BitSet zone = new BitSet();
            zone.set(seg);
            compared += compare(iso, zone, "seed " + seed + " segment " + seg);
        }
        for (int k = 0; k < 5 && segs.segmentCount() > 1; k++) {
            int a = rnd.nextInt(segs.segmentCount()), b = rnd.nextInt(segs.segmentCount());
            BitSet zone = new BitSet();
            zone.set(a);
            zone.set(b);
            compared += compare(iso, zone, "seed " + seed + " segments " + a + "+" + b);
        }
        return compared;
    }

    /** Compares every grown outcome of isolating {@code zone}; returns how many. */
    private static int compare(Isolation iso, BitSet zone, String at) {
        IsolationCore core = IsolationCore.of(iso, iso.grow(zone), true);
        for (int i = 0; i < core.listed.size(); i++) {
            IsolationCore fast = iso.grownCore(core, i);
            BitSet seed = (BitSet) core.region.clone();
            seed.set(core.far.get(i));
            IsolationCore plain = IsolationCore.of(iso, iso.grow(seed), true);
            String what = at + " valve " + i;
            assertThat(fast.region).as(what + " region").isEqualTo(plain.region);
            assertThat(fast.after).as(what + " fed after").isEqualTo(plain.after);
            assertThat(fast.off).as(what + " off").isEqualTo(plain.off);
            assertThat(fast.listed).as(what + " listed").isEqualTo(plain.listed);
            assertThat(fast.far).as(what + " far").isEqualTo(plain.far);
            assertThat(fast.sources).as(what + " sources").isEqualTo(plain.sources);
            assertThat(fast.stations).as(what + " stations").isEqualTo(plain.stations);
            assertThat(fast.byValves).as(what + " stops by valves").isEqualTo(plain.byValves);
            assertThat(fast.stops()).as(what + " stops").isEqualTo(plain.stops());
        }
        return core.listed.size();
    }
}
