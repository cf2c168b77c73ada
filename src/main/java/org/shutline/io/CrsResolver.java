package org.shutline.io;

import java.util.ArrayList;
import java.util.List;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.CoordinateSequence;
import org.locationtech.jts.geom.CoordinateSequenceFilter;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.shutline.model.CrsInfo;
import org.shutline.model.Finding;
import org.shutline.model.Findings;
import org.shutline.model.Severity;

/**
 * Brings all layers of one input into one projected CRS, the network CRS.
 *
 * <p>The mains' CRS decides. Geographic mains are re-projected to the WGS 84 UTM
 * zone of the mains' mean longitude (north or south by mean latitude), with a NOTE
 * {@code reprojected}; so are Mercator mains (Web Mercator, EPSG:3857), whose scale
 * grows as 1/cos(latitude), with a NOTE giving the scale at their mean latitude. A layer whose CRS differs from the mains' (by EPSG code or
 * proj4 definition) is re-projected to the network CRS, with a NOTE. A layer with
 * no CRS: if its coordinates look like degrees (all within +-180 / +-90) it is an
 * {@link InputException}, unless the mains are geographic, when the mains' CRS is
 * assumed; otherwise it is taken to be in the network CRS (metres when the mains
 * have none either), with a WARNING {@code no-prj} (shapefile) or {@code no-crs}
 * (GeoPackage).
 */
final class CrsResolver {
    private final String source;
    private CrsInfo mainsCrs;
    private CrsInfo target;

    CrsResolver(String source) {
        this.source = source;
    }

    /** The network CRS, after {@link #start}. */
    CrsInfo target() {
        return target;
    }

    /** Decides the network CRS from the mains layer and returns the mains in it. */
    RawLayer start(RawLayer mains, Findings findings) throws InputException {
        Envelope env = envelope(mains);
        if (mains.crs() == null || !Crs.isGeographic(mains.crs())) checkPlausible(mains);
        if (mains.crs() == null) {
            if (looksLikeDegrees(env)) throw degrees(mains);
            target = CrsInfo.UNKNOWN_METRES;
            if (!env.isNull()) findings.add(noCrs(mains, "coordinates assumed projected in metres"));
            return mains;
        }
        mainsCrs = mains.crs();
        if (isMercator(mainsCrs)) {
            // Mercator scale is 1/cos(latitude): its "metres" are not metres on the ground (x1.35 at 42 N)
            double[] mean = meanXy(mains);
            double[] ll = Crs.toLonLat(mainsCrs).apply(mean[0], mean[1]);
            if (!Double.isFinite(ll[0]) || !Double.isFinite(ll[1])) {
                throw new InputException(mains.where() + ": layer " + mains.name() + " is in Mercator (" + mainsCrs.name()
                        + ") but its coordinates are outside the projection (reading " + source + ")");
            }
            target = Crs.utmFor(ll[0], ll[1]);
            findings.add(Finding.of("reprojected", Severity.NOTE, "mains", String.format(java.util.Locale.ROOT,
                    "layer %s is in Mercator (%s), whose lengths are not lengths on the ground (x%.2f at %.1f degrees latitude);"
                    + " re-projected with all layers to %s (%s)", mains.name(), mainsCrs.name(),
                    1 / Math.cos(Math.toRadians(ll[1])), ll[1], zoneName(target), target.name())));
            return reproject(mains, mainsCrs, target);
        }
        if (!Crs.isGeographic(mainsCrs)) {
            target = mainsCrs;
            return mains;
        }
        double[] mean = meanXy(mains);
        target = Crs.utmFor(mean[0], mean[1]);
        findings.add(Finding.of("reprojected", Severity.NOTE, "mains", "layer " + mains.name() + " is in geographic "
                + "coordinates (" + mainsCrs.name() + "); re-projected with all layers to " + zoneName(target)
                + " (" + target.name() + ")"));
        return reproject(mains, mainsCrs, target);
    }

    /** Returns {@code layer} in the network CRS. */
    RawLayer adopt(RawLayer layer, String ours, Findings findings) throws InputException {
        CrsInfo c = layer.crs();
        if (c == null) {
            Envelope env = envelope(layer);
            if (looksLikeDegrees(env)) {
                if (mainsCrs == null || !Crs.isGeographic(mainsCrs)) throw degrees(layer);
                findings.add(noCrs(layer, "coordinates assumed in the mains' CRS " + mainsCrs.name()));
                return reproject(layer, mainsCrs, target);
            }
            if (!env.isNull()) findings.add(noCrs(layer, "coordinates assumed in the network CRS " + target.name()));
            return layer;
        }
        if (mainsCrs != null && Crs.same(c, mainsCrs)) {
            return Crs.same(mainsCrs, target) ? layer : reproject(layer, mainsCrs, target);
        }
        if (target.proj4() == null) {
            throw new InputException(layer.where() + ": layer " + layer.name() + " is in " + c.name()
                    + " but the mains layer has no CRS to re-project it to");
        }
        findings.add(Finding.of("reprojected", Severity.NOTE, ours, "layer " + layer.name() + " is in " + c.name()
                + ", not the mains' CRS; re-projected to " + target.name()));
        return reproject(layer, c, target);
    }

