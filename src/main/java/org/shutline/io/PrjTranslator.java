package org.shutline.io;

import java.util.Locale;
import org.shutline.model.LinearUnit;

/**
 * Translates a WKT1 CRS as GDAL writes it into a {@code .prj} (ESRI style, usually
 * with no AUTHORITY code) into a proj4 definition and a linear unit.
 *
 * <p>Handled: {@code GEOGCS} alone ({@code +proj=longlat}), and {@code PROJCS} with
 * {@code PROJECTION} {@code Transverse_Mercator}, {@code Lambert_Conformal_Conic}
 * (ESRI's one name for both: one standard parallel plus a scale factor is the 1SP
 * form, two standard parallels the 2SP form), {@code Lambert_Conformal_Conic_1SP}
 * and {@code Lambert_Conformal_Conic_2SP}. The ellipsoid is written as {@code +a}
 * and {@code +b} (b = a (1 - 1/rf)), never {@code +rf}, because proj4j yields NaN
 * for {@code +a} with {@code +rf}. False easting and northing are given in the
 * CRS's linear unit and are converted to metres for {@code +x_0}/{@code +y_0}.
 * WGS 84, NAD83 and ETRS89 datums get {@code +towgs84=0,0,0}; an explicit
 * {@code TOWGS84} node is copied; other datums get no datum shift (a same-datum
 * assumption, stated in docs/input-data.md). Anything else throws
 * {@link IllegalArgumentException} with a message naming what is unsupported.
 */
final class PrjTranslator {
    private PrjTranslator() {}

    /** A translated CRS: its name, proj4 definition, linear unit and whether it is geographic. */
    record Result(String name, String proj4, LinearUnit unit, boolean geographic) {}

    static Result translate(Wkt root) {
        if (root.keyword.equals("GEOGCS")) {
            return new Result(root.text(0) == null ? "unnamed CRS" : root.text(0), "+proj=longlat " + ellipsoid(root) + " +no_defs", LinearUnit.METRE, true);
        }
        if (!root.keyword.equals("PROJCS")) {
            throw new IllegalArgumentException("unsupported CRS kind " + root.keyword + " (expected PROJCS or GEOGCS)");
        }
        Wkt geog = root.child("GEOGCS");
        if (geog == null) throw new IllegalArgumentException("PROJCS without GEOGCS");
        Wkt unitNode = root.child("UNIT");
        if (unitNode == null) throw new IllegalArgumentException("PROJCS without a linear UNIT");
        LinearUnit unit = unit(unitNode.text(0), unitNode.number(1));
        Wkt proj = root.child("PROJECTION");
        if (proj == null || proj.text(0) == null) throw new IllegalArgumentException("PROJCS without a named PROJECTION");
        String method = proj.text(0).toLowerCase(Locale.ROOT);
        double f = unit.metres();
        StringBuilder sb = new StringBuilder();
        double lat0 = param(root, 0, "latitude_of_origin", "latitude_of_center");
        double lon0 = param(root, 0, "central_meridian", "longitude_of_origin", "longitude_of_center");
        double k = param(root, 1, "scale_factor");
        double sp1 = param(root, Double.NaN, "standard_parallel_1");
        double sp2 = param(root, Double.NaN, "standard_parallel_2");
        switch (method) {
            case "transverse_mercator" -> sb.append("+proj=tmerc +lat_0=").append(fmt(lat0)).append(" +lon_0=")
                    .append(fmt(lon0)).append(" +k_0=").append(fmt(k));
            case "lambert_conformal_conic", "lambert_conformal_conic_1sp", "lambert_conformal_conic_2sp" -> {
                boolean oneSp = method.endsWith("_1sp") || (!method.endsWith("_2sp") && Double.isNaN(sp2));
                if (oneSp) {
                    double lat1 = Double.isNaN(sp1) ? lat0 : sp1;
                    sb.append("+proj=lcc +lat_1=").append(fmt(lat1)).append(" +lat_0=").append(fmt(lat1))
                            .append(" +lon_0=").append(fmt(lon0)).append(" +k_0=").append(fmt(k));
                } else {
                    if (Double.isNaN(sp1)) throw new IllegalArgumentException("Lambert 2SP without standard_parallel_1");
                    sb.append("+proj=lcc +lat_1=").append(fmt(sp1)).append(" +lat_2=").append(fmt(sp2))
                            .append(" +lat_0=").append(fmt(lat0)).append(" +lon_0=").append(fmt(lon0));
                }
            }
            default -> throw new IllegalArgumentException("unsupported projection " + proj.text(0)
                    + " (supported: Transverse_Mercator, Lambert_Conformal_Conic 1SP and 2SP)");
        }
        sb.append(" +x_0=").append(fmt(param(root, 0, "false_easting") * f))
                .append(" +y_0=").append(fmt(param(root, 0, "false_northing") * f))
                .append(' ').append(ellipsoid(geog)).append(' ').append(unitKeyword(unit)).append(" +no_defs");
        return new Result(root.text(0) == null ? "unnamed CRS" : root.text(0), sb.toString(), unit, false);
    }

