package org.shutline.render;

import static org.assertj.core.api.Assertions.assertThat;
import static org.shutline.render.RenderFixtures.count;
import static org.shutline.render.RenderFixtures.countOther;
import static org.shutline.render.RenderFixtures.paint;
import static org.shutline.render.RenderFixtures.rgb;

import java.awt.Color;
import java.awt.image.BufferedImage;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.shutline.model.MainStatus;
import org.shutline.model.NormalPosition;
import org.shutline.model.Operability;

/**
 * Paints {@link RenderFixtures#town()} headless (anti-aliasing off, so colours are
 * exact) into 600 x 400 px at 1 m/px, where screen x = x + 100 and screen y = 200 - y
 * in the fixture's relative metres, and checks pixels at known feature positions.
 */
class MapPainterTest {
    private static final MapStyle S = MapStyle.LIGHT;
    private final MapScene scene = new MapScene(RenderFixtures.town());
    private final MapPainter painter = new MapPainter(scene, S).withAntialias(false);

    @Test
    void highPressureSystemRanksFirstAndActiveMainIsSolidInItsColour() {
        assertThat(scene.systems()).containsExactly("HP", "LP");
        BufferedImage img = paint(painter, RenderFixtures.view(), MapOverlays.NONE, null);
        // M1 (HP, active) runs along screen row 100 from x = 100 to 300; source and station symbols at the ends.
        for (int x = 120; x <= 285; x++) assertThat(rgb(img, x, 100)).as("M1 at x=%d", x).isEqualTo(rgb(S.systemColour(0)));
        // M2 (LP, active) along row 100 from x = 300; the control line from ST to T1 runs beneath it, unseen.
        for (int x = 312; x <= 340; x++) {
            assertThat(rgb(img, x, 100)).as("M2 at x=%d", x).isEqualTo(rgb(S.systemColour(1)));
            assertThat(rgb(img, x, 99)).as("M2 at x=%d", x).isEqualTo(rgb(S.systemColour(1)));
        }
    }

    @Test
    void proposedMainIsDashedAndAbandonedMainDotted() {
        BufferedImage img = paint(painter, RenderFixtures.view(), MapOverlays.NONE, null);
        Color lp = S.systemColour(1);
        // M3 (proposed) along row 200, x 300..500: dashes leave gaps of background.
        int on = count(img, lp, 310, 201, 490, 202);
        assertThat(on).isBetween(60, 170);
        assertThat(count(img, S.background(), 310, 201, 490, 202)).isGreaterThan(20);
        // M4 (abandoned) along row 300: thin dots, far fewer coloured pixels than a solid line of the same length.
        int dots = countOther(img, S.background(), 310, 297, 490, 304);
        assertThat(dots).isBetween(20, 180);
    }

    @Test
    void valveSymbolsDifferByNormalPositionAndOperability() {
        BufferedImage img = paint(painter, RenderFixtures.view(), MapOverlays.NONE, null);
        int fg = rgb(S.foreground());
        int bg = rgb(S.background());
        // V1 closed, operable: filled circle at (400, 100).
        assertThat(rgb(img, 400, 100)).isEqualTo(fg);
        assertThat(rgb(img, 397, 101)).isEqualTo(fg);
        // V2 open, unknown: hollow diamond at (350, 100): background inside, outline at the left tip.
        assertThat(rgb(img, 350, 100)).isEqualTo(bg);
        assertThat(countOther(img, S.background(), 342, 99, 345, 102)).isPositive();
        // V3 open, inoperable: square with a cross at (450, 100): cross at the centre, background beside it.
        assertThat(rgb(img, 450, 100)).isEqualTo(fg);
        assertThat(rgb(img, 447, 100)).isEqualTo(bg);
    }

    @Test
    void stationsServicesCriticalCustomersAndSources() {
        BufferedImage img = paint(painter, RenderFixtures.view(), MapOverlays.NONE, null);
        // Station at (300, 100): triangle filled with the station colour, square outline, background between.
        assertThat(rgb(img, 300, 101)).isEqualTo(rgb(S.station()));
        assertThat(rgb(img, 293, 94)).isEqualTo(rgb(S.background()));
        // Service s1 at (400, 140): a dot in the service colour.
        assertThat(rgb(img, 400, 140)).isEqualTo(rgb(S.service()));
        // Critical customer C1 at (450, 140): square in the critical colour with a plus in the middle.
        assertThat(rgb(img, 446, 136)).isEqualTo(rgb(S.critical()));
        assertThat(rgb(img, 450, 140)).isEqualTo(rgb(S.background()));
        // Source at (100, 100): star in the source colour.
        assertThat(rgb(img, 100, 101)).isEqualTo(rgb(S.source()));
        // Sensing tap T1 at (480, 100): downward triangle in the tap colour.
        assertThat(rgb(img, 480, 98)).isEqualTo(rgb(S.tap()));
    }

