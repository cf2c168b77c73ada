package org.shutline.topology;

import java.util.Arrays;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.LineString;

/**
 * The usable lines of the mains: one line per part of a main (a LineString is one
 * part), with its vertices and cumulative measures (length along the part, CRS units)
 * in flat arrays, and a {@link ChunkGrid} (uniform grid) over chunks of at most
 * {@link #CHUNK} segments for proximity queries.
 *
 * <p>Why chunks: indexing whole lines lets one long main with thousands of vertices
 * turn every nearby query into a scan of all its segments; indexing every segment
 * costs an index entry per vertex. Chunks of 32 segments bound both. A query costs
 * O(c + k) for the c grid cells and k chunks near the query point (see ChunkGrid).
 */
final class LineSet {
    static final int CHUNK = 32;

    private int count;
    private int[] lineMain = new int[16];
    private int[] linePart = new int[16];
    private int[] vStart = new int[17];
    private double[] xs = new double[64];
    private double[] ys = new double[64];
    private double[] ms = new double[64];
    private int vCount;

    private int chunkCount;
    private int[] chunkLine;
    private int[] chunkSeg0;
    private int[] chunkSeg1;
    private ChunkGrid grid;

    /** Makes room for {@code lines} more lines and {@code vertices} more vertices (a hint; add grows anyway). */
    void reserve(int lines, int vertices) {
        if (count + lines > lineMain.length) {
            lineMain = Arrays.copyOf(lineMain, count + lines);
            linePart = Arrays.copyOf(linePart, count + lines);
            vStart = Arrays.copyOf(vStart, count + lines + 1);
        }
        if (vCount + vertices > xs.length) {
            xs = Arrays.copyOf(xs, vCount + vertices);
            ys = Arrays.copyOf(ys, vCount + vertices);
            ms = Arrays.copyOf(ms, vCount + vertices);
        }
    }

    /** Adds a line (a part of main {@code main}); returns its line index. */
    int add(int main, int part, LineString ls) {
        int n = ls.getNumPoints();
        if (count == lineMain.length) {
            lineMain = Arrays.copyOf(lineMain, count * 2);
            linePart = Arrays.copyOf(linePart, count * 2);
        }
        if (count + 2 > vStart.length) vStart = Arrays.copyOf(vStart, count * 2 + 2);
        while (vCount + n > xs.length) {
            xs = Arrays.copyOf(xs, xs.length * 2);
            ys = Arrays.copyOf(ys, ys.length * 2);
            ms = Arrays.copyOf(ms, ms.length * 2);
        }
        double m = 0;
        for (int i = 0; i < n; i++) {
            Coordinate c = ls.getCoordinateN(i);
            xs[vCount + i] = c.x;
            ys[vCount + i] = c.y;
            if (i > 0) {
                double dx = c.x - xs[vCount + i - 1];
                double dy = c.y - ys[vCount + i - 1];
                m += Math.sqrt(dx * dx + dy * dy);
            }
            ms[vCount + i] = m;
        }
        lineMain[count] = main;
        linePart[count] = part;
        vStart[count] = vCount;
        vCount += n;
        vStart[count + 1] = vCount;
        return count++;
    }

    /** Builds the spatial index; call once after all lines are added. */
    void index() {
        int chunks = 0;
        for (int l = 0; l < count; l++) chunks += Math.max(1, (segments(l) + CHUNK - 1) / CHUNK);
        chunkLine = new int[chunks];
        chunkSeg0 = new int[chunks];
        chunkSeg1 = new int[chunks];
        double[] minX = new double[chunks], minY = new double[chunks], maxX = new double[chunks], maxY = new double[chunks];
        for (int l = 0; l < count; l++) {
            int segs = segments(l);
            int s = 0;
            do {
                int e = Math.min(segs, s + CHUNK);
                double ax = Double.POSITIVE_INFINITY, ay = Double.POSITIVE_INFINITY;
                double bx = Double.NEGATIVE_INFINITY, by = Double.NEGATIVE_INFINITY;
                int v0 = vStart[l] + s;
                int v1 = vStart[l] + Math.max(e, s + 1);
                for (int v = v0; v <= Math.min(v1, vStart[l + 1] - 1); v++) {
                    ax = Math.min(ax, xs[v]);
                    ay = Math.min(ay, ys[v]);
                    bx = Math.max(bx, xs[v]);
                    by = Math.max(by, ys[v]);
                }
                minX[chunkCount] = ax;
                minY[chunkCount] = ay;
                maxX[chunkCount] = bx;
                maxY[chunkCount] = by;
                chunkLine[chunkCount] = l;
                chunkSeg0[chunkCount] = s;
                chunkSeg1[chunkCount] = Math.max(e, s + 1);
                chunkCount++;
                s = e;
            } while (s < segs);
        }
        grid = new ChunkGrid(minX, minY, maxX, maxY, chunkCount);
    }

    int count() { return count; }
    int main(int l) { return lineMain[l]; }
    int part(int l) { return linePart[l]; }
    int vertexCount(int l) { return vStart[l + 1] - vStart[l]; }
    int segments(int l) { return vertexCount(l) - 1; }
    double x(int l, int i) { return xs[vStart[l] + i]; }
    double y(int l, int i) { return ys[vStart[l] + i]; }
    double m(int l, int i) { return ms[vStart[l] + i]; }
    double length(int l) { return ms[vStart[l + 1] - 1]; }
    /** x of end {@code end} (0 start, 1 last vertex) of line l. */
    double endX(int l, int end) { return end == 0 ? x(l, 0) : x(l, vertexCount(l) - 1); }
    double endY(int l, int end) { return end == 0 ? y(l, 0) : y(l, vertexCount(l) - 1); }

