package org.shutline.topology;

import java.util.Arrays;
import java.util.List;
import org.shutline.model.Finding;
import org.shutline.model.Findings;
import org.shutline.model.Main;
import org.shutline.model.Progress;
import org.shutline.model.Severity;
import org.shutline.topology.LineSet.Hit;
import org.shutline.topology.LineSet.IntList;

/**
 * Joins main ends by the connectivity rules: union-find over end elements (two per
 * line: {@code 2*line} start, {@code 2*line+1} end) and tee elements (one per end that
 * lands on another line's interior, appended after the ends).
 *
 * <p>For each end: every other main of the same system within the snap tolerance
 * (inclusive) is joined at its ends that are within tolerance, or, when none is, at
 * its nearest interior point (a tee; ties keep the lower part and measure). The other
 * parts of the end's own MultiLineString count as another main. The end's own line is
 * joined at its other end (a ring) or at its nearest point within tolerance on the
 * part beyond where the line first leaves the tolerance circle around the end (a tee
 * on itself); a line that never leaves the circle does not meet itself. A zero-length
 * line's two ends are one junction. Mains of another system within tolerance give a
 * {@code systems-touching} finding, unless a station linking the two systems lies
 * within the point tolerance of the end.
 *
 * <p>Cost: one index query per end, O(E log L + k) overall for E ends, L lines and k
 * candidate chunks.
 */
final class EndJoin {
    final UnionFind uf;
    final int endElements;
    int teeCount;
    int[] teeLine = new int[16];
    double[] teeMeasure = new double[16];
    double[] teeX = new double[16];
    double[] teeY = new double[16];

    private final LineSet lines;
    private final InputCheck in;
    private final List<Main> mains;
    private final StationNear stations;
    private final double snap;
    private final Findings out;

    private final IntList chunks = new IntList();
    private final IntList touched = new IntList();
    private final int[] stamp;
    private int query;
    private final double[] bestDist;
    private final double[] bestMeasure;
    private final double[] bestX;
    private final double[] bestY;
    private final Hit hit = new Hit();

    EndJoin(List<Main> mains, InputCheck in, StationNear stations, double snap, Findings out) {
        this.mains = mains;
        this.in = in;
        this.lines = in.lines;
        this.stations = stations;
        this.snap = snap;
        this.out = out;
        int n = lines.count();
        endElements = 2 * n;
        uf = new UnionFind(endElements);
        stamp = new int[n];
        bestDist = new double[n];
        bestMeasure = new double[n];
        bestX = new double[n];
        bestY = new double[n];
    }

    void run(Progress progress) {
        int n = lines.count();
        progress.begin("Joining main ends", n);
        for (int l = 0; l < n; l++) {
            if ((l & 4095) == 0) {
                progress.checkCancelled();
                progress.done(l);
            }
            if (lines.length(l) == 0) uf.union(2 * l, 2 * l + 1);
            joinEnd(l, 0);
            joinEnd(l, 1);
        }
        progress.done(n);
    }

    /** True when the end's junction holds anything besides the end itself (and, for a zero-length line, its twin). */
    boolean joined(int l, int end) {
        int own = lines.length(l) == 0 ? 2 : 1;
        return uf.setSize(2 * l + end) > own;
    }

    /**
     * Nearest point of each line within r of (x, y) into the per-line best arrays; the
     * lines touched (sorted) into {@link #touched}. Own line l is skipped when skip >= 0.
     */
    void nearLines(double x, double y, double r, int skip) {
        query++;
        if (query == Integer.MAX_VALUE) {
            Arrays.fill(stamp, 0);
            query = 1;
        }
        touched.clear();
        lines.query(x, y, r, chunks);
        for (int i = 0; i < chunks.size(); i++) {
            int c = chunks.get(i);
            int l = lines.chunkLine(c);
            if (l == skip) continue;
            hit.reset();
            lines.nearestInChunk(c, x, y, hit);
            if (hit.dist > r) continue;
            if (stamp[l] != query) {
                stamp[l] = query;
                touched.add(l);
                bestDist[l] = Double.POSITIVE_INFINITY;
            }
            if (hit.dist < bestDist[l] || (hit.dist == bestDist[l] && hit.measure < bestMeasure[l])) {
                bestDist[l] = hit.dist;
                bestMeasure[l] = hit.measure;
                bestX[l] = hit.x;
                bestY[l] = hit.y;
            }
        }
        touched.sort();
    }

