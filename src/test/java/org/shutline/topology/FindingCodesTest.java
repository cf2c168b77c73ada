package org.shutline.topology;

import static org.assertj.core.api.Assertions.assertThat;
import static org.shutline.topology.TestNet.findings;
import static org.shutline.topology.TestNet.pipes;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.shutline.model.Finding;
import org.shutline.model.MainStatus;
import org.shutline.model.Severity;

/** One test per topology finding code: the code appears with its severity, features, place and layer. */
class FindingCodesTest {

    private static Finding only(Topology t, String code) {
        List<Finding> fs = findings(t, code);
        assertThat(fs).as(code + " in " + t.findings()).hasSize(1);
        return fs.get(0);
    }

    /*  A (0,0)----(10,0), alone: both ends dangle  */
    @Test
    void danglingEnd() {
        Topology t = new TestNet().main("A", "LP", "LINESTRING (0 0, 10 0)").build();
        assertThat(findings(t, FindingCodes.DANGLING_END)).hasSize(2).allSatisfy(f -> {
            assertThat(f.severity()).isEqualTo(Severity.NOTE);
            assertThat(f.features()).containsExactly("A");
            assertThat(f.layer()).isEqualTo("mains");
        });
    }

    /*  an end with a valve within 2 m of it on its own main is a capped end, not a dangle  */
    @Test
    void endAtAValveIsNotDangling() {
        Topology t = new TestNet().main("A", "LP", "LINESTRING (0 0, 10 0)").valve("V", "LP", 9.5, 0).build();
        assertThat(findings(t, FindingCodes.DANGLING_END)).singleElement()
                .satisfies(f -> assertThat(f.x()).isEqualTo(0.0));
    }

    /*  A ends at (10,0); B passes 1.5 m away (beyond snap, within 2.5 m): near miss  */
    @Test
    void nearMiss() {
        Topology t = new TestNet()
                .main("A", "LP", "LINESTRING (0 0, 10 0)")
                .main("B", "LP", MainStatus.ABANDONED, "LINESTRING (11.5 -10, 11.5 10)").build();
        Finding f = only(t, FindingCodes.NEAR_MISS);
        assertThat(f.severity()).isEqualTo(Severity.WARNING);
        assertThat(f.features()).containsExactly("A", "B");
        assertThat(f.x()).isEqualTo(10.0);
    }

    /*  a hook: the end comes back 2 m from its own first segment: a near miss on its own line  */
    @Test
    void nearMissOnItsOwnLine() {
        Topology t = new TestNet().main("H", "LP", "LINESTRING (0 0, 20 0, 20 10, 10 10, 10 2)").build();
        Finding f = only(t, FindingCodes.NEAR_MISS);
        assertThat(f.features()).containsExactly("H");
        assertThat(f.y()).isEqualTo(2.0);
    }

    @Test
    void unattachedService() {
        Topology t = new TestNet().main("A", "LP", "LINESTRING (0 0, 10 0)").service("S", "LP", null, 5, 61).build();
        Finding f = only(t, FindingCodes.UNATTACHED_SERVICE);
        assertThat(f.severity()).isEqualTo(Severity.ERROR);
        assertThat(f.features()).containsExactly("S");
        assertThat(t.graph().serviceEdge(0)).isEqualTo(-1);
        // exactly 60 m is within the (inclusive) service tolerance
        Topology u = new TestNet().main("A", "LP", "LINESTRING (0 0, 10 0)").service("S", "LP", null, 5, 60).build();
        assertThat(u.graph().serviceEdge(0)).isEqualTo(0);
    }

    @Test
    void serviceMainNotFound() {
        Topology t = new TestNet().main("A", "LP", "LINESTRING (0 0, 10 0)").service("S", "LP", "Z9", 5, 1).build();
        Finding f = only(t, FindingCodes.SERVICE_MAIN_NOT_FOUND);
        assertThat(f.severity()).isEqualTo(Severity.ERROR);
        assertThat(f.features()).containsExactly("S", "Z9");
        assertThat(t.graph().serviceEdge(0)).isEqualTo(-1);
    }

    @Test
    void serviceFarFromMain() {
        Topology t = new TestNet().main("A", "LP", "LINESTRING (0 0, 10 0)").service("S", "LP", "A", 5, 60.5).build();
        assertThat(only(t, FindingCodes.SERVICE_FAR_FROM_MAIN).severity()).isEqualTo(Severity.WARNING);
        assertThat(t.graph().serviceEdge(0)).isEqualTo(0);
    }

    @Test
    void serviceOtherSystem() {
        Topology t = new TestNet()
                .main("A", "LP", "LINESTRING (0 0, 10 0)")
                .main("H", "HP", "LINESTRING (0 5, 10 5)")
                .service("S", "LP", "H", 5, 4).build();
        Finding f = only(t, FindingCodes.SERVICE_OTHER_SYSTEM);
        assertThat(f.severity()).isEqualTo(Severity.WARNING);
        assertThat(t.graph().serviceEdge(0)).isEqualTo(pipes(t.graph(), 1)[0]);
    }

