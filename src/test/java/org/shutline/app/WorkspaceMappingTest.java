package org.shutline.app;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.shutline.io.FieldMapping;
import org.shutline.io.NetworkReader;
import org.shutline.model.Finding;
import org.shutline.model.Progress;
import org.shutline.topology.NetworkBuilder;
import org.shutline.topology.Topology;

/**
 * The window reads a network through a field-mapping file as the command line does: the
 * sample with a mapping that names the status word 'actve' as active and widens the
 * point tolerance to 6 m (V-OFF lies 5 m off its main, sample-gis/README.md) loses exactly
 * those two error findings, and gives the same findings as the command-line read.
 */
class WorkspaceMappingTest {
    private static final Path NETWORK = Path.of("sample-gis/tallowmere.gpkg");

    @TempDir Path dir;

    @Test
    void theWindowReadsWithAMappingFileAndShowsWhatCheckShows() throws Exception {
        Path mapping = dir.resolve("mapping.yaml");
        Files.writeString(mapping, """
                layers:
                  mains:
                    values:
                      status: { actve: active }
                tolerances: { point_m: 6 }
                """);
        Workspace plain = Workspace.load(NETWORK, Progress.NONE);
        Workspace mapped = Workspace.load(NETWORK, mapping, Progress.NONE);
        assertThat(mapped.mapping()).isEqualTo(mapping);
        assertThat(codes(plain.findings())).contains("unknown-value", "valve-off-main");
        assertThat(codes(mapped.findings())).doesNotContain("unknown-value", "valve-off-main");
        // the command line's read (check --mapping) of the same file: the same findings, in the same order
        FieldMapping m = FieldMapping.load(mapping);
        Topology t = NetworkBuilder.build(NetworkReader.read(NETWORK, m), m.tolerances(), Progress.NONE);
        assertThat(mapped.findings().stream().map(Finding::message).toList())
                .isEqualTo(t.findings().stream().map(Finding::message).toList());
        // a context layer added later keeps the mapping the network was read with
        assertThat(mapped.withContext(new org.shutline.model.ContextLayer("extra", List.of())).mapping()).isEqualTo(mapping);
    }

    private static List<String> codes(List<Finding> fs) {
        return fs.stream().map(Finding::code).distinct().toList();
    }
}
