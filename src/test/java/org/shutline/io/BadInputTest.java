package org.shutline.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.RandomAccessFile;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.shutline.model.Finding;
import org.shutline.model.Network;
import org.shutline.model.Severity;

/**
 * One test per kind of bad input: each asserts the exception message or the
 * finding names the file, layer, feature and field concerned, and that reading left
 * every input file unchanged (content hash and modification time). Inputs are made
 * by GDAL's ogr2ogr from GeoJSON, then damaged byte by byte where a test needs it.
 */
class BadInputTest {
    @TempDir
    Path dir;
    private Map<String, String> before;

    @BeforeEach
    void needGdal() {
        assumeTrue(Gdal.has("ogr2ogr"), "ogr2ogr not installed: skipped");
    }

    @AfterEach
    void inputsUnchanged() throws Exception {
        if (before != null) assertThat(Snapshot.of(dir)).as("input files unchanged by reading").isEqualTo(before);
    }

    private Path shapes(String... layers) throws Exception {
        Path json = dir.resolve("json");
        List<Path> all = TestNetworks.writeAll(json);
        List<Path> chosen = all.stream().filter(p -> List.of(layers).contains(Gdal.base(p))).toList();
        return Gdal.toShapefiles(dir.resolve("shp"), chosen);
    }

    private Path shapesOf(String layer, String json, String... extra) throws Exception {
        return Gdal.toShapefiles(dir.resolve("shp"), List.of(TestNetworks.write(dir.resolve("json"), layer, json)), extra);
    }

    private InputException readFails(Path p) throws Exception {
        before = Snapshot.of(dir);
        try {
            NetworkReader.read(p, FieldMapping.DEFAULT);
        } catch (InputException e) {
            return e;
        }
        throw new AssertionError("no InputException reading " + p);
    }

    private Network readOk(Path p) throws Exception {
        before = Snapshot.of(dir);
        return NetworkReader.read(p, FieldMapping.DEFAULT);
    }

    private static List<Finding> withCode(Network n, String code) {
        return n.readFindings().stream().filter(f -> f.code().equals(code)).toList();
    }

    @Test
    void missingMainsLayer() throws Exception {
        Path shp = shapes("valves", "services");
        InputException e = readFails(shp);
        assertThat(e).hasMessageContaining(shp.toString()).hasMessageContaining("no mains layer")
                .hasMessageContaining("services, valves");
    }

    @Test
    void missingKeyField() throws Exception {
        Path shp = shapesOf("mains", TestNetworks.collection(TestNetworks.feature(TestNetworks.line(0, 0, 10, 0),
                "\"system_id\":\"LP1\",\"status\":\"active\"")));
        InputException e = readFails(shp);
        assertThat(e).hasMessageContaining("mains.shp").hasMessageContaining("layer mains")
                .hasMessageContaining("key field main_id");
    }

    @Test
    void textInARealFieldIsABadValuePerFeature() throws Exception {
        Path shp = shapesOf("mains", TestNetworks.collection(
                TestNetworks.feature(TestNetworks.line(0, 0, 10, 0), "\"main_id\":\"M1\",\"system_id\":\"LP1\",\"diam_mm\":\"wide\""),
                TestNetworks.feature(TestNetworks.line(10, 0, 20, 0), "\"main_id\":\"M2\",\"system_id\":\"LP1\",\"diam_mm\":\"60.3\"")));
        Network n = readOk(shp);
        assertThat(n.mains().get(0).diamMm()).isNull();
        assertThat(n.mains().get(1).diamMm()).isEqualTo(60.3); // a number written as text is still a number
        List<Finding> bad = withCode(n, "bad-value");
        assertThat(bad).hasSize(1);
        assertThat(bad.get(0).severity()).isEqualTo(Severity.ERROR);
        assertThat(bad.get(0).features()).containsExactly("M1");
        assertThat(bad.get(0).message()).contains("layer mains", "M1", "record 1", "diam_mm", "wide");
    }

