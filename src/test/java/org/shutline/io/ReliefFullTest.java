package org.shutline.io;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.shutline.model.Network;
import org.shutline.model.Station;

/** The optional station field relief_full: read from both sample formats, and mapped like other value words. */
class ReliefFullTest {
    @Test
    void sampleStationsCarryTheirReliefCapacityInBothFormats() throws Exception {
        for (String f : new String[] {"sample-gis/tallowmere.gpkg", "sample-gis/tallowmere-shp"}) {
            Network n = NetworkReader.read(Path.of(f), FieldMapping.DEFAULT);
            Map<String, Station> st = n.stations().stream().collect(Collectors.toMap(Station::id, s -> s));
            // SampleTown: ST-N1's relief full-capacity, ST-E1's token, ST-S1 and ST-N2 have no relief (empty)
            assertThat(st.get("ST-N1").reliefFull()).as(f).isTrue();
            assertThat(st.get("ST-N1").hasFullRelief()).isTrue();
            assertThat(st.get("ST-E1").reliefFull()).as(f).isFalse();
            assertThat(st.get("ST-E1").hasFullRelief()).isFalse();
            assertThat(st.get("ST-S1").reliefFull()).as(f).isNull();
            assertThat(n.readFindings()).noneMatch(x -> x.message().contains("relief_full"));
        }
    }

    @Test
    void theirWordsMapToYesAndNo(@TempDir Path dir) throws Exception {
        Path m = dir.resolve("map.yaml");
        Files.writeString(m, "layers:\n  stations:\n    fields: { relief_full: RLF_FULL }\n    values:\n      relief_full: { Y: yes, N: no }\n");
        FieldMapping fm = FieldMapping.load(m);
        assertThat(fm.fieldName("stations", "relief_full")).isEqualTo("RLF_FULL");
        assertThat(fm.valueWord("stations", "relief_full", "y")).isEqualTo("yes");
        assertThat(fm.valueWord("stations", "relief_full", "N")).isEqualTo("no");
    }
}
