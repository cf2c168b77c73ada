package org.shutline.trace;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.BitSet;
import java.util.List;
import java.util.Set;
import org.jgrapht.Graph;
import org.jgrapht.alg.connectivity.ConnectivityInspector;
import org.jgrapht.graph.DefaultEdge;
import org.jgrapht.graph.DirectedPseudograph;
import org.jgrapht.graph.Pseudograph;
import org.jgrapht.traverse.BreadthFirstIterator;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.shutline.testnet.RandomNet;
import org.shutline.testnet.TestNet;
import org.shutline.topology.EdgeKind;

/** Segments and feed trace against JGraphT 1.5.3 (ConnectivityInspector, BreadthFirstIterator) on random networks. */
class ConnectivityCrossCheckTest {

    static long[] seeds() {
        long[] s = new long[100];
        for (int i = 0; i < s.length; i++) s[i] = 4000 + i;
        return s;
    }

    @ParameterizedTest
    @MethodSource("seeds")
    void segmentsAreTheConnectedSetsOfActivePipe(long seed) {
        TestNet t = RandomNet.build(seed);
        NetworkState s = t.state();
        ValveSegments vs = ValveSegments.build(s);
        Graph<Integer, DefaultEdge> g = new Pseudograph<>(DefaultEdge.class);
        for (int v = 0; v < s.nodeCount(); v++) if (vs.nodeSegment(v) >= 0) g.addVertex(v);
        for (int e = 0; e < s.edgeCount(); e++) {
            if (s.edgeKind(e) == EdgeKind.PIPE && s.mainActive(s.edgeFeature(e))) g.addEdge(s.edgeFrom(e), s.edgeTo(e));
        }
        List<Set<Integer>> sets = new ConnectivityInspector<>(g).connectedSets();
        assertThat(sets).as("seed %d: number of segments", seed).hasSize(vs.segmentCount());
        for (Set<Integer> set : sets) {
            int seg = vs.nodeSegment(set.iterator().next());
            for (int v : set) assertThat(vs.nodeSegment(v)).as("seed %d node %d", seed, v).isEqualTo(seg);
        }
    }

    @ParameterizedTest
    @MethodSource("seeds")
    void liveNodesAreThoseReachedFromTheSources(long seed) {
        TestNet t = RandomNet.build(seed);
        NetworkState s = t.state();
        Graph<Integer, DefaultEdge> g = new DirectedPseudograph<>(DefaultEdge.class);
        for (int v = 0; v < s.nodeCount(); v++) g.addVertex(v);
        for (int e = 0; e < s.edgeCount(); e++) {
            int a = s.edgeFrom(e), b = s.edgeTo(e), f = s.edgeFeature(e);
            boolean both = switch (s.edgeKind(e)) {
                case EdgeKind.PIPE -> s.mainActive(f);
                case EdgeKind.VALVE -> !s.valveClosed(f);
                default -> false;
            };
            if (both) {
                g.addEdge(a, b);
                g.addEdge(b, a);
            } else if (s.edgeKind(e) == EdgeKind.STATION && s.stationInService(f)) {
                g.addEdge(a, b);
            }
        }
        BitSet expected = new BitSet();
        for (int i = 0; i < s.sourceCount(); i++) {
            new BreadthFirstIterator<>(g, s.sourceNode(i)).forEachRemaining(expected::set);
        }
        FeedTrace.Result r = FeedTrace.run(s);
        assertThat(r.liveNodes()).as("seed %d", seed).isEqualTo(expected);
        // and the segment graph agrees: a node is live exactly when its segment is fed
        ValveSegments vs = ValveSegments.build(s);
        BitSet fedSegs = vs.graph().reachFromSources(null, null);
        for (int v = 0; v < s.nodeCount(); v++) {
            if (vs.nodeSegment(v) >= 0) {
                assertThat(fedSegs.get(vs.nodeSegment(v))).as("seed %d node %d", seed, v).isEqualTo(expected.get(v));
            }
        }
    }
}
