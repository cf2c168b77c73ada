package org.shutline.render;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.shutline.render.GridReference.Precision;

class GridReferenceTest {
    private static final String GEOCONVERT = "/usr/bin/GeoConvert";

    /** Points (lat, lon) spread over zones, hemispheres and the Norway and Svalbard zone exceptions. */
    private static final double[][] POINTS = {
        {38.8895, -77.0352}, {47.6062, -122.3321}, {21.3069, -157.8583}, {64.8378, -147.7164},
        {-33.8688, 151.2093}, {-54.8019, -68.3030}, {60.5, 5.5}, {78.5, 15.0}, {0.0005, 0.0005},
        {-0.0005, -179.9995}, {83.5, -30.0}, {-79.5, 100.25}, {41.0, -72.000001}, {29.9999, -90.0}};

    @Test
    void fgdcTestPoint() {
        // FGDC-STD-011-2001 test point (trade-facts.md): 38.8895 N, 77.0352 W.
        GridReference r = GridReference.of(-77.0352, 38.8895);
        assertThat(r.format(Precision.M1)).isEqualTo("18S UJ 23486 06483");
        assertThat(r.format(Precision.M100)).isEqualTo("18S UJ 234 064");
        assertThat(r.format(Precision.M10)).isEqualTo("18S UJ 2348 0648");
        assertThat(r.format(Precision.KM1)).isEqualTo("18S UJ 23 06");
        assertThat(r.format(Precision.KM10)).isEqualTo("18S UJ 2 0");
        assertThat(r.gridZone()).isEqualTo("18S");
        assertThat(r.squareId()).isEqualTo("UJ");
    }

    @Test
    void digitsAreTruncatedNotRounded() {
        // 38.8895 N 77.0352 W is at UTM easting 323486.8 (GeographicLib GeoConvert -u, rounded: 323487);
        // the grid reference truncates to 23486. At 100 m: 486 -> 4, 483 -> 4, never 5.
        GridReference r = GridReference.of(-77.0352, 38.8895);
        assertThat(r.easting()).isEqualTo(23486);
        assertThat(r.truncate(Precision.M100)).isEqualTo(new GridReference(18, 'S', 'U', 'J', 23400, 6400));
        assertThat(new GridReference(18, 'S', 'U', 'J', 99999, 99999).format(Precision.KM1)).isEqualTo("18S UJ 99 99");
    }

    @Test
    void matchesGeoConvertAtEveryPrecision() throws Exception {
        Assumptions.assumeTrue(ExternalTool.exists(GEOCONVERT), "GeoConvert not installed: skipped");
        StringBuilder in = new StringBuilder();
        for (double[] p : POINTS) in.append(String.format(Locale.ROOT, "%.7f %.7f%n", p[0], p[1]));
        // GeographicLib GeoConvert -m -p N: MGRS with 5 + N digits per coordinate, truncated.
        int[] geoPrecision = {0, -1, -2, -3};
        Precision[] ours = {Precision.M1, Precision.M10, Precision.M100, Precision.KM1};
        for (int k = 0; k < ours.length; k++) {
            List<String> lines = ExternalTool.run(in.toString(), GEOCONVERT, "-m", "-p", Integer.toString(geoPrecision[k]))
                    .lines().toList();
            assertThat(lines).hasSize(POINTS.length);
            for (int i = 0; i < POINTS.length; i++) {
                String mine = GridReference.of(POINTS[i][1], POINTS[i][0]).format(ours[k]).replace(" ", "");
                assertThat(mine).as("GeoConvert -m -p %d for %s %s", geoPrecision[k], POINTS[i][0], POINTS[i][1])
                        .isEqualTo(withoutZonePadding(lines.get(i).trim()));
            }
        }
    }

    /**
     * GeoConvert writes zones 1-9 with a leading zero ("04QFJ..."); we write them as NGA's
     * library does and as US National Grid practice has it ("4Q FJ ...", from memory).
     */
    private static String withoutZonePadding(String mgrs) {
        return mgrs.startsWith("0") ? mgrs.substring(1) : mgrs;
    }

