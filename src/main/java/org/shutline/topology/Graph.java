package org.shutline.topology;

import java.util.Arrays;

/**
 * The frozen topology of a network: nodes {@code 0..n-1} and edges {@code 0..m-1}
 * in primitive arrays, with adjacency in CSR form. Built once by {@link GraphBuilder},
 * never edited afterwards; what-if states are overlays (see the {@code trace} package).
 *
 * <p>Edges: a {@link EdgeKind#PIPE} edge is the piece of main {@code feature} (index into
 * {@code Network.mains()}), part {@code part} of a MultiLineString, from measure
 * {@code m0} at node {@code from} to {@code m1} at node {@code to} (measures are lengths
 * along that part in CRS units, {@code m0 < m1} unless zero-length). A
 * {@link EdgeKind#VALVE} edge's feature is an index into {@code Network.valves()}; a
 * {@link EdgeKind#STATION} edge's feature is an index into {@code Network.stations()}
 * and it runs one way, from inlet node to outlet node.
 *
 * <p>Attachments, one slot per input feature, -1 when not attached: valve edge, station
 * edge, source node, service pipe edge and measure, sensing-tap pipe edge and measure.
 * Every main has its system index; systems are numbered in {@link #systemIds()}.
 *
 * <p>Why arrays: a million mains give a few million nodes and edges; one object per
 * node would cost tens of bytes each and scatter the traversal over the heap.
 */
public final class Graph {
    final int nodeCount;
    final double[] nodeX;
    final double[] nodeY;

    final int edgeCount;
    final byte[] edgeKind;
    final int[] edgeFrom;
    final int[] edgeTo;
    final int[] edgeFeature;
    final int[] edgePart;
    final double[] edgeM0;
    final double[] edgeM1;

    /** CSR: edges incident to node v are adjEdge[adjStart[v] .. adjStart[v+1]-1]. */
    final int[] adjStart;
    final int[] adjEdge;

    /** Pipe edges of main i are mainEdges[mainEdgeStart[i] .. mainEdgeStart[i+1]-1], by part then measure. */
    final int[] mainEdgeStart;
    final int[] mainEdges;
    final int[] mainSystem;
    final String[] systemIds;

    final int[] valveEdge;
    final int[] stationEdge;
    final int[] sourceNode;
    final int[] serviceEdge;
    final double[] serviceMeasure;
    final int[] tapEdge;
    final double[] tapMeasure;

    Graph(GraphBuilder b) {
        nodeCount = b.nodeCount;
        nodeX = Arrays.copyOf(b.nodeX, nodeCount);
        nodeY = Arrays.copyOf(b.nodeY, nodeCount);
        edgeCount = b.edgeCount;
        edgeKind = Arrays.copyOf(b.edgeKind, edgeCount);
        edgeFrom = Arrays.copyOf(b.edgeFrom, edgeCount);
        edgeTo = Arrays.copyOf(b.edgeTo, edgeCount);
        edgeFeature = Arrays.copyOf(b.edgeFeature, edgeCount);
        edgePart = Arrays.copyOf(b.edgePart, edgeCount);
        edgeM0 = Arrays.copyOf(b.edgeM0, edgeCount);
        edgeM1 = Arrays.copyOf(b.edgeM1, edgeCount);

        Csr adj = Csr.incidence(nodeCount, edgeFrom, edgeTo, edgeCount);
        adjStart = adj.start();
        adjEdge = adj.items();

        int mains = b.mainSystem.length;
        mainSystem = b.mainSystem.clone();
        systemIds = b.systemIds.clone();
        Csr byMain = Csr.build(mains, sink -> {
            for (int e = 0; e < edgeCount; e++) if (edgeKind[e] == EdgeKind.PIPE) sink.add(edgeFeature[e], e);
        });
        mainEdgeStart = byMain.start();
        mainEdges = byMain.items();
        for (int i = 0; i < mains; i++) sortMainEdges(mainEdgeStart[i], mainEdgeStart[i + 1]);

        valveEdge = b.valveEdge.clone();
        stationEdge = b.stationEdge.clone();
        sourceNode = b.sourceNode.clone();
        serviceEdge = b.serviceEdge.clone();
        serviceMeasure = b.serviceMeasure.clone();
        tapEdge = b.tapEdge.clone();
        tapMeasure = b.tapMeasure.clone();
    }

    private void sortMainEdges(int lo, int hi) {
        // insertion sort: a main has few pieces
        for (int i = lo + 1; i < hi; i++) {
            int e = mainEdges[i];
            int j = i - 1;
            while (j >= lo && comesAfter(mainEdges[j], e)) {
                mainEdges[j + 1] = mainEdges[j];
                j--;
            }
            mainEdges[j + 1] = e;
        }
    }

    private boolean comesAfter(int a, int b) {
        if (edgePart[a] != edgePart[b]) return edgePart[a] > edgePart[b];
        return Math.min(edgeM0[a], edgeM1[a]) > Math.min(edgeM0[b], edgeM1[b]);
    }

    public int nodeCount() { return nodeCount; }
    public double nodeX(int v) { return nodeX[v]; }
    public double nodeY(int v) { return nodeY[v]; }

    public int edgeCount() { return edgeCount; }
    public byte edgeKind(int e) { return edgeKind[e]; }
    public int edgeFrom(int e) { return edgeFrom[e]; }
    public int edgeTo(int e) { return edgeTo[e]; }
    public int edgeFeature(int e) { return edgeFeature[e]; }
    public int edgePart(int e) { return edgePart[e]; }
    public double edgeM0(int e) { return edgeM0[e]; }
    public double edgeM1(int e) { return edgeM1[e]; }

    /** The other end of edge e seen from node v. */
    public int opposite(int e, int v) {
        return edgeFrom[e] == v ? edgeTo[e] : edgeFrom[e];
    }

    public int degree(int v) { return adjStart[v + 1] - adjStart[v]; }
    public int adjStart(int v) { return adjStart[v]; }
    public int adjEnd(int v) { return adjStart[v + 1]; }
    /** The i-th entry of the adjacency array (use with {@link #adjStart}/{@link #adjEnd}). */
    public int adjEdge(int i) { return adjEdge[i]; }

    public int mainCount() { return mainSystem.length; }
    public int mainSystem(int main) { return mainSystem[main]; }
    public int mainEdgeStart(int main) { return mainEdgeStart[main]; }
    public int mainEdgeEnd(int main) { return mainEdgeStart[main + 1]; }
    public int mainEdge(int i) { return mainEdges[i]; }

    public int systemCount() { return systemIds.length; }
    public String systemId(int s) { return systemIds[s]; }
    public String[] systemIds() { return systemIds.clone(); }
    /** Index of a system id, or -1. */
    public int systemIndex(String id) {
        for (int i = 0; i < systemIds.length; i++) if (systemIds[i].equals(id)) return i;
        return -1;
    }

    public int valveCount() { return valveEdge.length; }
    public int valveEdge(int valve) { return valveEdge[valve]; }
    public int stationCount() { return stationEdge.length; }
    public int stationEdge(int station) { return stationEdge[station]; }
    public int sourceCount() { return sourceNode.length; }
    public int sourceNode(int source) { return sourceNode[source]; }
    public int serviceCount() { return serviceEdge.length; }
    public int serviceEdge(int service) { return serviceEdge[service]; }
    public double serviceMeasure(int service) { return serviceMeasure[service]; }
    public int tapCount() { return tapEdge.length; }
    public int tapEdge(int tap) { return tapEdge[tap]; }
    public double tapMeasure(int tap) { return tapMeasure[tap]; }
}