    @Test
    void controlLineRunsFromTheTapToItsStation() {
        // A tap 80 m north of the station (relative (200, 180), screen (300, 20)): the control line is vertical
        // at x = 300 from y = 100 up to y = 20, dashed 2 px on, 2 px off.
        var town = RenderFixtures.town();
        var net = new org.shutline.model.Network(town.sourceName(), town.crs(), town.mains(), town.valves(),
                town.stations(), List.of(new org.shutline.model.SenseTap("T2", "ST", org.shutline.model.TapDevice.WORKER,
                        RenderFixtures.pt(200, 180))), town.services(), town.sources(), town.context(), List.of());
        BufferedImage img = paint(new MapPainter(new MapScene(net), S).withAntialias(false), RenderFixtures.view(),
                MapOverlays.NONE, null);
        int dashes = count(img, S.tap(), 299, 35, 301, 85);
        assertThat(dashes).isBetween(20, 40);
        assertThat(count(img, S.tap(), 310, 35, 400, 85)).isZero();
    }

    @Test
    void nothingIsDrawnWhereNothingIs() {
        BufferedImage img = paint(painter, RenderFixtures.view(), MapOverlays.NONE, null);
        // Below the abandoned main (relative y < -120) and right of the network (x > 410) the map is empty.
        assertThat(countOther(img, S.background(), 0, 330, 600, 400)).isZero();
        assertThat(countOther(img, S.background(), 520, 0, 600, 400)).isZero();
    }

    @Test
    void viewportAwayFromTheNetworkDrawsNothingAndHasAnEmptyLegend() {
        Viewport far = RenderFixtures.view().withCenter(RenderFixtures.X0 + 5000, RenderFixtures.Y0 + 5000);
        List<LegendEntry> legend = new ArrayList<>();
        BufferedImage img = paint(painter, far, MapOverlays.NONE, legend);
        assertThat(countOther(img, S.background(), 0, 0, 600, 400)).isZero();
        assertThat(legend).isEmpty();
    }

    @Test
    void streetIsGreyAndNamedWhenZoomedIn() {
        BufferedImage img = paint(painter, RenderFixtures.view(), MapOverlays.NONE, null);
        // Alder Row along row 150 (relative y = 50), labelled about its midpoint x = 300.
        assertThat(rgb(img, 150, 150)).isEqualTo(rgb(S.street()));
        assertThat(count(img, S.streetLabel(), 240, 140, 360, 161)).isGreaterThan(10);
    }

    @Test
    void zoomedOutSkipsOrdinaryServicesAndLabelsButKeepsCriticalCustomers() {
        Viewport out = RenderFixtures.view().withScale(5);
        List<LegendEntry> legend = new ArrayList<>();
        BufferedImage img = paint(painter, out, MapOverlays.NONE, legend);
        assertThat(count(img, S.streetLabel(), 0, 0, 600, 400)).isZero();
        assertThat(legend).extracting(LegendEntry::kind)
                .contains(LegendKind.CRITICAL_SERVICE, LegendKind.STREET)
                .doesNotContain(LegendKind.SERVICE);
        // C1 at relative (350, 60): screen (300 + 150/5, 200 - 60/5) = (330, 188); its lower half is clear of V3.
        assertThat(rgb(img, 327, 191)).isEqualTo(rgb(S.critical()));
    }

    @Test
    void legendListsOnlyWhatIsDrawnInLegendOrder() {
        List<LegendEntry> legend = new ArrayList<>();
        paint(painter, RenderFixtures.view(), MapOverlays.NONE, legend);
        assertThat(legend).contains(
                LegendEntry.main(0, "HP", MainStatus.ACTIVE),
                LegendEntry.main(1, "LP", MainStatus.PROPOSED),
                LegendEntry.main(1, "LP", MainStatus.ABANDONED),
                LegendEntry.valve(NormalPosition.CLOSED, Operability.YES),
                LegendEntry.valve(NormalPosition.OPEN, Operability.NO));
        assertThat(legend).doesNotContain(LegendEntry.valve(NormalPosition.CLOSED, Operability.NO));
        assertThat(legend).extracting(LegendEntry::kind)
                .contains(LegendKind.STATION, LegendKind.SENSE_TAP, LegendKind.CONTROL_LINE, LegendKind.SOURCE,
                        LegendKind.SERVICE, LegendKind.CRITICAL_SERVICE, LegendKind.STREET)
                .doesNotContain(LegendKind.GAS_OFF, LegendKind.HAZARD, LegendKind.GRID, LegendKind.ISOLATION_CIRCLE)
                .isSorted();

        List<LegendEntry> noStation = new ArrayList<>();
        paint(new MapPainter(new MapScene(RenderFixtures.town(false)), S), RenderFixtures.view(), MapOverlays.NONE, noStation);
        assertThat(noStation).extracting(LegendEntry::kind)
                .doesNotContain(LegendKind.STATION, LegendKind.SENSE_TAP, LegendKind.CONTROL_LINE);
    }

    @Test
    void darkThemeHasItsOwnBackgroundAndForeground() {
        MapStyle d = MapStyle.DARK;
        BufferedImage img = paint(new MapPainter(scene, d).withAntialias(false), RenderFixtures.view(), MapOverlays.NONE, null);
        assertThat(rgb(img, 580, 380)).isEqualTo(rgb(d.background()));
        assertThat(rgb(img, 400, 100)).isEqualTo(rgb(d.foreground()));
        assertThat(rgb(d.background())).isNotEqualTo(rgb(S.background()));
    }
}
