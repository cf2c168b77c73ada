package org.shutline.topology;

import java.util.List;
import org.shutline.model.Main;
import org.shutline.model.MainStatus;
import org.shutline.topology.LineSet.Hit;
import org.shutline.topology.LineSet.IntList;

/**
 * Nearest point of a main to a point feature. Among mains of one system within a
 * radius (inclusive): the nearest wins; an exact tie goes to the lower {@code main_id}
 * (String order), then the lower part, then the lower measure. Zero-length lines are
 * never chosen by proximity (they are junction points, not pipe to sit on).
 */
final class NearestMain {
    private final LineSet lines;
    private final InputCheck in;
    private final List<Main> mains;
    private final IntList chunks = new IntList();
    private final Hit tmp = new Hit();

    NearestMain(LineSet lines, InputCheck in, List<Main> mains) {
        this.lines = lines;
        this.in = in;
        this.mains = mains;
    }

    /** Best point of system {@code sys} within r of (x, y) into {@code best}; false when there is none. */
    boolean near(double x, double y, int sys, double r, boolean activeOnly, Hit best) {
        best.reset();
        if (sys < 0) return false;
        lines.query(x, y, r, chunks);
        for (int i = 0; i < chunks.size(); i++) {
            int c = chunks.get(i);
            int l = lines.chunkLine(c);
            int m = lines.main(l);
            if (in.mainSystem[m] != sys || lines.length(l) == 0) continue;
            if (activeOnly && mains.get(m).status() != MainStatus.ACTIVE) continue;
            tmp.reset();
            lines.nearestInChunk(c, x, y, tmp);
            if (tmp.dist <= r && better(tmp, best)) best.copyFrom(tmp);
        }
        return best.line >= 0;
    }

    /** Nearest point of main {@code main} at any distance; false when it has no usable line. */
    boolean onMain(int main, double x, double y, Hit best) {
        best.reset();
        for (int l = in.mainLine0[main]; l < in.mainLine1[main]; l++) {
            tmp.reset();
            lines.nearest(l, 0, lines.segments(l), x, y, tmp);
            if (better(tmp, best)) best.copyFrom(tmp);
        }
        return best.line >= 0;
    }

    private boolean better(Hit a, Hit b) {
        if (a.line < 0) return false;
        if (b.line < 0 || a.dist < b.dist) return true;
        if (a.dist > b.dist) return false;
        int ma = lines.main(a.line);
        int mb = lines.main(b.line);
        if (ma != mb) {
            int c = InputCheck.key(mains.get(ma).id()).compareTo(InputCheck.key(mains.get(mb).id()));
            return c < 0 || (c == 0 && ma < mb);
        }
        if (a.line != b.line) return a.line < b.line;
        return a.measure < b.measure;
    }
}
