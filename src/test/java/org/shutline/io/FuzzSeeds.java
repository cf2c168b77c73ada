package org.shutline.io;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.Arrays;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.io.ByteOrderValues;
import org.locationtech.jts.io.WKBWriter;

/**
 * Makes the binary seed corpora of the io fuzz tests from the sample town
 * ({@code sample-gis/}) and the published layouts, into
 * {@code src/test/resources/org/shutline/io/*FuzzTestInputs/}. Run from the project folder
 * ({@code java -cp target/test-classes:target/classes:... org.shutline.io.FuzzSeeds}, see
 * docs/fuzzing.md); the seeds are small and committed, so this runs only when they are
 * to be made again. Text seeds (plans, mappings, .prj, locations) are written by hand.
 */
public final class FuzzSeeds {
    private static final Path RES = Path.of("src/test/resources/org/shutline/io");
    private static final Path SHP = Path.of("sample-gis/tallowmere-shp");
    private static final GeometryFactory GF = new GeometryFactory();

    private FuzzSeeds() {}

    public static void main(String[] args) throws Exception {
        blobs(RES.resolve("GpkgGeometryFuzzTestInputs/blob"));
        shapefiles(RES.resolve("ShpReaderFuzzTestInputs/shapefile"));
        tables(RES.resolve("DbfTableFuzzTestInputs/table"));
    }

