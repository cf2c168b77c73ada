package org.shutline.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.locationtech.jts.geom.Coordinate;
import org.shutline.model.CrsInfo;
import org.shutline.model.Finding;
import org.shutline.model.LinearUnit;
import org.shutline.model.Network;

/** CRS handling checked against PROJ's cs2cs and GDAL-written .prj files. */
class CrsTest {
    @Test
    void epsgTableScanGivesProj4jsOwnDefinition() throws Exception {
        // proj4j's lookup by name (CRSFactory.createFromName) is the reference for the plain table scan
        org.locationtech.proj4j.CRSFactory proj4j = new org.locationtech.proj4j.CRSFactory();
        for (int code : new int[] {4326, 3857, 2056, 27700, 26918, 32619, 32733, 3035}) {
            assertThat(Crs.fromEpsg(code).proj4()).as("EPSG:" + code)
                    .isEqualTo(proj4j.createFromName("EPSG:" + code).getParameterString());
        }
        assertThatThrownBy(() -> Crs.fromEpsg(999999)).isInstanceOf(InputException.class).hasMessageContaining("EPSG:999999");
    }

    @TempDir
    Path dir;

    /** Parses cs2cs output "a b c" into {a, b}. */
    private static double[] cs2cs(String from, String to, double a, double b) throws Exception {
        String out = Gdal.run(a + " " + b + "\n", "cs2cs", from, to, "-f", "%.10f").trim();
        String[] t = out.split("\\s+");
        return new double[] {Double.parseDouble(t[0]), Double.parseDouble(t[1])};
    }

    @Test
    void geographicMainsAreReprojectedToTheirUtmZoneAsCs2csDoes() throws Exception {
        assumeTrue(Gdal.has("ogr2ogr") && Gdal.has("cs2cs"), "ogr2ogr/cs2cs not installed: skipped");
        double lon = -73.99;
        double lat = 40.75;
        String json = "{\"type\":\"FeatureCollection\",\"features\":[{\"type\":\"Feature\",\"geometry\":"
                + "{\"type\":\"LineString\",\"coordinates\":[[" + lon + "," + lat + "],[-73.985,40.751]]},"
                + "\"properties\":{\"main_id\":\"M1\",\"system_id\":\"LP1\"}}]}";
        Path shp = Gdal.toShapefiles(dir.resolve("shp"), List.of(TestNetworks.write(dir, "mains", json)));
        Network n = NetworkReader.read(shp, FieldMapping.DEFAULT);
        assertThat(n.crs().epsg()).isEqualTo(32618);
        Coordinate c = n.mains().get(0).geometry().getCoordinates()[0];
        // PROJ cs2cs, which takes latitude then longitude for EPSG:4326
        double[] ref = cs2cs("EPSG:4326", "EPSG:32618", lat, lon);
        assertThat(c.x).isCloseTo(ref[0], within(0.001));
        assertThat(c.y).isCloseTo(ref[1], within(0.001));
        List<Finding> notes = n.readFindings().stream().filter(f -> f.code().equals("reprojected")).toList();
        assertThat(notes).hasSize(1);
        assertThat(notes.get(0).message()).contains("UTM zone 18N", "EPSG:32618");
    }

    @Test
    void southernHemisphereAndZoneNumbers() throws Exception {
        assertThat(Crs.utmFor(151.2, -33.9).epsg()).isEqualTo(32756);
        assertThat(Crs.utmZone(-180)).isEqualTo(1);
        assertThat(Crs.utmZone(179.99)).isEqualTo(60);
        assertThat(Crs.utmZone(3.0)).isEqualTo(31);
    }

    @Test
    void aGdalPrjInUsSurveyFeetIsReadWithItsUnitAndMatchesCs2cs() throws Exception {
        assumeTrue(Gdal.has("ogr2ogr") && Gdal.has("cs2cs"), "ogr2ogr/cs2cs not installed: skipped");
        Path json = TestNetworks.write(dir, "mains", TestNetworks.mains());
        // GDAL ogr2ogr writes an ESRI-style .prj without an EPSG code for EPSG:2263 (NY Long Island, US ft)
        Path shp = Gdal.toShapefiles(dir.resolve("ft"), List.of(json), "-t_srs", "EPSG:2263");
        String prj = Files.readString(shp.resolve("mains.prj"));
        assertThat(prj).doesNotContain("AUTHORITY").contains("Lambert_Conformal_Conic");
        CrsInfo crs = Crs.fromWkt(prj, "mains.prj");
        assertThat(crs.unit()).isEqualTo(LinearUnit.US_SURVEY_FOOT);
        assertThat(crs.proj4()).contains("+b=").doesNotContain("+rf");
        Network n = NetworkReader.read(shp, FieldMapping.DEFAULT);
        assertThat(n.crs().unit()).isEqualTo(LinearUnit.US_SURVEY_FOOT);
        Coordinate c = n.mains().get(0).geometry().getCoordinates()[0];
        double[] ours = Crs.toLonLat(n.crs()).apply(c.x, c.y);
        double[] ref = cs2cs("EPSG:2263", "EPSG:4326", c.x, c.y); // PROJ cs2cs prints lat lon
        assertThat(ours[0]).isCloseTo(ref[1], within(1e-8));
        assertThat(ours[1]).isCloseTo(ref[0], within(1e-8));
        assertThat(Crs.fromEpsg(2263).unit()).isEqualTo(LinearUnit.US_SURVEY_FOOT);
    }

