package org.shutline.io;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.shutline.model.ContextLayer;
import org.shutline.model.CrsInfo;
import org.shutline.model.LinearUnit;
import org.shutline.model.Main;
import org.shutline.model.MainStatus;
import org.shutline.model.Network;
import org.shutline.model.NormalPosition;
import org.shutline.model.Operability;
import org.shutline.model.SenseTap;
import org.shutline.model.Service;
import org.shutline.model.ServiceClass;
import org.shutline.model.Source;
import org.shutline.model.Station;
import org.shutline.model.TapDevice;
import org.shutline.model.Valve;
import org.shutline.model.ValveKind;

/**
 * Writes a small network and reads it back with GDAL's {@code ogrinfo} (gdal-bin), the
 * outside reference for what other GIS software sees in our files.
 *
 * <pre>
 *   S1 o=====IP-A=====+ ST1 --- LP-A ---- v1 ---- LP-B
 *                                 s1 (service)  t1 (tap)
 * </pre>
 */
class NetworkWriterTest {
    static final CrsInfo UTM15 = new CrsInfo("WGS 84 / UTM zone 15N", 32615, null, LinearUnit.METRE);
    static final GeometryFactory GF = new GeometryFactory();
    static final Path OGRINFO = Path.of("/usr/bin/ogrinfo");

    @TempDir Path dir;

    @BeforeAll
    static void needGdal() {
        Assumptions.assumeTrue(Files.isExecutable(OGRINFO), "ogrinfo not installed: skipped");
    }

    static Network network() {
        double x = 500000, y = 4900000;
        List<Main> mains = List.of(
            new Main("IP-A", "IP-1", MainStatus.ACTIVE, "steel", 150.0, 420.0, 1988,
                GF.createLineString(new Coordinate[] {new Coordinate(x, y), new Coordinate(x + 100, y)})),
            new Main("LP-A", "LP-1", MainStatus.ACTIVE, "cast iron", 100.0, 1.7, 1952,
                GF.createLineString(new Coordinate[] {new Coordinate(x + 101, y + 1), new Coordinate(x + 200, y + 1)})),
            new Main("LP-B", "LP-1", MainStatus.PROPOSED, "PE", null, null, null,
                GF.createMultiLineString(new org.locationtech.jts.geom.LineString[] {
                    GF.createLineString(new Coordinate[] {new Coordinate(x + 200, y + 1), new Coordinate(x + 300, y + 1)}),
                    GF.createLineString(new Coordinate[] {new Coordinate(x + 300, y + 1), new Coordinate(x + 300, y + 90)})})));
        List<Valve> valves = List.of(new Valve("V1", "LP-1", ValveKind.MAIN, NormalPosition.CLOSED, Operability.NO,
            LocalDate.of(2025, 3, 14), GF.createPoint(new Coordinate(x + 150, y + 1))));
        List<Station> stations = List.of(new Station("ST1", "IP-1", "LP-1", 1.74, null, 3.0, "Weir Lane Station",
            GF.createPoint(new Coordinate(x + 100.5, y + 0.5))));
        List<SenseTap> taps = List.of(new SenseTap("T1", "ST1", TapDevice.BOTH, GF.createPoint(new Coordinate(x + 250, y + 1))));
        List<Service> services = List.of(new Service("S1", "LP-1", ServiceClass.CRITICAL, 2, "clinic", "LP-A",
            "12 Weir Lane", GF.createPoint(new Coordinate(x + 120, y + 20))));
        List<Source> sources = List.of(new Source("SRC1", "IP-1", 400.0, GF.createPoint(new Coordinate(x, y))));
        ContextLayer streets = new ContextLayer("streets", List.of(new ContextLayer.Item(
            GF.createLineString(new Coordinate[] {new Coordinate(x, y - 3), new Coordinate(x + 300, y - 3)}),
            Map.of("name", "Weir Lane"))));
        ContextLayer parcels = new ContextLayer("parcels", List.of(new ContextLayer.Item(
            GF.createPolygon(new Coordinate[] {new Coordinate(x, y + 10), new Coordinate(x + 50, y + 10),
                new Coordinate(x + 50, y + 60), new Coordinate(x, y + 60), new Coordinate(x, y + 10)}),
            Map.of("parcel_number", 17))));
        return new Network("test", UTM15, mains, valves, stations, taps, services, sources, List.of(streets, parcels),
            List.of());
    }

