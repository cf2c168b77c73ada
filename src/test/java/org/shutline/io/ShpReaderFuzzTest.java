package org.shutline.io;

import static org.assertj.core.api.Assertions.assertThat;

import com.code_intelligence.jazzer.junit.FuzzTest;
import java.nio.ByteBuffer;
import java.nio.file.Path;
import java.util.Arrays;
import org.locationtech.jts.geom.Geometry;
import org.shutline.fuzz.Bounded;

/**
 * Fuzzes the {@code .shp}/{@code .shx} reader ({@link ShpReader}). An input is one
 * pair: a 4-byte big-endian length n, then n bytes of {@code .shp}, then the rest as
 * the {@code .shx} (inputs shorter than 4 bytes give an empty pair). The reader
 * documents {@link InputException} naming the file for anything it cannot read; any
 * other exception, a message that names neither file, or an input past
 * {@link Bounded#LIMIT_SECONDS} is a finding. When it reads the pair, there is one
 * geometry per {@code .shx} entry (ESRI Shapefile Technical Description, 1998: the
 * index holds one 8-byte record per shape after its 100-byte header). Seeds:
 * {@code ShpReaderFuzzTestInputs/shapefile}, cut from the sample town's shapefiles by
 * {@code FuzzSeeds}.
 */
class ShpReaderFuzzTest {
    static final Path SHP = Path.of("fuzz.shp");
    static final Path SHX = Path.of("fuzz.shx");

    @FuzzTest(maxDuration = "2m")
    void shapefile(byte[] data) {
        byte[][] pair = split(data);
        Throwable t = Bounded.run(() -> {
            ShpReader.Result r = ShpReader.read(pair[0], SHP, pair[1], SHX);
            assertThat(r.geometries()).hasSize((pair[1].length - 100) / 8);
            for (Geometry g : r.geometries()) {
                if (g != null) assertThat(g.getNumPoints()).isPositive();
            }
        }, InputException.class);
        if (t != null) assertThat(t.getMessage()).containsAnyOf("fuzz.shp", "fuzz.shx");
    }

    /** The .shp and .shx of one input (see the class comment). */
    static byte[][] split(byte[] data) {
        if (data.length < 4) return new byte[][] {new byte[0], new byte[0]};
        int n = ByteBuffer.wrap(data, 0, 4).getInt();
        n = Math.max(0, Math.min(n, data.length - 4));
        return new byte[][] {Arrays.copyOfRange(data, 4, 4 + n), Arrays.copyOfRange(data, 4 + n, data.length)};
    }

    /** One input from a .shp and its .shx. */
    static byte[] join(byte[] shp, byte[] shx) {
        return ByteBuffer.allocate(4 + shp.length + shx.length).putInt(shp.length).put(shp).put(shx).array();
    }
}