    @Test
    void textStoredInAGeoPackageRealColumnIsABadValue() throws Exception {
        Path json = TestNetworks.write(dir.resolve("json"), "mains", TestNetworks.mains());
        Path gpkg = Gdal.toGpkg(dir.resolve("town.gpkg"), List.of(json));
        // SQLite keeps text in a REAL column (dynamic typing); written with GDAL's ogrinfo running native SQL
        Gdal.run(null, "ogrinfo", gpkg.toString(), "-sql", "UPDATE mains SET diam_mm = 'wide' WHERE main_id = 'M2'");
        assertThat(Gdal.run(null, "ogrinfo", "-ro", gpkg.toString(), "-sql", "SELECT typeof(diam_mm) AS t FROM mains WHERE main_id = 'M2'"))
                .contains("t (String) = text");
        Network n = readOk(gpkg);
        assertThat(n.mains().get(1).diamMm()).isNull();
        assertThat(n.mains().get(0).diamMm()).isEqualTo(114.3);
        assertThat(withCode(n, "bad-value")).singleElement()
                .satisfies(f -> assertThat(f.message()).contains("layer mains", "M2", "fid 2", "diam_mm", "wide"));
    }

    @Test
    void unknownWordIsAnErrorAndTheDefault() throws Exception {
        Path shp = shapesOf("mains", TestNetworks.collection(TestNetworks.feature(TestNetworks.line(0, 0, 10, 0),
                "\"main_id\":\"M7\",\"system_id\":\"LP1\",\"status\":\"retired\"")));
        Network n = readOk(shp);
        assertThat(n.mains().get(0).status()).isEqualTo(org.shutline.model.MainStatus.DEFAULT);
        List<Finding> f = withCode(n, "unknown-value");
        assertThat(f).hasSize(1);
        assertThat(f.get(0).severity()).isEqualTo(Severity.ERROR);
        assertThat(f.get(0).message()).contains("layer mains", "M7", "field status", "'retired'", "read as active");
        // the optional fields that are absent are one warning each
        assertThat(withCode(n, "missing-field")).extracting(Finding::message)
                .anySatisfy(m -> assertThat(m).contains("diam_mm"))
                .hasSize(4); // material, diam_mm, maop_kpa, install_yr
    }

    @Test
    void truncatedShp() throws Exception {
        Path shp = shapes("mains");
        cut(shp.resolve("mains.shp"), 20);
        InputException e = readFails(shp);
        assertThat(e).hasMessageContaining("mains.shp").hasMessageContaining("truncated");
    }

    @Test
    void truncatedRecordInsideShpIsNamedByNumber() throws Exception {
        Path shp = shapes("mains");
        Path f = shp.resolve("mains.shp");
        cut(f, 20);
        // make the header agree with the shorter file, so the last record itself is short
        try (RandomAccessFile raf = new RandomAccessFile(f.toFile(), "rw")) {
            raf.seek(24);
            raf.writeInt((int) (raf.length() / 2));
        }
        InputException e = readFails(shp);
        assertThat(e).hasMessageContaining("mains.shp").hasMessageContaining("record 4");
    }

    @Test
    void truncatedShx() throws Exception {
        Path shp = shapes("mains");
        cut(shp.resolve("mains.shx"), 8);
        InputException e = readFails(shp);
        assertThat(e).hasMessageContaining("mains.shx").hasMessageContaining("truncated");
    }

    @Test
    void corruptDbf() throws Exception {
        Path shp = shapes("mains");
        try (RandomAccessFile raf = new RandomAccessFile(shp.resolve("mains.dbf").toFile(), "rw")) {
            raf.seek(10); // record length, little-endian
            raf.write(new byte[] {7, 0});
        }
        InputException e = readFails(shp);
        assertThat(e).hasMessageContaining("mains.dbf").hasMessageContaining("corrupt");
    }

