package org.shutline.topology;

import java.util.Arrays;
import org.shutline.model.Progress;

/**
 * Turns joined ends, tees and point-feature cuts into graph nodes and edges.
 *
 * <p>Along each line the cuts are taken in measure order and grouped by equal
 * measure. A group's junction node is the node of its end/tee cluster (all junctions
 * at one measure of one line are one node); stations and sources in the group use it,
 * or share a new node when the group has no junction. Valves in a group (by input
 * order) form a chain of VALVE edges: at the start of a line the chain runs from the
 * junction towards the line, at the end of a line from the line towards the junction
 * (so a valve at a main's end sits on its own main's side of the junction); inside a
 * line the junction stays with the lower-measure pipe and the chain runs towards
 * higher measure. Consecutive groups are joined by PIPE edges carrying their measures.
 * A zero-length line becomes one PIPE edge from its junction to itself.
 *
 * <p>A cluster's node lies at its first tee point when it has one (a point on the
 * through main), else at its lowest-numbered end. Cost: O(C log C) for C cuts (cuts
 * of one line sorted together).
 */
final class GraphAssembly {
    final GraphBuilder gb;
    final int[] pointNode;
    /** Pipe edges of line l are linePipes[linePipeStart[l] .. linePipeStart[l+1]-1], by measure. */
    final int[] linePipeStart;
    private int[] linePipes;
    private int pipeCount;

    private final LineSet lines;
    private final EndJoin ej;
    private final PointAttach pa;
    private final int n;
    private final int[] clusterNode;
    private final int[] clusterRep;
    private final double[] xy = new double[2];

    GraphAssembly(LineSet lines, InputCheck in, EndJoin ej, PointAttach pa, int valves, int stations,
                  int sources, int services, int taps) {
        this.lines = lines;
        this.ej = ej;
        this.pa = pa;
        this.n = lines.count();
        gb = new GraphBuilder(in.systemIds, in.mainSystem, valves, stations, sources, services, taps);
        pointNode = new int[pa.pointCount];
        Arrays.fill(pointNode, -1);
        linePipeStart = new int[n + 1];
        linePipes = new int[Math.max(16, n)];
        clusterNode = new int[ej.uf.size()];
        clusterRep = new int[ej.uf.size()];
    }

    private int cuts() { return ej.endElements + ej.teeCount + pa.cutCount; }

    private int lineOf(int c) {
        if (c < ej.endElements) return c >> 1;
        c -= ej.endElements;
        if (c < ej.teeCount) return ej.teeLine[c];
        return pa.cutLine[c - ej.teeCount];
    }

    private double measureOf(int c) {
        if (c < ej.endElements) return (c & 1) == 0 ? 0 : lines.length(c >> 1);
        c -= ej.endElements;
        if (c < ej.teeCount) return ej.teeMeasure[c];
        return pa.cutMeasure[c - ej.teeCount];
    }

    /** 0 junction, 1 point, 2 valve. */
    private int typeOf(int c) {
        if (c < ej.endElements + ej.teeCount) return 0;
        return pa.cutType[c - ej.endElements - ej.teeCount];
    }

    /** Union-find element of a junction cut: cut numbers of ends and tees are their element numbers. */
    private static int elemOf(int c) {
        return c;
    }

    private int refOf(int c) {
        return pa.cutRef[c - ej.endElements - ej.teeCount];
    }

    private boolean before(int a, int b) {
        double ma = measureOf(a);
        double mb = measureOf(b);
        if (ma != mb) return ma < mb;
        int ta = typeOf(a);
        int tb = typeOf(b);
        if (ta != tb) return ta < tb;
        return ta == 0 ? a < b : refOf(a) < refOf(b);
    }

    void run(Progress progress) {
        int total = cuts();
        Csr byLine = Csr.build(n, sink -> {
            for (int c = 0; c < total; c++) sink.add(lineOf(c), c);
        });
        int[] start = byLine.start();
        int[] order = byLine.items();
        for (int l = 0; l < n; l++) sort(order, start[l], start[l + 1]);
        // all junctions at one measure of one line are one node
        for (int l = 0; l < n; l++) {
            int prev = -1;
            for (int i = start[l]; i < start[l + 1]; i++) {
                int c = order[i];
                if (typeOf(c) != 0) continue;
                if (prev >= 0 && measureOf(prev) == measureOf(c)) ej.uf.union(elemOf(prev), elemOf(c));
                prev = c;
            }
        }
        representatives();
        progress.begin("Building graph", n);
        for (int l = 0; l < n; l++) {
            if ((l & 4095) == 0) {
                progress.checkCancelled();
                progress.done(l);
            }
            linePipeStart[l] = pipeCount;
            walkLine(l, order, start[l], start[l + 1]);
        }
        linePipeStart[n] = pipeCount;
        progress.done(n);
    }

