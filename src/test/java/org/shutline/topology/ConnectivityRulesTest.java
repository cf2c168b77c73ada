package org.shutline.topology;

import static org.assertj.core.api.Assertions.assertThat;
import static org.shutline.topology.TestNet.connected;
import static org.shutline.topology.TestNet.countKind;
import static org.shutline.topology.TestNet.findings;
import static org.shutline.topology.TestNet.pipes;

import org.junit.jupiter.api.Test;
import org.shutline.model.LinearUnit;
import org.shutline.model.MainStatus;

/** One test per connectivity rule of docs/connectivity.md, on hand-drawn networks (metres, default tolerances). */
class ConnectivityRulesTest {

    /*  A (0,0)----(10,0) B (10,0)----(20,0)   ends meet exactly  */
    @Test
    void endsThatMeetJoinEndToEnd() {
        Topology t = new TestNet()
                .main("A", "LP", "LINESTRING (0 0, 10 0)")
                .main("B", "LP", "LINESTRING (10 0, 20 0)").build();
        Graph g = t.graph();
        assertThat(g.nodeCount()).isEqualTo(3);
        assertThat(g.edgeCount()).isEqualTo(2);
        int a = pipes(g, 0)[0];
        int b = pipes(g, 1)[0];
        assertThat(g.edgeTo(a)).isEqualTo(g.edgeFrom(b));
        assertThat(findings(t, FindingCodes.DANGLING_END)).hasSize(2)
                .allSatisfy(f -> assertThat(f.x()).isIn(0.0, 20.0));
    }

    /*  A ...(10,0)  B (10.3,0)...  C (10.6,0)...: A-B 0.3, B-C 0.3, A-C 0.6 > snap: chain joins all three  */
    @Test
    void joinsChainTransitively() {
        Topology t = new TestNet()
                .main("A", "LP", "LINESTRING (0 0, 10 0)")
                .main("B", "LP", "LINESTRING (10.3 0, 10.3 10)")
                .main("C", "LP", "LINESTRING (10.6 0, 20 0)").build();
        Graph g = t.graph();
        int end = g.edgeTo(pipes(g, 0)[0]);
        assertThat(g.edgeFrom(pipes(g, 1)[0])).isEqualTo(end);
        assertThat(g.edgeFrom(pipes(g, 2)[0])).isEqualTo(end);
        assertThat(g.nodeCount()).isEqualTo(4);
        assertThat(g.degree(end)).isEqualTo(3);
    }

    /*
     *  B (10,10)
     *     |
     *     | end at (10,0.4), 0.4 from A's interior
     *  A (0,0)----------+----------(20,0)   A is split at measure 10 (a tee)
     */
    @Test
    void endOnInteriorMakesATee() {
        Topology t = new TestNet()
                .main("A", "LP", "LINESTRING (0 0, 20 0)")
                .main("B", "LP", "LINESTRING (10 0.4, 10 10)").build();
        Graph g = t.graph();
        int[] a = pipes(g, 0);
        assertThat(a).hasSize(2);
        assertThat(g.edgeM0(a[0])).isEqualTo(0.0);
        assertThat(g.edgeM1(a[0])).isEqualTo(10.0);
        assertThat(g.edgeM0(a[1])).isEqualTo(10.0);
        int tee = g.edgeTo(a[0]);
        assertThat(g.edgeFrom(a[1])).isEqualTo(tee);
        assertThat(g.edgeFrom(pipes(g, 1)[0])).isEqualTo(tee);
        assertThat(g.nodeX(tee)).isEqualTo(10.0);
        assertThat(g.nodeY(tee)).isEqualTo(0.0);
        assertThat(g.nodeCount()).isEqualTo(4);
        assertThat(findings(t, FindingCodes.DANGLING_END)).hasSize(3);
    }

    /*  A (0,0)->(10,10) and B (0,10)->(10,0) cross at (5,5) with no vertex there: not joined  */
    @Test
    void crossingMainsDoNotJoin() {
        Topology t = new TestNet()
                .main("A", "LP", "LINESTRING (0 0, 10 10)")
                .main("B", "LP", "LINESTRING (0 10, 10 0)").build();
        Graph g = t.graph();
        assertThat(g.nodeCount()).isEqualTo(4);
        assertThat(connected(g, 0, 1)).isFalse();
        assertThat(findings(t, FindingCodes.SHARED_INTERIOR_VERTEX)).isEmpty();
    }

    /*  as above, but both have a vertex at (5,5): still not joined, a note for GIS staff  */
    @Test
    void sharedInteriorVertexIsANoteAndNoJoin() {
        Topology t = new TestNet()
                .main("A", "LP", "LINESTRING (0 0, 5 5, 10 10)")
                .main("B", "LP", "LINESTRING (0 10, 5 5, 10 0)").build();
        Graph g = t.graph();
        assertThat(g.nodeCount()).isEqualTo(4);
        assertThat(connected(g, 0, 1)).isFalse();
        assertThat(findings(t, FindingCodes.SHARED_INTERIOR_VERTEX)).singleElement().satisfies(f -> {
            assertThat(f.features()).containsExactly("A", "B");
            assertThat(f.x()).isEqualTo(5.0);
            assertThat(f.y()).isEqualTo(5.0);
            assertThat(f.severity()).isEqualTo(org.shutline.model.Severity.NOTE);
        });
    }

