package org.shutline.analysis;

import static org.assertj.core.api.Assertions.assertThat;

import java.time.LocalDate;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.shutline.model.Operability;
import org.shutline.testnet.AsciiNet;
import org.shutline.testnet.TestNet;
import org.shutline.trace.FeedTrace;
import org.shutline.trace.ValveSegments;

class IsolationTest {
    static final ValveDoubt.Settings OPTIONS = ValveDoubt.Settings.defaults(LocalDate.of(2026, 12, 1));

    /*
     *   A--1--b--2--c        segments (by hand):
     *         |     |        X0 = ab#0 (source, s1)   X1 = ab#1 bc#0 bd#0 (s2)
     *         3     4        X2 = bc#1 ce#0 (s3, a clinic)
     *         |     |        X3 = bd#1 de#0 (s4)      X4 = de#1 ce#1 (s5)
     *         d--5--e        hops from the source: X0 0, X1 1, X2 2, X3 2, X4 3
     */
    static final String RING = """
            A--1--b--2--c
                  |     |
                  3     4
                  |     |
                  d--5--e
            --
            svc s1 ab#0 1
            svc s2 ab#1 2
            svc s3 bc#1 3 clinic
            svc s4 bd#1 4
            svc s5 de#1 5
            """;

    private static Isolation.Result isolate(TestNet t, Zone z) {
        return new Isolation(ValveSegments.build(t.state()), OPTIONS).isolate(z);
    }

    /* Isolating c's segment X2 (point at c; ties at c go to the lowest main id, bc):
     * close V2 (far side X1, 1 hop) then V4 (far side X4, fed round by d, 3 hops). */
    @Test
    void valveSplitListsBoundingValvesFromTheFeedingSide() {
        TestNet t = AsciiNet.parse(RING);
        Isolation.Result r = isolate(t, Zone.point(120, 0));
        assertThat(r.isolable()).isTrue();
        assertThat(r.reason()).isEmpty();
        assertThat(r.valveIds()).containsExactly("V2", "V4");
        assertThat(r.valves().get(0).hops()).isEqualTo(1);
        assertThat(r.valves().get(1).hops()).isEqualTo(3);
        assertThat(r.serviceIdsOff()).containsExactly("s3");
        assertThat(r.metersOff()).isEqualTo(3);
        assertThat(r.criticalOff()).containsExactly("s3");
        assertThat(r.unintended().isEmpty()).isTrue();
        assertThat(r.fallbacks()).isEmpty();
    }

    /* V4 inoperable: the region grows across it to X4; close V2 then V5. */
    @Test
    void inoperableValveExtendsTheRegion() {
        TestNet t = AsciiNet.parse(RING + "inoperable V4\n");
        Isolation.Result r = isolate(t, Zone.point(120, 0));
        assertThat(r.valveIds()).containsExactly("V2", "V5");
        assertThat(r.serviceIdsOff()).containsExactly("s3", "s5");
        assertThat(r.metersOff()).isEqualTo(8);
        assertThat(r.region().cardinality()).isEqualTo(2);
        assertThat(r.zoneSegments().cardinality()).isEqualTo(1);
    }

    /* V4 unknown: relied on, with a fallback: if it fails, close V5 too; s5 is added. */
    @Test
    void unknownValveGetsAFallback() {
        TestNet t = AsciiNet.parse(RING + "unknown V4\n");
        Isolation.Result r = isolate(t, Zone.point(120, 0));
        assertThat(r.valveIds()).containsExactly("V2", "V4");
        assertThat(r.valves().get(1).operable()).isEqualTo(Operability.UNKNOWN);
        assertThat(r.fallbacks()).hasSize(1);
        Isolation.Fallback f = r.fallbacks().get(0);
        assertThat(f.valveId()).isEqualTo("V4");
        assertThat(f.why()).isEqualTo("operability unknown");
        assertThat(f.valves()).containsExactly("V2", "V5");
        assertThat(f.thenClose()).containsExactly("V5");
        assertThat(f.addedServices()).containsExactly("s5");
        assertThat(f.addedMeters()).isEqualTo(5);
        assertThat(f.isolable()).isTrue();
    }

