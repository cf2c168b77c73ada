package org.shutline.ui;

import org.shutline.analysis.ValveDoubt;
import static org.assertj.core.api.Assertions.assertThat;

import java.awt.geom.Point2D;
import java.awt.image.BufferedImage;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Envelope;
import org.shutline.analysis.PlanEvaluation;
import org.shutline.app.Workspace;
import org.shutline.model.Progress;
import org.shutline.plan.PlanReader;
import org.shutline.plan.StepAction;
import org.shutline.render.MapStyle;
import org.shutline.render.Viewport;
import org.shutline.report.DocumentExport;
import org.shutline.report.MapSheet;
import org.shutline.report.ReportBuilder;
import org.shutline.report.ReportView;
import org.shutline.trace.NetworkState;

/**
 * A plan step's map draws the network state of that step, on screen and on paper: the
 * sample plan (sample-gis/tallowmere-plan-corrected.yaml) lays bypass BP-1 from
 * (512450, 4890399) on the new main to (512450, 4890403) on the old one at step 10 with
 * valve BPV-1 half way, and takes it off at step 13. The checks look at the pixels
 * between the two mains along the bypass line, where the network as recorded has
 * nothing but background (and, at these steps, the gas-off hatching, which is never dark).
 */
class StepStateMapTest {
    static final Path PLAN = Path.of("sample-gis/tallowmere-plan-corrected.yaml");
    static final double BX = 512450.0, BY0 = 4890399.0, BY1 = 4890403.0;
    private static Workspace ws;
    private static PlanEvaluation.Result result;

    @BeforeAll
    static void load() throws Exception {
        ws = SampleWorkspace.get();
        result = PlanRun.evaluate(ws, PlanReader.read(PLAN), PLAN.getFileName().toString(), LocalDate.of(2026, 12, 1),
                Progress.NONE);
    }

    private static NetworkState after(int step) {
        return result.states().steps().stream().filter(s -> s.step().number() == step).findFirst().orElseThrow().after();
    }

    private static boolean dark(int rgb) {
        int r = (rgb >> 16) & 0xFF, g = (rgb >> 8) & 0xFF, b = rgb & 0xFF;
        return r < 90 && g < 90 && b < 90;
    }

    /** Dark pixels within {@code halfPx} of the bypass line, between each main and the valve (the valve symbol left out). */
    private static int darkAlongBypass(BufferedImage img, Viewport v, double offX, double offY, double k, double halfPx,
                                       double clearPx) {
        Point2D a = v.screenOf(BX, BY0);
        Point2D b = v.screenOf(BX, BY1);
        double x = (a.getX() + offX) * k;
        double ya = (a.getY() + offY) * k;
        double yb = (b.getY() + offY) * k;
        double mid = (ya + yb) / 2;
        int n = 0;
        for (int py = (int) Math.ceil(Math.min(ya, yb) + clearPx); py <= Math.max(ya, yb) - clearPx; py++) {
            if (Math.abs(py - mid) < clearPx) continue;   // the valve symbol BPV-1
            for (int px = (int) Math.floor(x - halfPx); px <= x + halfPx; px++) if (dark(img.getRGB(px, py))) n++;
        }
        return n;
    }

    @Test
    void thePlanLaysTheBypassAtStep10AndTakesItOffAtStep13() {
        assertThat(result.states().steps().stream().filter(s -> s.step().action() instanceof StepAction.InstallBypass)
                .map(s -> s.step().number()).toList()).containsExactly(10);
        assertThat(result.states().steps().stream().filter(s -> s.step().action() instanceof StepAction.RemoveBypass)
                .map(s -> s.step().number()).toList()).containsExactly(13);
    }

