package org.shutline.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.shutline.model.CrsInfo;
import org.shutline.model.LinearUnit;

/**
 * The WKT we write must mean the same CRS to GDAL as the EPSG code (or proj4 string)
 * it came from: GDAL's {@code gdaltransform} (gdal-bin) takes a point from our WKT to
 * the reference CRS and must give the same coordinates back (to 1 mm).
 */
class CrsWktTest {
    static final Path GDALTRANSFORM = Path.of("/usr/bin/gdaltransform");

    @TempDir Path dir;

    record Case(CrsInfo crs, String reference, double x, double y) {}

    static List<Case> cases() {
        return List.of(
            new Case(new CrsInfo("WGS 84 / UTM zone 15N", 32615, null, LinearUnit.METRE), "EPSG:32615", 512000, 4890000),
            new Case(new CrsInfo("NAD83 / UTM zone 15N", 26915, null, LinearUnit.METRE), "EPSG:26915", 480000, 4650000),
            new Case(new CrsInfo("WGS 84 / UTM zone 33S", 32733, null, LinearUnit.METRE), "EPSG:32733", 400000, 8000000),
            // Lambert Conformal Conic, two parallels, US survey feet
            new Case(new CrsInfo("NAD83 / California zone 3 (ftUS)", 2227, null, LinearUnit.US_SURVEY_FOOT),
                "EPSG:2227", 6100000, 2100000),
            // no EPSG code: built from the proj4 definition alone
            new Case(new CrsInfo("local grid", 0,
                "+proj=tmerc +lat_0=40 +lon_0=-90 +k=0.9999 +x_0=200000 +y_0=100000 +datum=NAD83 +units=m +no_defs",
                LinearUnit.METRE), "+proj=tmerc +lat_0=40 +lon_0=-90 +k=0.9999 +x_0=200000 +y_0=100000 +datum=NAD83 "
                + "+units=m +no_defs", 210000, 120000));
    }

    @ParameterizedTest
    @MethodSource("cases")
    void gdalReadsOurWktAsTheSameCrs(Case c) throws Exception {
        Assumptions.assumeTrue(Files.isExecutable(GDALTRANSFORM), "gdaltransform not installed: skipped");
        for (boolean esri : new boolean[] {true, false}) {
            String wkt = esri ? CrsWkt.esri(c.crs()) : CrsWkt.ogc(c.crs());
            Path f = dir.resolve((esri ? "esri" : "ogc") + c.crs().epsg() + ".prj");
            Files.writeString(f, wkt);
            double[] back = transform(f.toString(), c.reference(), c.x(), c.y());
            assertThat(back[0]).as(wkt).isCloseTo(c.x(), org.assertj.core.data.Offset.offset(0.001));
            assertThat(back[1]).as(wkt).isCloseTo(c.y(), org.assertj.core.data.Offset.offset(0.001));
        }
    }

    @Test
    void esriFormHasEsriNamesAndNoAuthority() {
        String w = CrsWkt.esri(new CrsInfo("WGS 84 / UTM zone 15N", 32615, null, LinearUnit.METRE));
        assertThat(w).startsWith("PROJCS[\"WGS_1984_UTM_Zone_15N\",GEOGCS[\"GCS_WGS_1984\",DATUM[\"D_WGS_1984\"")
            .contains("PARAMETER[\"Central_Meridian\",-93.0]", "UNIT[\"Meter\",1.0]").doesNotContain("AUTHORITY");
        assertThat(CrsWkt.ogc(new CrsInfo("WGS 84 / UTM zone 15N", 32615, null, LinearUnit.METRE)))
            .endsWith("AUTHORITY[\"EPSG\",\"32615\"]]");
    }

    @Test
    void unsupportedProjectionsAndMissingDefinitionsAreRefused() {
        assertThatThrownBy(() -> CrsWkt.esri(new CrsInfo("polar", 3413, null, LinearUnit.METRE)))
            .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("no WKT form");
        assertThatThrownBy(() -> CrsWkt.ogc(CrsInfo.UNKNOWN_METRES)).isInstanceOf(IllegalArgumentException.class);
    }

    private static double[] transform(String from, String to, double x, double y) throws Exception {
        Process p = new ProcessBuilder(GDALTRANSFORM.toString(), "-s_srs", from, "-t_srs", to).start();
        p.getOutputStream().write(String.format(Locale.ROOT, "%.4f %.4f%n", x, y).getBytes());
        p.getOutputStream().close();
        String out = new String(p.getInputStream().readAllBytes()).trim();
        String err = new String(p.getErrorStream().readAllBytes());
        assertThat(p.waitFor(30, TimeUnit.SECONDS)).isTrue();
        assertThat(p.exitValue()).as(err).isZero();
        String[] parts = out.split("\\s+");
        return new double[] {Double.parseDouble(parts[0]), Double.parseDouble(parts[1])};
    }
}