    @Test
    void shpAndDbfRecordCountsDisagree() throws Exception {
        Path shp = shapes("mains", "valves");
        Files.copy(shp.resolve("valves.dbf"), shp.resolve("mains.dbf"), StandardCopyOption.REPLACE_EXISTING);
        InputException e = readFails(shp);
        assertThat(e).hasMessageContaining("mains.shp").hasMessageContaining("4 shapes")
                .hasMessageContaining("mains.dbf has 2 records");
    }

    @Test
    void textFileRenamedShp() throws Exception {
        Path folder = Files.createDirectories(dir.resolve("txt"));
        Files.writeString(folder.resolve("mains.shp"), "main_id,system_id\n".repeat(20), StandardCharsets.US_ASCII);
        InputException e = readFails(folder);
        assertThat(e).hasMessageContaining("mains.shp").hasMessageContaining("not a shapefile");
    }

    @Test
    void textFileRenamedGpkg() throws Exception {
        Path f = dir.resolve("town.gpkg");
        Files.writeString(f, "this is a list of valves\n", StandardCharsets.US_ASCII);
        InputException e = readFails(f);
        assertThat(e).hasMessageContaining("town.gpkg").hasMessageContaining("not a GeoPackage");
    }

    @Test
    void sqliteDatabaseThatIsNotAGeoPackage() throws Exception {
        Path json = TestNetworks.write(dir.resolve("json"), "mains", TestNetworks.mains());
        Path f = dir.resolve("plain.gpkg");
        Gdal.run(null, "ogr2ogr", "-f", "SQLite", f.toString(), json.toString()); // plain SQLite, no GeoPackage tables
        InputException e = readFails(f);
        assertThat(e).hasMessageContaining("plain.gpkg").hasMessageContaining("not a readable GeoPackage");
    }

    @Test
    void emptyLayerIsAWarning() throws Exception {
        Path shp = shapes("mains");
        shapesOf("valves", TestNetworks.collection(), "-nlt", "POINT");
        Network n = readOk(shp);
        assertThat(n.valves()).isEmpty();
        List<Finding> f = withCode(n, "empty-layer");
        assertThat(f).hasSize(1);
        assertThat(f.get(0).severity()).isEqualTo(Severity.WARNING);
        assertThat(f.get(0).message()).contains("valves");
    }

    @Test
    void mixedGeometryTypesAreFoundAndTheOddFeatureSkipped() throws Exception {
        Path json = TestNetworks.write(dir.resolve("json"), "mains", TestNetworks.collection(
                TestNetworks.feature(TestNetworks.line(0, 0, 10, 0), "\"main_id\":\"M1\",\"system_id\":\"LP1\""),
                TestNetworks.feature(TestNetworks.point(5, 5), "\"main_id\":\"M2\",\"system_id\":\"LP1\"")));
        Path gpkg = Gdal.toGpkg(dir.resolve("mixed.gpkg"), List.of(json));
        Network n = readOk(gpkg);
        assertThat(n.mains()).extracting(m -> m.id()).containsExactly("M1");
        assertThat(withCode(n, "mixed-geometry-types")).hasSize(1);
        List<Finding> wrong = withCode(n, "wrong-geometry-type");
        assertThat(wrong).hasSize(1);
        assertThat(wrong.get(0).features()).containsExactly("M2");
        assertThat(wrong.get(0).message()).contains("layer mains", "M2", "Point");
    }

    @Test
    void degreesWithoutPrj() throws Exception {
        String json = "{\"type\":\"FeatureCollection\",\"features\":[{\"type\":\"Feature\",\"geometry\":"
                + "{\"type\":\"LineString\",\"coordinates\":[[-73.99,40.75],[-73.98,40.75]]},"
                + "\"properties\":{\"main_id\":\"M1\",\"system_id\":\"LP1\"}}]}";
        Path shp = shapesOf("mains", json);
        Files.delete(shp.resolve("mains.prj"));
        InputException e = readFails(shp);
        assertThat(e).hasMessageContaining("mains.shp").hasMessageContaining("no .prj").hasMessageContaining("degrees");
    }

