package org.shutline.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.nio.file.Path;
import java.util.HashMap;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.locationtech.jts.geom.Coordinate;
import org.shutline.model.Main;
import org.shutline.model.Network;

/**
 * A network in Web Mercator (EPSG:3857) is re-projected to its UTM zone, like a
 * geographic one. Reference: GDAL's ogr2ogr (PROJ) writes the sample, which is in
 * UTM 15N (EPSG:32615), to EPSG:3857; read back, every main's vertices must land where
 * they were in the sample within 5 mm and the lengths agree, where the Mercator
 * "metres" themselves are longer by 1/cos(latitude) (about 1.39 at the sample's 44 N).
 */
class MercatorInputTest {
    @TempDir Path dir;

    @Test
    void webMercatorNetworkIsReprojectedToUtmWithGroundLengths() throws Exception {
        Path wm = dir.resolve("web-mercator.gpkg");
        Process p;
        try {
            p = new ProcessBuilder("ogr2ogr", "-f", "GPKG", "-t_srs", "EPSG:3857", wm.toString(), "sample-gis/tallowmere.gpkg")
                    .redirectErrorStream(true).redirectOutput(dir.resolve("ogr2ogr.log").toFile()).start();
        } catch (java.io.IOException e) {
            Assumptions.abort("ogr2ogr (GDAL) not installed");
            return;
        }
        assertThat(p.waitFor(60, TimeUnit.SECONDS)).isTrue();
        Assumptions.assumeTrue(p.exitValue() == 0, "ogr2ogr failed");

        Network original = NetworkReader.read(Path.of("sample-gis/tallowmere.gpkg"), FieldMapping.DEFAULT);
        Network read = NetworkReader.read(wm, FieldMapping.DEFAULT);
        assertThat(read.crs().epsg()).isEqualTo(32615);
        assertThat(read.readFindings()).anySatisfy(f -> {
            assertThat(f.code()).isEqualTo("reprojected");
            assertThat(f.message()).contains("Mercator", "EPSG:3857", "UTM zone 15N", "x1.39");
        });
        Map<String, Main> byId = new HashMap<>();
        for (Main m : original.mains()) if (m.id() != null) byId.putIfAbsent(m.id(), m);
        int compared = 0;
        for (Main m : read.mains()) {
            Main o = byId.get(m.id());
            if (o == null || o.geometry() == null || m.geometry() == null) continue;
            Coordinate[] a = o.geometry().getCoordinates();
            Coordinate[] b = m.geometry().getCoordinates();
            assertThat(b).hasSameSizeAs(a);
            for (int i = 0; i < a.length; i++) {
                assertThat(b[i].x).as(m.id()).isCloseTo(a[i].x, within(0.005));
                assertThat(b[i].y).as(m.id()).isCloseTo(a[i].y, within(0.005));
            }
            assertThat(m.geometry().getLength()).isCloseTo(o.geometry().getLength(), within(0.01));
            compared++;
        }
        assertThat(compared).isGreaterThan(300);
    }
}
