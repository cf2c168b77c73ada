package org.shutline.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.shutline.model.Feature;
import org.shutline.model.Network;

/**
 * The bundled sample network passed through GDAL: each layer of
 * sample-gis/tallowmere.gpkg converted by {@code ogr2ogr} to GeoJSON, and the GeoJSON
 * converted by {@code ogr2ogr} to a new GeoPackage and to a shapefile folder. Both
 * GDAL-written copies load to the same model as the original, and the feature counts
 * equal what GDAL's {@code ogrinfo} reports.
 */
class SampleTownGdalTest {
    static final Path SAMPLE = Path.of("sample-gis/tallowmere.gpkg");
    static final List<String> LAYERS = List.of("mains", "valves", "stations", "sense_taps", "services", "sources", "streets");

    @TempDir static Path dir;
    static Network original;
    static Network viaGpkg;
    static Network viaShp;
    static Path gpkg;
    static Path shp;

    @BeforeAll
    static void convert() throws Exception {
        assumeTrue(Gdal.has("ogr2ogr") && Gdal.has("ogrinfo"), "ogr2ogr not installed: skipped");
        List<Path> json = new ArrayList<>();
        for (String layer : LAYERS) {
            Path out = dir.resolve(layer + ".geojson");
            // GDAL's GeoJSON driver keeps about 15 significant digits: positions agree to 0.1 mm
            Gdal.run(null, "ogr2ogr", "-f", "GeoJSON", "-lco", "COORDINATE_PRECISION=9", out.toString(), SAMPLE.toString(), layer);
            json.add(out);
        }
        gpkg = Gdal.toGpkg(dir.resolve("gdal.gpkg"), json);
        shp = Gdal.toShapefiles(dir.resolve("gdal-shp"), json);
        original = NetworkReader.read(SAMPLE, FieldMapping.DEFAULT);
        viaGpkg = NetworkReader.read(gpkg, FieldMapping.DEFAULT);
        viaShp = NetworkReader.read(shp, FieldMapping.DEFAULT);
    }

    @Test
    void bothGdalCopiesLoadToTheSameModelAsTheOriginal() {
        for (Network n : List.of(viaGpkg, viaShp)) {
            same(n.mains(), original.mains());
            same(n.valves(), original.valves());
            same(n.stations(), original.stations());
            same(n.taps(), original.taps());
            same(n.services(), original.services());
            same(n.sources(), original.sources());
            assertThat(n.context()).hasSize(1);
            assertThat(n.context().get(0).items()).hasSameSizeAs(original.context().get(0).items());
        }
        // attributes, field by field, on records without geometry
        assertThat(viaShp.valves().stream().map(v -> v.id() + v.kind() + v.normal() + v.operable() + v.checked()).toList())
                .isEqualTo(original.valves().stream().map(v -> v.id() + v.kind() + v.normal() + v.operable() + v.checked()).toList());
        assertThat(viaShp.stations().stream().map(s -> s.id() + s.setKpa() + s.monitorKpa() + s.reliefKpa() + s.name()).toList())
                .isEqualTo(original.stations().stream().map(s -> s.id() + s.setKpa() + s.monitorKpa() + s.reliefKpa() + s.name()).toList());
        assertThat(viaGpkg.services().stream().map(s -> s.id() + s.serviceClass() + s.meters() + s.critical() + s.mainId() + s.address()).toList())
                .isEqualTo(original.services().stream().map(s -> s.id() + s.serviceClass() + s.meters() + s.critical() + s.mainId() + s.address()).toList());
    }

    private static void same(List<? extends Feature> got, List<? extends Feature> want) {
        assertThat(got).hasSameSizeAs(want);
        for (int i = 0; i < want.size(); i++) {
            assertThat(got.get(i).id()).isEqualTo(want.get(i).id());
            assertThat(got.get(i).geometry().equalsExact(want.get(i).geometry(), 1e-4)).as(want.get(i).id()).isTrue();
        }
    }

    @Test
    void featureCountsEqualOgrinfo() throws Exception {
        Map<String, Integer> counts = Gdal.featureCounts(SAMPLE);
        // ogrinfo -so -al counts every row; our reader skips one of the two valves sharing an id (a deliberate flaw)
        assertThat(counts.get("mains")).isEqualTo(original.mains().size());
        assertThat(counts.get("valves")).isEqualTo(original.valves().size() + 1);
        assertThat(counts.get("stations")).isEqualTo(original.stations().size());
        assertThat(counts.get("sense_taps")).isEqualTo(original.taps().size());
        assertThat(counts.get("services")).isEqualTo(original.services().size());
        assertThat(counts.get("sources")).isEqualTo(original.sources().size());
        assertThat(counts.get("streets")).isEqualTo(original.context().get(0).items().size());
        assertThat(Gdal.featureCounts(shp)).isEqualTo(counts);
        assertThat(Gdal.featureCounts(gpkg)).isEqualTo(counts);
    }
}
