package org.shutline.topology;

import java.util.List;
import org.shutline.model.Finding;
import org.shutline.model.Findings;
import org.shutline.model.Main;
import org.shutline.model.Progress;
import org.shutline.model.Severity;
import org.shutline.model.Tolerances;
import org.shutline.topology.LineSet.Hit;

/**
 * Findings about ends that join nothing. A near miss ({@code near-miss}, warning) is
 * such an end within the near-miss distance (snap tolerance times the near-miss
 * factor, inclusive) of a main of its system, whatever that main's status; its own
 * line counts beyond where the line first leaves the near-miss circle around the end.
 * A dangling end ({@code dangling-end}, note) is any such end that has no valve,
 * station or source attached to its line within the point tolerance of it. An end can
 * be both.
 */
final class EndChecks {
    private EndChecks() {}

    static void run(List<Main> mains, InputCheck in, EndJoin ej, PointAttach pa, Tolerances tol,
                    Findings out, Progress progress) {
        LineSet lines = in.lines;
        int n = lines.count();
        Csr byLine = Csr.build(n, sink -> {
            for (int i = 0; i < pa.featCount; i++) sink.add(pa.featLine[i], i);
        });
        int[] featStart = byLine.start();
        int[] feat = byLine.items();
        double r = tol.nearMiss();
        Hit own = new Hit();
        progress.begin("Checking main ends", n);
        for (int l = 0; l < n; l++) {
            if ((l & 4095) == 0) {
                progress.checkCancelled();
                progress.done(l);
            }
            for (int end = 0; end < 2; end++) {
                if (ej.joined(l, end)) continue;
                if (end == 1 && lines.length(l) == 0) continue;
                double x = lines.endX(l, end);
                double y = lines.endY(l, end);
                String id = mains.get(lines.main(l)).id();
                int near = nearMiss(in, ej, l, end, x, y, r, own);
                if (near >= 0) {
                    String other = mains.get(lines.main(near)).id();
                    String what = near == l ? "its own main " + other : "main " + other;
                    String msg = "An end of main " + id + " joins nothing but lies within the near-miss distance of "
                            + what + "; check whether they should meet.";
                    out.add(near == l || other.equals(id)
                            ? Finding.at(FindingCodes.NEAR_MISS, Severity.WARNING, FindingCodes.MAINS, x, y, msg, id)
                            : Finding.at(FindingCodes.NEAR_MISS, Severity.WARNING, FindingCodes.MAINS, x, y, msg, id,
                                    other));
                }
                if (!featureAt(pa, feat, featStart[l], featStart[l + 1], x, y, tol.pointM())) {
                    out.add(Finding.at(FindingCodes.DANGLING_END, Severity.NOTE, FindingCodes.MAINS, x, y,
                            "An end of main " + id + " joins no other main (a dead end); confirm it is capped.",
                            id));
                }
            }
        }
        progress.done(n);
    }

    /** The nearest line of the end's system within r (own line beyond the r-circle exit), or -1. */
    private static int nearMiss(InputCheck in, EndJoin ej, int l, int end, double x, double y, double r, Hit own) {
        LineSet lines = in.lines;
        int sys = in.mainSystem[lines.main(l)];
        ej.nearLines(x, y, r, l);
        int best = -1;
        double bestD = Double.POSITIVE_INFINITY;
        for (int i = 0; i < ej.touchedCount(); i++) {
            int g = ej.touchedLine(i);
            if (in.mainSystem[lines.main(g)] != sys) continue;
            if (ej.bestDist(g) < bestD) {
                bestD = ej.bestDist(g);
                best = g;
            }
        }
        int v = lines.exitVertex(l, end, r);
        if (v >= 0) {
            own.reset();
            if (end == 0) lines.nearest(l, v, lines.segments(l), x, y, own);
            else lines.nearest(l, 0, v, x, y, own);
            if (own.dist <= r && own.dist < bestD) best = l;
        }
        return best;
    }

    private static boolean featureAt(PointAttach pa, int[] feat, int lo, int hi, double x, double y, double r) {
        for (int i = lo; i < hi; i++) {
            int f = feat[i];
            double dx = pa.featX[f] - x;
            double dy = pa.featY[f] - y;
            if (Math.sqrt(dx * dx + dy * dy) <= r) return true;
        }
        return false;
    }
}
