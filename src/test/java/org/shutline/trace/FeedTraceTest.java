package org.shutline.trace;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.BitSet;
import org.junit.jupiter.api.Test;
import org.shutline.testnet.AsciiNet;
import org.shutline.testnet.TestNet;

class FeedTraceTest {

    /*
     * Two stations feed one low-pressure grid (answers by hand):
     *
     *   A---b>c---d        HP: ab, bc.1, be     LP: bc.2, cd, dg, ef.2, fg
     *       |     |        R1 at b>c, R2 at e>f
     *       e>f---g        s1 on cd, s2 on fg, s3 on dg, s4 on ab (HP)
     *
     * Both stations reach every LP service: s1..s3 counted for R1 and for R2,
     * none exclusive, all three multi-fed; s4 fed from the source directly.
     */
    static final String GRID = """
            A---b>c---d
                |     |
                e>f---g
            --
            sys LP c
            svc s1 cd 2
            svc s2 fg 1
            svc s3 dg 1
            svc s4 ab 5
            """;

    @Test
    void gridCountsServicesForEveryStationThatReachesThem() {
        TestNet t = AsciiNet.parse(GRID);
        FeedTrace.Result r = FeedTrace.run(t.state());
        int r1 = t.station("R1"), r2 = t.station("R2");
        assertThat(t.serviceIds(r.fedServices())).containsExactly("s1", "s2", "s3", "s4");
        assertThat(t.serviceIds(r.servicesFedThrough(r1))).containsExactly("s1", "s2", "s3");
        assertThat(t.serviceIds(r.servicesFedThrough(r2))).containsExactly("s1", "s2", "s3");
        assertThat(r.servicesExclusiveTo(r1).isEmpty()).isTrue();
        assertThat(r.servicesExclusiveTo(r2).isEmpty()).isTrue();
        assertThat(t.serviceIds(r.multiFed())).containsExactly("s1", "s2", "s3");
        assertThat(r.stationMeters()).containsExactly(4L, 4L);
        assertThat(r.metersFed()).isEqualTo(9);
        assertThat(r.stationsFeeding(t.service("s2"))).containsExactly(r1, r2);
        assertThat(r.deadMains().isEmpty()).isTrue();
    }

    @Test
    void stationOutMakesTheOtherExclusive() {
        TestNet t = AsciiNet.parse(GRID);
        int r1 = t.station("R1"), r2 = t.station("R2");
        FeedTrace.Result r = FeedTrace.run(t.state().withStationInService(r2, false));
        assertThat(t.serviceIds(r.servicesExclusiveTo(r1))).containsExactly("s1", "s2", "s3");
        assertThat(r.servicesFedThrough(r2).isEmpty()).isTrue();
        assertThat(r.multiFed().isEmpty()).isTrue();
        assertThat(r.stationExclusiveMeters()[r1]).isEqualTo(4);
    }

    /*
     *   a---b>C---d      the only source is on the outlet side (LP) at c
     *
     * Gas does not flow back through R1: a, b and the HP service s1 stay dead;
     * s2 on cd is fed; R1 feeds nothing since its inlet is dead.
     */
    @Test
    void stationIsOneWay() {
        TestNet t = AsciiNet.parse("""
                a---b>C---d
                --
                sys LP c
                svc s1 ab 1
                svc s2 cd 1
                """);
        FeedTrace.Result r = FeedTrace.run(t.state());
        assertThat(t.serviceIds(r.fedServices())).containsExactly("s2");
        assertThat(t.serviceIds(r.unfedServices())).containsExactly("s1");
        assertThat(r.isLive(t.node("a"))).isFalse();
        assertThat(r.isLive(t.node("b"))).isFalse();
        assertThat(r.isLive(t.node("d"))).isTrue();
        assertThat(r.servicesFedThrough(t.station("R1")).isEmpty()).isTrue();
        assertThat(r.isDeadMain(t.main("ab"))).isTrue();
        assertThat(r.isDeadMain(t.main("cd"))).isFalse();
    }

    /*
     *   A--b>c--d        HP -> IP (R1), IP -> LP (R2), a cascade
     *           !
     *           e--f     s1 on cd (IP, 1 meter), s2 on ef (LP, 2 meters)
     *
     * R1 feeds s1 and s2 (transitively), R2 feeds s2; both exclusive (one path);
     * s2 has one last-stage station, so it is not multi-fed.
     */
    @Test
    void cascadeIsTransitive() {
        TestNet t = AsciiNet.parse("""
                A--b>c--d
                        !
                        e--f
                --
                sys IP c
                sys LP e
                svc s1 cd 1
                svc s2 ef 2
                """);
        FeedTrace.Result r = FeedTrace.run(t.state());
        int r1 = t.station("R1"), r2 = t.station("R2");
        assertThat(t.serviceIds(r.servicesFedThrough(r1))).containsExactly("s1", "s2");
        assertThat(t.serviceIds(r.servicesFedThrough(r2))).containsExactly("s2");
        assertThat(t.serviceIds(r.servicesExclusiveTo(r1))).containsExactly("s1", "s2");
        assertThat(t.serviceIds(r.servicesExclusiveTo(r2))).containsExactly("s2");
        assertThat(r.stationMeters()).containsExactly(3L, 2L);
        assertThat(r.multiFed().isEmpty()).isTrue();
    }

    /*
     *   A--1--b--c       V1 closed: piece 2 of ab (after V1) and all of bc are dead;
     *                    ab keeps a live piece, so only bc is a dead main.
     */
    @Test
    void closedValveStopsFlowAndLeavesDeadMains() {
        TestNet t = AsciiNet.parse("""
                A--1--b--c
                --
                closed V1
                svc s1 ab#0 1
                svc s2 ab#1 1
                svc s3 bc 1
                """);
        FeedTrace.Result r = FeedTrace.run(t.state());
        assertThat(t.serviceIds(r.fedServices())).containsExactly("s1");
        BitSet dead = r.deadMains();
        assertThat(dead.get(t.main("bc"))).isTrue();
        assertThat(dead.get(t.main("ab"))).isFalse();
        assertThat(dead.cardinality()).isEqualTo(1);

        FeedTrace.Result opened = FeedTrace.run(t.state().withValveClosed(t.valve("V1"), false));
        assertThat(t.serviceIds(opened.fedServices())).containsExactly("s1", "s2", "s3");
        assertThat(opened.deadMains().isEmpty()).isTrue();
    }

    /*
     *   A--b--c          bc abandoned: carries no gas and is not a dead main (not active)
     */
    @Test
    void abandonedMainCarriesNoGas() {
        TestNet t = AsciiNet.parse("""
                A--b--c
                --
                status bc abandoned
                svc s1 ab 1
                svc s2 bc 1
                """);
        FeedTrace.Result r = FeedTrace.run(t.state());
        assertThat(t.serviceIds(r.fedServices())).containsExactly("s1");
        assertThat(r.isLive(t.node("c"))).isFalse();
        assertThat(r.deadMains().isEmpty()).isTrue();
    }
}