    @Test
    void projectedWithoutPrjIsAWarning() throws Exception {
        Path shp = shapes("mains");
        Files.delete(shp.resolve("mains.prj"));
        Network n = readOk(shp);
        assertThat(n.mains()).hasSize(4);
        assertThat(withCode(n, "no-prj")).extracting(Finding::message)
                .singleElement().satisfies(m -> assertThat(m).contains("no .prj: coordinates assumed projected in metres"));
    }

    @Test
    void recordsMarkedDeletedInTheDbfAreLeftOutAsGdalDoes() throws Exception {
        assumeTrue(Gdal.has("ogrinfo"), "ogrinfo not installed: skipped");
        Path shp = shapes("mains");
        Path dbf = shp.resolve("mains.dbf");
        try (RandomAccessFile raf = new RandomAccessFile(dbf.toFile(), "rw")) {
            raf.seek(8);
            int headerLen = Short.reverseBytes(raf.readShort()) & 0xffff;
            int recLen = Short.reverseBytes(raf.readShort()) & 0xffff;
            raf.seek(headerLen + recLen); // second record
            raf.write('*');
        }
        Network n = readOk(shp);
        assertThat(n.mains()).extracting(m -> m.id()).containsExactly("M1", "M3", "M4");
        // GDAL ogrinfo skips deleted records when it iterates (its -so "Feature Count" is the .shx count, 4)
        assertThat(Gdal.iteratedCount(shp.resolve("mains.shp"), "mains")).isEqualTo(3);
    }

    @Test
    void emptyAndRepeatedIdsAreErrorsAndTheFeatureIsSkipped() throws Exception {
        Path shp = shapesOf("mains", TestNetworks.collection(
                TestNetworks.feature(TestNetworks.line(0, 0, 10, 0), "\"main_id\":\"M1\",\"system_id\":\"LP1\""),
                TestNetworks.feature(TestNetworks.line(10, 0, 20, 0), "\"main_id\":\" \",\"system_id\":\"LP1\""),
                TestNetworks.feature(TestNetworks.line(20, 0, 30, 0), "\"main_id\":\"M1\",\"system_id\":\"LP1\"")));
        Network n = readOk(shp);
        assertThat(n.mains()).singleElement().satisfies(m -> assertThat(m.geometry().getCoordinate().x).isEqualTo(TestNetworks.X0));
        assertThat(withCode(n, "missing-id")).singleElement()
                .satisfies(f -> assertThat(f.message()).contains("layer mains", "record 2", "main_id"));
        assertThat(withCode(n, "duplicate-id")).singleElement()
                .satisfies(f -> assertThat(f.message()).contains("M1", "record 3"));
    }

    @Test
    void emptyGeometryIsSkipped() throws Exception {
        Path json = TestNetworks.write(dir.resolve("json"), "mains", TestNetworks.collection(
                TestNetworks.feature(TestNetworks.line(0, 0, 10, 0), "\"main_id\":\"M1\",\"system_id\":\"LP1\""),
                TestNetworks.feature("null", "\"main_id\":\"M2\",\"system_id\":\"LP1\"")));
        Path shp = Gdal.toShapefiles(dir.resolve("shp"), List.of(json));
        Network n = readOk(shp);
        assertThat(n.mains()).extracting(m -> m.id()).containsExactly("M1");
        assertThat(withCode(n, "empty-geometry")).singleElement()
                .satisfies(f -> assertThat(f.message()).contains("M2", "record 2"));
    }

    private static void cut(Path f, int bytes) throws Exception {
        try (RandomAccessFile raf = new RandomAccessFile(f.toFile(), "rw")) {
            raf.setLength(raf.length() - bytes);
        }
    }
}
