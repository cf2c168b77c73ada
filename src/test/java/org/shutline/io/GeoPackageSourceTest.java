package org.shutline.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.PreparedStatement;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.locationtech.jts.geom.Geometry;
import org.shutline.io.sample.GridTown;
import org.shutline.model.Finding;
import org.shutline.model.Network;

/**
 * The SQL GeoPackage reader ({@link GeoPackageSource}) against the reader it replaced
 * (NGA's row objects and JTS {@code WKBReader}, kept as {@link NgaGeoPackageSource}):
 * layer by layer and feature by feature (fid, geometry exactly, geometry error, every
 * value with its Java type) on the committed sample, a generated grid town written by
 * our writer and again by GDAL's {@code ogr2ogr}, and the GeoPackage cases of
 * {@link BadInputTest}. Broken geometry blobs, which the old reader could not locate,
 * must give a finding naming layer, feature and field.
 */
class GeoPackageSourceTest {
    @TempDir
    Path dir;

    private static void sameAsOld(Path gpkg) throws Exception {
        Map<String, String> before = Snapshot.of(gpkg.getParent());
        List<RawLayer> one = GeoPackageSource.read(gpkg, 1, GeoPackageSource.CHUNK_ROWS);
        // several reader threads, tables cut into key ranges of 100 rows: put back together in the same order
        List<RawLayer> ranges = GeoPackageSource.read(gpkg, 3, 100);
        List<RawLayer> auto = GeoPackageSource.read(gpkg);
        assertThat(Snapshot.of(gpkg.getParent())).as("nothing written or created beside " + gpkg + " by the parallel reads").isEqualTo(before);
        sameAsOld(gpkg, one);
        sameAsOld(gpkg, ranges);
        sameAsOld(gpkg, auto);
    }

    private static void sameAsOld(Path gpkg, List<RawLayer> nowRead) throws Exception {
        Map<String, String> before = Snapshot.of(gpkg.getParent());
        List<RawLayer> old = NgaGeoPackageSource.read(gpkg);
        List<RawLayer> now = nowRead;
        assertThat(Snapshot.of(gpkg.getParent())).as("nothing written or created beside " + gpkg).isEqualTo(before);
        assertThat(now).extracting(RawLayer::name).containsExactlyElementsOf(old.stream().map(RawLayer::name).toList());
        for (int l = 0; l < old.size(); l++) {
            RawLayer a = old.get(l);
            RawLayer b = now.get(l);
            String layer = gpkg.getFileName() + " layer " + a.name();
            assertThat(b.where()).as(layer).isEqualTo(a.where());
            assertThat(b.dbf()).as(layer).isEqualTo(a.dbf());
            assertThat(b.fields()).as(layer).isEqualTo(a.fields());
            assertThat(b.crs()).as(layer).isEqualTo(a.crs());
            assertThat(b.features()).as(layer).hasSameSizeAs(a.features());
            for (int i = 0; i < a.features().size(); i++) {
                RawLayer.Feature fa = a.features().get(i);
                RawLayer.Feature fb = b.features().get(i);
                String at = layer + " feature " + i;
                assertThat(fb.fid()).as(at).isEqualTo(fa.fid());
                assertThat(fb.geometryError() != null).as(at + " geometry error").isEqualTo(fa.geometryError() != null);
                sameGeometry(fa.geometry(), fb.geometry(), at);
                for (int v = 0; v < fa.values().size(); v++) {
                    Object va = fa.values().get(v);
                    Object vb = fb.values().get(v);
                    String field = at + " field " + a.fields().get(v);
                    if (va instanceof byte[] ba) {
                        assertThat(vb).as(field).isInstanceOf(byte[].class);
                        assertThat(Arrays.equals(ba, (byte[]) vb)).as(field).isTrue();
                    } else {
                        assertThat(vb).as(field).isEqualTo(va);
                        if (va != null) assertThat(vb.getClass()).as(field + " type").isEqualTo(va.getClass());
                    }
                }
            }
        }
    }

