package org.shutline.render;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.awt.geom.Point2D;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.shutline.model.CrsInfo;
import org.shutline.model.LinearUnit;
import org.shutline.render.GridReference.Precision;

class GeoTransformTest {
    private static final String CS2CS = "/usr/bin/cs2cs";
    private static final CrsInfo NY_LONG_ISLAND_FT =
            new CrsInfo("NAD83 / New York Long Island (ftUS)", 2263, null, LinearUnit.US_SURVEY_FOOT);

    @Test
    void utmByEpsgCodeAndByProj4DefinitionAgree() {
        GeoTransform byCode = GeoTransform.forCrs(RenderFixtures.UTM18N).orElseThrow();
        GeoTransform byDef = GeoTransform.forCrs(new CrsInfo("utm 18n", 0,
                "+proj=utm +zone=18 +datum=WGS84 +units=m +no_defs", LinearUnit.METRE)).orElseThrow();
        Point2D a = byCode.fromLonLat(-77.0352, 38.8895);
        Point2D b = byDef.fromLonLat(-77.0352, 38.8895);
        assertThat(a.getX()).isCloseTo(b.getX(), within(1e-6));
        assertThat(a.getY()).isCloseTo(b.getY(), within(1e-6));
        Point2D back = byCode.toLonLat(a.getX(), a.getY());
        assertThat(back.getX()).isCloseTo(-77.0352, within(1e-9));
        assertThat(back.getY()).isCloseTo(38.8895, within(1e-9));
        // FGDC-STD-011-2001 test point, through the network CRS.
        assertThat(byCode.gridReference(a.getX(), a.getY()).format(Precision.M1)).isEqualTo("18S UJ 23486 06483");
    }

    @Test
    void matchesProjCs2csInUtmAndInUsSurveyFeet() throws Exception {
        Assumptions.assumeTrue(ExternalTool.exists(CS2CS), "cs2cs not installed: skipped");
        check(RenderFixtures.UTM18N, "EPSG:32618", 38.8895, -77.0352, 1e-3);
        check(NY_LONG_ISLAND_FT, "EPSG:2263", 40.7128, -74.0060, 1e-3);
    }

    /** Compares with PROJ cs2cs (EPSG:4326 input in latitude, longitude order). */
    private static void check(CrsInfo crs, String code, double lat, double lon, double tol) throws Exception {
        String[] out = ExternalTool.run(lat + " " + lon + "\n", CS2CS, "-f", "%.6f", "EPSG:4326", code)
                .trim().split("\\s+");
        Point2D p = GeoTransform.forCrs(crs).orElseThrow().fromLonLat(lon, lat);
        assertThat(p.getX()).as("cs2cs EPSG:4326 %s x", code).isCloseTo(Double.parseDouble(out[0]), within(tol));
        assertThat(p.getY()).as("cs2cs EPSG:4326 %s y", code).isCloseTo(Double.parseDouble(out[1]), within(tol));
    }

    @Test
    void unknownCrsHasNoTransformAndABadDefinitionSaysWhich() {
        assertThat(GeoTransform.forCrs(CrsInfo.UNKNOWN_METRES)).isEmpty();
        assertThatThrownBy(() -> GeoTransform.forCrs(new CrsInfo("odd", 999_999_9, null, LinearUnit.METRE)))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("odd");
    }
}
