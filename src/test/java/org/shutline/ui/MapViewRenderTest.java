package org.shutline.ui;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.Color;
import java.awt.geom.Point2D;
import java.awt.image.BufferedImage;
import java.time.LocalDate;
import java.util.List;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Point;
import org.shutline.analysis.PlanEvaluation;
import org.shutline.app.Workspace;
import org.shutline.model.Progress;
import org.shutline.model.Valve;
import org.shutline.render.MapOverlays;
import org.shutline.render.MapStyle;
import org.shutline.render.Viewport;

/**
 * Headless drawing of the map view: the picture the view paints off the event thread
 * (MapView.render, anti-aliasing off for exact colours) checked at known feature
 * positions of the sample town.
 */
class MapViewRenderTest {
    private static Workspace ws;
    private static Viewport view;

    @BeforeAll
    static void load() throws Exception {
        ws = SampleWorkspace.get();
        Valve v039 = valve("V-039");
        // a 1:2 000-ish view (0.5 m per pixel) around the normally closed valve V-039
        view = new Viewport(v039.geometry().getX(), v039.geometry().getY(), 0.5, 600, 400);
    }

    private static Valve valve(String id) {
        return ws.network().valves().get(ws.valveIndex(id));
    }

    private static BufferedImage draw(MapLayers layers, MapOverlays o, List<MapComposer.Highlight> h) {
        return MapView.render(view, ws, MapStyle.LIGHT, layers, o, h, false);
    }

    private static int rgbAt(BufferedImage img, double x, double y) {
        Point2D p = view.screenOf(x, y);
        return img.getRGB((int) Math.floor(p.getX()), (int) Math.floor(p.getY())) & 0xFFFFFF;
    }

    private static int rgb(Color c) {
        return c.getRGB() & 0xFFFFFF;
    }

    @Test
    void aClosedValveIsAFilledSymbolWhereTheValveIs() {
        BufferedImage img = draw(MapLayers.defaults(List.of("streets")), MapOverlays.NONE, List.of());
        Point p = valve("V-039").geometry();
        // closed valves are filled with the foreground colour (render/Symbols.valve)
        assertThat(rgbAt(img, p.getX(), p.getY())).isEqualTo(rgb(MapStyle.LIGHT.foreground()));
        // 30 m north of it there is no feature: background
        assertThat(rgbAt(img, p.getX() + 30, p.getY() + 30)).isEqualTo(rgb(MapStyle.LIGHT.background()));
    }

    @Test
    void anOpenValveIsHollowAndAHiddenLayerIsNotDrawn() {
        MapLayers layers = MapLayers.defaults(List.of("streets"));
        Valve open = valve("V-001");   // open and operable in the sample (sample-gis/README.md)
        Viewport at = new Viewport(open.geometry().getX(), open.geometry().getY(), 0.5, 200, 200);
        BufferedImage img = MapView.render(at, ws, MapStyle.LIGHT, layers, MapOverlays.NONE, List.of(), false);
        // open valves are hollow: background inside, foreground ring (render/Symbols.valve)
        assertThat(img.getRGB(100, 100) & 0xFFFFFF).isEqualTo(rgb(MapStyle.LIGHT.background()));
        int valvesAt = -1;
        for (int i = 0; i < layers.entries().size(); i++) if (layers.entries().get(i).net() == MapLayers.Net.VALVES) valvesAt = i;
        BufferedImage hidden = draw(layers.withVisible(valvesAt, false), MapOverlays.NONE, List.of());
        Point p = valve("V-039").geometry();
        // without the valve layer the main under V-039 shows: not the valve fill, not the background
        assertThat(rgbAt(hidden, p.getX(), p.getY())).isNotEqualTo(rgb(MapStyle.LIGHT.foreground()))
                .isNotEqualTo(rgb(MapStyle.LIGHT.background()));
    }