    private static void sameGeometry(Geometry a, Geometry b, String at) {
        if (a == null) {
            assertThat(b).as(at).isNull();
            return;
        }
        assertThat(b).as(at).isNotNull();
        assertThat(b.getGeometryType()).as(at).isEqualTo(a.getGeometryType());
        assertThat(b.equalsExact(a)).as(at + ": " + b + " vs " + a).isTrue();
    }

    @Test
    void sampleTownReadsAsBefore() throws Exception {
        Path copy = dir.resolve("tallowmere.gpkg");
        Files.copy(Path.of("sample-gis/tallowmere.gpkg"), copy);
        sameAsOld(copy);
    }

    @Test
    void generatedTownWrittenByUsAndByGdalReadsAsBefore() throws Exception {
        Network town = GridTown.generate(3000, 11).network();
        Path ours = dir.resolve("ours").resolve("town.gpkg");
        Files.createDirectories(ours.getParent());
        NetworkWriter.writeGeoPackage(town, ours);
        sameAsOld(ours);
        assumeTrue(Gdal.has("ogr2ogr"), "ogr2ogr not installed: skipped");
        Path gdal = dir.resolve("gdal").resolve("town.gpkg");
        Files.createDirectories(gdal.getParent());
        Gdal.run(null, "ogr2ogr", "-f", "GPKG", gdal.toString(), ours.toString()); // GDAL's own GeoPackage writer
        sameAsOld(gdal);
        Network a = NetworkReader.read(ours, FieldMapping.DEFAULT);
        Network b = NetworkReader.read(gdal, FieldMapping.DEFAULT);
        assertThat(b.mains()).hasSize(town.mains().size());
        for (int i = 0; i < a.mains().size(); i++) {
            assertThat(b.mains().get(i).id()).isEqualTo(a.mains().get(i).id());
            assertThat(b.mains().get(i).geometry().equalsExact(a.mains().get(i).geometry())).isTrue();
        }
    }

    private Path in(String folder) throws Exception {
        return Files.createDirectories(dir.resolve(folder));
    }

    @Test
    void badInputCasesReadAsBefore() throws Exception {
        assumeTrue(Gdal.has("ogr2ogr"), "ogr2ogr not installed: skipped");
        // text stored in a REAL column (BadInputTest.textStoredInAGeoPackageRealColumnIsABadValue)
        Path json = TestNetworks.write(dir.resolve("json"), "mains", TestNetworks.mains());
        Path text = Gdal.toGpkg(in("text").resolve("town.gpkg"), List.of(json));
        Gdal.run(null, "ogrinfo", text.toString(), "-sql", "UPDATE mains SET diam_mm = 'wide' WHERE main_id = 'M2'");
        sameAsOld(text);
        // mixed geometry types, and a null geometry (mixedGeometryTypes..., emptyGeometryIsSkipped)
        Path mixedJson = TestNetworks.write(dir.resolve("json2"), "mains", TestNetworks.collection(
                TestNetworks.feature(TestNetworks.line(0, 0, 10, 0), "\"main_id\":\"M1\",\"system_id\":\"LP1\""),
                TestNetworks.feature(TestNetworks.point(5, 5), "\"main_id\":\"M2\",\"system_id\":\"LP1\""),
                TestNetworks.feature("null", "\"main_id\":\"M3\",\"system_id\":\"LP1\"")));
        sameAsOld(Gdal.toGpkg(in("mixed").resolve("mixed.gpkg"), List.of(mixedJson)));
        // every test layer at once (valves, stations, services... as GDAL writes them)
        Path all = Gdal.toGpkg(in("all").resolve("all.gpkg"), TestNetworks.writeAll(dir.resolve("json3")));
        sameAsOld(all);
        // 3D lines: read by the JTS fallback
        Path z = dir.resolve("z").resolve("z.gpkg");
        Files.createDirectories(z.getParent());
        Gdal.run(null, "ogr2ogr", "-f", "GPKG", "-dim", "XYZ", "-nln", "mains", z.toString(), json.toString());
        sameAsOld(z);
    }