    @Test
    void wktWithAnEpsgAuthorityUsesTheCode() throws Exception {
        String wkt = "PROJCS[\"WGS 84 / UTM zone 33N\",GEOGCS[\"WGS 84\",DATUM[\"WGS_1984\",SPHEROID[\"WGS 84\",6378137,"
                + "298.257223563]],PRIMEM[\"Greenwich\",0],UNIT[\"degree\",0.0174532925199433]],PROJECTION[\"Transverse_Mercator\"],"
                + "PARAMETER[\"central_meridian\",15],UNIT[\"metre\",1],AUTHORITY[\"EPSG\",\"32633\"]]";
        assertThat(Crs.fromWkt(wkt, "x.prj").epsg()).isEqualTo(32633);
    }

    @Test
    void unsupportedProjectionNamesTheFile() {
        String wkt = "PROJCS[\"odd\",GEOGCS[\"g\",DATUM[\"D_WGS_1984\",SPHEROID[\"s\",6378137,298.257223563]]],"
                + "PROJECTION[\"Mollweide\"],UNIT[\"Meter\",1]]";
        assertThatThrownBy(() -> Crs.fromWkt(wkt, "odd.prj")).isInstanceOf(InputException.class)
                .hasMessageContaining("odd.prj").hasMessageContaining("Mollweide");
        assertThatThrownBy(() -> Crs.fromWkt("PROJCS[\"x\"", "bad.prj")).isInstanceOf(InputException.class)
                .hasMessageContaining("bad.prj");
    }
    @Test
    void lambertOneParallelInInternationalFeetMatchesCs2cs() throws Exception {
        assumeTrue(Gdal.has("cs2cs"), "cs2cs not installed: skipped");
        // ESRI style: one Lambert name, the 1SP form told by a single standard parallel and a scale factor
        String wkt = "PROJCS[\"Test_LCC_1SP\",GEOGCS[\"GCS_WGS_1984\",DATUM[\"D_WGS_1984\",SPHEROID[\"WGS_1984\","
                + "6378137.0,298.257223563]],PRIMEM[\"Greenwich\",0.0],UNIT[\"Degree\",0.0174532925199433]],"
                + "PROJECTION[\"Lambert_Conformal_Conic\"],PARAMETER[\"False_Easting\",500000.0],"
                + "PARAMETER[\"False_Northing\",300000.0],PARAMETER[\"Central_Meridian\",-77.0],"
                + "PARAMETER[\"Standard_Parallel_1\",18.0],PARAMETER[\"Scale_Factor\",0.9995],"
                + "PARAMETER[\"Latitude_Of_Origin\",18.0],UNIT[\"Foot\",0.3048]]";
        CrsInfo crs = Crs.fromWkt(wkt, "t.prj");
        assertThat(crs.unit()).isEqualTo(LinearUnit.INTERNATIONAL_FOOT);
        double[] ours = Crs.toLonLat(crs).apply(1650000, 1000000);
        double[] ref = cs2cs(wkt, "EPSG:4326", 1650000, 1000000); // PROJ cs2cs reads the ESRI WKT itself
        assertThat(ours[0]).isCloseTo(ref[1], within(1e-8));
        assertThat(ours[1]).isCloseTo(ref[0], within(1e-8));
    }

    @Test
    void aLayerInAnotherCrsIsReprojectedToTheMainsCrs() throws Exception {
        assumeTrue(Gdal.has("ogr2ogr") && Gdal.has("cs2cs"), "ogr2ogr/cs2cs not installed: skipped");
        Path mains = TestNetworks.write(dir.resolve("json"), "mains", TestNetworks.mains());
        String streets = "{\"type\":\"FeatureCollection\",\"features\":[{\"type\":\"Feature\",\"geometry\":"
                + "{\"type\":\"LineString\",\"coordinates\":[[-75.0,38.85],[-74.99,38.85]]},\"properties\":{\"name\":\"Ash Row\"}}]}";
        Path gpkg = Gdal.toGpkg(dir.resolve("two.gpkg"), List.of(mains, TestNetworks.write(dir.resolve("json"), "streets", streets)));
        Network n = NetworkReader.read(gpkg, FieldMapping.DEFAULT);
        assertThat(n.crs().epsg()).isEqualTo(32618);
        Coordinate c = n.context().get(0).items().get(0).geometry().getCoordinates()[0];
        double[] ref = cs2cs("EPSG:4326", "EPSG:32618", 38.85, -75.0); // PROJ cs2cs, lat lon order
        assertThat(c.x).isCloseTo(ref[0], within(0.001));
        assertThat(c.y).isCloseTo(ref[1], within(0.001));
        assertThat(n.readFindings()).filteredOn(f -> f.code().equals("reprojected")).singleElement()
                .satisfies(f -> assertThat(f.message()).contains("streets", "EPSG:4326", "EPSG:32618"));
    }
}
