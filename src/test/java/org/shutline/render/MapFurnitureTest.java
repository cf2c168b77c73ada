package org.shutline.render;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.shutline.render.RenderFixtures.count;
import static org.shutline.render.RenderFixtures.countOther;

import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.util.List;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.shutline.model.LinearUnit;
import org.shutline.model.MainStatus;
import org.shutline.model.NormalPosition;
import org.shutline.model.Operability;

/** Scale bar, north arrow and legend drawn into rectangles. */
class MapFurnitureTest {
    private static final MapStyle S = MapStyle.LIGHT;

    private static BufferedImage canvas(int w, int h) {
        BufferedImage img = new BufferedImage(w, h, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        g.setColor(S.background());
        g.fillRect(0, 0, w, h);
        g.dispose();
        return img;
    }

    @Test
    void scaleBarPicksTheLongestNiceLengthThatFits() {
        ScaleBar.Length m = ScaleBar.choose(1.0, 150, LinearUnit.METRE);
        assertThat(m.label()).isEqualTo("100 m");
        assertThat(m.pixels()).isCloseTo(100, within(1e-9));
        assertThat(ScaleBar.choose(20, 150, LinearUnit.METRE).label()).isEqualTo("2 km");
        assertThat(ScaleBar.choose(0.01, 150, LinearUnit.METRE).label()).isEqualTo("1 m");
        // 150 m = 492 ft (0.3048 m/ft, NIST SP 811 Appendix B): 200 ft = 60.96 m = 60.96 px.
        ScaleBar.Length ft = ScaleBar.choose(1.0, 150, LinearUnit.US_SURVEY_FOOT);
        assertThat(ft.label()).isEqualTo("200 ft");
        assertThat(ft.pixels()).isCloseTo(60.96, within(1e-9));
        // 3000 m = 9843 ft = 1.86 mi (5280 ft/mi): 1 mi = 1609.344 m.
        ScaleBar.Length mi = ScaleBar.choose(20, 150, LinearUnit.INTERNATIONAL_FOOT);
        assertThat(mi.label()).isEqualTo("1 mi");
        assertThat(mi.metres()).isCloseTo(1609.344, within(1e-9));
    }

    @Test
    void scaleBarIsDrawnInsideItsBoxToTheChosenLength() {
        BufferedImage img = canvas(300, 60);
        Graphics2D g = img.createGraphics();
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_OFF);
        Viewport v = new Viewport(0, 0, 1.0, 800, 600);
        ScaleBar.Length len = ScaleBar.paint(g, new Rectangle2D.Double(50, 10, 150, 40), v, LinearUnit.METRE, S);
        g.dispose();
        assertThat(len.label()).isEqualTo("100 m");
        assertThat(countOther(img, S.background(), 0, 0, 50, 60)).isZero();
        assertThat(countOther(img, S.background(), 201, 0, 300, 60)).isZero();
        // The bar: first quarter filled in the foreground colour, second quarter open.
        int barY = 50 - 4;
        assertThat(count(img, S.foreground(), 55, barY, 75, barY + 1)).isGreaterThan(15);
        assertThat(count(img, S.background(), 82, barY, 100, barY + 1)).isGreaterThan(10);
    }

    @Test
    void trueNorthMatchesGeoConvertConvergence() throws Exception {
        Assumptions.assumeTrue(ExternalTool.exists("/usr/bin/GeoConvert"), "GeoConvert not installed: skipped");
        GeoTransform geo = GeoTransform.forCrs(RenderFixtures.UTM18N).orElseThrow();
        var c = geo.fromLonLat(-77.0352, 38.8895);
        Viewport v = new Viewport(c.getX(), c.getY(), 1, 400, 400);
        // GeographicLib GeoConvert -c prints gamma, the bearing of grid north clockwise from true north;
        // true north is then -gamma clockwise from grid north (screen up).
        String[] out = ExternalTool.run("38.8895 -77.0352\n", "/usr/bin/GeoConvert", "-c").trim().split("\\s+");
        double gamma = Double.parseDouble(out[0]);
        assertThat(Math.toDegrees(NorthArrow.trueNorth(geo, v))).isCloseTo(-gamma, within(0.005));
        assertThat(-gamma).isPositive();
    }

    @Test
    void northArrowPointsUpAtAngleZero() {
        BufferedImage img = canvas(60, 80);
        Graphics2D g = img.createGraphics();
        NorthArrow.paint(g, new Rectangle2D.Double(10, 10, 40, 60), 0, S);
        g.dispose();
        // The filled (left) half of the head is left of the centre line x = 30; the right half is hollow.
        assertThat(count(img, S.foreground(), 24, 55, 29, 60)).isPositive();
        assertThat(count(img, S.foreground(), 32, 52, 34, 56)).isZero();
        // The "N" sits above the tip.
        assertThat(count(img, S.foreground(), 24, 10, 37, 28)).isPositive();
        assertThat(countOther(img, S.background(), 0, 0, 60, 9)).isZero();
    }

    @Test
    void legendDrawsOneRowPerEntryAndSaysHowManyDidNotFit() {
        List<LegendEntry> entries = List.of(
                LegendEntry.main(0, "HP", MainStatus.ACTIVE),
                LegendEntry.valve(NormalPosition.CLOSED, Operability.YES),
                LegendEntry.simple(LegendKind.STATION, "District regulator station"),
                LegendEntry.simple(LegendKind.GAS_OFF, "Off gas"));
        BufferedImage img = canvas(300, 200);
        Graphics2D g = img.createGraphics();
        int shown = Legend.paint(g, new Rectangle2D.Double(0, 0, 300, 200), entries, S);
        g.dispose();
        assertThat(shown).isEqualTo(4);
        // Row 1 is the HP main sample: its colour at the sample's middle.
        assertThat(count(img, S.systemColour(0), 4, 14, 36, 50)).isGreaterThan(20);
        assertThat(count(img, S.gasOff(), 0, 0, 40, 200)).isGreaterThan(20);

        BufferedImage small = canvas(300, 60);
        Graphics2D g2 = small.createGraphics();
        int fit = Legend.paint(g2, new Rectangle2D.Double(0, 0, 130, 60), entries, S);
        g2.dispose();
        assertThat(fit).isLessThan(4).isPositive();
    }
}
