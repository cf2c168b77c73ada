package org.shutline.render;

import static org.assertj.core.api.Assertions.assertThat;
import static org.shutline.render.RenderFixtures.X0;
import static org.shutline.render.RenderFixtures.Y0;

import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.List;
import javax.imageio.ImageIO;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.shutline.model.Severity;

/**
 * Paints the test town with every overlay, the grid, a legend, a scale bar and a north
 * arrow (anti-aliased, as a map would be) and writes it to
 * {@code target/render-sample-<theme>.png} for a person to look at.
 */
class SampleMapTest {

    @ParameterizedTest
    @ValueSource(strings = {"light", "dark"})
    void writesASampleMap(String theme) throws Exception {
        MapStyle s = theme.equals("light") ? MapStyle.LIGHT : MapStyle.DARK;
        MapScene scene = new MapScene(RenderFixtures.town());
        GeoTransform geo = GeoTransform.forCrs(RenderFixtures.UTM18N).orElseThrow();
        MapPainter painter = new MapPainter(scene, s).withGrid(new UsngGrid(geo));
        Viewport v = Viewport.fitting(scene.extent(), 700, 500, 40);
        MapOverlays o = MapOverlays.NONE
                .withGasOff(List.of(GasOffArea.of(RenderFixtures.box(255, 40, 420, 130))))
                .withValvesToOperate(List.of(
                        ValveToOperate.of(1, "V1", X0 + 300, Y0 + 100, true),
                        ValveToOperate.of(2, "V2", X0 + 250, Y0 + 100, true)))
                .withHazards(List.of(HazardMark.of(X0 + 380, Y0 + 100, Severity.CRITICAL, "tap isolated")))
                .withRings(List.of(IsolationRing.of(X0 + 100, Y0 - 40, 60)));

        BufferedImage img = new BufferedImage(900, 500, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        g.setColor(s.background());
        g.fillRect(0, 0, 900, 500);
        List<LegendEntry> legend = painter.paint(g, v, o);
        ScaleBar.paint(g, new Rectangle2D.Double(10, 450, 200, 40), v, scene.network().crs().unit(), s);
        NorthArrow.paint(g, new Rectangle2D.Double(650, 20, 30, 50), NorthArrow.trueNorth(geo, v), s);
        int shown = Legend.paint(g, new Rectangle2D.Double(710, 10, 185, 480), legend, s);
        g.dispose();

        assertThat(shown).isEqualTo(legend.size());
        assertThat(legend).extracting(LegendEntry::kind).contains(LegendKind.GAS_OFF, LegendKind.VALVE_TO_CLOSE,
                LegendKind.CRITICAL_HAZARD, LegendKind.ISOLATION_CIRCLE, LegendKind.GRID);
        Path out = Path.of("target", "render-sample-" + theme + ".png");
        Files.createDirectories(out.getParent());
        Path tmp = Files.createTempFile(out.getParent(), "render-sample", ".tmp");
        ImageIO.write(img, "png", tmp.toFile());
        Files.move(tmp, out, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
        BufferedImage back = ImageIO.read(out.toFile());
        assertThat(back.getWidth()).isEqualTo(900);
        assertThat(RenderFixtures.countOther(back, s.background(), 710, 10, 895, 490)).isGreaterThan(500);
    }
}