    private Finding noCrs(RawLayer l, String assumed) {
        return l.dbf()
                ? Finding.of("no-prj", Severity.WARNING, l.name(), "no .prj: " + assumed + " (" + l.where() + ")")
                : Finding.of("no-crs", Severity.WARNING, l.name(), "no CRS: " + assumed + " (" + l.where() + ")");
    }

    private InputException degrees(RawLayer l) {
        return new InputException(l.where() + ": layer " + l.name() + " has " + (l.dbf() ? "no .prj" : "no CRS")
                + " and its coordinates look like degrees of longitude/latitude; add a .prj (or CRS) so it can be re-projected"
                + " (reading " + source + ")");
    }

    /** True for a Mercator projection (Web Mercator EPSG:3857 and its older codes, World Mercator): not fit for lengths. */
    static boolean isMercator(CrsInfo c) {
        return c.proj4() != null && c.proj4().contains("+proj=merc");
    }

    /**
     * No projected CRS of the Earth has coordinates beyond half the equator, 20,037.5 km
     * (Web Mercator's edge; UTM and state plane stay far inside it): a mains layer that
     * reaches past it has a wrong CRS or broken coordinates, and lengths and distances
     * from it would mean nothing. Refused naming the layer and the first such feature.
     */
    private void checkPlausible(RawLayer l) throws InputException {
        double perUnit = l.crs() == null ? 1 : l.crs().unit().metres();
        for (RawLayer.Feature f : l.features()) {
            if (f.geometry() == null) continue;
            Envelope e = f.geometry().getEnvelopeInternal();
            double far = Math.max(Math.max(Math.abs(e.getMinX()), Math.abs(e.getMaxX())),
                    Math.max(Math.abs(e.getMinY()), Math.abs(e.getMaxY()))) * perUnit;
            if (!(far <= EARTH_HALF_EQUATOR_M * 1.001)) {
                throw new InputException(l.where() + ": layer " + l.name() + ", feature " + f.fid() + ": coordinates reach "
                        + String.format(java.util.Locale.ROOT, "%.4g", far) + " m from the origin, beyond any projected CRS of the Earth"
                        + " (20,037 km); the CRS (" + (l.crs() == null ? "none, metres assumed" : l.crs().name())
                        + ") or the coordinates are wrong (reading " + source + ")");
            }
        }
    }

    /** Half the WGS 84 equator, pi * 6,378,137 m: the largest easting of Web Mercator (EPSG:3857). */
    static final double EARTH_HALF_EQUATOR_M = Math.PI * 6_378_137.0;

    static String zoneName(CrsInfo utm) {
        int code = utm.epsg();
        return "UTM zone " + (code % 100) + (code / 100 == 326 ? "N" : "S");
    }

    static boolean looksLikeDegrees(Envelope e) {
        return !e.isNull() && e.getMinX() >= -180 && e.getMaxX() <= 180 && e.getMinY() >= -90 && e.getMaxY() <= 90;
    }

    private static Envelope envelope(RawLayer l) {
        Envelope e = new Envelope();
        for (RawLayer.Feature f : l.features()) if (f.geometry() != null) e.expandToInclude(f.geometry().getEnvelopeInternal());
        return e;
    }

    /** Mean of all vertex coordinates (x, y) of the layer; (0, 0) when there are none. */
    private static double[] meanXy(RawLayer l) {
        double sx = 0;
        double sy = 0;
        long n = 0;
        for (RawLayer.Feature f : l.features()) {
            if (f.geometry() == null) continue;
            for (Coordinate c : f.geometry().getCoordinates()) {
                if (Double.isFinite(c.x) && Double.isFinite(c.y)) { sx += c.x; sy += c.y; n++; }
            }
        }
        return n == 0 ? new double[] {0, 0} : new double[] {sx / n, sy / n};
    }

    static RawLayer reproject(RawLayer l, CrsInfo from, CrsInfo to) {
        Crs.Transform t = Crs.between(from, to);
        List<RawLayer.Feature> out = new ArrayList<>(l.features().size());
        for (RawLayer.Feature f : l.features()) {
            out.add(f.geometry() == null ? f : f.withGeometry(transform(f.geometry(), t)));
        }
        return new RawLayer(l.name(), l.where(), l.dbf(), l.fields(), out, to);
    }

    static Geometry transform(Geometry g, Crs.Transform t) {
        Geometry copy = g.copy();
        copy.apply(new CoordinateSequenceFilter() {
            @Override
            public void filter(CoordinateSequence seq, int i) {
                double[] p = t.apply(seq.getX(i), seq.getY(i));
                seq.setOrdinate(i, 0, p[0]);
                seq.setOrdinate(i, 1, p[1]);
            }

            @Override
            public boolean isDone() {
                return false;
            }

            @Override
            public boolean isGeometryChanged() {
                return true;
            }
        });
        copy.geometryChanged();
        return copy;
    }
}