    /* V2 last checked 2025-01-01: due 2026-04-01, overdue on 2026-12-01 (15 months, 49 CFR 192.747).
     * If V2 fails the region is X1+X2: close V1; X3 and X4 lose every source (unintended). */
    @Test
    void overdueValveGetsAFallbackAndNeverCheckedCountsAsOverdue() {
        TestNet t = AsciiNet.parse(RING + "checked V2 2025-01-01\nnever V4\n");
        Isolation.Result r = isolate(t, Zone.point(120, 0));
        assertThat(r.valves().get(0).overdue()).isTrue();
        assertThat(r.fallbacks()).extracting(Isolation.Fallback::valveId).containsExactly("V2", "V4");
        Isolation.Fallback f2 = r.fallbacks().get(0);
        assertThat(f2.why()).startsWith("last checked 2025-01-01, more than 15 months");
        assertThat(f2.valves()).containsExactly("V1");
        assertThat(f2.addedServices()).containsExactly("s2", "s4", "s5");
        assertThat(r.fallbacks().get(1).why()).startsWith("never checked");

        Isolation early = new Isolation(ValveSegments.build(t.state()), ValveDoubt.Settings.defaults(LocalDate.of(2026, 3, 1)));
        assertThat(early.isolate(Zone.point(120, 0)).fallbacks()).extracting(Isolation.Fallback::valveId)
                .containsExactly("V4");
    }

    /* V5 normally closed: isolating X4 (point at e) closes V4 only; V5 bounds and is not listed. */
    @Test
    void alreadyClosedValveBoundsAndIsNotListed() {
        TestNet t = AsciiNet.parse(RING + "closed V5\n");
        Isolation.Result r = isolate(t, Zone.point(120, -40));
        assertThat(r.valveIds()).containsExactly("V4");
        assertThat(r.closedBoundaryValves()).containsExactly("V5");
        assertThat(r.serviceIdsOff()).containsExactly("s5");
    }

    /* Isolating X2 needs V2 and V4; grown across V2 (X1+X2) it needs V1 alone, at the cost
     * of s2, s4 and s5 (X3 and X4 are then cut off). */
    @Test
    void smallerValveSetIsOfferedAsAnAlternative() {
        TestNet t = AsciiNet.parse(RING);
        Isolation.Result r = isolate(t, Zone.point(120, 0));
        assertThat(r.alternative()).isPresent();
        assertThat(r.alternative().get().valves()).containsExactly("V1");
        assertThat(r.alternative().get().addedServices()).containsExactly("s2", "s4", "s5");
        assertThat(r.alternative().get().addedMeters()).isEqualTo(11);
    }

    /*
     *   A--1--b--2--c--3--d       X0 = ab#0 (source)  X1 = ab#1 bc#0   X2 = bc#1 cd#0 ce#0
     *               |             X3 = cd#1           X4 = ce#1
     *               4
     *               |
     *               e
     * Isolating X1 (main ab's second piece): V1 is listed (source beyond); V2's far side
     * X2 has no other source, so it is not listed and X2, X3, X4 go off unintended.
     */
    @Test
    void deadEndBranchBehindTheRegionIsUnintendedIsolation() {
        TestNet t = AsciiNet.parse("""
                A--1--b--2--c--3--d
                            |
                            4
                            |
                            e
                --
                svc s1 ab#0 1
                svc s2 ab#1 1
                svc s3 bc#1 1
                svc s4 cd#1 1
                svc s5 ce#1 1
                """);
        ValveSegments vs = ValveSegments.build(t.state());
        int x1 = vs.nodeSegment(t.node("b"));
        Isolation.Result r = new Isolation(vs, OPTIONS).isolate(new Zone.OfSegments(new int[] {x1}));
        assertThat(r.valveIds()).containsExactly("V1");
        assertThat(r.unlistedValves()).containsExactly("V2");
        assertThat(r.serviceIdsOff()).containsExactly("s2", "s3", "s4", "s5");
        assertThat(r.unintended().cardinality()).isEqualTo(3);

        // zone = main cd: its two segments X2 and X3; V3 is inside, V4 leads to the dead end e
        Isolation.Result m = new Isolation(vs, OPTIONS).isolate(Zone.main("cd"));
        assertThat(m.region().cardinality()).isEqualTo(2);
        assertThat(m.valveIds()).containsExactly("V2");
        assertThat(m.unlistedValves()).containsExactly("V4");
        assertThat(m.serviceIdsOff()).containsExactly("s3", "s4", "s5");

        // zone = main ab holds the source: valves cannot isolate it
        Isolation.Result src = new Isolation(vs, OPTIONS).isolate(Zone.main("ab"));
        assertThat(src.isolable()).isFalse();
        assertThat(src.sourcesInRegion()).containsExactly("Sa");
        assertThat(src.reason()).contains("Sa");
    }

