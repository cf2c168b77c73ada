package org.shutline.io;

import java.util.Locale;
import org.locationtech.proj4j.CRSFactory;
import org.locationtech.proj4j.CoordinateReferenceSystem;
import org.locationtech.proj4j.datum.Datum;
import org.locationtech.proj4j.datum.Ellipsoid;
import org.locationtech.proj4j.proj.ExtendedTransverseMercatorProjection;
import org.locationtech.proj4j.proj.LambertConformalConicProjection;
import org.locationtech.proj4j.proj.Projection;
import org.locationtech.proj4j.proj.TransverseMercatorProjection;
import org.shutline.model.CrsInfo;
import org.shutline.model.LinearUnit;

/**
 * Well-known-text (WKT1) forms of a projected {@link CrsInfo} for the files Shutline
 * writes: the OGC form for a GeoPackage's {@code gpkg_spatial_ref_sys.definition}
 * and the ESRI form for a shapefile's {@code .prj}.
 *
 * <p>The CRS is resolved with proj4j from its EPSG code, else its proj4 definition.
 * Transverse Mercator (UTM included) and Lambert Conformal Conic (one or two
 * standard parallels) are supported, which covers UTM and most US State Plane zones;
 * any other projection throws {@link IllegalArgumentException}. Datum names are
 * spelt the ESRI way for WGS 84, NAD83 and NAD27 (so GDAL identifies them), else
 * built from the proj4j datum code. False easting and northing are written in the
 * CRS's linear unit.
 */
public final class CrsWkt {
    private CrsWkt() {}

    /** The OGC WKT1 definition, with an AUTHORITY["EPSG",n] node when the code is known. */
    public static String ogc(CrsInfo crs) {
        return build(crs, false);
    }

    /** The ESRI WKT1 definition as written to a {@code .prj} (no AUTHORITY nodes). */
    public static String esri(CrsInfo crs) {
        return build(crs, true);
    }

    private static String build(CrsInfo crs, boolean esri) {
        CoordinateReferenceSystem c = resolve(crs);
        Projection p = c.getProjection();
        double u = crs.unit().metres();
        String geog = geogcs(c.getDatum(), esri);
        StringBuilder b = new StringBuilder();
        b.append("PROJCS[\"").append(esri ? esriName(crs, c) : crs.name()).append("\",").append(geog).append(',');
        if (isTmerc(p)) {
            b.append("PROJECTION[\"Transverse_Mercator\"],");
            param(b, esri ? "False_Easting" : "false_easting", p.getFalseEasting() / u);
            param(b, esri ? "False_Northing" : "false_northing", p.getFalseNorthing() / u);
            param(b, esri ? "Central_Meridian" : "central_meridian", deg(p.getProjectionLongitudeDegrees()));
            param(b, esri ? "Scale_Factor" : "scale_factor", p.getScaleFactor());
            param(b, esri ? "Latitude_Of_Origin" : "latitude_of_origin", deg(p.getProjectionLatitudeDegrees()));
        } else if (p instanceof LambertConformalConicProjection) {
            b.append(esri ? "PROJECTION[\"Lambert_Conformal_Conic\"]," : "PROJECTION[\"Lambert_Conformal_Conic_2SP\"],");
            param(b, esri ? "False_Easting" : "false_easting", p.getFalseEasting() / u);
            param(b, esri ? "False_Northing" : "false_northing", p.getFalseNorthing() / u);
            param(b, esri ? "Central_Meridian" : "central_meridian", deg(p.getProjectionLongitudeDegrees()));
            param(b, esri ? "Standard_Parallel_1" : "standard_parallel_1", deg(p.getProjectionLatitude1Degrees()));
            param(b, esri ? "Standard_Parallel_2" : "standard_parallel_2", deg(p.getProjectionLatitude2Degrees()));
            if (esri) param(b, "Scale_Factor", p.getScaleFactor());
            param(b, esri ? "Latitude_Of_Origin" : "latitude_of_origin", deg(p.getProjectionLatitudeDegrees()));
        } else {
            throw new IllegalArgumentException("no WKT form for the projection of " + crs.name() + ": " + p.getName());
        }
        b.append(unit(crs.unit(), esri));
        if (!esri && crs.epsg() > 0) b.append(",AUTHORITY[\"EPSG\",\"").append(crs.epsg()).append("\"]");
        return b.append(']').toString();
    }

    private static CoordinateReferenceSystem resolve(CrsInfo crs) {
        CRSFactory f = new CRSFactory();
        if (crs.epsg() > 0) return f.createFromName("EPSG:" + crs.epsg());
        if (crs.proj4() != null) return f.createFromParameters(crs.name(), crs.proj4());
        throw new IllegalArgumentException("CRS " + crs.name() + " has neither an EPSG code nor a proj4 definition");
    }

