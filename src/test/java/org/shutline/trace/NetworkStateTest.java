package org.shutline.trace;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.api.Test;
import org.shutline.model.MainStatus;
import org.shutline.model.Operability;
import org.shutline.model.ValveKind;
import org.shutline.testnet.AsciiNet;
import org.shutline.testnet.TestNet;
import org.shutline.topology.EdgeKind;

class NetworkStateTest {

    /*
     *   A-----b-----c      ab is 60 m (measures 0..60), bc 60 m
     *                      s1 on ab at 30 m, s2 on bc at 30 m (90 m along nothing: own main)
     *   d-----e            de: a separate main, no source
     */
    static final String LINE = """
            A-----b-----c

            d-----e
            --
            svc s1 ab 1
            svc s2 bc 2
            svc s3 de 4
            """;

    private static int edgeOf(TestNet t, String main) {
        return t.graph().mainEdge(t.graph().mainEdgeStart(t.main(main)));
    }

    @Test
    void cutSplitsThePipeIntoTwoPiecesThatDoNotMeet() {
        TestNet t = AsciiNet.parse(LINE);
        NetworkState base = t.state();
        int ab = edgeOf(t, "ab");
        NetworkState cutFar = base.withCut(ab, 45.0);
        // s1 at 30 m lies on the first piece, still fed; bc beyond the cut is dead
        assertThat(t.serviceIds(FeedTrace.run(cutFar).fedServices())).containsExactly("s1");
        assertThat(cutFar.nodeCount()).isEqualTo(base.nodeCount() + 2);
        assertThat(cutFar.edgeCount()).isEqualTo(base.edgeCount() + 2);
        assertThat(cutFar.isRemoved(ab)).isTrue();
        assertThat(cutFar.serviceEdge(t.service("s1"))).isEqualTo(base.edgeCount());
        assertThat(cutFar.nodeX(base.nodeCount())).isEqualTo(45.0);

        NetworkState cutNear = base.withCut(ab, 10.0);
        assertThat(FeedTrace.run(cutNear).fedServices().isEmpty()).isTrue();
        assertThat(cutNear.serviceEdge(t.service("s1"))).isEqualTo(base.edgeCount() + 1);
        // the base state is untouched
        assertThat(t.serviceIds(FeedTrace.run(base).fedServices())).containsExactly("s1", "s2");
        assertThat(base.isBase()).isTrue();
        assertThat(cutNear.isBase()).isFalse();
    }

    @Test
    void cutPieceCanBeCutAgain() {
        TestNet t = AsciiNet.parse(LINE);
        NetworkState base = t.state();
        int ab = edgeOf(t, "ab");
        int first = base.edgeCount();
        NetworkState s = base.withCut(ab, 50.0).withCut(first, 20.0);
        // s1 at 30 m: second cut leaves it on the piece 20..50, isolated from both ends
        assertThat(s.serviceEdge(t.service("s1"))).isEqualTo(first + 3);
        assertThat(FeedTrace.run(s).fedServices().isEmpty()).isTrue();
    }

    @Test
    void tieInFeedsADeadMainAndBypassValveControlsIt() {
        TestNet t = AsciiNet.parse(LINE);
        NetworkState base = t.state();
        int hose = base.mainCount();
        int valve = base.valveCount();
        int c = t.node("c"), d = t.node("d");
        NetworkState closedBypass = base.withMain("bypass-1", 0, MainStatus.ACTIVE)
                .withNode(120, -10)
                .withPipe(c, base.nodeCount(), hose, 0, 0, 14.1)
                .withValve(base.nodeCount(), d, "BV1", ValveKind.BYPASS, Operability.YES, true);
        assertThat(closedBypass.valveCount()).isEqualTo(valve + 1);
        assertThat(closedBypass.valveId(valve)).isEqualTo("BV1");
        assertThat(closedBypass.edgeKind(closedBypass.valveEdge(valve))).isEqualTo(EdgeKind.VALVE);
        assertThat(t.serviceIds(FeedTrace.run(closedBypass).fedServices())).containsExactly("s1", "s2");

        NetworkState open = closedBypass.withValveClosed(valve, false);
        assertThat(t.serviceIds(FeedTrace.run(open).fedServices())).containsExactly("s1", "s2", "s3");

        NetworkState removed = open.withEdgeRemoved(open.valveEdge(valve));
        assertThat(t.serviceIds(FeedTrace.run(removed).fedServices())).containsExactly("s1", "s2");
        assertThat(t.serviceIds(FeedTrace.run(removed.withEdgeRestored(open.valveEdge(valve))).fedServices()))
                .containsExactly("s1", "s2", "s3");
    }

    @Test
    void transferMovesAServiceToAnotherMain() {
        TestNet t = AsciiNet.parse(LINE);
        NetworkState s = t.state().withServiceAttachment(t.service("s3"), edgeOf(t, "bc"), 70.0);
        assertThat(t.serviceIds(FeedTrace.run(s).fedServices())).containsExactly("s1", "s2", "s3");
        assertThat(s.serviceMeasure(t.service("s3"))).isEqualTo(70.0);
    }

    @Test
    void statusChangesAndStationsAreOverlaid() {
        TestNet t = AsciiNet.parse("""
                A--b>c--d
                --
                sys LP c
                status cd proposed
                svc s1 cd 1
                """);
        NetworkState base = t.state();
        assertThat(FeedTrace.run(base).fedServices().isEmpty()).isTrue();
        NetworkState active = base.withMainStatus(t.main("cd"), MainStatus.ACTIVE);
        assertThat(t.serviceIds(FeedTrace.run(active).fedServices())).containsExactly("s1");
        NetworkState stopped = active.withStationInService(t.station("R1"), false);
        assertThat(FeedTrace.run(stopped).fedServices().isEmpty()).isTrue();
        assertThat(FeedTrace.run(stopped.withStationInService(t.station("R1"), true)).isFed(t.service("s1"))).isTrue();
        assertThat(base.mainStatus(t.main("cd"))).isEqualTo(MainStatus.PROPOSED);
    }

    @Test
    void adjacencyReadsBaseMinusRemovedPlusAdded() {
        TestNet t = AsciiNet.parse(LINE);
        NetworkState base = t.state();
        int b = t.node("b");
        int[] buf = base.adjacencyBuffer();
        assertThat(base.incidentEdges(b, buf)).isEqualTo(2);
        NetworkState s = base.withCut(edgeOf(t, "ab"), 30.0);
        buf = s.adjacencyBuffer();
        int c = s.incidentEdges(b, buf);
        assertThat(c).isEqualTo(2);
        assertThat(new int[] {buf[0], buf[1]}).contains(base.edgeCount() + 1).doesNotContain(edgeOf(t, "ab"));
        assertThat(s.incidentEdges(base.nodeCount(), buf)).isEqualTo(1);
    }

    @Test
    void badIndicesAreContractErrors() {
        NetworkState s = AsciiNet.parse(LINE).state();
        assertThatThrownBy(() -> s.withValveClosed(99, true)).isInstanceOf(IndexOutOfBoundsException.class);
        assertThatThrownBy(() -> s.withCut(0, 1e9)).isInstanceOf(IllegalArgumentException.class);
    }
}
