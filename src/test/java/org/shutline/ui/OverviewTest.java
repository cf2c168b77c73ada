package org.shutline.ui;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.shutline.app.Workspace;
import org.shutline.render.MapOverlays;
import org.shutline.render.MapStyle;
import org.shutline.render.Viewport;

/** The overview picture serves only coarse views with the settings it was made for, and draws the network. */
class OverviewTest {
    @Test
    void servesCoarseViewsOfItsOwnSettings() throws Exception {
        Workspace ws = SampleWorkspace.get();
        assertThat(Overview.wanted(ws)).as("the sample is small: always drawn in full").isFalse();
        MapLayers layers = MapLayers.defaults(List.of("streets"));
        Overview ov = Overview.build(ws, MapStyle.LIGHT, layers);
        Viewport whole = Viewport.fitting(ws.scene().extent(), 400, 300, 10);
        assertThat(ov.serves(ws, MapStyle.LIGHT, layers, whole)).isTrue();
        assertThat(ov.serves(ws, MapStyle.DARK, layers, whole)).isFalse();
        assertThat(ov.serves(ws, MapStyle.LIGHT, layers.withVisible(4, false), whole)).isFalse();
        assertThat(ov.serves(ws, MapStyle.LIGHT, layers, whole.withScale(0.1))).as("finer than the picture").isFalse();
        var fromOverview = ov.render(whole, MapOverlays.NONE, List.of());
        var full = MapView.render(whole, ws, MapStyle.LIGHT, layers, MapOverlays.NONE, List.of(), true);
        // the same network, thinner: the 4096 px picture is scaled down about ten times here, so lines and
        // symbols cover fewer pixels than a full drawing at this scale, but the network is there
        int a = 0;
        int b = 0;
        for (int y = 0; y < 300; y++) {
            for (int x = 0; x < 400; x++) {
                if ((fromOverview.getRGB(x, y) & 0xFFFFFF) != 0xFFFFFF) a++;
                if ((full.getRGB(x, y) & 0xFFFFFF) != 0xFFFFFF) b++;
            }
        }
        assertThat(b).isGreaterThan(5000);
        assertThat((double) a).isBetween(b * 0.1, b * 1.0);
    }
}
