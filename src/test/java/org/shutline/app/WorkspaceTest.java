package org.shutline.app;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.shutline.io.InputException;
import org.shutline.model.Finding;
import org.shutline.model.Progress;
import org.shutline.model.Tolerances;
import org.shutline.trace.FeedTrace;
import org.shutline.trace.NetworkState;
import org.shutline.trace.ValveSegments;

/**
 * The one open of a network: tolerances from the settings file, else the mapping file,
 * else the defaults, a conflict between the two files refused; derived values made on
 * first use, once, and equal to computing them directly.
 */
class WorkspaceTest {
    private static final Path NETWORK = Path.of("sample-gis/tallowmere.gpkg");
    @TempDir Path dir;

    @Test
    void theSettingsFilesTolerancesAreUsedAndAConflictWithTheMappingIsRefused() throws Exception {
        // V-OFF lies 5 m off its main (sample-gis/README.md): a point tolerance of 6 m attaches it
        Path settings = dir.resolve("site.yaml");
        Files.writeString(settings, "tolerances: { point_m: 6 }\n");
        AnalysisSettings s = AnalysisSettings.load(settings);
        Workspace plain = Workspace.open(NETWORK, null, AnalysisSettings.defaults(), Progress.NONE);
        Workspace wide = Workspace.open(NETWORK, null, s, Progress.NONE);
        assertThat(plain.topology().tolerances()).isEqualTo(Tolerances.DEFAULT);
        assertThat(wide.topology().tolerances()).isEqualTo(new Tolerances(0.5, 6, 60, 5));
        assertThat(plain.findings().stream().map(Finding::code)).contains("valve-off-main");
        assertThat(wide.findings().stream().map(Finding::code)).doesNotContain("valve-off-main");

        Path sameMapping = dir.resolve("same.yaml");
        Files.writeString(sameMapping, "tolerances: { point_m: 6 }\n");
        assertThat(Workspace.open(NETWORK, sameMapping, s, Progress.NONE).topology().tolerances()).isEqualTo(wide.topology().tolerances());
        Path otherMapping = dir.resolve("other.yaml");
        Files.writeString(otherMapping, "tolerances: { point_m: 4 }\n");
        assertThatThrownBy(() -> Workspace.open(NETWORK, otherMapping, s, Progress.NONE)).isInstanceOf(InputException.class)
                .hasMessageContaining(otherMapping.toString()).hasMessageContaining(settings.toString());
        // the mapping file's tolerances alone still count, as before
        assertThat(Workspace.open(NETWORK, otherMapping, AnalysisSettings.defaults(), Progress.NONE).topology().tolerances().pointM())
                .isEqualTo(4.0);
    }

    @Test
    void derivedValuesAreMadeOnceAndEqualDirectComputation() throws Exception {
        Workspace w = Workspace.open(NETWORK, null, AnalysisSettings.defaults(LocalDate.of(2026, 12, 1)), Progress.NONE);
        NetworkState direct = NetworkState.of(w.topology());
        ValveSegments segs = ValveSegments.build(direct);
        assertThat(w.segments()).isSameAs(w.segments());
        assertThat(w.segments().segmentCount()).isEqualTo(segs.segmentCount());
        for (int e = 0; e < w.topology().graph().edgeCount(); e++) {
            assertThat(w.segments().edgeSegment(e)).as("edge %d", e).isEqualTo(segs.edgeSegment(e));
        }
        assertThat(w.trace()).isSameAs(w.trace());
        assertThat(w.trace().fedServices()).isEqualTo(FeedTrace.run(direct).fedServices());
        // id lookups: the first feature with the id, -1 for none
        for (int i = 0; i < w.network().valves().size(); i++) {
            int found = w.valveIndex(w.network().valves().get(i).id());
            assertThat(found).isLessThanOrEqualTo(i);
            assertThat(w.network().valves().get(found).id()).isEqualTo(w.network().valves().get(i).id());
        }
        assertThat(w.mainIndex("no-such-main")).isEqualTo(-1);
        assertThat(w.usableMains()).isPositive();
    }

    @Test
    void aMissingNetworkOrMappingIsRefusedNamingIt() {
        Path none = dir.resolve("none.gpkg");
        assertThatThrownBy(() -> Workspace.open(none, null, AnalysisSettings.defaults(), Progress.NONE))
                .isInstanceOf(InputException.class).hasMessageContaining("cannot read " + none);
        Path noMap = dir.resolve("none.yaml");
        assertThatThrownBy(() -> Workspace.open(NETWORK, noMap, AnalysisSettings.defaults(), Progress.NONE))
                .isInstanceOf(InputException.class).hasMessageContaining("cannot read mapping file " + noMap);
    }
}
