package org.shutline.analysis;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;
import org.shutline.testnet.AsciiNet;
import org.shutline.testnet.TestNet;
import org.shutline.trace.ValveSegments;

/** Over-pressure shut-off on hand-drawn networks, answers worked by hand. */
class OverpressureShutoffTest {
    /*
     *   A---1>c--2--d     HP: X0 = ac.1#0 (source Sa, s1), X1 = ac.1#1 (s2); V1 kind station, 10 m from R1
     *                     LP: X2 = ac.2 cd#0 (s3, 2 meters), X3 = cd#1 (s4, 3 meters, a hospital)
     */
    static final String NET = IsolationTest.STATION.replace("svc s4 cd#1 3", "svc s4 cd#1 3 hospital");

    @Test
    void stationFeedIsStoppedAtItsInletValveAndTheDistrictIsAtRisk() {
        TestNet t = AsciiNet.parse(NET);
        OverpressureShutoff.Result r = OverpressureShutoff.of(ValveSegments.build(t.state()), IsolationTest.OPTIONS, "LP",
                ResponseSettings.DEFAULT);
        assertThat(r.feeds()).singleElement().satisfies(f -> {
            assertThat(f.isStation()).isTrue();
            assertThat(f.id()).isEqualTo("R1");
            assertThat(f.fromSystem()).isEqualTo("HP");
            // V1 (kind station, 10 m from R1) is the only link between the source side X0 and the inlet side X1:
            // closing it leaves R1's inlet dead, so it is the stop, by the station's own valve
            assertThat(f.inletValves()).containsExactly("V1");
            assertThat(f.stop().byStationValves()).isTrue();
            assertThat(f.upstream().isolable()).isTrue();
            assertThat(f.upstream().valveIds()).containsExactly("V1");
            // own district: s3 and s4 (R1 alone feeds LP); besides them the stop puts off s2, on the inlet side X1
            assertThat(t.serviceIds(f.stop().ownDistrict())).containsExactly("s3", "s4");
            assertThat(t.serviceIds(f.stop().otherOff())).containsExactly("s2");
        });
        assertThat(t.serviceIds(r.atRisk())).containsExactly("s3", "s4");
        assertThat(r.atRiskOrdered()).containsExactly("s4", "s3"); // critical customers first
        assertThat(r.criticalAtRisk()).containsExactly("s4");
        assertThat(r.atRiskMeters()).isEqualTo(5);
        // the shut-off as done: V1 closed puts off the inlet side X1 (s2, 1 meter) and the district (s3, s4)
        assertThat(t.serviceIds(r.off())).containsExactly("s2", "s3", "s4");
        assertThat(r.restoration().deadSystems()).containsExactly("LP");
        assertThat(r.restoration().metersRelight()).isEqualTo(6);
        InstructionCheck.verify(ValveSegments.build(t.state()), r, "over-pressure of LP");
    }

    /* Over-pressure of HP, fed by the source: shut the supply; HP and the LP district behind it go dead. */
    @Test
    void sourceFedSystemIsStoppedAtTheSourceAndTakesItsDistrictsDown() {
        TestNet t = AsciiNet.parse(NET);
        OverpressureShutoff.Result r = OverpressureShutoff.of(ValveSegments.build(t.state()), IsolationTest.OPTIONS, "HP",
                ResponseSettings.DEFAULT);
        assertThat(r.feeds()).singleElement().satisfies(f -> {
            assertThat(f.isStation()).isFalse();
            assertThat(f.id()).isEqualTo("Sa");
            assertThat(f.upstream()).isNull();
        });
        assertThat(t.serviceIds(r.atRisk())).containsExactly("s1", "s2");
        assertThat(t.serviceIds(r.off())).containsExactly("s1", "s2", "s3", "s4");
        assertThat(r.restoration().deadSystems()).containsExactly("HP", "LP");
    }

    /*
     *   A--1--b>c--2--d     two stations R1 (b>c) and R2 (e>f) feed LP (c..d, joined to f by g)
     *         |       |     V3 on the HP branch b-e
     *         3       |
     *         |       |
     *         e>f-----g
     * V3 closed: R2's inlet is dead, so only R1 brings gas in.
     */
    @Test
    void onlyStationsWithAFedInletAreFeeds() {
        String net = """
                A--1--b>c--2--d
                      |       |
                      3       |
                      |       |
                      e>f-----g
                --
                sys LP c
                closed V3
                svc s1 cd#0 1
                svc s2 fg 2
                """;
        TestNet t = AsciiNet.parse(net);
        OverpressureShutoff.Result r = OverpressureShutoff.of(ValveSegments.build(t.state()), IsolationTest.OPTIONS, "LP",
                ResponseSettings.DEFAULT);
        assertThat(r.feeds()).extracting(OverpressureShutoff.Feed::id).containsExactly("R1");
        assertThat(t.serviceIds(r.atRisk())).containsExactly("s1", "s2");
        assertThat(t.serviceIds(r.off())).containsExactly("s1", "s2");
    }

    @Test
    void unknownSystemHasNoFeedsAndNobodyAtRisk() {
        TestNet t = AsciiNet.parse(NET);
        OverpressureShutoff.Result r = OverpressureShutoff.of(ValveSegments.build(t.state()), IsolationTest.OPTIONS, "XX",
                ResponseSettings.DEFAULT);
        assertThat(r.feeds()).isEmpty();
        assertThat(r.atRisk().isEmpty()).isTrue();
        assertThat(r.off().isEmpty()).isTrue();
    }
}
