package org.shutline.io;

import static org.assertj.core.api.Assertions.assertThat;

import com.code_intelligence.jazzer.junit.DictionaryEntries;
import com.code_intelligence.jazzer.junit.FuzzTest;
import java.nio.charset.StandardCharsets;
import org.shutline.fuzz.Bounded;
import org.shutline.model.CrsInfo;

/**
 * Fuzzes the CRS definitions read from a {@code .prj} or a GeoPackage's
 * {@code gpkg_spatial_ref_sys}: {@link Crs#fromWkt} (the WKT1 parser {@link Wkt}, an EPSG
 * AUTHORITY looked up, else {@link PrjTranslator}). Bytes are read as ISO-8859-1, as
 * {@code ShapefileSource} reads a {@code .prj}. The documented refusal is
 * {@link InputException} naming the file; any other exception, a message without the
 * file name, or an input past {@link Bounded#LIMIT_SECONDS} is a finding. A CRS it
 * accepts must be usable: a proj4 definition free of NaN and infinities, a transform to
 * longitude/latitude that can be built and applied, and for a projected CRS the WKT
 * written back out ({@link CrsWkt}, which documents {@link IllegalArgumentException} for a
 * projection it has no form for). Seeds: {@code PrjFuzzTestInputs/prj}.
 */
class PrjFuzzTest {
    @FuzzTest(maxDuration = "2m")
    @DictionaryEntries({"PROJCS[", "GEOGCS[", "DATUM[", "SPHEROID[", "PRIMEM[", "UNIT[", "PROJECTION[", "PARAMETER[",
        "AUTHORITY[\\\"EPSG\\\",", "TOWGS84[", "Transverse_Mercator", "Lambert_Conformal_Conic", "_1SP", "_2SP",
        "standard_parallel_1", "standard_parallel_2", "latitude_of_origin", "central_meridian", "scale_factor",
        "false_easting", "false_northing", "Foot_US", "0.3048006096012192", "NaN", "Infinity", "1e308", "\\\"", "]", ","})
    void prj(byte[] data) {
        String text = new String(data, StandardCharsets.ISO_8859_1);
        Throwable t = Bounded.run(() -> check(text), InputException.class);
        if (t != null) assertThat(t.getMessage()).contains("fuzz.prj");
    }

    private static void check(String text) throws InputException {
        CrsInfo c = Crs.fromWkt(text, "fuzz.prj");
        assertThat(c.proj4()).isNotNull().doesNotContain("NaN").doesNotContain("Infinity");
        double[] ll = Crs.toLonLat(c).apply(0, 0);
        assertThat(ll).hasSize(2);
        if (!Crs.isGeographic(c)) {
            try {
                assertThat(CrsWkt.ogc(c)).startsWith("PROJCS[");
                assertThat(CrsWkt.esri(c)).startsWith("PROJCS[");
            } catch (IllegalArgumentException e) {
                assertThat(e.getMessage()).startsWith("no WKT form");
            }
        }
    }
}