    @Test
    void notGeoPackagesFailAsBefore() throws Exception {
        Path f = dir.resolve("town.gpkg");
        Files.writeString(f, "this is a list of valves\n", StandardCharsets.US_ASCII);
        assertThatThrownBy(() -> GeoPackageSource.read(f)).isInstanceOf(InputException.class)
                .hasMessageContaining("town.gpkg").hasMessageContaining("not a GeoPackage");
        assumeTrue(Gdal.has("ogr2ogr"), "ogr2ogr not installed: skipped");
        Path json = TestNetworks.write(dir.resolve("json"), "mains", TestNetworks.mains());
        Path plain = dir.resolve("plain.gpkg");
        Gdal.run(null, "ogr2ogr", "-f", "SQLite", plain.toString(), json.toString()); // plain SQLite, no GeoPackage tables
        Map<String, String> before = Snapshot.of(dir);
        assertThatThrownBy(() -> GeoPackageSource.read(plain)).isInstanceOf(InputException.class)
                .hasMessageContaining("plain.gpkg").hasMessageContaining("not a readable GeoPackage");
        assertThat(Snapshot.of(dir)).isEqualTo(before);
    }

    /** GeoPackage blob: "GP", version 0, flags 1 (little-endian header, no envelope), srs_id, then {@code wkb}. */
    private static byte[] blob(byte[] wkb) {
        ByteBuffer b = ByteBuffer.allocate(8 + wkb.length).order(ByteOrder.LITTLE_ENDIAN);
        b.put((byte) 'G').put((byte) 'P').put((byte) 0).put((byte) 1).putInt(32619).put(wkb);
        return b.array();
    }

    private static byte[] wkbLine(int type, double... xy) {
        ByteBuffer b = ByteBuffer.allocate(9 + 8 * xy.length).order(ByteOrder.LITTLE_ENDIAN);
        b.put((byte) 1).putInt(type).putInt(xy.length / 2);
        for (double d : xy) b.putDouble(d);
        return b.array();
    }

    @Test
    void brokenBlobsAreLocatedFindings() throws Exception {
        assumeTrue(Gdal.has("ogr2ogr"), "ogr2ogr not installed: skipped");
        Path json = TestNetworks.write(dir.resolve("json"), "mains", TestNetworks.mains());
        Path gpkg = Gdal.toGpkg(dir.resolve("town.gpkg"), List.of(json));
        byte[] unknownCode = blob(wkbLine(77, 0, 0, 10, 0));
        byte[] good = wkbLine(2, 0, 0, 10, 0, 20, 0);
        byte[] truncated = Arrays.copyOf(blob(good), blob(good).length - 5);
        byte[] noHeader = good;
        // damaged with plain SQL (the rtree triggers need GDAL's spatial functions, so only the blob column is set)
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + gpkg)) {
            c.createStatement().execute("PRAGMA recursive_triggers = 0");
            for (String t : List.of("rtree_mains_geom_update1", "rtree_mains_geom_update2", "rtree_mains_geom_update3",
                    "rtree_mains_geom_update4")) {
                c.createStatement().execute("DROP TRIGGER IF EXISTS " + t);
            }
            try (PreparedStatement s = c.prepareStatement("UPDATE mains SET geom = ? WHERE main_id = ?")) {
                Object[][] bad = {{unknownCode, "M1"}, {truncated, "M2"}, {noHeader, "M3"}};
                for (Object[] row : bad) {
                    s.setBytes(1, (byte[]) row[0]);
                    s.setString(2, (String) row[1]);
                    assertThat(s.executeUpdate()).isEqualTo(1);
                }
            }
        }
        Network n = NetworkReader.read(gpkg, FieldMapping.DEFAULT);
        assertThat(n.mains()).extracting(m -> m.id()).containsExactly("M4");
        List<Finding> bad = n.readFindings().stream().filter(f -> f.code().equals("invalid-geometry")).toList();
        assertThat(bad).hasSize(3);
        for (int i = 0; i < 3; i++) {
            assertThat(bad.get(i).message()).contains("layer mains", "M" + (i + 1), "fid " + (i + 1), "field geom", "not readable");
        }
        assertThat(bad.get(0).message()).contains("77");
    }
}
