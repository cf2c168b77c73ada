package org.shutline.report;

import java.text.NumberFormat;
import java.util.List;
import java.util.Locale;
import org.locationtech.jts.geom.Envelope;
import org.shutline.model.LinearUnit;

/**
 * Round map scales and the choice of one for a map frame. The list holds the
 * engineer's-scale series of US plans (1 in = 100 ft is 1:1,200, 1 in = 200 ft is
 * 1:2,400, 1 in = 400 ft is 1:4,800, 1 in = 2,000 ft is 1:24,000) and the metric
 * series 1:500, 1:1,000, 1:2,000, 1:2,500, 1:5,000 ... (common practice). A scale 1:D means one point
 * (1/72 in = 0.352 78 mm) on paper is D points on the ground.
 */
public final class MapScales {
    /** Denominators, smallest (most detailed) first. */
    public static final List<Integer> ROUND = List.of(500, 1000, 1200, 2000, 2400, 2500, 4800, 5000, 6000, 10_000,
            12_000, 20_000, 24_000, 25_000, 50_000, 62_500, 100_000, 125_000, 250_000, 500_000, 1_000_000);
    /** Metres per PostScript point: 0.0254 / 72 (NIST SP 811: 1 in = 0.0254 m exactly). */
    public static final double METRES_PER_POINT = 0.0254 / 72;

    private MapScales() {}

    /** CRS units per point on paper at 1:{@code denominator}. */
    public static double crsUnitsPerPoint(int denominator, LinearUnit unit) {
        return unit.fromMetres(denominator * METRES_PER_POINT);
    }

    /**
     * The most detailed round scale at which {@code area} fits a frame of {@code widthPt} x
     * {@code heightPt} points; the largest denominator in the list when none does; the
     * most detailed one for a null or point area.
     */
    public static int fitting(Envelope area, double widthPt, double heightPt, LinearUnit unit) {
        if (area == null || area.isNull() || (area.getWidth() == 0 && area.getHeight() == 0)) return ROUND.get(0);
        for (int d : ROUND) {
            double s = crsUnitsPerPoint(d, unit);
            if (area.getWidth() <= widthPt * s && area.getHeight() <= heightPt * s) return d;
        }
        return ROUND.get(ROUND.size() - 1);
    }

    /** For example "1:2,400". */
    public static String label(int denominator) {
        return "1:" + NumberFormat.getIntegerInstance(Locale.US).format(denominator);
    }
}