    @Test
    void theWindowsMapOfAStepDrawsTheBypassItsValveAndItsLabels() {
        MapView map = new MapView();
        map.setWorkspace(ws);
        // 0.05 m per pixel: the 4 m bypass is 80 px long
        Viewport v = new Viewport(BX, (BY0 + BY1) / 2, 0.05, 300, 200);
        map.setViewport(v);
        MapLayers layers = MapLayers.defaults(List.of("streets"));
        map.setLayers(layers);
        BufferedImage recorded = map.renderNow(false);
        map.setState(after(11));
        BufferedImage step11 = map.renderNow(false);
        map.setState(after(14));
        BufferedImage step14 = map.renderNow(false);
        map.setState(null);
        BufferedImage back = map.renderNow(false);
        // the temporary pipe's casing is drawn in the foreground colour (render/Symbols.temporaryPipe)
        int before = darkAlongBypass(recorded, v, 0, 0, 1, 6, 8);
        int at11 = darkAlongBypass(step11, v, 0, 0, 1, 6, 8);
        int at14 = darkAlongBypass(step14, v, 0, 0, 1, 6, 8);
        assertThat(before).as("nothing dark between the mains as recorded").isZero();
        assertThat(at11).as("the bypass casing along its line at step 11").isGreaterThan(40);
        assertThat(at14).as("the bypass is off after step 13").isZero();
        assertThat(darkAlongBypass(back, v, 0, 0, 1, 6, 8)).as("back to the network as recorded").isZero();
        // valve BPV-1 half way: a hollow open valve (background centre, foreground ring) at step 11 only
        Point2D c = v.screenOf(BX, (BY0 + BY1) / 2);
        int ring = 0, ringBefore = 0;
        for (int dy = -7; dy <= 7; dy++) {
            for (int dx = -7; dx <= 7; dx++) {
                if (Math.hypot(dx, dy) < 4 || Math.hypot(dx, dy) > 7) continue;
                if (dark(step11.getRGB((int) c.getX() + dx, (int) c.getY() + dy))) ring++;
                if (dark(recorded.getRGB((int) c.getX() + dx, (int) c.getY() + dy))) ringBefore++;
            }
        }
        assertThat(ring).as("valve ring of BPV-1").isGreaterThan(10);
        assertThat(ringBefore).isZero();
        // the labels (BP-1 left, BPV-1 right of the line) change pixels away from the line
        int labelPixels = 0;
        for (int y = 0; y < v.height(); y++) {
            for (int x = 0; x < v.width(); x++) {
                if (Math.abs(x - c.getX()) > 12 && recorded.getRGB(x, y) != step11.getRGB(x, y)
                        && dark(step11.getRGB(x, y))) labelPixels++;
            }
        }
        assertThat(labelPixels).as("dark label text beside the bypass").isGreaterThan(30);
        map.setState(after(11));
        assertThat(map.scene().state().addedValves()).extracting(a -> a.valve().id()).containsExactly("BPV-1");
    }

    @Test
    void thePrintedMapOfAStepDrawsTheBypass() {
        Envelope area = new Envelope(BX - 12, BX + 12, BY0 - 6, BY1 + 6);
        ReportBuilder.Options opts = ReportBuilder.Options.defaults().withMade(java.time.LocalDateTime.of(2026, 12, 1, 8, 0));
        ValveDoubt.Settings iso = ValveDoubt.Settings.defaults(LocalDate.of(2026, 12, 1));
        int dpi = 150;
        double k = dpi / 72.0;
        int[] dark = new int[3];
        int[] steps = {1, 11, 14};
        for (int i = 0; i < steps.length; i++) {
            ReportBuilder rb = ReportBuilder.of(ReportView.ofStep(result, steps[i], iso), null, opts).withPlan(result, PLAN)
                    .withArea(area);
            MapSheet sheet = rb.mapSheet();
            double w = opts.page().widthPt(), h = opts.page().heightPt();
            Viewport v = sheet.viewport(w, h);
            var frame = MapSheet.layout(w, h).frame();
            BufferedImage img = DocumentExport.image(sheet, opts.page(), dpi);
            // the sheet's map frame starts at the frame's corner (points), scaled to pixels at dpi
            dark[i] = darkAlongBypass(img, v, frame.getX(), frame.getY(), k, 5, 10);
        }
        assertThat(dark[0]).as("step 1: nothing dark between the mains").isZero();
        assertThat(dark[1]).as("step 11: the bypass casing, both sides of the line").isGreaterThan(15);
        assertThat(dark[2]).as("step 14: the bypass is off").isZero();
    }
}
