package org.shutline.analysis;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.BitSet;
import org.junit.jupiter.api.Test;
import org.shutline.testnet.AsciiNet;
import org.shutline.testnet.TestNet;
import org.shutline.trace.ValveSegments;

/** Leak and damage response on hand-drawn networks, answers worked by hand. */
class IncidentResponseTest {
    static final ValveDoubt.Settings OPTIONS = IsolationTest.OPTIONS;
    static final ResponseSettings ONE_CREW = ResponseSettings.DEFAULT.withCrews(1);

    /*
     * IsolationTest.RING:
     *   A--1--b--2--c        valves at V1 (30,0) V2 (90,0) V3 (60,-20) V4 (120,-20) V5 (90,-40)
     *         |     |        X0 = ab#0 (source, s1)   X1 = ab#1 bc#0 bd#0 (s2)
     *         3     4        X2 = bc#1 ce#0 (s3 clinic, 3 meters)
     *         |     |        X3 = bd#1 de#0 (s4)      X4 = de#1 ce#1 (s5)
     *         d--5--e
     */
    @Test
    void leakAtAPointClosesTheSegmentsValvesAndTimesThem() {
        TestNet t = AsciiNet.parse(IsolationTest.RING);
        IncidentResponse.Result r = IncidentResponse.leak(ValveSegments.build(t.state()), OPTIONS, Zone.point(120, 0), ONE_CREW);
        assertThat(r.isolation().valveIds()).containsExactly("V2", "V4");
        assertThat(r.systemId()).isEqualTo("HP");
        // V2 (90,0) to V4 (120,-20): sqrt(30^2 + 20^2) = 36.056 m, x 1.3 = 46.872 m road;
        // 0.046872 km / 25 km/h = 0.11249 min; two valves 20 min -> 20.1125 min
        assertThat(r.route().tour()).containsExactly("V2", "V4");
        assertThat(r.route().driveMetres()).isCloseTo(Math.sqrt(1300) * 1.3, within(1e-9));
        assertThat(r.route().elapsedMinutes()).isCloseTo(20 + Math.sqrt(1300) * 1.3 / 1000 / 25 * 60, within(1e-9));
        assertThat(r.route().elapsedMinutes()).isCloseTo(20.1125, within(1e-4));
        // s3 off, 3 meters: 0.3 technician-hours; relight 3 x 1.1 / 1.25 = 2.64 technician-hours; no district dead
        Restoration.Result rest = r.restoration();
        assertThat(rest.metersShutOff()).isEqualTo(3);
        assertThat(rest.metersRelight()).isEqualTo(3);
        assertThat(rest.sizing().shutoffTechHours()).isCloseTo(0.3, within(1e-9));
        assertThat(rest.sizing().relightTechHours()).isCloseTo(2.64, within(1e-9));
        assertThat(rest.deadSystems()).isEmpty();
        assertThat(rest.purge()).isFalse();
        assertThat(rest.criticalShutOff()).containsExactly("s3");
        // the alternative grows across V2 into X1: V1 alone; X3 and X4 then lose every source
        // (unintended isolation): adds s2, s4, s5; one valve, 10 min
        assertThat(r.isolation().alternative()).hasValueSatisfying(a -> {
            assertThat(a.valves()).containsExactly("V1");
            assertThat(a.addedServices()).containsExactly("s2", "s4", "s5");
        });
        assertThat(r.alternativeRoute()).hasValueSatisfying(a -> {
            assertThat(a.tour()).containsExactly("V1");
            assertThat(a.elapsedMinutes()).isCloseTo(10, within(1e-9));
        });
    }

