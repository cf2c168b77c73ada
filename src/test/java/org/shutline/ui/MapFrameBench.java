package org.shutline.ui;

import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import org.shutline.app.Workspace;
import org.shutline.model.Progress;
import org.shutline.render.MapOverlays;
import org.shutline.render.MapStyle;
import org.shutline.render.Viewport;

/**
 * Benchmark (not a test): paint times of the map view's picture on a network file, at
 * the whole extent, a quarter of it, and street level (0.5 m per pixel), each for 20
 * pans of 100 px (back and forth) and 10 wheel zoom steps (5 in, 5 out), in a 1280 x 800 view with anti-aliasing on
 * (as the window draws), through the overview picture when the window would use it. Run: {@code java -cp ... org.shutline.ui.MapFrameBench big.gpkg}.
 */
public final class MapFrameBench {
    private MapFrameBench() {}

    public static void main(String[] args) throws Exception {
        long t0 = System.nanoTime();
        Workspace ws = Workspace.load(Path.of(args[0]), Progress.NONE);
        System.out.printf(Locale.ROOT, "loaded %s in %.1f s: %d mains, %d services%n", args[0], (System.nanoTime() - t0) / 1e9,
                ws.network().mains().size(), ws.network().services().size());
        MapLayers layers = MapLayers.defaults(ws.context().stream().map(c -> c.name()).toList());
        Viewport full = Viewport.fitting(ws.scene().extent(), 1280, 800, 24);
        long b0 = System.nanoTime();
        Overview ov = Overview.wanted(ws) ? Overview.build(ws, MapStyle.LIGHT, layers) : null;
        System.out.printf(Locale.ROOT, "overview picture: %s%n", ov == null ? "not used (small network)"
                : String.format(Locale.ROOT, "built in %.1f s (render's own painters, in the background)", (System.nanoTime() - b0) / 1e9));
        for (int round = 0; round < 2; round++) {
            for (double zoom : new double[] {1, 4, full.scale() / 0.5}) {
                Viewport v = full.zoomAround(640, 400, zoom);
                double[] pans = new double[20];
                for (int i = 0; i < pans.length; i++) {
                    v = v.pan(i % 2 == 0 ? 100 : -100, i % 4 < 2 ? 37 : -37);   // zigzag: stays over the network
                    long s = System.nanoTime();
                    frame(ov, v, ws, layers);
                    pans[i] = (System.nanoTime() - s) / 1e6;
                }
                double[] zooms = new double[10];
                for (int i = 0; i < zooms.length; i++) {
                    v = v.zoomAround(500, 300, i < 5 ? 1.25 : 0.8);
                    long s = System.nanoTime();
                    frame(ov, v, ws, layers);
                    zooms[i] = (System.nanoTime() - s) / 1e6;
                }
                if (round == 1) {
                    System.out.printf(Locale.ROOT, "%8.3f m/px: pan median %6.1f ms p90 %6.1f max %6.1f; zoom median %6.1f ms p90 %6.1f max %6.1f%n",
                            v.scale(), median(pans), p90(pans), max(pans), median(zooms), p90(zooms), max(zooms));
                }
            }
        }
    }

    /** What the view's render thread does for one frame. */
    private static void frame(Overview ov, Viewport v, Workspace ws, MapLayers layers) {
        if (ov != null && ov.serves(ws, MapStyle.LIGHT, layers, v)) ov.render(v, MapOverlays.NONE, List.of());
        else MapView.render(v, ws, MapStyle.LIGHT, layers, MapOverlays.NONE, List.of(), true);
    }

    private static double median(double[] a) {
        double[] c = a.clone();
        Arrays.sort(c);
        return c[c.length / 2];
    }

    private static double p90(double[] a) {
        double[] c = a.clone();
        Arrays.sort(c);
        return c[(int) Math.floor(c.length * 0.9)];
    }

    private static double max(double[] a) {
        return Arrays.stream(a).max().orElse(0);
    }
}