    static String ogrinfo(String... args) throws IOException, InterruptedException {
        List<String> cmd = new ArrayList<>(List.of(OGRINFO.toString(), "-ro"));
        cmd.addAll(List.of(args));
        Process p = new ProcessBuilder(cmd).redirectErrorStream(true).start();
        String out = new String(p.getInputStream().readAllBytes());
        assertThat(p.waitFor(60, TimeUnit.SECONDS)).isTrue();
        assertThat(p.exitValue()).as(out).isZero();
        return out;
    }

    @Test
    void geoPackageReadsBackInGdal() throws Exception {
        Path gpkg = dir.resolve("t.gpkg");
        NetworkWriter.writeGeoPackage(network(), gpkg);
        assertThat(dir.toFile().list()).containsExactly("t.gpkg"); // temp file moved into place
        String so = ogrinfo("-so", "-al", gpkg.toString());
        // ogrinfo -so -al: "Layer name:", "Geometry:", "Feature Count:", CRS as WKT with ID["EPSG",32615]
        assertThat(so).contains("Layer name: mains", "Layer name: valves", "Layer name: stations",
            "Layer name: sense_taps", "Layer name: services", "Layer name: sources", "Layer name: streets",
            "Layer name: parcels");
        assertThat(so).contains("Geometry: Point", "Geometry: Polygon", "Geometry: Line String", "Geometry: Unknown (any)");
        assertThat(so).contains("ID[\"EPSG\",32615]", "UTM zone 15N");
        assertThat(so).contains("monitor_kpa: Real", "install_yr: Integer", "checked: Date", "parcel_number: Integer");
        String mains = ogrinfo("-al", gpkg.toString(), "mains");
        assertThat(mains).contains("Feature Count: 3", "main_id (String) = LP-A", "material (String) = cast iron",
            "install_yr (Integer) = 1952", "status (String) = proposed", "diam_mm (Real) = (null)");
        assertThat(mains).contains("MULTILINESTRING ((500200 4900001,500300 4900001),(500300 4900001,500300 4900090))");
        String valves = ogrinfo("-al", gpkg.toString(), "valves");
        assertThat(valves).contains("checked (Date) = 2025/03/14", "operable (String) = no", "normal (String) = closed",
            "POINT (500150 4900001)");
        String stations = ogrinfo("-al", gpkg.toString(), "stations");
        assertThat(stations).contains("set_kpa (Real) = 1.74", "monitor_kpa (Real) = (null)",
            "name (String) = Weir Lane Station");
    }