    /*
     *  (0,10)-----(10,10)
     *    |           |
     *  (0,0.3)       |      end 0.3 from start: a ring, one node
     *  (0,0)------(10,0)
     */
    @Test
    void endMeetsItsOwnOtherEndAsARing() {
        Topology t = new TestNet().main("R", "LP", "LINESTRING (0 0, 10 0, 10 10, 0 10, 0 0.3)").build();
        Graph g = t.graph();
        assertThat(g.nodeCount()).isEqualTo(1);
        assertThat(g.edgeCount()).isEqualTo(1);
        assertThat(g.edgeFrom(0)).isEqualTo(g.edgeTo(0));
        assertThat(findings(t, FindingCodes.DANGLING_END)).isEmpty();
    }

    /*
     *  (5,10)-----(10,10)
     *    |           |
     *  (5,0.2)       |      last end 0.2 above its own first segment: a tee on itself at measure 5
     *  (0,0)--------(10,0)
     */
    @Test
    void endMeetsItsOwnInteriorAsASelfTee() {
        Topology t = new TestNet().main("S", "LP", "LINESTRING (0 0, 10 0, 10 10, 5 10, 5 0.2)").build();
        Graph g = t.graph();
        int[] s = pipes(g, 0);
        assertThat(s).hasSize(2);
        assertThat(g.edgeM1(s[0])).isEqualTo(5.0);
        int tee = g.edgeTo(s[0]);
        assertThat(g.edgeFrom(s[1])).isEqualTo(tee);
        assertThat(g.edgeTo(s[1])).isEqualTo(tee);
        assertThat(g.nodeCount()).isEqualTo(2);
        assertThat(findings(t, FindingCodes.DANGLING_END)).singleElement()
                .satisfies(f -> assertThat(f.x()).isEqualTo(0.0));
    }

    /*  (0,0)--(0.3,0)--(0.3,0.3): never leaves the 0.5 circle around either end: no self-join, two nodes  */
    @Test
    void shortLineInsideItsOwnCircleDoesNotMeetItself() {
        Topology t = new TestNet().main("Q", "LP", "LINESTRING (0 0, 0.3 0, 0.3 0.3)").build();
        assertThat(t.graph().nodeCount()).isEqualTo(2);
        assertThat(t.graph().edgeFrom(0)).isNotEqualTo(t.graph().edgeTo(0));
    }

    /*
     *  HP A (0,0)----(10,0)  (10.2,0)----(20,0) LP B    0.2 apart, different systems
     */
    @Test
    void twoSystemsTouchingDoNotJoinAndAreReported() {
        Topology t = new TestNet()
                .main("A", "HP", "LINESTRING (0 0, 10 0)")
                .main("B", "LP", "LINESTRING (10.2 0, 20 0)").build();
        assertThat(t.graph().nodeCount()).isEqualTo(4);
        assertThat(connected(t.graph(), 0, 1)).isFalse();
        assertThat(findings(t, FindingCodes.SYSTEMS_TOUCHING)).hasSize(2)
                .allSatisfy(f -> assertThat(f.features()).containsExactlyInAnyOrder("A", "B"));
    }

    /*  same, with station HP->LP at (10.1,0): no systems-touching finding; a station edge HP -> LP  */
    @Test
    void systemsTouchingAtTheirStationIsNotReported() {
        Topology t = new TestNet()
                .main("A", "HP", "LINESTRING (0 0, 10 0)")
                .main("B", "LP", "LINESTRING (10.2 0, 20 0)")
                .station("ST1", "HP", "LP", 10.1, 0).build();
        assertThat(findings(t, FindingCodes.SYSTEMS_TOUCHING)).isEmpty();
        assertThat(countKind(t.graph(), EdgeKind.STATION)).isEqualTo(1);
        assertThat(findings(t, FindingCodes.DANGLING_END)).hasSize(2);
    }

    /*
     *  HP H (0,0)------(10,0)
     *                     S (10,0.5)      station HP -> LP
     *                  (10,1)------(20,1) LP L
     */
    @Test
    void stationLinksInletNodeToOutletNode() {
        Topology t = new TestNet()
                .main("L", "LP", "LINESTRING (10 1, 20 1)")
                .main("H", "HP", "LINESTRING (0 0, 10 0)")
                .station("S", "HP", "LP", 10, 0.5).build();
        Graph g = t.graph();
        int e = g.stationEdge(0);
        assertThat(e).isNotNegative();
        assertThat(g.edgeKind(e)).isEqualTo(EdgeKind.STATION);
        assertThat(g.edgeFrom(e)).isEqualTo(g.edgeTo(pipes(g, 1)[0]));   // H's end (10,0)
        assertThat(g.edgeTo(e)).isEqualTo(g.edgeFrom(pipes(g, 0)[0]));   // L's start (10,1)
        assertThat(g.systemId(g.mainSystem(1))).isEqualTo("HP");
    }

