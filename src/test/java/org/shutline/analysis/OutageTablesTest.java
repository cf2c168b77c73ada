package org.shutline.analysis;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.junit.jupiter.api.Test;
import org.shutline.testnet.AsciiNet;
import org.shutline.testnet.RandomNet;
import org.shutline.testnet.TestNet;
import org.shutline.trace.ValveSegments;

class OutageTablesTest {

    /*
     * The ring of IsolationTest: X0 (source, s1) - V1 - X1 (s2); X1 - V2 - X2 (s3);
     * X1 - V3 - X3 (s4); X2 - V4 - X4 (s5); X3 - V5 - X4.
     * Dominator tree (by hand): super -> X0 -> X1 -> {X2, X3, X4}.
     *   isolate X1: s2..s5 (4); isolate X2: s3 (1); isolate X4: s5 (1)
     *   V4 fails (X2+X4): X3 still fed by V3: s3, s5 off (2), neither dominates the other
     *   V2 fails (X1+X2): X1 dominates X2: 4 off.   V1 fails: 5 off.
     */
    @Test
    void ringTableWorkedByHand() {
        TestNet t = AsciiNet.parse(IsolationTest.RING);
        ValveSegments vs = ValveSegments.build(t.state());
        OutageTables tab = OutageTables.build(vs);
        int x1 = vs.nodeSegment(t.node("b")), x2 = vs.nodeSegment(t.node("c")), x4 = vs.nodeSegment(t.node("e"));
        assertThat(tab.servicesOffWhenIsolated(x1)).isEqualTo(4);
        assertThat(tab.metersOffWhenIsolated(x1)).isEqualTo(2 + 3 + 4 + 5);
        assertThat(tab.servicesOffWhenIsolated(x2)).isEqualTo(1);
        assertThat(tab.servicesOffWhenIsolated(x4)).isEqualTo(1);
        assertThat(tab.servicesOffWhenFails(t.valve("V4"))).isEqualTo(2);
        assertThat(tab.metersOffWhenFails(t.valve("V4"))).isEqualTo(8);
        assertThat(tab.growthFromSideA(t.valve("V4"))).isEqualTo(1);
        assertThat(tab.growthFromSideB(t.valve("V4"))).isEqualTo(1);
        assertThat(tab.servicesOffWhenFails(t.valve("V2"))).isEqualTo(4);
        assertThat(tab.growthFromSideB(t.valve("V2"))).isEqualTo(3);
        assertThat(tab.servicesOffWhenFails(t.valve("V1"))).isEqualTo(5);
        assertThat(tab.unitCount()).isEqualTo(5);
    }

    /* V4 inoperable: X2 and X4 form one isolation unit; isolating X2 takes s3 and s5 off. */
    @Test
    void inoperableValveMergesUnits() {
        TestNet t = AsciiNet.parse(IsolationTest.RING + "inoperable V4\n");
        ValveSegments vs = ValveSegments.build(t.state());
        OutageTables tab = OutageTables.build(vs);
        int x2 = vs.nodeSegment(t.node("c")), x4 = vs.nodeSegment(t.node("e"));
        assertThat(tab.unitOf(x2)).isEqualTo(tab.unitOf(x4));
        assertThat(tab.servicesOffWhenIsolated(x2)).isEqualTo(2);
        assertThat(tab.isRelied(t.valve("V4"))).isFalse();
        assertThat(tab.servicesOffWhenFails(t.valve("V4"))).isZero();
    }

    /* Station R1 out: its LP district (s3, s4: 5 meters) loses gas. */
    @Test
    void stationOutTable() {
        TestNet t = AsciiNet.parse(IsolationTest.STATION);
        OutageTables tab = OutageTables.build(ValveSegments.build(t.state()));
        assertThat(tab.servicesOffWhenStationOut(t.station("R1"))).isEqualTo(2);
        assertThat(tab.metersOffWhenStationOut(t.station("R1"))).isEqualTo(5);
    }

    static long[] seeds() {
        long[] s = new long[300];
        for (int i = 0; i < s.length; i++) s[i] = 1000 + i;
        return s;
    }

    @ParameterizedTest
    @MethodSource("seeds")
    void dominatorTablesMatchBruteForce(long seed) {
        TestNet t = RandomNet.build(seed);
        ValveSegments vs = ValveSegments.build(t.state());
        OutageTables tab = OutageTables.build(vs);
        OutageTables subtreeBfs = OutageTables.buildWithoutLocalPairs(vs);
        BruteForceOutages brute = new BruteForceOutages(vs);
        for (int s = 0; s < vs.segmentCount(); s++) {
            assertThat(tab.servicesOffWhenIsolated(s)).as("seed %d segment %d services", seed, s)
                    .isEqualTo(brute.servicesOffWhenIsolated(s));
            assertThat(tab.metersOffWhenIsolated(s)).as("seed %d segment %d meters", seed, s)
                    .isEqualTo(brute.metersOffWhenIsolated(s));
        }
        for (int st = 0; st < t.network().stations().size(); st++) {
            assertThat(tab.servicesOffWhenStationOut(st)).as("seed %d station %d", seed, st)
                    .isEqualTo(brute.servicesOffWhenStationOut(st));
            assertThat(tab.metersOffWhenStationOut(st)).as("seed %d station %d meters", seed, st)
                    .isEqualTo(brute.metersOffWhenStationOut(st));
        }
        for (int v = 0; v < t.network().valves().size(); v++) {
            assertThat(tab.servicesOffWhenFails(v)).as("seed %d valve %d", seed, v)
                    .isEqualTo(brute.servicesOffWhenFails(v));
            assertThat(tab.metersOffWhenFails(v)).as("seed %d valve %d meters", seed, v)
                    .isEqualTo(brute.metersOffWhenFails(v));
            assertThat(subtreeBfs.servicesOffWhenFails(v)).as("seed %d valve %d (subtree BFS)", seed, v)
                    .isEqualTo(brute.servicesOffWhenFails(v));
        }
    }
}