    @Test
    void shapefilesReadBackInGdal() throws Exception {
        Path folder = dir.resolve("shp");
        NetworkWriter.writeShapefiles(network(), folder);
        assertThat(folder.toFile().list()).hasSize(8 * 5).allMatch(n -> !n.startsWith("."));
        assertThat(Files.readString(folder.resolve("mains.cpg"))).isEqualTo("UTF-8");
        String so = ogrinfo("-so", "-al", folder.toString());
        assertThat(so).contains("Layer name: mains", "Layer name: sense_taps", "Layer name: parcels");
        assertThat(so).contains("Geometry: Line String", "Geometry: Point", "Geometry: Polygon");
        // GDAL identifies our ESRI .prj as EPSG:32615 (ogrinfo -so shows the WKT2 name and ID)
        assertThat(so).contains("WGS 84 / UTM zone 15N", "ID[\"EPSG\",32615]");
        assertThat(so).contains("monitor_kp: Real", "install_yr: Integer", "checked: Date", "parcel_num: Integer");
        String mains = ogrinfo("-al", folder.toString(), "mains");
        assertThat(mains).contains("Feature Count: 3", "main_id (String) = LP-A", "install_yr (Integer) = 1952",
            "material (String) = cast iron", "status (String) = proposed");
        assertThat(mains).contains("MULTILINESTRING ((500200 4900001,500300 4900001),(500300 4900001,500300 4900090))");
        String valves = ogrinfo("-al", folder.toString(), "valves");
        assertThat(valves).contains("checked (Date) = 2025/03/14", "operable (String) = no", "POINT (500150 4900001)");
        String services = ogrinfo("-al", folder.toString(), "services");
        assertThat(services).contains("meters (Integer) = 2", "critical (String) = clinic", "address (String) = 12 Weir Lane");
        String parcels = ogrinfo("-al", folder.toString(), "parcels");
        // shell written clockwise; GDAL reports polygons with the shell as the first ring
        assertThat(parcels).contains("POLYGON ((500000 4900010,");
    }

    /**
     * A polygon with a hole given counter-clockwise shell / clockwise hole (JTS does not care),
     * and a row without geometry: the shapefile needs the shell clockwise (ESRI 1998, p. 8) and
     * a Null shape; GDAL must read the hole back as a hole and the row as having no geometry.
     */
    @Test
    void polygonRingsAndNullShapes() throws Exception {
        var shell = new Coordinate[] {new Coordinate(0, 0), new Coordinate(10, 0), new Coordinate(10, 10),
            new Coordinate(0, 10), new Coordinate(0, 0)};
        var hole = new Coordinate[] {new Coordinate(2, 2), new Coordinate(2, 4), new Coordinate(4, 4),
            new Coordinate(4, 2), new Coordinate(2, 2)};
        var poly = GF.createPolygon(GF.createLinearRing(shell), new org.locationtech.jts.geom.LinearRing[] {
            GF.createLinearRing(hole)});
        WriteLayer l = WriteLayer.of("blocks", WriteLayer.GeometryKind.POLYGON,
            List.of(new WriteLayer.Column("name", WriteLayer.ColumnType.TEXT)),
            java.util.Arrays.asList(poly, null), List.of(List.of("with hole"), java.util.Arrays.asList((Object) null)));
        ShapefileWriter.write(dir, UTM15, List.of(l), org.shutline.model.Progress.NONE);
        String out = ogrinfo("-al", dir.resolve("blocks.shp").toString());
        assertThat(out).contains("Feature Count: 2", "name (String) = with hole");
        assertThat(out).containsPattern("POLYGON \\(\\(0 0,0 10,10 10,10 0,0 0\\),\\(2 2,[^)]*\\)\\)");
        // GDAL prints no geometry line for a Null shape: exactly one POLYGON for two features
        assertThat(out.split("POLYGON", -1)).hasSize(2);
        // .shx: 100-byte header + 8 bytes a record; the Null record's content is 4 bytes (2 words)
        byte[] shx = Files.readAllBytes(dir.resolve("blocks.shx"));
        assertThat(shx).hasSize(116);
        assertThat(java.nio.ByteBuffer.wrap(shx, 112, 4).getInt()).isEqualTo(2);
    }

    @Test
    void shortFieldNamesAreUnique() {
        List<WriteLayer.Column> cols = List.of(new WriteLayer.Column("monitor_kpa", WriteLayer.ColumnType.REAL),
            new WriteLayer.Column("monitor_kpb", WriteLayer.ColumnType.REAL),
            new WriteLayer.Column("name", WriteLayer.ColumnType.TEXT));
        assertThat(ShapefileWriter.fieldNames(cols)).containsExactly("monitor_kp", "monitor_k1", "name");
    }
}
