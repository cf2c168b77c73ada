package org.shutline.render;

import java.awt.geom.Point2D;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.ConcurrentHashMap;
import org.locationtech.proj4j.CoordinateReferenceSystem;
import org.shutline.model.CrsInfo;

/**
 * Converts between the network CRS and WGS84 longitude/latitude (degrees), through
 * proj4j: the CRS is built from its EPSG code when known, else from its proj4
 * definition. Safe to share between threads. A point that cannot be transformed gives
 * NaN coordinates.
 */
public final class GeoTransform {
    private final CrsInfo crs;
    private final CoordinateReferenceSystem networkCrs;
    private final Reprojection lonLat;
    private final Map<Integer, Reprojection> utmCache = new ConcurrentHashMap<>();

    private GeoTransform(CrsInfo crs, CoordinateReferenceSystem networkCrs) {
        this.crs = crs;
        this.networkCrs = networkCrs;
        this.lonLat = new Reprojection(networkCrs, Reprojection.wgs84());
    }

    /**
     * The transform for a network CRS; empty when the CRS has neither an EPSG code nor a
     * proj4 definition (a network in an unknown CRS has no grid references).
     *
     * @throws IllegalArgumentException when proj4j cannot use the code or definition
     */
    public static Optional<GeoTransform> forCrs(CrsInfo crs) {
        CoordinateReferenceSystem c = Reprojection.crsOf(crs);
        return c == null ? Optional.empty() : Optional.of(new GeoTransform(crs, c));
    }

    public CrsInfo crs() {
        return crs;
    }

    /** Network CRS to (longitude, latitude) in degrees. */
    public Point2D toLonLat(double x, double y) {
        double[] r = lonLat.forward(x, y);
        return new Point2D.Double(r[0], r[1]);
    }

    /** (longitude, latitude) in degrees to the network CRS. */
    public Point2D fromLonLat(double lon, double lat) {
        double[] r = lonLat.back(lon, lat);
        return new Point2D.Double(r[0], r[1]);
    }

    /** The US National Grid reference of a network point (see {@link GridReference#of}). */
    public GridReference gridReference(double x, double y) {
        Point2D ll = toLonLat(x, y);
        return GridReference.of(ll.getX(), ll.getY());
    }

    /** Network CRS to WGS84 / UTM of the given zone, and back; built once per zone and hemisphere. */
    Reprojection utm(int zone, boolean south) {
        return utmCache.computeIfAbsent(south ? -zone : zone,
                z -> new Reprojection(networkCrs, Reprojection.utm(zone, south)));
    }
}
