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

    /**
     * The US National Grid reference of a network point, to the metre. The grid zone and
     * latitude band are those of the point's latitude and longitude ({@link GridReference#of},
     * the standard zones with their Norway and Svalbard exceptions). The easting and
     * northing are the point's own coordinates when the network CRS is that UTM zone
     * ({@link #utmZone}), else the point projected from the network CRS straight to that
     * UTM zone; the reference is then built from them ({@link GridReference#ofUtm}), never
     * from a round trip through latitude and longitude.
     *
     * @throws IllegalArgumentException when the point has no reference (outside -80..84 degrees, not finite)
     */
    public GridReference gridReference(double x, double y) {
        Point2D ll = toLonLat(x, y);
        GridReference zoneOf = GridReference.of(ll.getX(), ll.getY());
        boolean south = ll.getY() < 0;
        int own = utmZone(crs);
        double e, n;
        if (own == (south ? -zoneOf.zone() : zoneOf.zone())) {
            e = x;
            n = y;
        } else {
            double[] u = utm(zoneOf.zone(), south).forward(x, y);
            e = u[0];
            n = u[1];
        }
        return GridReference.ofUtm(zoneOf.zone(), zoneOf.band(), e, n);
    }

    /**
     * The network point at (east, north) metres from the south-west corner of a grid
     * reference's 1 m cell (0.5, 0.5 is the centre of that cell): the reference's UTM
     * coordinates themselves when the network CRS is its UTM zone, else projected from
     * that zone. NaN coordinates when the point cannot be transformed.
     */
    public Point2D fromGridReference(GridReference ref, double east, double north) {
        double e = ref.utmEasting() + east;
        double n = ref.utmNorthing() + north;
        int own = utmZone(crs);
        if (own == (ref.south() ? -ref.zone() : ref.zone())) return new Point2D.Double(e, n);
        double[] w = utm(ref.zone(), ref.south()).back(e, n);
        return new Point2D.Double(w[0], w[1]);
    }

    /**
     * The UTM zone a CRS is, in metres on WGS 84 or NAD 83 (which US National Grid takes
     * as the same, FGDC-STD-011-2001), positive north and negative south; 0 when it is
     * not one. By EPSG code (WGS 84 / UTM 32601-32660 and 32701-32760, NAD83 / UTM
     * 26901-26923, ETRS89 / UTM 25828-25838) or, without a code, by a proj4 definition
     * {@code +proj=utm +zone=N [+south]} on the WGS84 or GRS80 ellipsoid in metres.
     */
    public static int utmZone(CrsInfo crs) {
        if (crs == null || crs.unit() != org.shutline.model.LinearUnit.METRE) return 0;
        int c = crs.epsg();
        if (c >= 32601 && c <= 32660) return c - 32600;
        if (c >= 32701 && c <= 32760) return -(c - 32700);
        if (c >= 26901 && c <= 26923) return c - 26900;
        if (c >= 25828 && c <= 25838) return c - 25800;
        if (c > 0 || crs.proj4() == null) return 0;
        Map<String, String> p = new java.util.HashMap<>();
        for (String t : crs.proj4().trim().split("\\s+")) {
            if (!t.startsWith("+")) continue;
            int eq = t.indexOf('=');
            p.put(eq < 0 ? t.substring(1) : t.substring(1, eq), eq < 0 ? "" : t.substring(eq + 1));
        }
        if (!"utm".equals(p.get("proj")) || p.get("zone") == null) return 0;
        String units = p.getOrDefault("units", "m");
        String datum = p.get("datum"), ellps = p.get("ellps");
        boolean earth = "WGS84".equals(datum) || "NAD83".equals(datum)
                || (datum == null && ("WGS84".equals(ellps) || "GRS80".equals(ellps)));
        String towgs = p.get("towgs84");
        boolean noShift = towgs == null || towgs.replaceAll("[0.,\\s]", "").isEmpty();
        if (!"m".equals(units) || p.containsKey("to_meter") || !earth || !noShift) return 0;
        int z;
        try {
            z = Integer.parseInt(p.get("zone"));
        } catch (NumberFormatException ex) {
            return 0;
        }
        if (z < 1 || z > 60) return 0;
        return p.containsKey("south") ? -z : z;
    }

    /** Network CRS to WGS84 / UTM of the given zone, and back; built once per zone and hemisphere. */
    Reprojection utm(int zone, boolean south) {
        return utmCache.computeIfAbsent(south ? -zone : zone,
                z -> new Reprojection(networkCrs, Reprojection.utm(zone, south)));
    }
}
