package org.shutline.trace;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.BitSet;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.shutline.testnet.AsciiNet;
import org.shutline.testnet.RandomNet;
import org.shutline.testnet.TestNet;

class ValveSegmentsTest {

    /*
     *   A--1--b--2--c        five valves, five segments (by hand):
     *         |     |        X0 = ab#0 (source)      X1 = ab#1 bc#0 bd#0 (around b)
     *         3     4        X2 = bc#1 ce#0 (c)      X3 = bd#1 de#0 (d)
     *         |     |        X4 = de#1 ce#1 (e)
     *         d--5--e
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

    @Test
    void ringSplitsIntoSegmentsBoundedByValves() {
        TestNet t = AsciiNet.parse(RING);
        ValveSegments vs = ValveSegments.build(t.state());
        assertThat(vs.segmentCount()).isEqualTo(5);
        int x1 = vs.nodeSegment(t.node("b"));
        assertThat(vs.serviceSegment(t.service("s2"))).isEqualTo(x1);
        assertThat(vs.mainCount(x1)).isEqualTo(3); // ab, bc, bd
        assertThat(vs.boundingValves(x1)).containsExactly(t.valve("V1"), t.valve("V2"), t.valve("V3"));
        int x4 = vs.nodeSegment(t.node("e"));
        assertThat(vs.services(x4)).containsExactly(t.service("s5"));
        assertThat(vs.meters(x4)).isEqualTo(5);
        assertThat(vs.boundingValves(x4)).containsExactly(t.valve("V4"), t.valve("V5"));
        SegmentGraph g = vs.graph();
        assertThat(g.linkCount()).isEqualTo(5);
        int l2 = g.valveLink(t.valve("V2"));
        assertThat(g.other(l2, x1)).isEqualTo(vs.nodeSegment(t.node("c")));
        assertThat(g.hasSource(vs.nodeSegment(t.node("a")))).isTrue();
        assertThat(g.reachFromSources(null, null).cardinality()).isEqualTo(5);
    }

    @Test
    void closedValveStillBoundsButStopsFlow() {
        TestNet t = AsciiNet.parse(RING + "closed V2\nclosed V3\n");
        ValveSegments vs = ValveSegments.build(t.state());
        assertThat(vs.segmentCount()).isEqualTo(5);
        // only X0 and X1 are fed: c, d, e sit behind the closed V2 and V3
        assertThat(vs.graph().reachFromSources(null, null).cardinality()).isEqualTo(2);
    }

    /*
     *   A--1--b--2--c        bc abandoned: V2's two sides touch no active pipe, so it links
     *                        two empty segments; d-e is a separate main joined to c only by
     *   d--e                 the loose valve V7 (valve straight between c and d).
     */
    @Test
    void valveWithNoActivePipeOnASideBoundsAnEmptySegment() {
        TestNet t = AsciiNet.parse("""
                A--1--b--2--c

                d--e
                --
                status bc abandoned
                loose V7 c d
                svc s1 de 1
                """);
        ValveSegments vs = ValveSegments.build(t.state());
        SegmentGraph g = vs.graph();
        int l2 = g.valveLink(t.valve("V2"));
        assertThat(vs.isEmpty(g.linkA(l2))).isTrue();
        assertThat(vs.isEmpty(g.linkB(l2))).isTrue();
        assertThat(g.linkA(l2)).isNotEqualTo(g.linkB(l2));
        int cSeg = vs.nodeSegment(t.node("c"));
        assertThat(vs.isEmpty(cSeg)).isTrue();
        assertThat(vs.nodeSegment(t.node("d"))).isEqualTo(vs.serviceSegment(t.service("s1")));
        // X0, X1, the two empty sides of V2, c alone (empty, V7's side: bc#1 is abandoned), de
        assertThat(vs.segmentCount()).isEqualTo(6);
        assertThat(FeedTrace.run(t.state()).isFed(t.service("s1"))).isFalse();
    }

    @Test
    void stationsAreDirectedLinks() {
        TestNet t = AsciiNet.parse("""
                A--b>c--d
                --
                sys LP c
                """);
        ValveSegments vs = ValveSegments.build(t.state());
        SegmentGraph g = vs.graph();
        int l = g.stationLink(t.station("R1"));
        int in = vs.nodeSegment(t.node("b")), out = vs.nodeSegment(t.node("c"));
        assertThat(g.linkA(l)).isEqualTo(in);
        assertThat(g.linkB(l)).isEqualTo(out);
        assertThat(g.canFlow(l, in)).isTrue();
        assertThat(g.canFlow(l, out)).isFalse();
    }

    /** Services and meters of a set of segments, both paths (few segments, most segments), against the per-segment lists. */
    @Test
    void servicesAndMetersOfSegmentSetsMatchThePerSegmentLists() {
        for (long seed = 300; seed < 340; seed++) {
            NetworkState s = RandomNet.build(seed).state();
            ValveSegments vs = ValveSegments.build(s);
            Random rnd = new Random(seed);
            for (double share : new double[] {0.0, 0.2, 0.7, 1.0}) {
                BitSet set = new BitSet();
                for (int g = 0; g < vs.segmentCount(); g++) if (rnd.nextDouble() < share) set.set(g);
                BitSet expected = new BitSet();
                long meters = 0;
                for (int g = set.nextSetBit(0); g >= 0; g = set.nextSetBit(g + 1)) {
                    for (int sv : vs.services(g)) expected.set(sv);
                    for (int sv : vs.services(g)) meters += s.network().services().get(sv).meters();
                }
                assertThat(vs.servicesOf(set)).as("seed %d share %s", seed, share).isEqualTo(expected);
                assertThat(vs.metersOf(set)).as("seed %d share %s", seed, share).isEqualTo(meters);
            }
        }
    }
}