    /* V4 inoperable: the region grows to X4; close V2 then V5: V2 (90,0) to V5 (90,-40) = 40 m x 1.3 = 52 m. */
    @Test
    void inoperableValveIsPassedOverAndTheRouteFollows() {
        TestNet t = AsciiNet.parse(IsolationTest.RING + "inoperable V4\n");
        IncidentResponse.Result r = IncidentResponse.leak(ValveSegments.build(t.state()), OPTIONS, Zone.point(120, 0), ONE_CREW);
        assertThat(r.isolation().valveIds()).containsExactly("V2", "V5");
        assertThat(r.route().driveMetres()).isCloseTo(52, within(1e-9));
        assertThat(r.route().elapsedMinutes()).isCloseTo(20 + 52.0 / 1000 / 25 * 60, within(1e-9));
        assertThat(r.isolation().serviceIdsOff()).containsExactly("s3", "s5");
        assertThat(r.restoration().metersShutOff()).isEqualTo(8);
    }

    /* V4 unknown: relied on, with the fallback V5 (adds s5); the route still takes V2 and V4. */
    @Test
    void unknownValveKeepsItsFallback() {
        TestNet t = AsciiNet.parse(IsolationTest.RING + "unknown V4\n");
        IncidentResponse.Result r = IncidentResponse.leak(ValveSegments.build(t.state()), OPTIONS, Zone.point(120, 0), ONE_CREW);
        assertThat(r.route().tour()).containsExactly("V2", "V4");
        assertThat(r.isolation().fallbacks()).singleElement().satisfies(f -> {
            assertThat(f.valveId()).isEqualTo("V4");
            assertThat(f.thenClose()).containsExactly("V5");
            assertThat(f.addedServices()).containsExactly("s5");
        });
    }

    /*
     * IsolationTest.STATION:  A---1>c--2--d   HP: X0 (source, s1), X1 (s2); LP: X2 (s3), X3 (s4)
     * Isolating X1 (close V1) leaves the LP district unfed: it is dead, purged and relit whole.
     */
    @Test
    void isolationThatKillsADistrictRelightsItWhole() {
        TestNet t = AsciiNet.parse(IsolationTest.STATION);
        ValveSegments vs = ValveSegments.build(t.state());
        int x1 = vs.serviceSegment(t.service("s2"));
        IncidentResponse.Result r = IncidentResponse.leak(vs, OPTIONS, new Zone.OfSegments(new int[] {x1}), ResponseSettings.DEFAULT);
        assertThat(r.restoration().deadSystems()).containsExactly("LP");
        assertThat(r.restoration().purge()).isTrue();
        assertThat(t.serviceIds(r.restoration().relight())).containsExactly("s2", "s3", "s4");
        assertThat(r.restoration().metersRelight()).isEqualTo(6);
    }

    /* Restoration on its own: LP dead but only s3 counted as shut off: the relight still takes s4 (the whole district). */
    @Test
    void deadDistrictAddsItsOtherServicesToTheRelight() {
        TestNet t = AsciiNet.parse(IsolationTest.STATION);
        ValveSegments vs = ValveSegments.build(t.state());
        BitSet before = vs.graph().reachFromSources(null, null);
        BitSet after = new BitSet();
        after.set(vs.serviceSegment(t.service("s1")));
        after.set(vs.serviceSegment(t.service("s2")));
        BitSet off = new BitSet();
        off.set(t.service("s3"));
        Restoration.Result r = Restoration.of(vs, before, after, off, ResponseSettings.DEFAULT);
        assertThat(r.deadSystems()).containsExactly("LP");
        assertThat(t.serviceIds(r.shutOff())).containsExactly("s3");
        assertThat(t.serviceIds(r.relight())).containsExactly("s3", "s4");
        assertThat(r.metersShutOff()).isEqualTo(2);
        assertThat(r.metersRelight()).isEqualTo(5);
        // 5 meters x 1.1 = 5.5 visits / 1.25 = 4.4 technician-hours; within 24 h: 1 technician, 1 crew
        assertThat(r.sizing().relightTechHours()).isCloseTo(4.4, within(1e-9));
        assertThat(r.sizing().relightCrews()).isEqualTo(1);
    }
}