    /** The linear unit named by a WKT UNIT node, recognised by its size in metres. */
    static LinearUnit unit(String name, double metres) {
        for (LinearUnit u : LinearUnit.values()) {
            if (Math.abs(u.metres() - metres) <= 1e-9 * u.metres()) return u;
        }
        throw new IllegalArgumentException("unsupported linear unit " + name + " (" + metres
                + " m); supported: metre, US survey foot, international foot");
    }

    /** The proj4 units keyword; the projection's output is in this unit. */
    static String unitKeyword(LinearUnit u) {
        return switch (u) {
            case METRE -> "+units=m";
            case US_SURVEY_FOOT -> "+units=us-ft";
            case INTERNATIONAL_FOOT -> "+units=ft";
        };
    }

    private static String ellipsoid(Wkt geog) {
        Wkt datum = geog.child("DATUM");
        if (datum == null) throw new IllegalArgumentException("GEOGCS without DATUM");
        Wkt sph = datum.child("SPHEROID");
        if (sph == null) throw new IllegalArgumentException("DATUM without SPHEROID");
        double a = sph.number(1);
        double rf = sph.number(2);
        double b = rf == 0 ? a : a * (1 - 1 / rf);
        String s = "+a=" + fmt(a) + " +b=" + fmt(b);
        Wkt pm = geog.child("PRIMEM");
        if (pm != null && pm.number(1) != 0) s += " +pm=" + fmt(pm.number(1));
        Wkt tw = datum.child("TOWGS84");
        if (tw != null) {
            StringBuilder t = new StringBuilder(" +towgs84=");
            for (int i = 0; i < tw.args.size(); i++) t.append(i == 0 ? "" : ",").append(fmt(tw.number(i)));
            return s + t;
        }
        String dn = datum.text(0) == null ? "" : datum.text(0).toLowerCase(Locale.ROOT).replace(" ", "_");
        if (dn.contains("wgs_1984") || dn.contains("wgs84") || dn.contains("north_american_1983")
                || dn.contains("nad83") || dn.contains("etrs_1989") || dn.contains("european_terrestrial_reference_system_1989")) {
            s += " +towgs84=0,0,0";
        }
        return s;
    }

    /** A PARAMETER of the PROJCS by any of its names (case-insensitive), or {@code dflt}. */
    private static double param(Wkt projcs, double dflt, String... names) {
        for (Wkt p : projcs.children("PARAMETER")) {
            String n = p.text(0);
            if (n == null) continue;
            for (String want : names) if (n.equalsIgnoreCase(want)) return p.number(1);
        }
        return dflt;
    }

    private static String fmt(double v) {
        if (v == Math.rint(v) && Math.abs(v) < 1e15) return Long.toString((long) v);
        return Double.toString(v);
    }
}