    private static String geogcs(Datum d, boolean esri) {
        Ellipsoid e = d.getEllipsoid();
        String code = d.getCode() == null ? "" : d.getCode();
        String[] n = switch (code) {
            // {OGC GEOGCS, OGC DATUM, ESRI GEOGCS, ESRI DATUM, spheroid}
            case "WGS84" -> new String[] {"WGS 84", "WGS_1984", "GCS_WGS_1984", "D_WGS_1984", "WGS_1984"};
            case "NAD83" -> new String[] {"NAD83", "North_American_Datum_1983", "GCS_North_American_1983",
                "D_North_American_1983", "GRS_1980"};
            case "NAD27" -> new String[] {"NAD27", "North_American_Datum_1927", "GCS_North_American_1927",
                "D_North_American_1927", "Clarke_1866"};
            default -> new String[] {code, code, "GCS_" + code, "D_" + code, e.getName().replace(' ', '_')};
        };
        double a = e.getEquatorRadius();
        double rf = inverseFlattening(e);
        String spheroid = String.format(Locale.ROOT, "SPHEROID[\"%s\",%s,%s]", n[4], num(a), num(rf));
        String prime = "PRIMEM[\"Greenwich\",0.0]";
        String deg = esri ? "UNIT[\"Degree\",0.0174532925199433]" : "UNIT[\"degree\",0.0174532925199433]";
        return esri
            ? "GEOGCS[\"" + n[2] + "\",DATUM[\"" + n[3] + "\"," + spheroid + "]," + prime + "," + deg + "]"
            : "GEOGCS[\"" + n[0] + "\",DATUM[\"" + n[1] + "\"," + spheroid + "]," + prime + "," + deg + "]";
    }

    /** Published inverse flattening for the common ellipsoids (EPSG registry), else from a and b. */
    private static double inverseFlattening(Ellipsoid e) {
        String s = e.getShortName() == null ? "" : e.getShortName();
        return switch (s) {
            case "WGS84" -> 298.257223563;
            case "GRS80" -> 298.257222101;
            case "clrk66" -> 294.978698213898;
            default -> e.getA() / (e.getA() - e.getB());
        };
    }

    private static String esriName(CrsInfo crs, CoordinateReferenceSystem c) {
        Projection p = c.getProjection();
        String code = c.getDatum().getCode() == null ? "" : c.getDatum().getCode();
        if (isTmerc(p) && p.getScaleFactor() == 0.9996
            && p.getFalseEasting() == 500000 && (code.equals("WGS84") || code.equals("NAD83"))) {
            int zone = (int) Math.round((p.getProjectionLongitudeDegrees() + 183) / 6);
            String hemi = p.getFalseNorthing() == 0 ? "N" : "S";
            return (code.equals("WGS84") ? "WGS_1984" : "NAD_1983") + "_UTM_Zone_" + zone + hemi;
        }
        return crs.name().replaceAll("[^A-Za-z0-9]+", "_");
    }

    private static boolean isTmerc(Projection p) {
        return p instanceof TransverseMercatorProjection || p instanceof ExtendedTransverseMercatorProjection;
    }

    private static String unit(LinearUnit u, boolean esri) {
        return switch (u) {
            case METRE -> esri ? "UNIT[\"Meter\",1.0]" : "UNIT[\"metre\",1,AUTHORITY[\"EPSG\",\"9001\"]]";
            case US_SURVEY_FOOT -> esri ? "UNIT[\"Foot_US\",0.3048006096012192]"
                : "UNIT[\"US survey foot\",0.304800609601219,AUTHORITY[\"EPSG\",\"9003\"]]";
            case INTERNATIONAL_FOOT -> esri ? "UNIT[\"Foot\",0.3048]"
                : "UNIT[\"foot\",0.3048,AUTHORITY[\"EPSG\",\"9002\"]]";
        };
    }

    private static void param(StringBuilder b, String name, double v) {
        b.append("PARAMETER[\"").append(name).append("\",").append(num(v)).append("],");
    }

    /** Degrees rounded to 1e-12 (below 1e-7 m on the ground) to undo the radian round trip (-92.99999999999999). */
    private static double deg(double v) {
        return Math.round(v * 1e12) / 1e12;
    }

    private static String num(double v) {
        if (v == Math.rint(v) && Math.abs(v) < 1e15) return String.format(Locale.ROOT, "%.1f", v);
        return Double.toString(v);
    }
}
