package org.shutline.render;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.awt.geom.Point2D;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.shutline.model.CrsInfo;
import org.shutline.model.LinearUnit;
import org.shutline.render.GridReference.Precision;

/**
 * Grid references of network points to the metre, checked against GeographicLib
 * GeoConvert (Debian geographiclib-tools; skipped visibly when it is missing): in a
 * network CRS that is the point's UTM zone the reference comes from the easting and
 * northing themselves, so whole-metre coordinates name their own 1 m cell.
 */
class GridReferenceUtmTest {
    private static final String GEOCONVERT = "/usr/bin/GeoConvert";
    private static final CrsInfo UTM15N = new CrsInfo("WGS 84 / UTM zone 15N", 32615, null, LinearUnit.METRE);
    private static final CrsInfo NAD83_UTM15N = new CrsInfo("NAD83 / UTM zone 15N", 26915, null, LinearUnit.METRE);
    private static final CrsInfo UTM56S = new CrsInfo("WGS 84 / UTM zone 56S", 32756, null, LinearUnit.METRE);
    private static final CrsInfo UTM15N_PROJ4 = new CrsInfo("utm 15n", 0, "+proj=utm +zone=15 +datum=WGS84 +units=m +no_defs",
            LinearUnit.METRE);
    private static final CrsInfo NY_LONG_ISLAND_FT =
            new CrsInfo("NAD83 / New York Long Island (ftUS)", 2263, null, LinearUnit.US_SURVEY_FOOT);

    @Test
    void wholeMetreSamplePointNamesItsOwnCell() {
        // Regression: 512547, 4890597 came out "... 90596" after a trip through latitude and longitude.
        // GeographicLib GeoConvert -m -p 0 for "15n 512547 4890597": 15TWJ1254790597.
        GeoTransform g = GeoTransform.forCrs(UTM15N).orElseThrow();
        assertThat(g.gridReference(512547, 4890597).format(Precision.M1)).isEqualTo("15T WJ 12547 90597");
        assertThat(g.gridReference(512547.999, 4890597.999).format(Precision.M1)).isEqualTo("15T WJ 12547 90597");
        assertThat(g.gridReference(512546.999, 4890596.999).format(Precision.M1)).isEqualTo("15T WJ 12546 90596");
        assertThat(GeoTransform.utmZone(UTM15N)).isEqualTo(15);
        assertThat(GeoTransform.utmZone(NAD83_UTM15N)).isEqualTo(15);
        assertThat(GeoTransform.utmZone(UTM56S)).isEqualTo(-56);
        assertThat(GeoTransform.utmZone(UTM15N_PROJ4)).isEqualTo(15);
        assertThat(GeoTransform.utmZone(NY_LONG_ISLAND_FT)).isZero();
        assertThat(GeoTransform.utmZone(new CrsInfo("utm 15 ft", 0, "+proj=utm +zone=15 +datum=WGS84 +units=us-ft",
                LinearUnit.US_SURVEY_FOOT))).isZero();
    }

    @Test
    void utmGridOfWholeAndFractionalMetresMatchesGeoConvert() throws Exception {
        Assumptions.assumeTrue(ExternalTool.exists(GEOCONVERT), "GeoConvert not installed: skipped");
        List<double[]> pts = new ArrayList<>();
        for (int i = 0; i < 12; i++) {
            for (int j = 0; j < 12; j++) {
                double e = 300_000 + i * 37_813.0, n = 4_000_000 + j * 91_337.0;
                pts.add(new double[] {e, n});
                pts.add(new double[] {e + 0.25, n + 0.75});
                pts.add(new double[] {e + 0.999, n + 0.001});
                pts.add(new double[] {e - 0.001, n - 0.999});
            }
        }
        compareUtm(UTM15N, "15n", pts);
        compareUtm(NAD83_UTM15N, "15n", pts);
        compareUtm(UTM15N_PROJ4, "15n", pts);
        List<double[]> south = new ArrayList<>();
        for (double[] p : pts) south.add(new double[] {p[0], p[1] + 2_000_000});
        compareUtm(UTM56S, "56s", south);
    }

    /** GeographicLib GeoConvert -m -s -p 0 (MGRS to the metre, standard zone) of "zone E N" against ours. */
    private static void compareUtm(CrsInfo crs, String zone, List<double[]> pts) throws Exception {
        StringBuilder in = new StringBuilder();
        for (double[] p : pts) in.append(String.format(Locale.ROOT, "%s %.3f %.3f%n", zone, p[0], p[1]));
        List<String> lines = ExternalTool.run(in.toString(), GEOCONVERT, "-m", "-s", "-p", "0").lines().toList();
        assertThat(lines).hasSize(pts.size());
        GeoTransform g = GeoTransform.forCrs(crs).orElseThrow();
        for (int i = 0; i < pts.size(); i++) {
            String mine = g.gridReference(pts.get(i)[0], pts.get(i)[1]).format(Precision.M1).replace(" ", "");
            assertThat(mine).as("%s %s %.3f %.3f", crs.name(), zone, pts.get(i)[0], pts.get(i)[1])
                    .isEqualTo(lines.get(i).trim());
        }
    }

