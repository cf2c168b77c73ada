package org.shutline.topology;

import static org.assertj.core.api.Assertions.assertThat;
import static org.shutline.topology.TestNet.countKind;
import static org.shutline.topology.TestNet.findings;
import static org.shutline.topology.TestNet.pipeComponents;
import static org.shutline.topology.TestNet.pipes;

import org.junit.jupiter.api.Test;
import org.shutline.model.MainStatus;
import org.shutline.model.Severity;

/** Attachment of valves, stations, sources, sensing taps and services (metres, default tolerances). */
class AttachmentTest {

    /*
     *  A (0,0)-------V-------(20,0)     valve V at (8,0.5) projects to measure 8
     *  -> pipe [0,8] | VALVE | pipe [8,20]
     */
    @Test
    void valveSplitsItsMainIntoTwoNodesJoinedByAValveEdge() {
        Topology t = new TestNet().main("A", "LP", "LINESTRING (0 0, 20 0)").valve("V", "LP", 8, 0.5).build();
        Graph g = t.graph();
        int[] a = pipes(g, 0);
        assertThat(a).hasSize(2);
        int v = g.valveEdge(0);
        assertThat(g.edgeKind(v)).isEqualTo(EdgeKind.VALVE);
        assertThat(g.edgeFrom(v)).isEqualTo(g.edgeTo(a[0]));
        assertThat(g.edgeTo(v)).isEqualTo(g.edgeFrom(a[1]));
        assertThat(g.edgeFrom(v)).isNotEqualTo(g.edgeTo(v));
        assertThat(g.edgeM1(a[0])).isEqualTo(8.0);
        assertThat(g.edgeM0(a[1])).isEqualTo(8.0);
        assertThat(g.nodeX(g.edgeFrom(v))).isEqualTo(8.0);
        assertThat(g.nodeY(g.edgeTo(v))).isEqualTo(0.0);
        assertThat(g.nodeCount()).isEqualTo(4);
        int[] c = pipeComponents(g);
        assertThat(c[g.edgeFrom(a[0])]).isNotEqualTo(c[g.edgeTo(a[1])]);
    }

    /*
     *  A (0,0)------(10,0)=J=(10,0)------(20,0) B     valve exactly at J: equal distance 0 to A and B,
     *  lower main_id A wins; it sits on A's side: A's pipe | VALVE | J (with B)
     */
    @Test
    void valveAtAJunctionSitsOnItsOwnMainsSide() {
        Topology t = new TestNet()
                .main("B", "LP", "LINESTRING (10 0, 20 0)")
                .main("A", "LP", "LINESTRING (0 0, 10 0)")
                .valve("V", "LP", 10, 0).build();
        Graph g = t.graph();
        int v = g.valveEdge(0);
        int a = pipes(g, 1)[0];
        int b = pipes(g, 0)[0];
        assertThat(g.edgeFrom(v)).isEqualTo(g.edgeTo(a));
        assertThat(g.edgeTo(v)).isEqualTo(g.edgeFrom(b));
        assertThat(g.degree(g.edgeTo(a))).isEqualTo(2);
        assertThat(findings(t, FindingCodes.DANGLING_END)).hasSize(2);
    }

    /*  two valves at one spot on one main: in series, three nodes at the spot  */
    @Test
    void twoValvesAtOneSpotAreInSeries() {
        Topology t = new TestNet().main("A", "LP", "LINESTRING (0 0, 20 0)")
                .valve("V2", "LP", 5, 1).valve("V1", "LP", 5, -1).build();
        Graph g = t.graph();
        assertThat(countKind(g, EdgeKind.VALVE)).isEqualTo(2);
        int a = pipes(g, 0)[0];
        int b = pipes(g, 0)[1];
        int v0 = g.valveEdge(0);
        int v1 = g.valveEdge(1);
        assertThat(g.edgeFrom(v0)).isEqualTo(g.edgeTo(a));
        assertThat(g.edgeTo(v0)).isEqualTo(g.edgeFrom(v1));
        assertThat(g.edgeTo(v1)).isEqualTo(g.edgeFrom(b));
        assertThat(g.nodeCount()).isEqualTo(5);
    }

    /*  parallel mains M2 (y=4) and M10 (y=6); valve at y=5 is 1 m from both: "M10" < "M2" as strings  */
    @Test
    void exactTieGoesToLowerMainIdAsAString() {
        Topology t = new TestNet()
                .main("M2", "LP", "LINESTRING (0 4, 10 4)")
                .main("M10", "LP", "LINESTRING (0 6, 10 6)")
                .valve("V", "LP", 5, 5).build();
        Graph g = t.graph();
        assertThat(pipes(g, 1)).hasSize(2);
        assertThat(pipes(g, 0)).hasSize(1);
        assertThat(g.nodeY(g.edgeFrom(g.valveEdge(0)))).isEqualTo(6.0);
    }

    /*  valve 1.9 m from L1 and 1.0 m from L2: the nearer wins  */
    @Test
    void nearerMainWins() {
        Topology t = new TestNet()
                .main("L1", "LP", "LINESTRING (0 0, 10 0)")
                .main("L2", "LP", "LINESTRING (0 2.9, 10 2.9)")
                .valve("V", "LP", 5, 1.9).build();
        assertThat(pipes(t.graph(), 1)).hasSize(2);
        assertThat(pipes(t.graph(), 0)).hasSize(1);
    }

