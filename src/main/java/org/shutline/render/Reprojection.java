package org.shutline.render;

import org.locationtech.proj4j.CRSFactory;
import org.locationtech.proj4j.CoordinateReferenceSystem;
import org.locationtech.proj4j.CoordinateTransform;
import org.locationtech.proj4j.CoordinateTransformFactory;
import org.locationtech.proj4j.Proj4jException;
import org.locationtech.proj4j.ProjCoordinate;
import org.shutline.model.CrsInfo;

/**
 * A pair of proj4j transforms between two coordinate reference systems, forward and
 * back. proj4j transforms keep scratch state, so both directions are synchronized,
 * and CRS parsing goes through one lock as well (proj4j's factory and registry are
 * not documented as thread-safe); x is always easting or longitude. A failed point transform gives NaN coordinates.
 */
final class Reprojection {
    private static final CRSFactory CRS_FACTORY = new CRSFactory();
    private static final CoordinateTransformFactory TX_FACTORY = new CoordinateTransformFactory();

    private final CoordinateTransform forward;
    private final CoordinateTransform back;

    Reprojection(CoordinateReferenceSystem from, CoordinateReferenceSystem to) {
        synchronized (Reprojection.class) {
            this.forward = TX_FACTORY.createTransform(from, to);
            this.back = TX_FACTORY.createTransform(to, from);
        }
    }

    /** The proj4j CRS of a network CRS: by EPSG code when known, else by its proj4 definition; null when neither. */
    static synchronized CoordinateReferenceSystem crsOf(CrsInfo crs) {
        try {
            if (crs.epsg() > 0) return CRS_FACTORY.createFromName("EPSG:" + crs.epsg());
            if (crs.proj4() != null && !crs.proj4().isBlank()) {
                return CRS_FACTORY.createFromParameters(crs.name() == null ? "network" : crs.name(), crs.proj4());
            }
            return null;
        } catch (Proj4jException e) {
            throw new IllegalArgumentException("coordinate reference system not usable for grid references: "
                    + crs.name() + " (EPSG " + crs.epsg() + ", proj4 " + crs.proj4() + "): " + e.getMessage(), e);
        }
    }

    static synchronized CoordinateReferenceSystem wgs84() {
        return CRS_FACTORY.createFromParameters("WGS84", "+proj=longlat +datum=WGS84 +no_defs");
    }

    /** WGS84 / UTM zone {@code zone}, north or south. */
    static synchronized CoordinateReferenceSystem utm(int zone, boolean south) {
        return CRS_FACTORY.createFromParameters("UTM" + zone + (south ? "S" : "N"),
                "+proj=utm +zone=" + zone + (south ? " +south" : "") + " +datum=WGS84 +units=m +no_defs");
    }

    synchronized double[] forward(double x, double y) {
        return run(forward, x, y);
    }

    synchronized double[] back(double x, double y) {
        return run(back, x, y);
    }

    private static double[] run(CoordinateTransform t, double x, double y) {
        ProjCoordinate out = new ProjCoordinate();
        try {
            t.transform(new ProjCoordinate(x, y), out);
        } catch (Proj4jException e) {
            return new double[] {Double.NaN, Double.NaN};
        }
        return new double[] {out.x, out.y};
    }
}
