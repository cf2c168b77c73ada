package org.shutline.topology;

import java.util.Arrays;

/**
 * Low-level, mutable construction of a {@link Graph}: add nodes and edges, set the
 * attachment of each feature, then {@link #freeze()}. After freezing, any change throws
 * {@link IllegalStateException}. {@code NetworkBuilder} drives this from a network;
 * tests may drive it directly for hand-built graphs.
 */
public final class GraphBuilder {
    int nodeCount;
    double[] nodeX = new double[16];
    double[] nodeY = new double[16];
    int edgeCount;
    byte[] edgeKind = new byte[16];
    int[] edgeFrom = new int[16];
    int[] edgeTo = new int[16];
    int[] edgeFeature = new int[16];
    int[] edgePart = new int[16];
    double[] edgeM0 = new double[16];
    double[] edgeM1 = new double[16];

    final int[] mainSystem;
    final String[] systemIds;
    final int[] valveEdge;
    final int[] stationEdge;
    final int[] sourceNode;
    final int[] serviceEdge;
    final double[] serviceMeasure;
    final int[] tapEdge;
    final double[] tapMeasure;
    private boolean frozen;

    /**
     * @param systemIds the system ids, index = system number
     * @param mainSystem system number of each main
     * @param valves, stations, sources, services, taps counts of the feature lists; all start unattached
     */
    public GraphBuilder(String[] systemIds, int[] mainSystem, int valves, int stations, int sources,
                        int services, int taps) {
        this.systemIds = systemIds.clone();
        this.mainSystem = mainSystem.clone();
        valveEdge = filled(valves);
        stationEdge = filled(stations);
        sourceNode = filled(sources);
        serviceEdge = filled(services);
        serviceMeasure = new double[services];
        tapEdge = filled(taps);
        tapMeasure = new double[taps];
    }

    private static int[] filled(int n) {
        int[] a = new int[n];
        Arrays.fill(a, -1);
        return a;
    }

    private void check() {
        if (frozen) throw new IllegalStateException("graph is frozen");
    }

    public int addNode(double x, double y) {
        check();
        if (nodeCount == nodeX.length) {
            nodeX = Arrays.copyOf(nodeX, nodeCount * 2);
            nodeY = Arrays.copyOf(nodeY, nodeCount * 2);
        }
        nodeX[nodeCount] = x;
        nodeY[nodeCount] = y;
        return nodeCount++;
    }

    private int addEdge(byte kind, int from, int to, int feature, int part, double m0, double m1) {
        check();
        if (from < 0 || from >= nodeCount || to < 0 || to >= nodeCount) {
            throw new IllegalArgumentException("edge end out of range: " + from + ", " + to);
        }
        if (edgeCount == edgeKind.length) {
            int n = edgeCount * 2;
            edgeKind = Arrays.copyOf(edgeKind, n);
            edgeFrom = Arrays.copyOf(edgeFrom, n);
            edgeTo = Arrays.copyOf(edgeTo, n);
            edgeFeature = Arrays.copyOf(edgeFeature, n);
            edgePart = Arrays.copyOf(edgePart, n);
            edgeM0 = Arrays.copyOf(edgeM0, n);
            edgeM1 = Arrays.copyOf(edgeM1, n);
        }
        edgeKind[edgeCount] = kind;
        edgeFrom[edgeCount] = from;
        edgeTo[edgeCount] = to;
        edgeFeature[edgeCount] = feature;
        edgePart[edgeCount] = part;
        edgeM0[edgeCount] = m0;
        edgeM1[edgeCount] = m1;
        return edgeCount++;
    }

    /** A piece of main {@code main}, part {@code part}, from measure m0 (node from) to m1 (node to). */
    public int addPipe(int from, int to, int main, int part, double m0, double m1) {
        if (main < 0 || main >= mainSystem.length) throw new IllegalArgumentException("main index " + main);
        return addEdge(EdgeKind.PIPE, from, to, main, part, m0, m1);
    }

    /** Valve {@code valve} between the two nodes its main was split into; records the attachment. */
    public int addValve(int a, int b, int valve) {
        int e = addEdge(EdgeKind.VALVE, a, b, valve, 0, 0, 0);
        valveEdge[valve] = e;
        return e;
    }

    /** Station {@code station} from its inlet node to its outlet node; records the attachment. */
    public int addStation(int inlet, int outlet, int station) {
        int e = addEdge(EdgeKind.STATION, inlet, outlet, station, 0, 0, 0);
        stationEdge[station] = e;
        return e;
    }

    public void attachSource(int source, int node) {
        check();
        sourceNode[source] = node;
    }

    /** Service {@code service} sits on pipe edge {@code edge} at measure {@code measure} along its main part. */
    public void attachService(int service, int edge, double measure) {
        check();
        serviceEdge[service] = edge;
        serviceMeasure[service] = measure;
    }

    public void attachTap(int tap, int edge, double measure) {
        check();
        tapEdge[tap] = edge;
        tapMeasure[tap] = measure;
    }

    public int nodeCount() { return nodeCount; }
    public int edgeCount() { return edgeCount; }

    /** Freeze into an immutable graph; the builder can no longer be changed. */
    public Graph freeze() {
        check();
        frozen = true;
        return new Graph(this);
    }
}