    @Test
    void aPointOfTheNetworkZoneLyingInTheNextZoneTakesItsOwnZone() throws Exception {
        Assumptions.assumeTrue(ExternalTool.exists(GEOCONVERT), "GeoConvert not installed: skipped");
        // E 250 000 in zone 15 lies west of 96 W, in zone 14: GeoConvert -m -s -p 0 gives 14TQP3007789273
        GeoTransform g = GeoTransform.forCrs(UTM15N).orElseThrow();
        String geo = ExternalTool.run("15n 250000.3 4890000.7\n", GEOCONVERT, "-m", "-s", "-p", "0").trim();
        assertThat(g.gridReference(250000.3, 4890000.7).format(Precision.M1).replace(" ", "")).isEqualTo(geo);
    }

    @Test
    void statePlaneFeetMatchGeoConvertAwayFromCellEdges() throws Exception {
        Assumptions.assumeTrue(ExternalTool.exists(GEOCONVERT), "GeoConvert not installed: skipped");
        GeoTransform g = GeoTransform.forCrs(NY_LONG_ISLAND_FT).orElseThrow();
        StringBuilder in = new StringBuilder();
        List<double[]> pts = new ArrayList<>();
        for (int i = 0; i < 10; i++) {
            for (int j = 0; j < 10; j++) {
                double x = 980_000 + i * 7_919.0 + (i % 3) * 0.37, y = 190_000 + j * 5_113.0 + (j % 2) * 0.61;
                pts.add(new double[] {x, y});
                Point2D ll = g.toLonLat(x, y);
                in.append(String.format(Locale.ROOT, "%.10f %.10f%n", ll.getY(), ll.getX()));
            }
        }
        List<String> mgrs = ExternalTool.run(in.toString(), GEOCONVERT, "-m", "-p", "0").lines().toList();
        List<String> utm = ExternalTool.run(in.toString(), GEOCONVERT, "-u", "-p", "4").lines().toList();
        int compared = 0;
        for (int i = 0; i < pts.size(); i++) {
            String[] u = utm.get(i).trim().split("\\s+");
            double fe = frac(Double.parseDouble(u[1])), fn = frac(Double.parseDouble(u[2]));
            // the two projections agree to well under 1 mm; a cell edge within 1 mm is not decidable
            if (Math.min(fe, 1 - fe) < 1e-3 || Math.min(fn, 1 - fn) < 1e-3) continue;
            compared++;
            assertThat(g.gridReference(pts.get(i)[0], pts.get(i)[1]).format(Precision.M1).replace(" ", ""))
                    .as("EPSG:2263 %.2f %.2f", pts.get(i)[0], pts.get(i)[1]).isEqualTo(mgrs.get(i).trim());
        }
        assertThat(compared).isGreaterThan(90);
    }

    private static double frac(double v) {
        return v - Math.floor(v);
    }

    @Test
    void aTypedReferenceComesBackAtItsCellCentre() throws Exception {
        GeoTransform g = GeoTransform.forCrs(UTM15N).orElseThrow();
        GridReference r = GridReference.parse("15T WJ 12547 90597");
        Point2D c = g.fromGridReference(r, 0.5, 0.5);
        assertThat(c.getX()).isEqualTo(512547.5);
        assertThat(c.getY()).isEqualTo(4890597.5);
        assertThat(GridReference.cellMetres("15T WJ 125 905")).isEqualTo(100);
        assertThat(GridReference.cellMetres("15TWJ")).isEqualTo(100_000);
        assertThat(GridReference.cellMetres("15T")).isZero();
        Assumptions.assumeTrue(ExternalTool.exists(GEOCONVERT), "GeoConvert not installed: skipped");
        // GeographicLib GeoConvert -u reads an MGRS reference as the centre of its cell
        String[] geo = ExternalTool.run("15TWJ1254790597\n", GEOCONVERT, "-u", "-p", "3").trim().split("\\s+");
        assertThat(c.getX()).isCloseTo(Double.parseDouble(geo[1]), within(1e-3));
        assertThat(c.getY()).isCloseTo(Double.parseDouble(geo[2]), within(1e-3));
        // NAD83 / UTM 15N is taken as the same grid (FGDC-STD-011-2001): the same numbers
        Point2D d = GeoTransform.forCrs(NAD83_UTM15N).orElseThrow().fromGridReference(r, 0.5, 0.5);
        assertThat(d.getX()).isEqualTo(512547.5);
    }
}
