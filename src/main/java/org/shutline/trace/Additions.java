package org.shutline.trace;

import java.util.Arrays;
import org.shutline.model.MainStatus;
import org.shutline.model.Operability;
import org.shutline.model.ValveKind;

/**
 * The nodes, edges, mains and valves a {@link NetworkState} adds beyond its base
 * graph; immutable, each addition copies these small arrays (a plan adds a handful).
 * {@link #incidence} holds (node << 32 | edge) for both ends of every added edge,
 * sorted, so a node's added edges are one binary search away.
 */
final class Additions {
    static final Additions EMPTY = new Additions();

    int nodes;
    double[] nodeX = new double[0];
    double[] nodeY = new double[0];

    int edges;
    byte[] edgeKind = new byte[0];
    int[] edgeFrom = new int[0];
    int[] edgeTo = new int[0];
    int[] edgeFeature = new int[0];
    int[] edgePart = new int[0];
    double[] edgeM0 = new double[0];
    double[] edgeM1 = new double[0];
    long[] incidence = new long[0];

    int mains;
    String[] mainId = new String[0];
    int[] mainSystem = new int[0];
    byte[] mainStatus = new byte[0];

    int valves;
    String[] valveId = new String[0];
    byte[] valveKind = new byte[0];
    byte[] valveOperability = new byte[0];
    boolean[] valveNormallyClosed = new boolean[0];
    int[] valveEdge = new int[0];

    private Additions() {}

    private Additions copy() {
        Additions a = new Additions();
        a.nodes = nodes;
        a.nodeX = nodeX;
        a.nodeY = nodeY;
        a.edges = edges;
        a.edgeKind = edgeKind;
        a.edgeFrom = edgeFrom;
        a.edgeTo = edgeTo;
        a.edgeFeature = edgeFeature;
        a.edgePart = edgePart;
        a.edgeM0 = edgeM0;
        a.edgeM1 = edgeM1;
        a.incidence = incidence;
        a.mains = mains;
        a.mainId = mainId;
        a.mainSystem = mainSystem;
        a.mainStatus = mainStatus;
        a.valves = valves;
        a.valveId = valveId;
        a.valveKind = valveKind;
        a.valveOperability = valveOperability;
        a.valveNormallyClosed = valveNormallyClosed;
        a.valveEdge = valveEdge;
        return a;
    }

    Additions node(double x, double y) {
        Additions a = copy();
        a.nodeX = Arrays.copyOf(nodeX, nodes + 1);
        a.nodeY = Arrays.copyOf(nodeY, nodes + 1);
        a.nodeX[nodes] = x;
        a.nodeY[nodes] = y;
        a.nodes = nodes + 1;
        return a;
    }

    /** Adds an edge; {@code baseEdges + edges} (before the call) is its index in the state. */
    Additions edge(byte kind, int from, int to, int feature, int part, double m0, double m1, int index) {
        Additions a = copy();
        int n = edges + 1;
        a.edgeKind = Arrays.copyOf(edgeKind, n);
        a.edgeFrom = Arrays.copyOf(edgeFrom, n);
        a.edgeTo = Arrays.copyOf(edgeTo, n);
        a.edgeFeature = Arrays.copyOf(edgeFeature, n);
        a.edgePart = Arrays.copyOf(edgePart, n);
        a.edgeM0 = Arrays.copyOf(edgeM0, n);
        a.edgeM1 = Arrays.copyOf(edgeM1, n);
        a.edgeKind[edges] = kind;
        a.edgeFrom[edges] = from;
        a.edgeTo[edges] = to;
        a.edgeFeature[edges] = feature;
        a.edgePart[edges] = part;
        a.edgeM0[edges] = m0;
        a.edgeM1[edges] = m1;
        a.edges = n;
        int extra = from == to ? 1 : 2;
        long[] inc = Arrays.copyOf(incidence, incidence.length + extra);
        inc[incidence.length] = ((long) from << 32) | index;
        if (extra == 2) inc[incidence.length + 1] = ((long) to << 32) | index;
        Arrays.sort(inc);
        a.incidence = inc;
        return a;
    }

    Additions main(String id, int system, MainStatus status) {
        Additions a = copy();
        int n = mains + 1;
        a.mainId = Arrays.copyOf(mainId, n);
        a.mainSystem = Arrays.copyOf(mainSystem, n);
        a.mainStatus = Arrays.copyOf(mainStatus, n);
        a.mainId[mains] = id;
        a.mainSystem[mains] = system;
        a.mainStatus[mains] = (byte) status.ordinal();
        a.mains = n;
        return a;
    }

    Additions valve(String id, ValveKind kind, Operability op, boolean closed, int edge) {
        Additions a = copy();
        int n = valves + 1;
        a.valveId = Arrays.copyOf(valveId, n);
        a.valveKind = Arrays.copyOf(valveKind, n);
        a.valveOperability = Arrays.copyOf(valveOperability, n);
        a.valveNormallyClosed = Arrays.copyOf(valveNormallyClosed, n);
        a.valveEdge = Arrays.copyOf(valveEdge, n);
        a.valveId[valves] = id;
        a.valveKind[valves] = (byte) kind.ordinal();
        a.valveOperability[valves] = (byte) op.ordinal();
        a.valveNormallyClosed[valves] = closed;
        a.valveEdge[valves] = edge;
        a.valves = n;
        return a;
    }
}