    @Test
    void theSelectionBandIsDrawnAroundAPickedFeature() {
        Pick pick = Identify.at(ws, valve("V-039").geometry().getX(), valve("V-039").geometry().getY(), 3);
        assertThat(pick).isNotNull();
        assertThat(pick.id()).isEqualTo("V-039");
        Point p = pick.feature().geometry().getInteriorPoint();
        MapComposer.Highlight h = new MapComposer.Highlight(List.of(pick.geometry()), new Color(255, 0, 0, 255));
        BufferedImage img = draw(MapLayers.defaults(List.of("streets")), MapOverlays.NONE, List.of(h));
        BufferedImage none = draw(MapLayers.defaults(List.of("streets")), MapOverlays.NONE, List.of());
        // the ring 6.5..8.5 px from the centre lies outside the 11 px valve symbol but inside the 18 px highlight disc
        Point2D c = view.screenOf(p.getX(), p.getY());
        int red = 0;
        int redBefore = 0;
        int redFar = 0;
        for (int y = 0; y < img.getHeight(); y++) {
            for (int x = 0; x < img.getWidth(); x++) {
                double d = Math.hypot(x + 0.5 - c.getX(), y + 0.5 - c.getY());
                boolean isRed = (img.getRGB(x, y) & 0xFFFFFF) == 0xFF0000;
                if (d >= 6.5 && d <= 8.5 && isRed) red++;
                if (d > 10 && isRed) redFar++;
                if ((none.getRGB(x, y) & 0xFFFFFF) == 0xFF0000) redBefore++;
            }
        }
        assertThat(redBefore).isZero();
        assertThat(red).isGreaterThan(20);
        assertThat(redFar).isZero();
    }

    @Test
    void theHazardStepShowsTheGasOffAreaAndTheHazardAtTheTap() throws Exception {
        PlanEvaluation.Result r = PlanRun.evaluate(ws, SampleWorkspace.plan(), "elder-street-plan.yaml", LocalDate.of(2026, 12, 1), Progress.NONE);
        PlanEvaluation.StepResult step3 = r.steps().get(2);
        assertThat(step3.hazards()).anyMatch(h -> h.code().equals("tap-on-dead-main"));
        MapOverlays o = PlanRun.overlays(ws, step3);
        assertThat(o.hazards()).anyMatch(h -> h.text().equals("tap-on-dead-main"));
        assertThat(o.gasOff()).hasSize(1);
        var tap = ws.network().taps().stream().filter(t -> t.id().equals("T-S1-W")).findFirst().orElseThrow();
        Viewport v = new Viewport(tap.geometry().getX(), tap.geometry().getY(), 0.5, 600, 400);
        BufferedImage plain = MapView.render(v, ws, MapStyle.LIGHT, MapLayers.defaults(List.of("streets")), MapOverlays.NONE, List.of(), false);
        BufferedImage marked = MapView.render(v, ws, MapStyle.LIGHT, MapLayers.defaults(List.of("streets")), o, List.of(), false);
        int changed = 0;
        for (int y = 150; y < 250; y++) for (int x = 250; x < 350; x++) if (plain.getRGB(x, y) != marked.getRGB(x, y)) changed++;
        // the hazard triangle (and the hatched gas-off area of the abandoned main) are drawn around the tap
        assertThat(changed).isGreaterThan(100);
        boolean critical = false;
        for (int y = 150; y < 250 && !critical; y++) {
            for (int x = 250; x < 350; x++) {
                if ((marked.getRGB(x, y) & 0xFFFFFF) == rgb(MapStyle.LIGHT.hazard())) {
                    critical = true;
                    break;
                }
            }
        }
        assertThat(critical).as("hazard colour near the tap").isTrue();
    }

    @Test
    void identifyGivesTheNetworkFactsOfAMain() {
        var m = ws.network().mains().get(ws.mainIndex("M-CI-01"));
        Point p = m.geometry().getInteriorPoint();
        Pick pick = Identify.at(ws, p.getX(), p.getY(), 0.5);
        assertThat(pick.kind()).isEqualTo(Pick.Kind.MAIN);
        List<String> facts = Identify.facts(ws, pick);
        assertThat(facts).anyMatch(f -> f.startsWith("valve segment #"));
        assertThat(facts).anyMatch(f -> f.startsWith("valves bounding it: "));
        assertThat(facts).contains("fed through: ST-S1");
        assertThat(Identify.attributes(pick)).contains("system: LP-SOUTH", "material: cast iron");
    }

    @Test
    void searchFindsByIdAndAddress() {
        assertThat(Identify.search(ws, "v-039")).extracting(Pick::id).containsExactly("V-039");
        assertThat(Identify.search(ws, "Elder Street Care Home")).extracting(Pick::id).contains("SV-C-CARE");
    }
}