    /*  a valve attaches whatever its main's status, but only to a main of its own system  */
    @Test
    void valveAttachesToAbandonedMainOfItsSystemOnly() {
        Topology t = new TestNet()
                .main("H", "HP", "LINESTRING (0 0, 10 0)")
                .main("L", "LP", MainStatus.ABANDONED, "LINESTRING (0 1.5, 10 1.5)")
                .valve("V", "LP", 5, 0.2).build();
        assertThat(pipes(t.graph(), 1)).hasSize(2);
        assertThat(pipes(t.graph(), 0)).hasSize(1);
    }

    /*  a source gets a node at its projection: the pipe splits into two pipe edges meeting there  */
    @Test
    void sourceGetsANodeThatSplitsThePipe() {
        Topology t = new TestNet().main("A", "HP", "LINESTRING (0 0, 20 0)").source("S", "HP", 12, 1).build();
        Graph g = t.graph();
        int[] a = pipes(g, 0);
        assertThat(a).hasSize(2);
        int n = g.sourceNode(0);
        assertThat(g.edgeTo(a[0])).isEqualTo(n);
        assertThat(g.edgeFrom(a[1])).isEqualTo(n);
        assertThat(g.nodeX(n)).isEqualTo(12.0);
        assertThat(g.nodeY(n)).isEqualTo(0.0);
    }

    /*  station on the end of its inlet main uses the end's node; its outlet splits the LP main mid-way  */
    @Test
    void stationNodesSitOnTheirMains() {
        Topology t = new TestNet()
                .main("H", "HP", "LINESTRING (0 0, 10 0)")
                .main("L", "LP", "LINESTRING (10 -10, 10 1, 10 10)")
                .station("S", "HP", "LP", 10, 0.3).build();
        Graph g = t.graph();
        int e = g.stationEdge(0);
        assertThat(g.edgeFrom(e)).isEqualTo(g.edgeTo(pipes(g, 0)[0]));
        int[] l = pipes(g, 1);
        assertThat(l).hasSize(2);
        assertThat(g.edgeTo(e)).isEqualTo(g.edgeTo(l[0]));
        assertThat(g.edgeM1(l[0])).isCloseTo(10.3, org.assertj.core.data.Offset.offset(1e-9));
        assertThat(findings(t, FindingCodes.DANGLING_END)).hasSize(3); // H start, L both ends
    }

    /*  service with main_id attaches to that main even 100 m away, with a warning; it does not split the main  */
    @Test
    void serviceAttachesToItsMainIdAtAnyDistance() {
        Topology t = new TestNet()
                .main("A", "LP", "LINESTRING (0 0, 20 0)")
                .main("B", "LP", "LINESTRING (0 100, 20 100)")
                .service("S", "LP", "A", 5, 100.5).build();
        Graph g = t.graph();
        assertThat(g.serviceEdge(0)).isEqualTo(pipes(g, 0)[0]);
        assertThat(g.serviceMeasure(0)).isEqualTo(5.0);
        assertThat(pipes(g, 0)).hasSize(1);
        assertThat(findings(t, FindingCodes.SERVICE_FAR_FROM_MAIN)).singleElement()
                .satisfies(f -> assertThat(f.severity()).isEqualTo(Severity.WARNING));
    }

    /*  no main_id: the nearest ACTIVE main within 60 m, passing over a nearer abandoned one  */
    @Test
    void serviceWithoutMainIdGoesToNearestActiveMain() {
        Topology t = new TestNet()
                .main("OLD", "LP", MainStatus.ABANDONED, "LINESTRING (0 10, 20 10)")
                .main("NEW", "LP", "LINESTRING (0 40, 20 40)")
                .main("FAR", "LP", "LINESTRING (0 -60, 20 -60)")
                .service("S", "LP", null, 7, 12).build();
        Graph g = t.graph();
        assertThat(g.serviceEdge(0)).isEqualTo(pipes(g, 1)[0]);
        assertThat(g.serviceMeasure(0)).isEqualTo(7.0);
        assertThat(findings(t, FindingCodes.UNATTACHED_SERVICE)).isEmpty();
    }

    /*  service on a valve-split main records the pipe edge that holds its measure  */
    @Test
    void serviceRecordsThePipeEdgeHoldingItsMeasure() {
        Topology t = new TestNet()
                .main("A", "LP", "LINESTRING (0 0, 20 0)")
                .valve("V", "LP", 8, 0)
                .service("S1", "LP", null, 3, 5)
                .service("S2", "LP", "A", 15, -5)
                .tap("T", "ST", 18, 0.5)
                .main("H", "HP", "LINESTRING (0 -30, 20 -30)")
                .station("ST", "HP", "LP", 20, -30).build();
        Graph g = t.graph();
        int[] a = pipes(g, 0);
        assertThat(g.serviceEdge(0)).isEqualTo(a[0]);
        assertThat(g.serviceEdge(1)).isEqualTo(a[1]);
        assertThat(g.serviceMeasure(1)).isEqualTo(15.0);
        assertThat(g.tapEdge(0)).isEqualTo(a[1]);
        assertThat(g.tapMeasure(0)).isEqualTo(18.0);
        // the station is 30 m from any LP main: no outlet, left out
        assertThat(g.stationEdge(0)).isEqualTo(-1);
        assertThat(findings(t, FindingCodes.STATION_NO_OUTLET)).hasSize(1);
    }
}
