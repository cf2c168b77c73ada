package org.shutline.render;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.geom.Path2D;
import java.awt.geom.PathIterator;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.io.WKTReader;

class ScreenPathTest {
    private static final GeometryFactory GF = new GeometryFactory();
    private static final Viewport V = new Viewport(0, 0, 1, 200, 200);

    /** Segment types and points of a path: {type, x, y}. */
    private static List<double[]> segments(Path2D p) {
        List<double[]> out = new ArrayList<>();
        double[] c = new double[6];
        for (PathIterator it = p.getPathIterator(null); !it.isDone(); it.next()) {
            int t = it.currentSegment(c);
            out.add(new double[] {t, c[0], c[1]});
        }
        return out;
    }

    @Test
    void denseLineIsDecimatedButKeepsItsEnds() {
        // 10 001 vertices 0.01 units apart along y = 0 (100 px at 1 unit/px).
        Coordinate[] cs = new Coordinate[10_001];
        for (int i = 0; i < cs.length; i++) cs[i] = new Coordinate(i * 0.01, 0);
        List<double[]> seg = segments(ScreenPath.of(GF.createLineString(cs), V, 0.75));
        assertThat(seg.size()).isBetween(100, 140);
        assertThat(seg.get(0)).containsExactly(PathIterator.SEG_MOVETO, 100, 100);
        assertThat(seg.get(seg.size() - 1)).containsExactly(PathIterator.SEG_LINETO, 200, 100);
        // With decimation off every vertex stays.
        assertThat(segments(ScreenPath.of(GF.createLineString(cs), V, 0)).size()).isEqualTo(10_001);
    }

    @Test
    void polygonRingsAreClosedAndPointsSkipped() throws Exception {
        var poly = new WKTReader().read("POLYGON ((0 0, 10 0, 10 10, 0 10, 0 0), (2 2, 4 2, 4 4, 2 2))");
        List<double[]> seg = segments(ScreenPath.of(poly, V, 0.75));
        long closes = seg.stream().filter(s -> s[0] == PathIterator.SEG_CLOSE).count();
        assertThat(closes).isEqualTo(2);
        // World (10, 10) is screen (110, 90): y flips.
        assertThat(seg.get(2)).containsExactly(PathIterator.SEG_LINETO, 110, 90);
        assertThat(segments(ScreenPath.of(new WKTReader().read("POINT (1 1)"), V, 0.75))).isEmpty();
        assertThat(segments(ScreenPath.of(new WKTReader().read("LINESTRING EMPTY"), V, 0.75))).isEmpty();
        assertThat(segments(ScreenPath.of(
                new WKTReader().read("MULTILINESTRING ((0 0, 5 0), (0 5, 5 5))"), V, 0.75)))
                .filteredOn(s -> s[0] == PathIterator.SEG_MOVETO).hasSize(2);
    }
}