    @Test
    void parsingGivesTheCellsSouthWestCorner() throws Exception {
        GridReference r = GridReference.parse("18S UJ 234 064");
        assertThat(r).isEqualTo(new GridReference(18, 'S', 'U', 'J', 23400, 6400));
        assertThat(GridReference.parse("18suj2348606483").format(Precision.M1)).isEqualTo("18S UJ 23486 06483");
        double[] ll = r.toLonLat();
        // The corner lies south-west of the FGDC test point, within the 100 m cell.
        assertThat(ll[0]).isLessThan(-77.0352).isGreaterThan(-77.0352 - 0.002);
        assertThat(ll[1]).isLessThan(38.8895).isGreaterThan(38.8895 - 0.002);
        assertThat(GridReference.of(ll[0] + 1e-7, ll[1] + 1e-7).format(Precision.M100)).isEqualTo("18S UJ 234 064");
        Assumptions.assumeTrue(ExternalTool.exists(GEOCONVERT), "GeoConvert not installed: skipped");
        // GeographicLib GeoConvert reads 18SUJ2340006400 as the centre of that 1 m square: 0.5 m north-east of the corner.
        String[] geo = ExternalTool.run("18SUJ2340006400\n", GEOCONVERT, "-p", "6").trim().split("\\s+");
        assertThat(ll[1]).isCloseTo(Double.parseDouble(geo[0]), within(1e-5));
        assertThat(ll[0]).isCloseTo(Double.parseDouble(geo[1]), within(1e-5));
    }

    @Test
    void badInputIsRejectedWithAPlainMessage() {
        assertThatThrownBy(() -> GridReference.parse("not a grid ref")).isInstanceOf(IllegalArgumentException.class)
                .hasMessageContaining("not a grid ref");
        assertThatThrownBy(() -> GridReference.of(10, 85)).isInstanceOf(IllegalArgumentException.class)
                .hasMessageContaining("latitude");
        assertThatThrownBy(() -> GridReference.of(Double.NaN, 10)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> Precision.ofDigits(6)).isInstanceOf(IllegalArgumentException.class);
        assertThat(Precision.ofDigits(3)).isEqualTo(Precision.M100);
    }

    @Test
    void columnLettersAreThoseOfTheZoneAsGeoConvertChecksThem() throws Exception {
        Assumptions.assumeTrue(ExternalTool.exists(GEOCONVERT), "GeoConvert not installed: skipped");
        // every zone 1..60 with every column letter A..Z but I and O, in band N with row letter A; GeographicLib's
        // GeoConvert -u rejects a column letter outside the zone's set with "Column letter X not in zone"; any other
        // answer (a position, or a block outside the band) means the column letter itself is good
        StringBuilder in = new StringBuilder();
        List<String> refs = new java.util.ArrayList<>();
        for (int zone = 1; zone <= 60; zone++) {
            for (char c = 'A'; c <= 'Z'; c++) {
                if (c == 'I' || c == 'O') continue;
                String ref = zone + "N" + c + "A" + "0000000000";
                refs.add(ref);
                in.append(ref).append('\n');
            }
        }
        Process p = new ProcessBuilder(GEOCONVERT, "-u").redirectErrorStream(true).start();
        try (var os = p.getOutputStream()) {
            os.write(in.toString().getBytes(java.nio.charset.StandardCharsets.UTF_8));
        }
        List<String> lines = new String(p.getInputStream().readAllBytes(), java.nio.charset.StandardCharsets.UTF_8).lines().toList();
        p.waitFor();
        assertThat(lines).hasSize(refs.size());
        int refused = 0;
        for (int i = 0; i < refs.size(); i++) {
            String ref = refs.get(i);
            boolean badColumn = lines.get(i).contains("Column letter");
            if (badColumn) {
                refused++;
                assertThatThrownBy(() -> GridReference.parse(ref)).as(ref + ": " + lines.get(i)).isInstanceOf(IllegalArgumentException.class)
                        .hasMessageContaining("column letter");
            } else {
                assertThat(GridReference.parse(ref).squareId()).as(ref + ": " + lines.get(i)).startsWith(ref.substring(ref.indexOf('N') + 1, ref.indexOf('N') + 2));
            }
        }
        // 24 letters, 8 of them in each zone's set
        assertThat(refused).isEqualTo(60 * 16);
    }
}