    int touchedCount() { return touched.size(); }
    int touchedLine(int i) { return touched.get(i); }
    double bestDist(int l) { return bestDist[l]; }

    private void joinEnd(int l, int end) {
        int e = 2 * l + end;
        double x = lines.endX(l, end);
        double y = lines.endY(l, end);
        int main = lines.main(l);
        int sys = in.mainSystem[main];
        nearLines(x, y, snap, l);
        int lastMain = -1;
        for (int i = 0; i < touched.size(); i++) {
            int g = touched.get(i);
            int gm = lines.main(g);
            if (gm == lastMain) continue;
            lastMain = gm;
            if (in.mainSystem[gm] != sys) {
                touching(l, end, gm, x, y);
            } else {
                joinMain(e, l, gm, x, y);
            }
        }
        joinOwnLine(e, l, end, x, y);
    }

    /** Join end e to main gm (all its lines except the end's own line l). */
    private void joinMain(int e, int l, int gm, double x, double y) {
        boolean atEnd = false;
        for (int g = in.mainLine0[gm]; g < in.mainLine1[gm]; g++) {
            if (g == l) continue;
            for (int k = 0; k < 2; k++) {
                if (lines.dist(g, k == 0 ? 0 : lines.vertexCount(g) - 1, x, y) <= snap) {
                    uf.union(e, 2 * g + k);
                    atEnd = true;
                }
            }
        }
        if (atEnd) return;
        int best = -1;
        for (int g = in.mainLine0[gm]; g < in.mainLine1[gm]; g++) {
            if (g == l || stamp[g] != query) continue;
            if (best < 0 || bestDist[g] < bestDist[best]) best = g;
        }
        if (best >= 0 && bestDist[best] <= snap) tee(e, best, bestMeasure[best], bestX[best], bestY[best]);
    }

    private void joinOwnLine(int e, int l, int end, double x, double y) {
        int v = lines.exitVertex(l, end, snap);
        if (v < 0) return;
        int other = end == 0 ? lines.vertexCount(l) - 1 : 0;
        if (lines.dist(l, other, x, y) <= snap) {
            uf.union(e, 2 * l + (1 - end));
            return;
        }
        hit.reset();
        if (end == 0) lines.nearest(l, v, lines.segments(l), x, y, hit);
        else lines.nearest(l, 0, v, x, y, hit);
        if (hit.dist <= snap) tee(e, l, hit.measure, hit.x, hit.y);
    }

    private void tee(int e, int line, double m, double x, double y) {
        int t = uf.add();
        if (teeCount == teeLine.length) {
            int n = teeCount * 2;
            teeLine = Arrays.copyOf(teeLine, n);
            teeMeasure = Arrays.copyOf(teeMeasure, n);
            teeX = Arrays.copyOf(teeX, n);
            teeY = Arrays.copyOf(teeY, n);
        }
        teeLine[teeCount] = line;
        teeMeasure[teeCount] = m;
        teeX[teeCount] = x;
        teeY[teeCount] = y;
        teeCount++;
        uf.union(e, t);
    }

    private void touching(int l, int end, int gm, double x, double y) {
        int main = lines.main(l);
        String a = in.systemIds[in.mainSystem[main]];
        String b = in.systemIds[in.mainSystem[gm]];
        if (stations.linksNear(a, b, x, y)) return;
        String ida = mains.get(main).id();
        String idb = mains.get(gm).id();
        out.add(Finding.at(FindingCodes.SYSTEMS_TOUCHING, Severity.WARNING, FindingCodes.MAINS, x, y,
                "An end of main " + ida + " (system " + a + ") lies within the snap tolerance of main "
                        + idb + " (system " + b + "), away from any station; systems join only through"
                        + " a station, so they are not joined here.", ida, idb));
    }
}
