package org.shutline.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.io.WKTReader;

/** The .shp/.shx reader against files written by GDAL's ogr2ogr (the reference writer). */
class ShpReaderTest {
    @TempDir
    Path dir;

    private Path shp(String name, String json, String... extra) throws Exception {
        assumeTrue(Gdal.has("ogr2ogr"), "ogr2ogr not installed: skipped");
        Gdal.toShapefiles(dir, List.of(TestNetworks.write(dir.resolve("json"), name, json)), extra);
        return dir.resolve(name + ".shp");
    }

    private static Path shx(Path shp) {
        return shp.resolveSibling(Gdal.base(shp) + ".shx");
    }

    @Test
    void polygonWithHoleAndMultiPolygon() throws Exception {
        // two squares, the first with a square hole (GeoJSON: outer ring counter-clockwise; shapefile: clockwise)
        String g = "{\"type\":\"MultiPolygon\",\"coordinates\":[[[[0,0],[10,0],[10,10],[0,10],[0,0]],[[2,2],[2,4],[4,4],[4,2],[2,2]]],"
                + "[[[20,0],[30,0],[30,10],[20,10],[20,0]]]]}";
        String poly = "{\"type\":\"Polygon\",\"coordinates\":[[[0,0],[10,0],[10,10],[0,10],[0,0]]]}";
        Path p = shp("parcels", TestNetworks.collection(TestNetworks.feature(g, "\"n\":1"), TestNetworks.feature(poly, "\"n\":2")));
        ShpReader.Result r = ShpReader.read(p, shx(p));
        assertThat(r.shapeType()).isEqualTo(5);
        WKTReader wkt = new WKTReader();
        Geometry expected = wkt.read("MULTIPOLYGON (((0 0, 10 0, 10 10, 0 10, 0 0), (2 2, 2 4, 4 4, 4 2, 2 2)), ((20 0, 30 0, 30 10, 20 10, 20 0)))");
        assertThat(r.geometries().get(0).equalsTopo(expected)).as(r.geometries().get(0).toText()).isTrue();
        assertThat(r.geometries().get(1).getGeometryType()).isEqualTo("Polygon");
    }

    @Test
    void lineStringZReadsXyOnly() throws Exception {
        String g = "{\"type\":\"LineString\",\"coordinates\":[[1,2,30],[4,6,31]]}";
        Path p = shp("mains", TestNetworks.collection(TestNetworks.feature(g, "\"main_id\":\"M1\"")));
        ShpReader.Result r = ShpReader.read(p, shx(p));
        assertThat(r.shapeType()).isEqualTo(13); // PolyLineZ
        assertThat(r.geometries().get(0).toText()).isEqualTo("LINESTRING (1 2, 4 6)");
    }

    @Test
    void multiPointIsRejectedNamingTheFile() throws Exception {
        String g = "{\"type\":\"MultiPoint\",\"coordinates\":[[1,2],[3,4]]}";
        Path p = shp("valves", TestNetworks.collection(TestNetworks.feature(g, "\"valve_id\":\"V1\"")));
        assertThatThrownBy(() -> ShpReader.read(p, shx(p))).isInstanceOf(InputException.class)
                .hasMessageContaining("valves.shp").hasMessageContaining("MultiPoint");
    }
}