    /*  MULTILINESTRING ((0 0, 10 0), (20 0, 30 0)): two lines with their own ends, one main; J (10,0)-(20,0) joins them  */
    @Test
    void multiLineStringPartsHaveTheirOwnEnds() {
        Topology t = new TestNet()
                .main("M", "LP", "MULTILINESTRING ((0 0, 10 0), (20 0, 30 0))").build();
        Graph g = t.graph();
        assertThat(g.nodeCount()).isEqualTo(4);
        int[] m = pipes(g, 0);
        assertThat(m).hasSize(2);
        assertThat(g.edgePart(m[0])).isEqualTo(0);
        assertThat(g.edgePart(m[1])).isEqualTo(1);
        assertThat(g.edgeM1(m[1])).isEqualTo(10.0);
        assertThat(findings(t, FindingCodes.DANGLING_END)).hasSize(4);

        Topology j = new TestNet()
                .main("M", "LP", "MULTILINESTRING ((0 0, 10 0), (20 0, 30 0))")
                .main("J", "LP", "LINESTRING (10 0, 20 0)").build();
        assertThat(j.graph().nodeCount()).isEqualTo(4);
        assertThat(j.graph().degree(j.graph().edgeTo(pipes(j.graph(), 0)[0]))).isEqualTo(2);
        assertThat(findings(j, FindingCodes.DANGLING_END)).hasSize(2);
    }

    /*  gap of exactly 0.5 m joins (inclusive); 0.5 m plus a little does not, and is a near miss  */
    @Test
    void snapToleranceIsInclusiveAtExactlyHalfAMetre() {
        Topology t = new TestNet()
                .main("A", "LP", "LINESTRING (0 0, 10 0)")
                .main("B", "LP", "LINESTRING (10.5 0, 20 0)").build();
        assertThat(t.graph().nodeCount()).isEqualTo(3);
        assertThat(findings(t, FindingCodes.NEAR_MISS)).isEmpty();

        Topology u = new TestNet()
                .main("A", "LP", "LINESTRING (0 0, 10 0)")
                .main("B", "LP", "LINESTRING (10.5001 0, 20 0)").build();
        assertThat(u.graph().nodeCount()).isEqualTo(4);
        assertThat(findings(u, FindingCodes.NEAR_MISS)).hasSize(2);
    }

    /*
     *  CRS in US survey feet: 0.5 m = 1.64042 US ft (0.5 x 3937/1200; NIST SP 811 B.6).
     *  A gap of 1.64 ft joins, 1.65 ft does not.
     */
    @Test
    void tolerancesAreConvertedToUsSurveyFeet() {
        TestNet a = new TestNet()
                .main("A", "LP", "LINESTRING (0 0, 100 0)")
                .main("B", "LP", "LINESTRING (101.64 0, 200 0)");
        a.unit = LinearUnit.US_SURVEY_FOOT;
        Topology t = a.build();
        assertThat(t.graph().nodeCount()).isEqualTo(3);
        assertThat(t.tolerances().snapM()).isCloseTo(0.5 * 3937 / 1200, org.assertj.core.data.Offset.offset(1e-12));

        TestNet b = new TestNet()
                .main("A", "LP", "LINESTRING (0 0, 100 0)")
                .main("B", "LP", "LINESTRING (101.65 0, 200 0)");
        b.unit = LinearUnit.US_SURVEY_FOOT;
        assertThat(b.build().graph().nodeCount()).isEqualTo(4);
        // in metres the same 1.65 gap would be far beyond the snap tolerance but a near miss (<= 2.5 m)
        TestNet c = new TestNet()
                .main("A", "LP", "LINESTRING (0 0, 100 0)")
                .main("B", "LP", "LINESTRING (101.65 0, 200 0)");
        assertThat(findings(c.build(), FindingCodes.NEAR_MISS)).hasSize(2);
    }

    /*  joins ignore status: an abandoned main still joins its neighbour (status only matters to the trace)  */
    @Test
    void joinsIgnoreStatus() {
        Topology t = new TestNet()
                .main("A", "LP", MainStatus.ABANDONED, "LINESTRING (0 0, 10 0)")
                .main("B", "LP", MainStatus.PROPOSED, "LINESTRING (10.2 0, 20 0)").build();
        assertThat(t.graph().nodeCount()).isEqualTo(3);
    }

    /*  read findings come first, then topology findings  */
    @Test
    void readFindingsComeFirst() {
        TestNet n = new TestNet().main("A", "LP", "LINESTRING (0 0, 10 0)");
        n.read.add(org.shutline.model.Finding.of("unknown-word", org.shutline.model.Severity.ERROR, "mains",
                "status 'actve' is not a known word", "A"));
        Topology t = n.build();
        assertThat(t.findings().get(0).code()).isEqualTo("unknown-word");
        assertThat(t.findings()).hasSize(3);
    }
}
