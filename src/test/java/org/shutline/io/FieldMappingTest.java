package org.shutline.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.shutline.model.MainStatus;
import org.shutline.model.Network;
import org.shutline.model.Tolerances;

/** The YAML mapping file: parsing, strictness about keys, and its use by the reader. */
class FieldMappingTest {
    @TempDir
    Path dir;

    private Path yaml(String text) throws Exception {
        Path p = dir.resolve("mapping.yaml");
        Files.writeString(p, text);
        return p;
    }

    @Test
    void mapsLayersFieldsAndWords() throws Exception {
        FieldMapping m = FieldMapping.load(yaml("""
                layers:
                  mains: { name: GAS_MAIN, fields: { main_id: MAINNO, status: STAT }, values: { status: { ACT: active, ABN: abandoned } } }
                tolerances: { snap_m: 0.25, service_m: 45 }
                """));
        assertThat(m.layerName("mains")).isEqualTo("GAS_MAIN");
        assertThat(m.layerName("valves")).isEqualTo("valves");
        assertThat(m.fieldName("mains", "main_id")).isEqualTo("MAINNO");
        assertThat(m.fieldName("mains", "system_id")).isEqualTo("system_id");
        assertThat(m.valueWord("mains", "status", " abn ")).isEqualTo("abandoned");
        assertThat(m.valueWord("mains", "status", "proposed")).isEqualTo("proposed");
        assertThat(m.tolerances()).isEqualTo(new Tolerances(0.25, Tolerances.DEFAULT.pointM(), 45, Tolerances.DEFAULT.nearMissFactor()));
        assertThat(FieldMapping.DEFAULT.tolerances()).isNull();
    }

    @Test
    void unquotedYesAndNoAreWords() throws Exception {
        FieldMapping m = FieldMapping.load(yaml("layers:\n  valves: { values: { operable: { Y: yes, N: no, U: unknown } } }\n"));
        assertThat(m.valueWord("valves", "operable", "y")).isEqualTo("yes");
        assertThat(m.valueWord("valves", "operable", "N")).isEqualTo("no");
        assertThat(m.valueWord("valves", "operable", "u")).isEqualTo("unknown");
    }

    @Test
    void unknownKeysNameTheFileAndKey() throws Exception {
        for (String[] c : List.of(
                new String[] {"layer:\n  mains: {name: X}\n", "'layer'"},
                new String[] {"layers:\n  pipes: {name: X}\n", "'layers.pipes'"},
                new String[] {"layers:\n  mains: {title: X}\n", "'layers.mains.title'"},
                new String[] {"layers:\n  mains: {fields: {pipe_no: X}}\n", "'layers.mains.fields.pipe_no'"},
                new String[] {"layers:\n  mains: {values: {status: {A: live}}}\n", "'layers.mains.values.status.A'"},
                new String[] {"tolerances: {snap: 1}\n", "'tolerances.snap'"})) {
            Path p = yaml(c[0]);
            assertThatThrownBy(() -> FieldMapping.load(p)).as(c[0]).isInstanceOf(InputException.class)
                    .hasMessageContaining("mapping.yaml").hasMessageContaining(c[1]);
        }
    }

    @Test
    void aKeyGivenTwiceIsAnError() throws Exception {
        Path p = yaml("layers:\n  mains: {name: A}\n  mains: {name: B}\n");
        assertThatThrownBy(() -> FieldMapping.load(p)).isInstanceOf(InputException.class)
                .hasMessageContaining("mapping.yaml").hasMessageContaining("mains");
    }

    @Test
    void theReaderUsesTheMappingWithCaseInsensitiveNames() throws Exception {
        assumeTrue(Gdal.has("ogr2ogr"), "ogr2ogr not installed: skipped");
        Path json = TestNetworks.write(dir.resolve("json"), "GAS_MAIN", TestNetworks.collection(
                TestNetworks.feature(TestNetworks.line(0, 0, 10, 0), "\"MainNo\":\"M1\",\"SYS\":\"LP1\",\"Stat\":\"ABN\""),
                TestNetworks.feature(TestNetworks.line(10, 0, 20, 0), "\"MainNo\":\"M2\",\"SYS\":\"LP1\",\"Stat\":\"act\"")));
        Path gpkg = Gdal.toGpkg(dir.resolve("theirs.gpkg"), List.of(json));
        FieldMapping m = FieldMapping.load(yaml("""
                layers:
                  mains:
                    name: gas_main
                    fields: { main_id: MAINNO, system_id: sys, status: STAT }
                    values: { status: { ACT: active, ABN: abandoned } }
                """));
        Network n = NetworkReader.read(gpkg, m);
        assertThat(n.mains()).extracting(x -> x.id() + " " + x.systemId() + " " + x.status())
                .containsExactly("M1 LP1 " + MainStatus.ABANDONED, "M2 LP1 " + MainStatus.ACTIVE);
        assertThat(n.readFindings()).noneMatch(f -> f.code().equals("unknown-value"));
        assertThat(n.context()).isEmpty();
    }
}
