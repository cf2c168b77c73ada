package org.shutline.ui;

import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import org.shutline.model.Progress;
import org.shutline.render.MapOverlays;
import org.shutline.render.MapStyle;
import org.shutline.render.Viewport;

/**
 * Benchmark (not a test): paint times of the map view's picture on a network file, at
 * the whole extent, a quarter of it, and street level (0.5 m per pixel), each for 20
 * pans of 100 px and 10 wheel zoom steps, in a 1280 x 800 view with anti-aliasing on
 * (as the window draws). Run: {@code java -cp ... org.shutline.ui.MapFrameBench big.gpkg}.
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
        for (int round = 0; round < 2; round++) {
            for (double zoom : new double[] {1, 4, full.scale() / 0.5}) {
                Viewport v = full.zoomAround(640, 400, zoom);
                double[] pans = new double[20];
                for (int i = 0; i < pans.length; i++) {
                    v = v.pan(100, 37);
                    long s = System.nanoTime();
                    MapView.render(v, ws, MapStyle.LIGHT, layers, MapOverlays.NONE, List.of(), true);
                    pans[i] = (System.nanoTime() - s) / 1e6;
                }
                double[] zooms = new double[10];
                for (int i = 0; i < zooms.length; i++) {
                    v = v.zoomAround(500, 300, i < 5 ? 1.25 : 0.8);
                    long s = System.nanoTime();
                    MapView.render(v, ws, MapStyle.LIGHT, layers, MapOverlays.NONE, List.of(), true);
                    zooms[i] = (System.nanoTime() - s) / 1e6;
                }
                if (round == 1) {
                    System.out.printf(Locale.ROOT, "%8.3f m/px: pan median %6.1f ms max %6.1f; zoom median %6.1f ms max %6.1f%n",
                            v.scale(), median(pans), max(pans), median(zooms), max(zooms));
                }
            }
        }
    }

    private static double median(double[] a) {
        double[] c = a.clone();
        Arrays.sort(c);
        return c[c.length / 2];
    }

    private static double max(double[] a) {
        return Arrays.stream(a).max().orElse(0);
    }
}