    /*
     *   A---1>c--2--d     V1 (kind station, 10 m from R1) on HP; R1 at the '>'; LP beyond
     *                     X0 = ac.1#0 (source, s1)  X1 = ac.1#1 (V1 to R1 inlet, s2)
     *                     X2 = ac.2 cd#0 (LP, s3)   X3 = cd#1 (s4)
     */
    static final String STATION = """
            A---1>c--2--d
            --
            sys LP c
            kind V1 station
            tol 15
            svc s1 ac.1#0 1
            svc s2 ac.1#1 1
            svc s3 cd#0 2
            svc s4 cd#1 3
            """;

    /* Isolating the station's inlet side X1 (close V1) takes its whole district off. */
    @Test
    void stationWithIsolatedInletTakesItsDistrictOff() {
        TestNet t = AsciiNet.parse(STATION);
        ValveSegments vs = ValveSegments.build(t.state());
        int x1 = vs.serviceSegment(t.service("s2"));
        Isolation.Result r = new Isolation(vs, OPTIONS).isolate(new Zone.OfSegments(new int[] {x1}));
        assertThat(r.isolable()).isTrue();
        assertThat(r.valveIds()).containsExactly("V1");
        assertThat(r.serviceIdsOff()).containsExactly("s2", "s3", "s4");
        assertThat(r.metersOff()).isEqualTo(6);
    }

    /* Isolating LP segment X2: R1 feeds it straight: not isolable by valves; stop R1, inlet valve V1. */
    @Test
    void stationOutletFeedingTheRegionIsNotIsolable() {
        TestNet t = AsciiNet.parse(STATION);
        Isolation.Result r = isolate(t, Zone.main("cd"));
        // cd spans X2 and X3 (V2 is inside the zone)
        assertThat(r.isolable()).isFalse();
        assertThat(r.stationsToStop()).containsExactly("R1");
        assertThat(r.stationInletValves()).containsExactly("V1");
        assertThat(r.reason()).contains("R1").contains("V1");
        assertThat(r.valveIds()).isEmpty();
        // the instruction stops R1 by closing V1: the inlet pipe between V1 and the station (s2 on ac.1#1) goes off
        // with the district; s1 lies on the source side of V1 and stays on
        assertThat(r.serviceIdsOff()).containsExactly("s2", "s3", "s4");
        FeedTrace.Result closedV1 = FeedTrace.run(t.state().withValveClosed(t.valve("V1"), true));
        assertThat(t.serviceIds(closedV1.fedServices())).containsExactly("s1");

        FeedTrace.Result before = FeedTrace.run(t.state());
        assertThat(t.serviceIds(before.fedServices())).containsExactly("s1", "s2", "s3", "s4");
    }

    @Test
    void polygonZoneTakesTheSegmentsItTouches() {
        TestNet t = AsciiNet.parse(RING);
        GeometryFactory gf = new GeometryFactory();
        // a box around e (x 115..125, y -45..-35): touches de#1 and ce#1, both in X4
        var box = gf.createPolygon(new Coordinate[] {new Coordinate(115, -45), new Coordinate(125, -45),
            new Coordinate(125, -35), new Coordinate(115, -35), new Coordinate(115, -45)});
        Isolation.Result r = isolate(t, new Zone.InPolygon(box));
        assertThat(r.zoneSegments().cardinality()).isEqualTo(1);
        assertThat(r.valveIds()).containsExactly("V4", "V5");
        assertThat(r.serviceIdsOff()).containsExactly("s5");
    }

    @Test
    void pointZoneCanBeLimitedToASystem() {
        TestNet t = AsciiNet.parse(STATION);
        // at the station cell: nearest LP main is ac.2 (X2), nearest HP is ac.1
        Isolation.Result lp = isolate(t, new Zone.AtPoint(50, 0, "LP"));
        assertThat(lp.stationsToStop()).containsExactly("R1");
        Isolation.Result hp = isolate(t, new Zone.AtPoint(50, 0, "HP"));
        assertThat(hp.valveIds()).containsExactly("V1");
        assertThat(hp.serviceIdsOff()).containsAll(List.of("s2", "s3", "s4"));
    }
}
