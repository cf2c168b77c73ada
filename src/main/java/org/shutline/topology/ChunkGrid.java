package org.shutline.topology;

import java.util.Arrays;
import org.shutline.topology.LineSet.IntList;

/**
 * A uniform grid over axis-aligned boxes (the line chunks of {@link LineSet}), in flat
 * int and double arrays: a query returns every box that meets the query rectangle
 * (closed intervals, as {@code Envelope.intersects}), each once, in ascending id order.
 *
 * <p>Cell size: the larger of the mean box side and the side that gives about one cell
 * per box over the boxes' extent, so a box meets few cells and a cell holds few boxes.
 * A box spanning more than {@link #BIG} cells in a direction goes to a separate list that
 * every query checks, so one very long line cannot fill the grid. Memory: one int per
 * (box, cell) pair plus one per cell; no objects per box or per query.
 *
 * <p>Cost: build O(B + C) for B boxes and C cells (C is at most about 4B); a query
 * O(cells met + boxes found + big boxes). Why not the STRtree: the same answers without
 * an Envelope and a boxed id per box and a visitor per query; the grid towns and real
 * networks have boxes of similar size, where a uniform grid is the cheaper index.
 */
final class ChunkGrid {
    static final int BIG = 16;

    private final double[] minX, minY, maxX, maxY;
    private final int count;
    private final double x0, y0, cell;
    private final int nx, ny;
    private final int[] cellStart;
    private final int[] cellBox;
    private final int[] big;
    private final int[] stamp;
    private int query;

    ChunkGrid(double[] minX, double[] minY, double[] maxX, double[] maxY, int count) {
        this.minX = minX;
        this.minY = minY;
        this.maxX = maxX;
        this.maxY = maxY;
        this.count = count;
        this.stamp = new int[count];
        double ax = Double.POSITIVE_INFINITY, ay = Double.POSITIVE_INFINITY;
        double bx = Double.NEGATIVE_INFINITY, by = Double.NEGATIVE_INFINITY;
        double sides = 0;
        for (int i = 0; i < count; i++) {
            ax = Math.min(ax, minX[i]);
            ay = Math.min(ay, minY[i]);
            bx = Math.max(bx, maxX[i]);
            by = Math.max(by, maxY[i]);
            sides += (maxX[i] - minX[i]) + (maxY[i] - minY[i]);
        }
        if (count == 0) {
            ax = ay = 0;
            bx = by = 0;
        }
        double w = bx - ax, h = by - ay;
        double c = Math.max(sides / Math.max(1, 2 * count), Math.sqrt(w * h / Math.max(1, count)));
        if (!(c > 0) || !Double.isFinite(c)) c = Math.max(1, Math.max(w, h));
        while ((Math.floor(w / c) + 1) * (Math.floor(h / c) + 1) > 4.0 * count + 16) c *= 1.5;
        this.x0 = ax;
        this.y0 = ay;
        this.cell = c;
        this.nx = (int) Math.floor(w / c) + 1;
        this.ny = (int) Math.floor(h / c) + 1;
        int cells = nx * ny;
        int bigCount = 0;
        for (int i = 0; i < count; i++) if (isBig(i)) bigCount++;
        int[] bigs = new int[bigCount];
        for (int i = 0, b = 0; i < count; i++) if (isBig(i)) bigs[b++] = i;
        Csr byCell = Csr.build(cells, sink -> {
            for (int i = 0; i < count; i++) {
                if (isBig(i)) continue;
                int cx0 = cx(minX[i]), cx1 = cx(maxX[i]), cy0 = cy(minY[i]), cy1 = cy(maxY[i]);
                for (int gy = cy0; gy <= cy1; gy++) for (int gx = cx0; gx <= cx1; gx++) sink.add(gy * nx + gx, i);
            }
        });
        int[] start = byCell.start();
        int[] boxes = byCell.items();
        this.cellStart = start;
        this.cellBox = boxes;
        this.big = bigs;
    }

    /** A box spanning {@code BIG} cells or more in x or y: kept apart, tested on every query. */
    private boolean isBig(int i) {
        return cx(maxX[i]) - cx(minX[i]) >= BIG || cy(maxY[i]) - cy(minY[i]) >= BIG;
    }

    private int cx(double x) {
        int i = (int) Math.floor((x - x0) / cell);
        return i < 0 ? 0 : Math.min(i, nx - 1);
    }

    private int cy(double y) {
        int i = (int) Math.floor((y - y0) / cell);
        return i < 0 ? 0 : Math.min(i, ny - 1);
    }

    /** Boxes meeting [qx0, qx1] x [qy0, qy1] (closed), ascending, into {@code out} (cleared first). */
    void query(double qx0, double qy0, double qx1, double qy1, IntList out) {
        out.clear();
        if (count == 0) return;
        if (++query == Integer.MAX_VALUE) {
            Arrays.fill(stamp, 0);
            query = 1;
        }
        int gx0 = cx(qx0), gx1 = cx(qx1), gy0 = cy(qy0), gy1 = cy(qy1);
        for (int gy = gy0; gy <= gy1; gy++) {
            for (int gx = gx0; gx <= gx1; gx++) {
                int k = gy * nx + gx;
                for (int j = cellStart[k]; j < cellStart[k + 1]; j++) consider(cellBox[j], qx0, qy0, qx1, qy1, out);
            }
        }
        for (int i : big) consider(i, qx0, qy0, qx1, qy1, out);
        out.sort();
    }

    private void consider(int i, double qx0, double qy0, double qx1, double qy1, IntList out) {
        if (stamp[i] == query) return;
        stamp[i] = query;
        if (minX[i] > qx1 || maxX[i] < qx0 || minY[i] > qy1 || maxY[i] < qy0) return;
        out.add(i);
    }
}