    /** The point at measure m along line l, written to out[0], out[1]. */
    void pointAt(int l, double m, double[] out) {
        int v0 = vStart[l];
        int v1 = vStart[l + 1] - 1;
        if (m <= ms[v0]) { out[0] = xs[v0]; out[1] = ys[v0]; return; }
        if (m >= ms[v1]) { out[0] = xs[v1]; out[1] = ys[v1]; return; }
        int lo = v0;
        int hi = v1;
        while (hi - lo > 1) {
            int mid = (lo + hi) >>> 1;
            if (ms[mid] <= m) lo = mid; else hi = mid;
        }
        double len = ms[hi] - ms[lo];
        double t = len == 0 ? 0 : (m - ms[lo]) / len;
        out[0] = xs[lo] + t * (xs[hi] - xs[lo]);
        out[1] = ys[lo] + t * (ys[hi] - ys[lo]);
    }

    /** Chunk ids whose envelope lies within d of (x, y), appended to {@code out}. */
    void query(double x, double y, double d, IntList out) {
        grid.query(x - d, y - d, x + d, y + d, out);
    }

    int chunkLine(int c) { return chunkLine[c]; }

    /**
     * Nearest point of line l's segments {@code [s0, s1)} to (px, py). Ties keep the
     * lower measure. Writes into {@code hit} only when nearer than what it holds.
     */
    void nearest(int l, int s0, int s1, double px, double py, Hit hit) {
        int base = vStart[l];
        if (s1 <= s0) {
            if (segments(l) == 0 && s0 == 0) consider(l, base, 0, px, py, hit);
            return;
        }
        for (int s = s0; s < s1; s++) {
            int a = base + s;
            double ax = xs[a];
            double ay = ys[a];
            double bx = xs[a + 1];
            double by = ys[a + 1];
            double dx = bx - ax;
            double dy = by - ay;
            double len2 = dx * dx + dy * dy;
            double t = len2 == 0 ? 0 : ((px - ax) * dx + (py - ay) * dy) / len2;
            if (t < 0) t = 0;
            else if (t > 1) t = 1;
            consider(l, a, t, px, py, hit);
        }
    }

    private void consider(int l, int a, double t, double px, double py, Hit hit) {
        double qx;
        double qy;
        double m;
        if (t == 0) {
            qx = xs[a]; qy = ys[a]; m = ms[a];
        } else if (t == 1) {
            qx = xs[a + 1]; qy = ys[a + 1]; m = ms[a + 1];
        } else {
            qx = xs[a] + t * (xs[a + 1] - xs[a]);
            qy = ys[a] + t * (ys[a + 1] - ys[a]);
            m = ms[a] + t * (ms[a + 1] - ms[a]);
        }
        double ex = px - qx;
        double ey = py - qy;
        double d = Math.sqrt(ex * ex + ey * ey);
        if (d < hit.dist || (d == hit.dist && hit.line == l && m < hit.measure)) {
            hit.dist = d;
            hit.line = l;
            hit.measure = m;
            hit.x = qx;
            hit.y = qy;
        }
    }

    /** Nearest point on chunk c (no-op for an empty chunk). */
    void nearestInChunk(int c, double px, double py, Hit hit) {
        nearest(chunkLine[c], chunkSeg0[c], Math.min(chunkSeg1[c], segments(chunkLine[c])), px, py, hit);
    }

    /**
     * Index of the first vertex of line l beyond where the line, walked from end
     * {@code end}, first leaves the closed circle of radius r around that end; -1 when
     * it never leaves. For end 0 the own interior is the segments from that vertex on;
     * for end 1 (walked backwards) it is the segments up to that vertex.
     */
    int exitVertex(int l, int end, double r) {
        int n = vertexCount(l);
        double cx = endX(l, end);
        double cy = endY(l, end);
        if (end == 0) {
            for (int i = 1; i < n; i++) if (dist(l, i, cx, cy) > r) return i;
        } else {
            for (int i = n - 2; i >= 0; i--) if (dist(l, i, cx, cy) > r) return i;
        }
        return -1;
    }

    double dist(int l, int i, double px, double py) {
        double dx = x(l, i) - px;
        double dy = y(l, i) - py;
        return Math.sqrt(dx * dx + dy * dy);
    }

    /** A mutable nearest-point result, reused across queries. */
    static final class Hit {
        double dist = Double.POSITIVE_INFINITY;
        int line = -1;
        double measure;
        double x;
        double y;

        void reset() {
            dist = Double.POSITIVE_INFINITY;
            line = -1;
        }

        void copyFrom(Hit o) {
            dist = o.dist; line = o.line; measure = o.measure; x = o.x; y = o.y;
        }
    }

    /** A growable int list, reused across queries. */
    static final class IntList {
        private int[] a = new int[16];
        private int n;

        void clear() { n = 0; }
        int size() { return n; }
        int get(int i) { return a[i]; }

        void sort() { Arrays.sort(a, 0, n); }

        void add(int v) {
            if (n == a.length) a = Arrays.copyOf(a, n * 2);
            a[n++] = v;
        }
    }
}
