package org.shutline.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Map;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.shutline.model.LinearUnit;

/**
 * Sheet grids of a map book over an L-shaped area (metres), map frames of 500 x 400 pt:
 *
 * <pre>
 *   |#|                 vertical arm   x 0..50,   y 0..1500
 *   |#|
 *   |#|
 *   |#################| horizontal arm x 0..2000, y 0..50
 * </pre>
 * Cell sizes: 500 pt x D x 0.0254/72 m, e.g. 423.3 x 338.7 m at 1:2,400.
 */
class MapBookTest {
    private static final GeometryFactory GF = new GeometryFactory();

    private static Geometry ell(double w, double h, double arm) {
        return GF.toGeometry(new Envelope(0, w, 0, arm)).union(GF.toGeometry(new Envelope(0, arm, 0, h)));
    }

    @Test
    void fewestSheetsUpToTheFieldScale() {
        // 1:2,400 (cells 423.3 x 338.7 m): 5 x 5 grid centred on the area; the arm along y 0..50 lies in the
        // bottom row only and the arm along x 0..50 in the west column only: 5 + 4 = 9 sheets. 1:2,500 also
        // needs 9 (the tie goes to the more detailed scale); 1:2,000 would need 6 + 5 = 11
        MapBook b = MapBook.plan(ell(2000, 1500, 50), null, 500, 400, LinearUnit.METRE, 20);
        assertThat(b.scale()).isEqualTo(2400);
        assertThat(b.size()).isEqualTo(9);
        // numbered row by row from the north-west: the west column first (rows 0..3), then the bottom row
        MapBook.Cell first = b.cells().get(0);
        assertThat(first.column()).isZero();
        assertThat(first.row()).isZero();
        MapBook.Cell corner = b.cells().get(4);
        assertThat(corner.number()).isEqualTo(5);
        assertThat(corner.row()).isEqualTo(4);
        assertThat(b.neighbours(corner)).isEqualTo(Map.of(MapSheet.Side.NORTH, 4, MapSheet.Side.EAST, 6));
        assertThat(b.neighbours(first)).isEqualTo(Map.of(MapSheet.Side.SOUTH, 2));
        assertThat(b.cells().get(0).ground().getWidth()).isCloseTo(500 * 2400 * 0.0254 / 72, org.assertj.core.data.Offset.offset(1e-9));
        assertThat(b.sheetOf(1500, 25)).isEqualTo(b.cells().get(7).number()).isEqualTo(8); // column 3 spans x 1211.7..1635.0
        assertThat(b.sheetOf(1500, 1400)).isZero(); // in the grid's empty corner: no sheet
    }

    @Test
    void coarserScaleWhenTooManySheets() {
        // at most 4: 1:4,800 and 1:5,000 need 3 x 3 grids with 5 sheets; 1:6,000 (1058 x 847 m) a 2 x 2 grid with 3
        MapBook b = MapBook.plan(ell(2000, 1500, 50), null, 500, 400, LinearUnit.METRE, 4);
        assertThat(b.scale()).isEqualTo(6000);
        assertThat(b.size()).isEqualTo(3);
    }

    @Test
    void smallAreaIsOneSheet() {
        // 340 x 260 m: 3 sheets at 1:1,000 and 1:1,200, one at 1:2,000 (706 x 564 m)
        MapBook b = MapBook.plan(ell(340, 260, 20), null, 500, 400, LinearUnit.METRE, 9);
        assertThat(b.scale()).isEqualTo(2000);
        assertThat(b.size()).isEqualTo(1);
        assertThat(b.extent().contains(new Envelope(0, 340, 0, 260))).isTrue();
    }

    @Test
    void noAreaNoSheets() {
        assertThat(MapBook.plan(null, null, 500, 400, LinearUnit.METRE, 9).size()).isZero();
        assertThat(MapBook.plan(GF.createPolygon(), new Envelope(0, 100, 0, 100), 500, 400, LinearUnit.METRE, 9).size()).isEqualTo(1);
    }

    @Test
    void roundScales() {
        assertThat(MapScales.label(2400)).isEqualTo("1:2,400");
        assertThat(MapScales.label(1_000_000)).isEqualTo("1:1,000,000");
        // 1 pt = 0.0254/72 m (NIST SP 811: 1 in = 0.0254 m exactly): at 1:2,400 one point is 0.846 667 m
        assertThat(MapScales.crsUnitsPerPoint(2400, LinearUnit.METRE)).isCloseTo(0.8466667, org.assertj.core.data.Offset.offset(1e-6));
        // 400 x 300 m in a 500 x 400 pt frame: 1:2,400 shows 423 x 339 m, 1:2,000 only 353 x 282 m
        assertThat(MapScales.fitting(new Envelope(0, 400, 0, 300), 500, 400, LinearUnit.METRE)).isEqualTo(2400);
    }
}
