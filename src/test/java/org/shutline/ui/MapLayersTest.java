package org.shutline.ui;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.shutline.app.Workspace;
import org.shutline.io.FieldMapping;
import org.shutline.io.NetworkReader;
import org.shutline.model.ContextLayer;
import org.shutline.render.MapOverlays;
import org.shutline.render.MapStyle;
import org.shutline.render.Viewport;

/** Layer order and visibility, and a context layer added from another file. */
class MapLayersTest {
    private static List<String> names(MapLayers l) {
        return l.entries().stream().map(e -> e.name() + (e.visible() ? "" : " (hidden)")).toList();
    }

    @Test
    void defaultsPutContextUnderTheNetworkInRenderOrder() {
        MapLayers l = MapLayers.defaults(List.of("streets"));
        assertThat(names(l)).containsExactly("streets", "US National Grid (hidden)", "Gas-off extent", "Control lines", "Mains",
                "Services", "Sensing taps", "Valves", "Regulator stations", "Sources", "Plan and incident marks");
        MapLayers added = l.withContext("parcels", 1);
        assertThat(names(added).subList(0, 3)).containsExactly("streets", "parcels", "US National Grid (hidden)");
        assertThat(names(added.raised(1)).subList(0, 3)).containsExactly("streets", "US National Grid (hidden)", "parcels");
        assertThat(added.lowered(0)).isEqualTo(added);
        assertThat(added.raised(added.entries().size() - 1)).isEqualTo(added);
        assertThat(added.entries().get(5).net()).isEqualTo(MapLayers.Net.MAINS);
        assertThat(added.withVisible(5, false).isVisible(MapLayers.Net.MAINS)).isFalse();
        assertThat(added.isVisible(MapLayers.Net.MAINS)).isTrue();
    }

    @Test
    void aContextLayerFromAShapefileFolderIsDrawnAndCanBeHidden() throws Exception {
        Workspace ws = SampleWorkspace.get();
        var other = NetworkReader.read(Path.of("sample-gis/tallowmere-shp"), FieldMapping.DEFAULT);
        ContextLayer streets = other.context().stream().filter(c -> c.name().equalsIgnoreCase("streets")).findFirst().orElseThrow();
        Workspace more = ws.withContext(new ContextLayer("shp:streets", streets.items()));
        assertThat(more.context()).hasSize(ws.context().size() + 1);
        // only the added layer, network layers hidden: street pixels appear; hidden, nothing but background
        MapLayers only = MapLayers.defaults(List.of()).withContext("shp:streets", more.context().size() - 1);
        for (int i = 0; i < only.entries().size(); i++) if (!only.entries().get(i).isContext()) only = only.withVisible(i, false);
        Viewport v = Viewport.fitting(more.scene().extent(), 300, 200, 4);
        var shown = MapView.render(v, more, MapStyle.LIGHT, only, MapOverlays.NONE, List.of(), false);
        var hidden = MapView.render(v, more, MapStyle.LIGHT, only.withVisible(0, false), MapOverlays.NONE, List.of(), false);
        int street = 0;
        int other2 = 0;
        for (int y = 0; y < 200; y++) {
            for (int x = 0; x < 300; x++) {
                if ((shown.getRGB(x, y) & 0xFFFFFF) == (MapStyle.LIGHT.street().getRGB() & 0xFFFFFF)) street++;
                if ((hidden.getRGB(x, y) & 0xFFFFFF) != 0xFFFFFF) other2++;
            }
        }
        assertThat(street).isGreaterThan(1000);
        assertThat(other2).isZero();
    }
}
