package org.shutline.io;

import static org.assertj.core.api.Assertions.assertThat;

import com.code_intelligence.jazzer.junit.DictionaryEntries;
import com.code_intelligence.jazzer.junit.FuzzTest;
import java.util.Arrays;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.io.ParseException;
import org.locationtech.jts.io.WKBReader;
import org.shutline.fuzz.Bounded;

/**
 * Fuzzes the GeoPackage geometry blob decoder ({@link GpkgGeometry}): it documents "an
 * error text, never an exception", so any exception is a finding, and so is an input
 * that takes longer than {@link Bounded#LIMIT_SECONDS}. A geometry read by its direct
 * path must be the one JTS {@link WKBReader} reads from the same WKB (the decoder's
 * stated contract: it "decides exactly as" JTS did), coordinate for coordinate, bit for
 * bit. Seeds: {@code GpkgGeometryFuzzTestInputs/blob} (made by {@code FuzzSeeds} from
 * the sample town and the OGC 12-128r18 header layouts).
 */
class GpkgGeometryFuzzTest {
    @FuzzTest(maxDuration = "2m")
    @DictionaryEntries({"GP", "\\x00\\x00\\x00\\x02", "\\x02\\x00\\x00\\x00", "\\x05\\x00\\x00\\x00",
        "\\xE9\\x03\\x00\\x00", "\\xFF\\xFF\\xFF\\xFF", "\\x00\\x00\\x00\\x00\\x00\\x00\\xF8\\x7F"})
    void blob(byte[] data) {
        Bounded.run(() -> check(data));
    }

    private static void check(byte[] data) {
        GpkgGeometry.Result r = new GpkgGeometry().decode(data);
        if (r.error() != null) {
            assertThat(r.geometry()).isNull();
            assertThat(r.error()).isNotBlank();
            return;
        }
        Geometry g = r.geometry();
        if (g == null) return; // empty
        assertThat(g.isEmpty()).isFalse();
        int flags = data[3] & 0xff;
        int env = (flags >> 1) & 7;
        int start = 8 + (env == 0 ? 0 : env == 1 ? 32 : env == 4 ? 64 : 48);
        Geometry jts;
        try {
            jts = new WKBReader().read(Arrays.copyOfRange(data, start, data.length));
        } catch (ParseException | RuntimeException e) {
            throw new AssertionError("decoded a geometry JTS refuses: " + e, e);
        }
        assertThat(g.getGeometryType()).isEqualTo(jts.getGeometryType());
        Coordinate[] a = g.getCoordinates();
        Coordinate[] b = jts.getCoordinates();
        assertThat(a.length).isEqualTo(b.length);
        for (int i = 0; i < a.length; i++) {
            assertThat(Double.doubleToLongBits(a[i].x)).as("x of vertex " + i).isEqualTo(Double.doubleToLongBits(b[i].x));
            assertThat(Double.doubleToLongBits(a[i].y)).as("y of vertex " + i).isEqualTo(Double.doubleToLongBits(b[i].y));
        }
    }
}