    @Test
    void valveOffMain() {
        Topology t = new TestNet().main("A", "LP", "LINESTRING (0 0, 10 0)")
                .valve("V", "LP", 5, 2.01).valve("W", "LP", 5, 2.0).build();
        Finding f = only(t, FindingCodes.VALVE_OFF_MAIN);
        assertThat(f.features()).containsExactly("V");
        assertThat(f.severity()).isEqualTo(Severity.ERROR);
        assertThat(t.graph().valveEdge(0)).isEqualTo(-1);
        assertThat(t.graph().valveEdge(1)).isNotNegative(); // exactly 2 m: inclusive
    }

    @Test
    void tapOffMain() {
        Topology t = new TestNet()
                .main("H", "HP", "LINESTRING (0 0, 10 0)")
                .main("L", "LP", "LINESTRING (10 0.5, 20 0.5)")
                .station("ST", "HP", "LP", 10, 0.2)
                .tap("T", "ST", 15, 0.6)        // on the LP main
                .tap("U", "ST", 5, 0).build();  // on the HP main only: not the outlet system
        Finding f = only(t, FindingCodes.TAP_OFF_MAIN);
        assertThat(f.features()).contains("U");
        assertThat(t.graph().tapEdge(0)).isEqualTo(pipes(t.graph(), 1)[0]);
        assertThat(t.graph().tapEdge(1)).isEqualTo(-1);
    }

    @Test
    void stationNoInlet() {
        Topology t = new TestNet()
                .main("L", "LP", "LINESTRING (0 0, 10 0)")
                .main("H", "HP", "LINESTRING (0 10, 10 10)")
                .station("ST", "HP", "LP", 5, 0).build();
        assertThat(only(t, FindingCodes.STATION_NO_INLET).severity()).isEqualTo(Severity.ERROR);
        assertThat(findings(t, FindingCodes.STATION_NO_OUTLET)).isEmpty();
        assertThat(t.graph().stationEdge(0)).isEqualTo(-1);
    }

    @Test
    void stationNoOutlet() {
        Topology t = new TestNet()
                .main("L", "LP", "LINESTRING (0 10, 10 10)")
                .main("H", "HP", "LINESTRING (0 0, 10 0)")
                .station("ST", "HP", "LP", 5, 0).build();
        assertThat(only(t, FindingCodes.STATION_NO_OUTLET).severity()).isEqualTo(Severity.ERROR);
        assertThat(t.graph().stationEdge(0)).isEqualTo(-1);
    }

    @Test
    void stationUnknown() {
        Topology t = new TestNet().main("L", "LP", "LINESTRING (0 0, 10 0)").tap("T", "NOPE", 5, 0).build();
        Finding f = only(t, FindingCodes.STATION_UNKNOWN);
        assertThat(f.layer()).isEqualTo("sense_taps");
        assertThat(t.graph().tapEdge(0)).isEqualTo(-1);
    }

    @Test
    void sourceOffMain() {
        Topology t = new TestNet().main("H", "HP", "LINESTRING (0 0, 10 0)").source("S", "HP", 5, 3).build();
        assertThat(only(t, FindingCodes.SOURCE_OFF_MAIN).features()).containsExactly("S");
        assertThat(t.graph().sourceNode(0)).isEqualTo(-1);
    }

    /*  an end of HP 0.3 m from the interior of an LP main (no station): reported, not joined  */
    @Test
    void systemsTouching() {
        Topology t = new TestNet()
                .main("L", "LP", "LINESTRING (0 0, 20 0)")
                .main("H", "HP", "LINESTRING (10 0.3, 10 10)").build();
        Finding f = only(t, FindingCodes.SYSTEMS_TOUCHING);
        assertThat(f.features()).containsExactly("H", "L");
        assertThat(f.severity()).isEqualTo(Severity.WARNING);
        assertThat(pipes(t.graph(), 0)).hasSize(1);
    }

    @Test
    void sharedInteriorVertex() {
        Topology t = new TestNet()
                .main("A", "LP", "LINESTRING (0 0, 5 5, 10 10)")
                .main("B", "IP", "LINESTRING (0 10, 5 5, 10 0)").build();
        assertThat(only(t, FindingCodes.SHARED_INTERIOR_VERTEX).features()).containsExactly("A", "B");
    }

    @Test
    void duplicateIdPerLayer() {
        Topology t = new TestNet()
                .main("A", "LP", "LINESTRING (0 0, 10 0)")
                .main("A", "LP", "LINESTRING (0 5, 10 5)")
                .valve("A", "LP", 5, 0).build();   // same id in another layer: no finding
        Finding f = only(t, FindingCodes.DUPLICATE_ID);
        assertThat(f.layer()).isEqualTo("mains");
        assertThat(f.severity()).isEqualTo(Severity.ERROR);
        assertThat(f.y()).isEqualTo(5.0);
        assertThat(pipes(t.graph(), 1)).isEmpty();
        assertThat(t.graph().valveEdge(0)).isNotNegative();
    }

