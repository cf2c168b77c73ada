package org.shutline.topology;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.shutline.topology.TestNet.findings;
import static org.shutline.topology.TestNet.pipes;

import java.util.concurrent.CancellationException;
import org.junit.jupiter.api.Test;
import org.shutline.model.Progress;
import org.shutline.model.Tolerances;

/** The finer points of the rules: own interior, per-main end preference, valves at tees, cancellation. */
class EdgeCaseRulesTest {

    /*
     *        (0.4,10)
     *           |
     *           |          the vertical passes 0.4 from the start end (0,0) at (0.4,0), but that is
     *  (0,0)--(0.4,0)      before the line leaves the 0.5 circle around the end: not its own interior
     */
    @Test
    void pointsBeforeTheLineLeavesTheCircleAreNotItsOwnInterior() {
        Topology t = new TestNet().main("L", "LP", "LINESTRING (0 0, 0.4 0, 0.4 10)").build();
        assertThat(t.graph().nodeCount()).isEqualTo(2);
        assertThat(t.graph().edgeCount()).isEqualTo(1);
        assertThat(findings(t, FindingCodes.DANGLING_END)).hasSize(2);
        assertThat(findings(t, FindingCodes.NEAR_MISS)).isEmpty();
    }

    /*
     *  B (10,0.45) -> (10,10) -> (20.6,10) -> (5.6,-5)
     *  A ----(10,0)     B's start is 0.45 from A's end; B's last leg (x - y = 10.6) passes nearer,
     *                   0.42 from it (and 0.74 from B's own start): A joins B at B's end only
     */
    @Test
    void anEndWithinToleranceIsPreferredToTheInterior() {
        Topology t = new TestNet()
                .main("A", "LP", "LINESTRING (0 0, 10 0)")
                .main("B", "LP", "LINESTRING (10 0.45, 10 10, 20.6 10, 5.6 -5)").build();
        Graph g = t.graph();
        assertThat(pipes(g, 1)).hasSize(1);
        assertThat(g.edgeTo(pipes(g, 0)[0])).isEqualTo(g.edgeFrom(pipes(g, 1)[0]));
        assertThat(g.nodeCount()).isEqualTo(3);
    }

    /*  MULTILINESTRING ((0 0, 20 0), (10 0.3, 10 10)): part 1 tees into part 0 of the same main  */
    @Test
    void partsOfOneMainJoinEachOther() {
        Topology t = new TestNet().main("M", "LP", "MULTILINESTRING ((0 0, 20 0), (10 0.3, 10 10))").build();
        Graph g = t.graph();
        int[] m = pipes(g, 0);
        assertThat(m).hasSize(3);
        assertThat(g.edgeTo(m[0])).isEqualTo(g.edgeFrom(m[1])).isEqualTo(g.edgeFrom(m[2]));
        assertThat(g.edgePart(m[2])).isEqualTo(1);
    }

    /*
     *            B (10,10)
     *              |
     *  A (0,0)----T+V----(20,0)   valve V exactly at the tee on A: the junction T keeps A's lower piece
     *                             and B; V lies between T and A's upper piece
     */
    @Test
    void valveOnATeeNodeOfTheThroughMain() {
        Topology t = new TestNet()
                .main("A", "LP", "LINESTRING (0 0, 20 0)")
                .main("B", "LP", "LINESTRING (10 0, 10 10)")
                .valve("V", "LP", 10, 0).build();
        Graph g = t.graph();
        int[] a = pipes(g, 0);
        int v = g.valveEdge(0);
        int tee = g.edgeTo(a[0]);
        assertThat(g.edgeFrom(pipes(g, 1)[0])).isEqualTo(tee);
        assertThat(g.edgeFrom(v)).isEqualTo(tee);
        assertThat(g.edgeTo(v)).isEqualTo(g.edgeFrom(a[1]));
        assertThat(g.degree(tee)).isEqualTo(3);
    }

