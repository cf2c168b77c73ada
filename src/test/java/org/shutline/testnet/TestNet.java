package org.shutline.testnet;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.List;
import java.util.Map;
import org.shutline.model.Network;
import org.shutline.topology.Graph;
import org.shutline.topology.Topology;
import org.shutline.trace.NetworkState;
import org.shutline.trace.ValveSegments;

/** A hand-built test network: its topology, node names, and index lookups by input id. */
public final class TestNet {
    private final Topology topology;
    private final Map<String, Integer> nodes;

    public TestNet(Topology topology, Map<String, Integer> nodes) {
        this.topology = topology;
        this.nodes = Map.copyOf(nodes);
    }

    public Topology topology() { return topology; }
    public Graph graph() { return topology.graph(); }
    public Network network() { return topology.network(); }
    public NetworkState state() { return NetworkState.of(topology); }

    public int node(String name) {
        Integer n = nodes.get(name);
        if (n == null) throw new IllegalArgumentException("no node " + name);
        return n;
    }

    public int valve(String id) { return index(network().valves().stream().map(v -> v.id()).toList(), id); }
    public int main(String id) { return index(network().mains().stream().map(v -> v.id()).toList(), id); }
    public int station(String id) { return index(network().stations().stream().map(v -> v.id()).toList(), id); }
    public int service(String id) { return index(network().services().stream().map(v -> v.id()).toList(), id); }

    private static int index(List<String> ids, String id) {
        int i = ids.indexOf(id);
        if (i < 0) throw new IllegalArgumentException("no feature " + id);
        return i;
    }

    /** Segment of the first pipe piece of a main. */
    public int segmentOf(ValveSegments segs, String mainId) {
        int m = main(mainId);
        return segs.edgeSegment(graph().mainEdge(graph().mainEdgeStart(m)));
    }

    /** Ids of the services set in a BitSet, in index order. */
    public List<String> serviceIds(BitSet set) {
        List<String> out = new ArrayList<>();
        for (int i = set.nextSetBit(0); i >= 0; i = set.nextSetBit(i + 1)) out.add(network().services().get(i).id());
        return out;
    }
}