    private void representatives() {
        Arrays.fill(clusterNode, -1);
        Arrays.fill(clusterRep, -1);
        for (int t = 0; t < ej.teeCount; t++) {
            int r = ej.uf.find(ej.endElements + t);
            if (clusterRep[r] < 0) clusterRep[r] = ej.endElements + t;
        }
        for (int e = 0; e < ej.endElements; e++) {
            int r = ej.uf.find(e);
            if (clusterRep[r] < 0) clusterRep[r] = e;
        }
    }

    private int clusterNodeOf(int elem) {
        int r = ej.uf.find(elem);
        if (clusterNode[r] < 0) {
            int rep = clusterRep[r];
            double x;
            double y;
            if (rep < ej.endElements) {
                x = lines.endX(rep >> 1, rep & 1);
                y = lines.endY(rep >> 1, rep & 1);
            } else {
                x = ej.teeX[rep - ej.endElements];
                y = ej.teeY[rep - ej.endElements];
            }
            clusterNode[r] = gb.addNode(x, y);
        }
        return clusterNode[r];
    }

    private void walkLine(int l, int[] order, int lo, int hi) {
        int main = lines.main(l);
        int part = lines.part(l);
        int prevHigh = -1;
        double prevM = 0;
        int i = lo;
        while (i < hi) {
            double m = measureOf(order[i]);
            int j = i;
            while (j < hi && measureOf(order[j]) == m) j++;
            boolean first = i == lo;
            boolean last = j == hi;
            int junction = -1;
            for (int k = i; k < j; k++) {
                if (typeOf(order[k]) == 0) {
                    junction = clusterNodeOf(elemOf(order[k]));
                    break;
                }
            }
            lines.pointAt(l, m, xy);
            int lowSide;
            int highSide;
            if (first && last) {
                lowSide = highSide = junction;
                pipe(junction, junction, main, part, 0, m);
            } else if (last) {
                int cur = hasValve(order, i, j) ? gb.addNode(xy[0], xy[1]) : junction;
                lowSide = cur;
                int nv = countValves(order, i, j);
                int seen = 0;
                for (int k = i; k < j; k++) {
                    if (typeOf(order[k]) != 2) continue;
                    seen++;
                    int next = seen == nv ? junction : gb.addNode(xy[0], xy[1]);
                    gb.addValve(cur, next, refOf(order[k]));
                    cur = next;
                }
                highSide = junction;
                points(order, i, j, junction);
            } else {
                int base = junction >= 0 ? junction : gb.addNode(xy[0], xy[1]);
                lowSide = base;
                int cur = base;
                for (int k = i; k < j; k++) {
                    if (typeOf(order[k]) != 2) continue;
                    int next = gb.addNode(xy[0], xy[1]);
                    gb.addValve(cur, next, refOf(order[k]));
                    cur = next;
                }
                highSide = cur;
                points(order, i, j, base);
            }
            if (!first) pipe(prevHigh, lowSide, main, part, prevM, m);
            prevHigh = highSide;
            prevM = m;
            i = j;
        }
    }

    private boolean hasValve(int[] order, int i, int j) {
        return countValves(order, i, j) > 0;
    }

    private int countValves(int[] order, int i, int j) {
        int c = 0;
        for (int k = i; k < j; k++) if (typeOf(order[k]) == 2) c++;
        return c;
    }

    private void points(int[] order, int i, int j, int node) {
        for (int k = i; k < j; k++) if (typeOf(order[k]) == 1) pointNode[refOf(order[k])] = node;
    }

    private void pipe(int from, int to, int main, int part, double m0, double m1) {
        int e = gb.addPipe(from, to, main, part, m0, m1);
        if (pipeCount == linePipes.length) linePipes = Arrays.copyOf(linePipes, pipeCount * 2);
        linePipes[pipeCount++] = e;
    }

    /** The pipe edge of line l containing measure m (the lower-measure one at a node). */
    int pipeAt(int l, double m) {
        int lo = linePipeStart[l];
        int hi = linePipeStart[l + 1] - 1;
        while (lo < hi) {
            int mid = (lo + hi) >>> 1;
            if (gb.edgeM1[linePipes[mid]] < m) lo = mid + 1; else hi = mid;
        }
        return linePipes[lo];
    }

    private void sort(int[] a, int lo, int hi) {
        if (hi - lo > 48) {
            Integer[] box = new Integer[hi - lo];
            for (int i = lo; i < hi; i++) box[i - lo] = a[i];
            Arrays.sort(box, (p, q) -> before(p, q) ? -1 : before(q, p) ? 1 : 0);
            for (int i = lo; i < hi; i++) a[i] = box[i - lo];
            return;
        }
        for (int i = lo + 1; i < hi; i++) {
            int v = a[i];
            int j = i - 1;
            while (j >= lo && before(v, a[j])) {
                a[j + 1] = a[j];
                j--;
            }
            a[j + 1] = v;
        }
    }
}
