package org.shutline.render;

import static org.assertj.core.api.Assertions.assertThat;
import static org.shutline.render.RenderFixtures.count;
import static org.shutline.render.RenderFixtures.countOther;
import static org.shutline.render.RenderFixtures.paint;

import java.awt.image.BufferedImage;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.shutline.model.CrsInfo;
import org.shutline.model.LinearUnit;
import org.shutline.model.Network;

class UsngGridTest {
    private static final MapStyle S = MapStyle.LIGHT;

    private static Network empty(CrsInfo crs) {
        return new Network("empty", crs, List.of(), List.of(), List.of(), List.of(), List.of(), List.of(), List.of(), List.of());
    }

    @Test
    void spacingFollowsTheScale() {
        assertThat(UsngGrid.spacingFor(0.5)).isEqualTo(100);
        assertThat(UsngGrid.spacingFor(1)).isEqualTo(100);
        assertThat(UsngGrid.spacingFor(2)).isEqualTo(1000);
        assertThat(UsngGrid.spacingFor(10)).isEqualTo(1000);
        assertThat(UsngGrid.spacingFor(20)).isEqualTo(10_000);
        assertThat(UsngGrid.spacingFor(160)).isEqualTo(10_000);
        assertThat(UsngGrid.spacingFor(200)).isZero();
    }

    @Test
    void labelsAreTheDigitsWithinThe100KmSquare() {
        assertThat(UsngGrid.label(323_000, 1000, 2)).isEqualTo("23");
        assertThat(UsngGrid.label(4_306_000, 1000, 2)).isEqualTo("06");
        assertThat(UsngGrid.label(323_400, 100, 3)).isEqualTo("234");
        assertThat(UsngGrid.label(320_000, 10_000, 1)).isEqualTo("2");
    }

    @Test
    void gridLinesInAUtmNetworkFallOnRoundEastingsAndNorthings() {
        // Network in WGS 84 / UTM 18N; 600 x 400 px at 5 m/px centred on (323 500, 4 306 500):
        // easting 323 000 at screen x = 200, northing 4 306 000 at screen y = 300; 1 km spacing.
        MapScene scene = new MapScene(empty(RenderFixtures.UTM18N));
        GeoTransform geo = GeoTransform.forCrs(RenderFixtures.UTM18N).orElseThrow();
        MapPainter p = new MapPainter(scene, S).withAntialias(false).withGrid(new UsngGrid(geo));
        Viewport v = new Viewport(323_500, 4_306_500, 5, 600, 400);
        List<LegendEntry> legend = new ArrayList<>();
        BufferedImage img = paint(p, v, MapOverlays.NONE, legend);
        assertThat(count(img, S.grid(), 199, 40, 201, 280)).isGreaterThanOrEqualTo(235);
        assertThat(count(img, S.grid(), 220, 299, 580, 301)).isGreaterThanOrEqualTo(355);
        // Northing 4 307 000 at y = 100; no line half-way between (easting 323 500, x = 300; northing 4 306 500, y = 200).
        assertThat(count(img, S.grid(), 220, 99, 580, 101)).isGreaterThanOrEqualTo(355);
        assertThat(count(img, S.grid(), 297, 110, 299, 290)).isZero();
        assertThat(count(img, S.grid(), 220, 197, 390, 199)).isZero();
        // Labels: "23" at the bottom edge under x = 200, "06" at the left edge by y = 300, "18S UJ" top left.
        assertThat(count(img, S.foreground(), 188, 385, 212, 400)).isGreaterThan(5);
        assertThat(count(img, S.foreground(), 0, 290, 20, 310)).isGreaterThan(5);
        assertThat(count(img, S.foreground(), 0, 0, 60, 18)).isGreaterThan(10);
        assertThat(legend).contains(LegendEntry.simple(LegendKind.GRID, "US National Grid, 1 km"));
    }

    @Test
    void withoutAGridNothingIsDrawn() {
        MapScene scene = new MapScene(empty(RenderFixtures.UTM18N));
        BufferedImage img = paint(new MapPainter(scene, S).withAntialias(false),
                new Viewport(323_500, 4_306_500, 5, 600, 400), MapOverlays.NONE, null);
        assertThat(countOther(img, S.background(), 0, 0, 600, 400)).isZero();
    }

    @Test
    void gridOverAStatePlaneFootNetworkMeetsWhereCs2csPutsTheUtmCorner() throws Exception {
        Assumptions.assumeTrue(ExternalTool.exists("/usr/bin/cs2cs"), "cs2cs not installed: skipped");
        CrsInfo ft = new CrsInfo("NAD83 / New York Long Island (ftUS)", 2263, null, LinearUnit.US_SURVEY_FOOT);
        // PROJ cs2cs EPSG:32618 -> EPSG:2263 of the grid corner (584 000 E, 4 507 000 N).
        String[] out = ExternalTool.run("584000 4507000\n", "/usr/bin/cs2cs", "-f", "%.4f", "EPSG:32618", "EPSG:2263")
                .trim().split("\\s+");
        double x = Double.parseDouble(out[0]);
        double y = Double.parseDouble(out[1]);
        // 10 US ft per pixel (about 3 m/px): 1 km lines; the corner 30 px right and 20 px below the centre.
        Viewport v = new Viewport(x - 300, y + 200, 10, 600, 400);
        MapPainter p = new MapPainter(new MapScene(empty(ft)), S).withAntialias(false)
                .withGrid(new UsngGrid(GeoTransform.forCrs(ft).orElseThrow()));
        BufferedImage img = paint(p, v, MapOverlays.NONE, null);
        int cx = (int) v.screenX(x);
        int cy = (int) v.screenY(y);
        assertThat(cx).isEqualTo(330);
        assertThat(cy).isEqualTo(220);
        // Both lines pass within a pixel of the corner: grid pixels left, right, above and below it.
        assertThat(count(img, S.grid(), cx - 12, cy - 2, cx - 8, cy + 3)).isPositive();
        assertThat(count(img, S.grid(), cx + 8, cy - 2, cx + 12, cy + 3)).isPositive();
        assertThat(count(img, S.grid(), cx - 2, cy - 12, cx + 3, cy - 8)).isPositive();
        assertThat(count(img, S.grid(), cx - 2, cy + 8, cx + 3, cy + 12)).isPositive();
        // A point 40 px off both lines is empty.
        assertThat(count(img, S.grid(), cx + 38, cy + 38, cx + 43, cy + 43)).isZero();
    }
}
