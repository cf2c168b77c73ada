package org.shutline.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.locationtech.jts.io.WKTReader;
import org.shutline.model.ContextLayer;
import org.shutline.model.Finding;
import org.shutline.model.LinearUnit;
import org.shutline.model.MainStatus;
import org.shutline.model.Network;
import org.shutline.model.NormalPosition;
import org.shutline.model.Operability;
import org.shutline.model.ServiceClass;
import org.shutline.model.TapDevice;
import org.shutline.model.ValveKind;

/**
 * The same small network converted by GDAL's ogr2ogr into a GeoPackage and into a
 * shapefile folder reads to the same model, with the feature counts GDAL's ogrinfo
 * reports (reference: GDAL 3.6 ogr2ogr / ogrinfo run in the test).
 */
class RoundTripTest {
    @TempDir
    static Path dir;
    static Path gpkg;
    static Path shapes;

    @BeforeAll
    static void convert() throws Exception {
        assumeTrue(Gdal.has("ogr2ogr") && Gdal.has("ogrinfo"), "ogr2ogr not installed: skipped");
        List<Path> json = TestNetworks.writeAll(dir.resolve("json"));
        gpkg = Gdal.toGpkg(dir.resolve("town.gpkg"), json);
        shapes = Gdal.toShapefiles(dir.resolve("shp"), json);
    }

    @Test
    void geopackageAndShapefilesGiveTheSameModel() throws Exception {
        var before = Snapshot.of(dir);
        Network a = NetworkReader.read(gpkg, FieldMapping.DEFAULT);
        Network b = NetworkReader.read(shapes, FieldMapping.DEFAULT);
        assertThat(Snapshot.of(dir)).as("input files unchanged by reading").isEqualTo(before);
        assertThat(a.mains()).isEqualTo(b.mains());
        assertThat(a.valves()).isEqualTo(b.valves());
        assertThat(a.stations()).isEqualTo(b.stations());
        assertThat(a.taps()).isEqualTo(b.taps());
        assertThat(a.services()).isEqualTo(b.services());
        assertThat(a.sources()).isEqualTo(b.sources());
        assertThat(a.context()).isEqualTo(b.context());
        assertThat(codes(a.readFindings())).isEqualTo(codes(b.readFindings()));
        assertThat(a.crs().unit()).isEqualTo(LinearUnit.METRE);
        assertThat(a.crs().epsg()).isEqualTo(32618);
        assertThat(b.crs().epsg()).isZero(); // GDAL's .prj carries no EPSG code: translated WKT
        // the EPSG definition and the translated .prj agree to 1e-9 degree (about 0.1 mm)
        double[] pa = Crs.toLonLat(a.crs()).apply(500000, 4300000);
        double[] pb = Crs.toLonLat(b.crs()).apply(500000, 4300000);
        assertThat(pa[0]).isCloseTo(pb[0], org.assertj.core.api.Assertions.within(1e-9));
        assertThat(pa[1]).isCloseTo(pb[1], org.assertj.core.api.Assertions.within(1e-9));
    }

    @Test
    void fieldsAndWordsAreReadAsWritten() throws Exception {
        Network n = NetworkReader.read(gpkg, FieldMapping.DEFAULT);
        WKTReader wkt = new WKTReader();
        assertThat(n.mains()).extracting(m -> m.id()).containsExactly("M1", "M2", "M3", "M4");
        var m1 = n.mains().get(0);
        assertThat(m1.status()).isEqualTo(MainStatus.ACTIVE);
        assertThat(m1.diamMm()).isEqualTo(114.3);
        assertThat(m1.installYr()).isEqualTo(1998);
        assertThat(m1.geometry()).isEqualTo(wkt.read("LINESTRING (500100 4300000, 500200 4300000)"));
        assertThat(n.mains().get(1).status()).isEqualTo(MainStatus.ABANDONED);
        assertThat(n.mains().get(1).maopKpa()).isNull();
        assertThat(n.mains().get(2).geometry().getGeometryType()).isEqualTo("MultiLineString");
        assertThat(n.mains().get(2).installYr()).isNull();
        assertThat(n.mains().get(3).status()).isEqualTo(MainStatus.DEFAULT); // "actve" is unknown
        var v1 = n.valves().get(0);
        assertThat(v1.kind()).isEqualTo(ValveKind.MAIN);
        assertThat(v1.operable()).isEqualTo(Operability.YES);
        assertThat(v1.checked()).isEqualTo(LocalDate.of(2024, 3, 15));
        var v2 = n.valves().get(1);
        assertThat(v2.normal()).isEqualTo(NormalPosition.CLOSED);
        assertThat(v2.operable()).isEqualTo(Operability.UNKNOWN);
        assertThat(v2.checked()).isNull();
        assertThat(n.stations().get(0).monitorKpa()).isEqualTo(2.2);
        assertThat(n.stations().get(0).reliefKpa()).isNull();
        assertThat(n.stations().get(0).name()).isEqualTo("Millbrook Gate");
        assertThat(n.taps().get(0).device()).isEqualTo(TapDevice.WORKER);
        assertThat(n.services().get(0).meters()).isEqualTo(2);
        assertThat(n.services().get(0).mainId()).isEqualTo("M1");
        assertThat(n.services().get(1).meters()).isEqualTo(1); // empty meters default to 1
        assertThat(n.services().get(1).serviceClass()).isEqualTo(ServiceClass.CRITICAL);
        assertThat(n.services().get(1).address()).isEqualTo("5 Rue \u00c9lan");
        assertThat(n.sources().get(0).kpa()).isEqualTo(400.0);
        ContextLayer streets = n.context().get(0);
        assertThat(streets.name()).isEqualTo("streets");
        assertThat(streets.items().get(0).text("name")).isEqualTo("Quarry Lane");
        assertThat(streets.items().get(0).attributes().get("lanes")).isEqualTo(2L);
    }

    @Test
    void theUnknownWordIsOneErrorNamingLayerFeatureAndField() throws Exception {
        for (Path p : List.of(gpkg, shapes)) {
            Network n = NetworkReader.read(p, FieldMapping.DEFAULT);
            List<Finding> unknown = n.readFindings().stream().filter(f -> f.code().equals("unknown-value")).toList();
            assertThat(unknown).hasSize(1);
            assertThat(unknown.get(0).features()).containsExactly("M4");
            assertThat(unknown.get(0).message()).contains("mains", "M4", "status", "actve", "active");
            assertThat(unknown.get(0).x()).isEqualTo(500000.0);
        }
    }

    @Test
    void featureCountsMatchOgrinfo() throws Exception {
        for (Path p : List.of(gpkg, shapes)) {
            Network n = NetworkReader.read(p, FieldMapping.DEFAULT);
            Map<String, Integer> counts = Gdal.featureCounts(p); // GDAL ogrinfo -so -al
            assertThat(counts).containsEntry("mains", n.mains().size()).containsEntry("valves", n.valves().size())
                    .containsEntry("stations", n.stations().size()).containsEntry("sense_taps", n.taps().size())
                    .containsEntry("services", n.services().size()).containsEntry("sources", n.sources().size())
                    .containsEntry("streets", n.context().get(0).items().size()).hasSize(7);
        }
    }

    private static List<String> codes(List<Finding> fs) {
        return fs.stream().map(Finding::code).sorted().toList();
    }
}