    /*  a joined end is neither a near miss nor a dangle, even with another main 1 m away  */
    @Test
    void joinedEndsAreNotNearMisses() {
        Topology t = new TestNet()
                .main("A", "LP", "LINESTRING (0 0, 10 0)")
                .main("B", "LP", "LINESTRING (10 0, 20 0)")
                .main("C", "LP", "LINESTRING (11 -5, 11 5)").build();
        assertThat(findings(t, FindingCodes.NEAR_MISS)).isEmpty();
        assertThat(findings(t, FindingCodes.DANGLING_END)).hasSize(4)
                .noneSatisfy(f -> assertThat(f.x()).isEqualTo(10.0));
    }

    /*  a station of two other systems does not excuse systems touching at its spot  */
    @Test
    void onlyAStationLinkingTheTwoSystemsExcusesTouching() {
        Topology t = new TestNet()
                .main("A", "HP", "LINESTRING (0 0, 10 0)")
                .main("B", "LP", "LINESTRING (10.2 0, 20 0)")
                .main("C", "IP", "LINESTRING (10 50, 20 50)")
                .station("S", "HP", "IP", 10.1, 0).build();
        assertThat(findings(t, FindingCodes.SYSTEMS_TOUCHING)).hasSize(2);
    }

    /*  snap tolerance set to 1 m: a 0.8 m gap now joins  */
    @Test
    void configuredTolerancesAreUsed() {
        TestNet n = new TestNet()
                .main("A", "LP", "LINESTRING (0 0, 10 0)")
                .main("B", "LP", "LINESTRING (10.8 0, 20 0)");
        assertThat(NetworkBuilder.build(n.network(), new Tolerances(1.0, 2.0, 60.0, 5.0)).graph().nodeCount())
                .isEqualTo(3);
        assertThat(n.build().graph().nodeCount()).isEqualTo(4);
    }

    @Test
    void cancellationStopsTheBuild() {
        Progress cancelled = new Progress() {
            @Override public void begin(String task, long total) {}
            @Override public void done(long units) {}
            @Override public boolean isCancelled() { return true; }
        };
        TestNet n = new TestNet().main("A", "LP", "LINESTRING (0 0, 10 0)");
        assertThatThrownBy(() -> NetworkBuilder.build(n.network(), Tolerances.DEFAULT, cancelled))
                .isInstanceOf(CancellationException.class);
    }

    /*
     *             B (10,10)
     *               |  end (10,0.2)
     *  A (0,0)------+-+------(20,0)   B and C ends are 0.41 apart (joined); they tee into A at
     *                 |  end (10.1,-0.2)   measures 10 and 10.1: one junction, the 0.1 m piece
     *             C (10.1,-10)             between is a loop edge on it
     */
    @Test
    void closeTeesOfOneJunctionLeaveALoopPiece() {
        Topology t = new TestNet()
                .main("A", "LP", "LINESTRING (0 0, 20 0)")
                .main("B", "LP", "LINESTRING (10 0.2, 10 10)")
                .main("C", "LP", "LINESTRING (10.1 -0.2, 10.1 -10)").build();
        Graph g = t.graph();
        int[] a = pipes(g, 0);
        assertThat(a).hasSize(3);
        int j = g.edgeTo(a[0]);
        assertThat(g.edgeFrom(a[1])).isEqualTo(j);
        assertThat(g.edgeTo(a[1])).isEqualTo(j);
        assertThat(g.edgeM1(a[1]) - g.edgeM0(a[1])).isCloseTo(0.1, org.assertj.core.data.Offset.offset(1e-9));
        assertThat(g.edgeFrom(a[2])).isEqualTo(j);
        assertThat(g.edgeFrom(pipes(g, 1)[0])).isEqualTo(j);
        assertThat(g.edgeFrom(pipes(g, 2)[0])).isEqualTo(j);
        assertThat(g.nodeCount()).isEqualTo(5);
    }
}