    @Test
    void emptyGeometry() {
        Topology t = new TestNet().main("A", "LP", "LINESTRING EMPTY")
                .main("B", "LP", MainStatus.ACTIVE, (org.locationtech.jts.geom.Geometry) null).build();
        assertThat(findings(t, FindingCodes.EMPTY_GEOMETRY)).hasSize(2);
        assertThat(t.graph().edgeCount()).isZero();
        assertThat(t.graph().mainCount()).isEqualTo(2);
    }

    @Test
    void invalidGeometry() {
        Topology t = new TestNet().main("A", "LP", "POINT (1 1)")
                .main("B", "LP", "LINESTRING (0 0, 10 0)").build();
        Finding f = only(t, FindingCodes.INVALID_GEOMETRY);
        assertThat(f.features()).containsExactly("A");
        assertThat(pipes(t.graph(), 0)).isEmpty();
        assertThat(pipes(t.graph(), 1)).hasSize(1);
    }

    /*  a zero-length main is kept as one junction point: it joins what meets it  */
    @Test
    void zeroLengthMain() {
        Topology t = new TestNet()
                .main("A", "LP", "LINESTRING (0 0, 10 0)")
                .main("Z", "LP", "LINESTRING (10.3 0, 10.3 0)")
                .main("B", "LP", "LINESTRING (10.6 0, 20 0)").build();
        assertThat(only(t, FindingCodes.ZERO_LENGTH_MAIN).severity()).isEqualTo(Severity.WARNING);
        Graph g = t.graph();
        int z = pipes(g, 1)[0];
        assertThat(g.edgeFrom(z)).isEqualTo(g.edgeTo(z));
        assertThat(g.edgeTo(pipes(g, 0)[0])).isEqualTo(g.edgeFrom(z));
        assertThat(g.edgeFrom(pipes(g, 2)[0])).isEqualTo(g.edgeFrom(z));
        assertThat(g.nodeCount()).isEqualTo(3);
    }

    @Test
    void unknownSystem() {
        Topology t = new TestNet().main("A", "LP", "LINESTRING (0 0, 10 0)").valve("V", "XP", 5, 0).build();
        Finding f = only(t, FindingCodes.UNKNOWN_SYSTEM);
        assertThat(f.features()).containsExactly("V");
        assertThat(only(t, FindingCodes.VALVE_OFF_MAIN).features()).containsExactly("V");
    }

    @Test
    void everyFindingHasAPlainMessageAndLayer() {
        Topology t = new TestNet()
                .main("A", "LP", "LINESTRING (0 0, 10 0)")
                .main("H", "HP", "LINESTRING (10 0.3, 10 10)")
                .valve("V", "LP", 50, 50).service("S", "LP", "Q", 3, 3).build();
        assertThat(t.findings()).isNotEmpty().allSatisfy(f -> {
            assertThat(f.message()).isNotBlank();
            assertThat(f.layer()).isNotNull();
            assertThat(f.code()).matches("[a-z]+(-[a-z]+)*");
            assertThat(f.hasLocation()).isTrue();
        });
    }

    /*  A (0,0)----V1(3,0)----V1(7,0)----(10,0): the second V1 is left out, the first splits A  */
    @Test
    void duplicateIdInAPointLayerLeavesTheLaterOneOut() {
        Topology t = new TestNet().main("A", "LP", "LINESTRING (0 0, 10 0)")
                .valve("V1", "LP", 3, 0).valve("V1", "LP", 7, 0).build();
        Finding f = only(t, FindingCodes.DUPLICATE_ID);
        assertThat(f.layer()).isEqualTo("valves");
        assertThat(f.x()).isEqualTo(7.0);
        assertThat(t.graph().valveEdge(0)).isNotNegative();
        assertThat(t.graph().valveEdge(1)).isEqualTo(-1);
        assertThat(pipes(t.graph(), 0)).hasSize(2);
    }

    /*  station whose inlet system has no main at all: unknown-system and station-no-inlet  */
    @Test
    void stationOfAnUnknownSystem() {
        Topology t = new TestNet().main("L", "LP", "LINESTRING (0 0, 10 0)").station("ST", "XHP", "LP", 5, 0).build();
        assertThat(only(t, FindingCodes.UNKNOWN_SYSTEM).layer()).isEqualTo("stations");
        assertThat(only(t, FindingCodes.STATION_NO_INLET).features()).containsExactly("ST");
        assertThat(t.graph().stationEdge(0)).isEqualTo(-1);
        assertThat(pipes(t.graph(), 0)).hasSize(1);
    }
}
