package org.shutline.render;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Envelope;
import org.shutline.model.Main;
import org.shutline.model.MainStatus;
import org.shutline.model.Network;

class MapSceneTest {

    @Test
    void systemsRankByHighestMaopThenId() {
        // HP 400 kPa, IP 100 kPa, LP 3 kPa, XX with no MAOP: HP, IP, LP, XX.
        List<Main> mains = List.of(
                new Main("a", "LP", MainStatus.ACTIVE, null, null, 3.0, null, RenderFixtures.line(0, 0, 1, 0)),
                new Main("b", "XX", MainStatus.ACTIVE, null, null, null, null, RenderFixtures.line(0, 1, 1, 1)),
                new Main("c", "HP", MainStatus.ACTIVE, null, null, 400.0, null, RenderFixtures.line(0, 2, 1, 2)),
                new Main("d", "IP", MainStatus.ACTIVE, null, null, 100.0, null, RenderFixtures.line(0, 3, 1, 3)),
                new Main("e", "IP", MainStatus.ACTIVE, null, null, 20.0, null, RenderFixtures.line(0, 4, 1, 4)));
        MapScene s = new MapScene(new Network("n", RenderFixtures.UTM18N, mains, List.of(), List.of(), List.of(),
                List.of(), List.of(), List.of(), List.of()));
        assertThat(s.systems()).containsExactly("HP", "IP", "LP", "XX");
        assertThat(s.rankOf("LP")).isEqualTo(2);
        assertThat(s.rankOf("nowhere")).isEqualTo(4);
    }

    @Test
    void extentAndQueriesUseTheSpatialIndex() {
        MapScene s = new MapScene(RenderFixtures.town());
        Envelope e = s.extent();
        assertThat(e.getMinX()).isEqualTo(RenderFixtures.X0);
        assertThat(e.getMaxX()).isEqualTo(RenderFixtures.X0 + 400);
        assertThat(e.getMinY()).isEqualTo(RenderFixtures.Y0 - 100);
        assertThat(e.getMaxY()).isEqualTo(RenderFixtures.Y0 + 100);
        // A box around V1 only (relative 295..305, 95..105).
        Envelope v1 = new Envelope(RenderFixtures.X0 + 295, RenderFixtures.X0 + 305, RenderFixtures.Y0 + 95, RenderFixtures.Y0 + 105);
        assertThat(s.valvesIn(v1)).extracting(v -> v.id()).containsExactly("V1");
        assertThat(s.mainsIn(v1)).extracting(Main::id).containsExactly("M2");
        assertThat(s.servicesIn(v1)).isEmpty();
        assertThat(new MapScene(new Network("empty", RenderFixtures.UTM18N, List.of(), List.of(), List.of(), List.of(),
                List.of(), List.of(), List.of(), List.of())).extent().isNull()).isTrue();
    }
}
