package org.shutline.io;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.shutline.io.sample.GridTown;
import org.shutline.model.Feature;
import org.shutline.model.Findings;
import org.shutline.model.Network;

/**
 * The network reader's path (SQL reader, each row made into its record at once, each raw
 * feature dropped once used) against the old one (NGA's row objects kept as
 * {@link NgaGeoPackageSource}, then the whole list of decoded rows): per network layer,
 * row by row (id, geometry exactly, every typed value) and every finding in order, on the
 * committed sample (which carries a flaw of each kind) and on a generated grid town; and
 * the model records {@link NetworkReader} returns follow the same rows in the same order.
 */
class StreamedDecodeTest {
    @TempDir
    Path dir;

    private static void sameAsOldPath(Path gpkg) throws Exception {
        List<RawLayer> oldRaw = NgaGeoPackageSource.read(gpkg);
        List<RawLayer> newRaw = GeoPackageSource.read(gpkg);
        Network network = NetworkReader.read(gpkg, FieldMapping.DEFAULT);
        int layersSeen = 0;
        for (Schema.Layer l : Schema.LAYERS) {
            RawLayer a = oldRaw.stream().filter(r -> r.name().equalsIgnoreCase(l.name())).findFirst().orElse(null);
            RawLayer b = newRaw.stream().filter(r -> r.name().equalsIgnoreCase(l.name())).findFirst().orElse(null);
            assertThat(b == null).as(l.name()).isEqualTo(a == null);
            if (a == null) continue;
            layersSeen++;
            Findings fa = new Findings();
            Findings fb = new Findings();
            List<LayerDecoder.Row> old = LayerDecoder.decode(l, a, FieldMapping.DEFAULT, fa);
            List<LayerDecoder.Row> now = LayerDecoder.decode(l, b, FieldMapping.DEFAULT, fb, r -> r, true);
            String at = gpkg.getFileName() + " layer " + l.name();
            assertThat(fb.list()).as(at + " findings").isEqualTo(fa.list());
            assertThat(now).as(at).hasSameSizeAs(old);
            for (int i = 0; i < old.size(); i++) {
                LayerDecoder.Row x = old.get(i);
                LayerDecoder.Row y = now.get(i);
                assertThat(y.id()).as(at + " row " + i).isEqualTo(x.id());
                assertThat(y.geometry().equalsExact(x.geometry())).as(at + " geometry of " + x.id()).isTrue();
                assertThat(y.values()).as(at + " values of " + x.id()).isEqualTo(x.values());
            }
            assertThat(b.features()).as(at + ": every raw feature dropped once decoded").containsOnlyNulls();
            List<? extends Feature> records = switch (l.name()) {
                case "mains" -> network.mains();
                case "valves" -> network.valves();
                case "stations" -> network.stations();
                case "sense_taps" -> network.taps();
                case "services" -> network.services();
                case "sources" -> network.sources();
                default -> throw new IllegalStateException(l.name());
            };
            assertThat(records).extracting(Feature::id).as(at + " records").containsExactlyElementsOf(old.stream().map(LayerDecoder.Row::id).toList());
            for (int i = 0; i < old.size(); i++) {
                assertThat(records.get(i).geometry().equalsExact(old.get(i).geometry())).as(at + " record " + i).isTrue();
            }
        }
        assertThat(layersSeen).isGreaterThanOrEqualTo(5);
    }

    @Test
    void sampleTownDecodesAsBefore() throws Exception {
        Path copy = dir.resolve("tallowmere.gpkg");
        Files.copy(Path.of("sample-gis/tallowmere.gpkg"), copy);
        sameAsOldPath(copy);
    }

    @Test
    void generatedTownDecodesAsBefore() throws Exception {
        Network town = GridTown.generate(3000, 11).network();
        Path gpkg = dir.resolve("town.gpkg");
        NetworkWriter.writeGeoPackage(town, gpkg);
        sameAsOldPath(gpkg);
    }
}