    /** GeoPackage geometry blobs: three from the sample, and made ones for each header and WKB form the decoder has a path for. */
    static void blobs(Path dir) throws IOException, SQLException {
        Files.createDirectories(dir);
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:file:sample-gis/tallowmere.gpkg?mode=ro");
             Statement st = c.createStatement()) {
            for (String layer : new String[] {"mains", "valves", "streets"}) {
                try (ResultSet rs = st.executeQuery("SELECT geom FROM " + layer + " WHERE geom IS NOT NULL LIMIT 1")) {
                    rs.next();
                    Files.write(dir.resolve("sample-" + layer), rs.getBytes(1));
                }
            }
        }
        LineString line = GF.createLineString(new Coordinate[] {new Coordinate(512000, 4890000), new Coordinate(512100, 4890003)});
        Geometry multi = GF.createMultiLineString(new LineString[] {line,
            GF.createLineString(new Coordinate[] {new Coordinate(512100, 4890003), new Coordinate(512100, 4890100), new Coordinate(512200, 4890100)})});
        Geometry point = GF.createPoint(new Coordinate(512050, 4890001));
        Geometry poly = GF.createPolygon(new Coordinate[] {new Coordinate(0, 0), new Coordinate(10, 0), new Coordinate(10, 10), new Coordinate(0, 0)});
        Geometry line3 = GF.createLineString(new Coordinate[] {new Coordinate(1, 2, 3), new Coordinate(4, 5, 6)});
        Files.write(dir.resolve("line-le-env1"), gp(1, wkb(line, 2, ByteOrderValues.LITTLE_ENDIAN)));
        Files.write(dir.resolve("line-be-env0"), gp(0, wkb(line, 2, ByteOrderValues.BIG_ENDIAN)));
        Files.write(dir.resolve("multiline-env2"), gp(2, wkb(multi, 2, ByteOrderValues.LITTLE_ENDIAN)));
        Files.write(dir.resolve("point-env4"), gp(4, wkb(point, 2, ByteOrderValues.LITTLE_ENDIAN)));
        Files.write(dir.resolve("polygon-env3"), gp(3, wkb(poly, 2, ByteOrderValues.LITTLE_ENDIAN)));
        Files.write(dir.resolve("line-z"), gp(0, wkb(line3, 3, ByteOrderValues.LITTLE_ENDIAN)));
        byte[] nan = wkb(GF.createPoint(new Coordinate(Double.NaN, Double.NaN)), 2, ByteOrderValues.LITTLE_ENDIAN);
        Files.write(dir.resolve("point-nan"), gp(0, nan));
        byte[] empty = gp(0, new byte[0]);
        empty[3] |= 0x10;
        Files.write(dir.resolve("empty-flag"), empty);
        byte[] full = gp(1, wkb(line, 2, ByteOrderValues.LITTLE_ENDIAN));
        Files.write(dir.resolve("line-cut"), Arrays.copyOf(full, full.length - 5));
        // an ISO WKB geometry code for a LineString Z (1002), read by the JTS path
        byte[] iso = gp(0, wkb(line, 2, ByteOrderValues.LITTLE_ENDIAN));
        ByteBuffer.wrap(iso).order(ByteOrder.LITTLE_ENDIAN).putInt(9, 1002);
        Files.write(dir.resolve("line-iso-code"), iso);
    }

    private static byte[] wkb(Geometry g, int dims, int order) {
        return new WKBWriter(dims, order).write(g);
    }

    /** A GeoPackage header (magic, version 0, flags little-endian with envelope code {@code env}, srs_id 32615) then the WKB. */
    private static byte[] gp(int env, byte[] wkb) {
        int envBytes = switch (env) { case 0 -> 0; case 1 -> 32; case 4 -> 64; default -> 48; };
        ByteBuffer b = ByteBuffer.allocate(8 + envBytes + wkb.length).order(ByteOrder.LITTLE_ENDIAN);
        b.put((byte) 'G').put((byte) 'P').put((byte) 0).put((byte) (1 | env << 1)).putInt(32615);
        for (int i = 0; i < envBytes / 8; i++) b.putDouble(i);
        return b.put(wkb).array();
    }

    /** Shapefile pairs (see {@link ShpReaderFuzzTest#join}): small sample layers whole, and the first records of the others. */
    static void shapefiles(Path dir) throws IOException {
        Files.createDirectories(dir);
        for (String layer : new String[] {"sources", "sense_taps"}) {
            Files.write(dir.resolve(layer), ShpReaderFuzzTest.join(read(layer + ".shp"), read(layer + ".shx")));
        }
        for (String layer : new String[] {"mains", "streets", "valves"}) {
            byte[][] cut = firstRecords(read(layer + ".shp"), read(layer + ".shx"), 2);
            Files.write(dir.resolve(layer + "-2"), ShpReaderFuzzTest.join(cut[0], cut[1]));
        }
    }

    /** The first {@code n} records of a .shp and .shx, with both headers' lengths set to match. */
    static byte[][] firstRecords(byte[] shp, byte[] shx, int n) {
        ByteBuffer x = ByteBuffer.wrap(shx);
        int end = 2 * x.getInt(100 + 8 * (n - 1)) + 8 + 2 * x.getInt(104 + 8 * (n - 1));
        byte[] s = Arrays.copyOf(shp, end);
        byte[] i = Arrays.copyOf(shx, 100 + 8 * n);
        ByteBuffer.wrap(s).putInt(24, end / 2);
        ByteBuffer.wrap(i).putInt(24, i.length / 2);
        return new byte[][] {s, i};
    }

    /** .dbf tables: small sample tables whole, the first records of the others (record count set to match). */
    static void tables(Path dir) throws IOException {
        Files.createDirectories(dir);
        for (String layer : new String[] {"sources", "sense_taps"}) Files.write(dir.resolve(layer), read(layer + ".dbf"));
        for (String layer : new String[] {"mains", "valves", "stations"}) {
            byte[] b = read(layer + ".dbf");
            ByteBuffer le = ByteBuffer.wrap(b).order(ByteOrder.LITTLE_ENDIAN);
            int header = le.getShort(8) & 0xffff;
            int rec = le.getShort(10) & 0xffff;
            byte[] cut = Arrays.copyOf(b, header + 2 * rec + 1);
            cut[cut.length - 1] = 0x1A; // end-of-file mark
            ByteBuffer.wrap(cut).order(ByteOrder.LITTLE_ENDIAN).putInt(4, 2);
            Files.write(dir.resolve(layer + "-2"), cut);
        }
        byte[] deleted = read("sources.dbf");
        int header = ByteBuffer.wrap(deleted).order(ByteOrder.LITTLE_ENDIAN).getShort(8);
        deleted[header] = '*';
        Files.write(dir.resolve("sources-deleted"), deleted);
        Files.write(dir.resolve("header-only"), Arrays.copyOf(read("sources.dbf"), 33));
    }

    private static byte[] read(String name) throws IOException {
        return Files.readAllBytes(SHP.resolve(name));
    }
}
