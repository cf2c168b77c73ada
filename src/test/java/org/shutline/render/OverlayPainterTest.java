package org.shutline.render;

import org.shutline.model.Finding;
import static org.assertj.core.api.Assertions.assertThat;
import static org.shutline.render.RenderFixtures.count;
import static org.shutline.render.RenderFixtures.countOther;
import static org.shutline.render.RenderFixtures.paint;
import static org.shutline.render.RenderFixtures.rgb;

import java.awt.image.BufferedImage;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.shutline.model.LinearUnit;
import org.shutline.model.Severity;

/**
 * Overlays over {@link RenderFixtures#town()} at 1 m/px (screen x = x + 100,
 * screen y = 200 - y in relative metres), anti-aliasing off.
 */
class OverlayPainterTest {
    private static final MapStyle S = MapStyle.LIGHT;
    private final MapPainter painter = new MapPainter(new MapScene(RenderFixtures.town()), S).withAntialias(false);

    @Test
    void gasOffAreaIsHatchedInsideAndOnlyInside() {
        // Box relative (-80, -180) .. (-20, -130): screen x 20..80, y 330..380, where nothing else is drawn.
        MapOverlays o = MapOverlays.NONE.withGasOff(List.of(GasOffArea.of(RenderFixtures.box(-80, -180, -20, -130))));
        List<LegendEntry> legend = new ArrayList<>();
        BufferedImage img = paint(painter, RenderFixtures.view(), o, legend);
        int inside = 50 * 40;
        int hatch = count(img, S.gasOff(), 25, 335, 75, 375);
        // Hatch lines 2 px wide every 8 px: about a quarter of the pixels; the rest is a light tint, not the background.
        assertThat(hatch).isBetween(inside / 8, inside / 2);
        assertThat(count(img, S.background(), 25, 335, 75, 375)).isZero();
        // Solid outline on the left edge (screen x = 20).
        assertThat(rgb(img, 20, 355)).isEqualTo(rgb(S.gasOff()));
        // Outside the box: no hatch.
        assertThat(countOther(img, S.background(), 90, 330, 200, 400)).isZero();
        assertThat(countOther(img, S.background(), 20, 385, 80, 400)).isZero();
        assertThat(legend).extracting(LegendEntry::kind).contains(LegendKind.GAS_OFF);
    }

    @Test
    void valvesToOperateAreCircledNumbersFilledForCloseHollowForOpen() {
        // V1 at relative (300, 100) -> screen (400, 100); badge centred 15 px up and right: (415, 85).
        // V2 at relative (250, 100) -> screen (350, 100); badge at (365, 85).
        MapOverlays o = MapOverlays.NONE.withValvesToOperate(List.of(
                ValveToOperate.of(1, "V1", RenderFixtures.X0 + 300, RenderFixtures.Y0 + 100, true),
                ValveToOperate.of(2, "V2", RenderFixtures.X0 + 250, RenderFixtures.Y0 + 100, false)));
        List<LegendEntry> legend = new ArrayList<>();
        BufferedImage img = paint(painter, RenderFixtures.view(), o, legend);
        assertThat(rgb(img, 409, 85)).isEqualTo(rgb(S.foreground()));
        assertThat(rgb(img, 359, 85)).isEqualTo(rgb(S.background()));
        // The number itself: background-coloured strokes in the filled badge, foreground in the hollow one.
        assertThat(count(img, S.background(), 412, 79, 419, 91)).isPositive();
        assertThat(count(img, S.foreground(), 362, 79, 369, 91)).isPositive();
        assertThat(legend).extracting(LegendEntry::kind).contains(LegendKind.VALVE_TO_CLOSE, LegendKind.VALVE_TO_OPEN);
    }

    @Test
    void hazardMarkerAndIsolationCircleWithRadiusLabel() {
        // Both at relative (100, -50) -> screen (200, 250); circle radius 60 m = 60 px.
        double x = RenderFixtures.X0 + 100;
        double y = RenderFixtures.Y0 - 50;
        MapOverlays o = MapOverlays.NONE
                .withHazards(List.of(HazardMark.of(x, y, Severity.WARNING, "")))
                .withRings(List.of(IsolationRing.of(x, y, 60)));
        List<LegendEntry> legend = new ArrayList<>();
        BufferedImage img = paint(painter, RenderFixtures.view(), o, legend);
        // Hazard triangle stands on its point: filled in the hazard colour left of the exclamation mark.
        assertThat(rgb(img, 196, 244)).isEqualTo(rgb(S.hazard()));
        // Circle: its dash pattern starts at the rightmost point (260, 250).
        assertThat(countOther(img, S.background(), 258, 247, 263, 253)).isPositive();
        assertThat(countOther(img, S.background(), 196, 180, 205, 186)).isPositive();
        // Radius label above the top of the circle (y = 190).
        assertThat(count(img, S.isolation(), 170, 172, 230, 188)).isGreaterThan(10);
        assertThat(legend).extracting(LegendEntry::kind).contains(LegendKind.HAZARD, LegendKind.ISOLATION_CIRCLE);
    }

    @Test
    void criticalHazardHasItsOwnFillAndLegendEntry() {
        MapOverlays o = MapOverlays.NONE.withHazards(List.of(
                HazardMark.of(RenderFixtures.X0 + 100, RenderFixtures.Y0 - 50, Severity.CRITICAL, "sensing tap on abandoned main")));
        List<LegendEntry> legend = new ArrayList<>();
        BufferedImage img = paint(painter, RenderFixtures.view(), o, legend);
        assertThat(rgb(img, 196, 244)).isEqualTo(rgb(S.critical()));
        assertThat(count(img, S.foreground(), 215, 230, 400, 250)).as("text beside the marker").isGreaterThan(20);
        assertThat(legend).extracting(LegendEntry::kind).contains(LegendKind.CRITICAL_HAZARD).doesNotContain(LegendKind.HAZARD);
    }

    @Test
    void radiusLabelsFollowTheCrsUnitFamily() {
        assertThat(OverlayPainter.radiusLabel(100, LinearUnit.METRE)).isEqualTo("r = 100 m");
        // 100 m / 0.3048 m per ft (NIST SP 811, Appendix B) = 328.08 ft
        assertThat(OverlayPainter.radiusLabel(100, LinearUnit.US_SURVEY_FOOT)).isEqualTo("r = 328 ft");
        assertThat(OverlayPainter.radiusLabel(16_000, LinearUnit.METRE)).isEqualTo("r = 16.0 km");
    }
}
