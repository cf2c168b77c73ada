package org.shutline.io;

import java.util.Locale;
import org.locationtech.proj4j.BasicCoordinateTransform;
import org.locationtech.proj4j.CRSFactory;
import org.locationtech.proj4j.CoordinateReferenceSystem;
import org.locationtech.proj4j.ProjCoordinate;
import org.locationtech.proj4j.Proj4jException;
import org.shutline.model.CrsInfo;
import org.shutline.model.LinearUnit;

/**
 * Coordinate reference systems of input data: building {@link CrsInfo} from an EPSG
 * code (proj4j-epsg's table) or from WKT1 (an EPSG AUTHORITY when the WKT carries
 * one, else {@link PrjTranslator}), choosing the local UTM zone for geographic data,
 * and transforms between CRSs and to longitude/latitude (WGS 84 / EPSG:4326).
 *
 * <p>proj4j always takes and returns x = easting or longitude, y = northing or
 * latitude. A {@link CrsInfo} with a null proj4 definition (unknown CRS) cannot be
 * transformed: {@link #toLonLat} and {@link #between} throw
 * {@link IllegalArgumentException} for it.
 */
public final class Crs {
    private static final CRSFactory FACTORY = new CRSFactory();

    private Crs() {}

    /** A coordinate transform; {@link #apply} returns a new {x', y'} array. Safe for one thread at a time. */
    public interface Transform {
        double[] apply(double x, double y);
    }

    /** Definitions already looked up, by EPSG code. */
    private static final java.util.Map<Integer, CrsInfo> BY_CODE = new java.util.concurrent.ConcurrentHashMap<>();

    /**
     * The CRS with this EPSG code, from proj4j-epsg's table. The table's line for the code
     * ({@code <code> +proj=... <>}) is found by a plain scan of the resource and its
     * parameters given to proj4j, which gives the same definition as proj4j's own lookup
     * by name without tokenizing the whole 0.9 MB table (about half a second of a short
     * command); when the scan finds nothing, proj4j's lookup decides.
     */
    public static CrsInfo fromEpsg(int code) throws InputException {
        CrsInfo known = BY_CODE.get(code);
        if (known != null) return known;
        String def;
        try {
            String[] params = epsgLine(code);
            def = (params != null ? FACTORY.createFromParameters("EPSG:" + code, params)
                    : FACTORY.createFromName("EPSG:" + code)).getParameterString();
        } catch (Proj4jException | IllegalStateException e) {
            throw new InputException("EPSG:" + code + " is not a CRS known here: " + e.getMessage(), e);
        }
        CrsInfo c = new CrsInfo("EPSG:" + code, code, def, unitOf(def));
        BY_CODE.put(code, c);
        return c;
    }

    /** The parameters of the code's line in proj4j-epsg's {@code proj4/nad/epsg} table, or null. */
    private static String[] epsgLine(int code) {
        String head = "<" + code + ">";
        java.io.InputStream in = Crs.class.getResourceAsStream("/proj4/nad/epsg");
        if (in == null) return null;
        try (java.io.BufferedReader r = new java.io.BufferedReader(
                new java.io.InputStreamReader(in, java.nio.charset.StandardCharsets.ISO_8859_1))) {
            for (String line = r.readLine(); line != null; line = r.readLine()) {
                if (!line.startsWith(head)) continue;
                String body = line.substring(head.length()).trim();
                if (body.endsWith("<>")) body = body.substring(0, body.length() - 2).trim();
                return body.isEmpty() ? null : body.split("\\s+");
            }
        } catch (java.io.IOException e) {
            return null; // unreadable resource: proj4j's own lookup below reports the problem
        }
        return null;
    }

    /**
     * The CRS described by WKT1 text ({@code where} names the file or table for
     * messages): the EPSG code of a top-level AUTHORITY["EPSG", n] when present,
     * else a translation of the ESRI-style definition.
     */
    public static CrsInfo fromWkt(String wkt, String where) throws InputException {
        Wkt root;
        try {
            root = Wkt.parse(wkt);
        } catch (IllegalArgumentException e) {
            throw new InputException(where + ": CRS definition is not readable WKT: " + e.getMessage());
        }
        Wkt auth = root.child("AUTHORITY");
        if (auth != null && "EPSG".equalsIgnoreCase(auth.text(0)) && auth.text(1) != null) {
            try {
                CrsInfo c = fromEpsg(Integer.parseInt(auth.text(1).trim()));
                return new CrsInfo(root.text(0) == null ? c.name() : root.text(0), c.epsg(), c.proj4(), c.unit());
            } catch (InputException e) {
                throw new InputException(where + ": " + e.getMessage(), e);
            } catch (NumberFormatException e) {
                throw new InputException(where + ": bad EPSG code '" + auth.text(1) + "' in CRS definition");
            }
        }
        try {
            PrjTranslator.Result r = PrjTranslator.translate(root);
            FACTORY.createFromParameters(null, r.proj4());
            return new CrsInfo(r.name(), 0, r.proj4(), r.unit());
        } catch (IllegalArgumentException | Proj4jException e) {
            throw new InputException(where + ": unsupported CRS: " + e.getMessage());
        }
    }

    /** True when the CRS is geographic (longitude/latitude in degrees). */
    public static boolean isGeographic(CrsInfo crs) {
        return crs.proj4() != null && (crs.proj4().contains("+proj=longlat") || crs.proj4().contains("+proj=latlong"));
    }

    /** The WGS 84 UTM zone CRS (EPSG 326zz north, 327zz south) for a point. */
    public static CrsInfo utmFor(double lon, double lat) throws InputException {
        int zone = utmZone(lon);
        return fromEpsg((lat >= 0 ? 32600 : 32700) + zone);
    }

    /** UTM zone 1..60 of a longitude (6-degree zones from 180 W; the Norway/Svalbard exceptions are not applied). */
    public static int utmZone(double lon) {
        double l = ((lon + 180) % 360 + 360) % 360;
        return Math.min(60, (int) Math.floor(l / 6) + 1);
    }

    /** A transform from {@code crs} to {lon, lat} in degrees on WGS 84 (EPSG:4326). */
    public static Transform toLonLat(CrsInfo crs) {
        return between(crs, wgs84());
    }

    /** A transform from one CRS to another; a point outside the target's domain gives {NaN, NaN}. */
    public static Transform between(CrsInfo from, CrsInfo to) {
        CoordinateReferenceSystem a = create(from);
        CoordinateReferenceSystem b = create(to);
        BasicCoordinateTransform t = new BasicCoordinateTransform(a, b);
        return (x, y) -> {
            ProjCoordinate out = new ProjCoordinate();
            try {
                t.transform(new ProjCoordinate(x, y), out);
            } catch (Proj4jException e) {
                return new double[] {Double.NaN, Double.NaN}; // outside the projection's domain
            }
            return new double[] {out.x, out.y};
        };
    }

    /** True when both name the same CRS (same EPSG code, or the same proj4 definition). */
    static boolean same(CrsInfo a, CrsInfo b) {
        if (a.epsg() != 0 && a.epsg() == b.epsg()) return true;
        return a.proj4() != null && b.proj4() != null && norm(a.proj4()).equals(norm(b.proj4()));
    }

    private static String norm(String p) {
        return p.trim().replaceAll("\\s+", " ").toLowerCase(Locale.ROOT);
    }

    private static CrsInfo wgs84() {
        return new CrsInfo("EPSG:4326", 4326, "+proj=longlat +datum=WGS84 +no_defs", LinearUnit.METRE);
    }

    private static CoordinateReferenceSystem create(CrsInfo c) {
        if (c.proj4() == null) throw new IllegalArgumentException("CRS " + c.name() + " has no definition to transform with");
        return FACTORY.createFromParameters(c.name(), c.proj4());
    }

    /** The linear unit of a proj4 definition: +units or +to_meter; metre when neither is given. */
    static LinearUnit unitOf(String proj4) {
        for (String tok : proj4.trim().split("\\s+")) {
            if (tok.equals("+units=us-ft")) return LinearUnit.US_SURVEY_FOOT;
            if (tok.equals("+units=ft")) return LinearUnit.INTERNATIONAL_FOOT;
            if (tok.startsWith("+to_meter=")) {
                return PrjTranslator.unit("to_meter", Double.parseDouble(tok.substring("+to_meter=".length())));
            }
        }
        return LinearUnit.METRE;
    }
}
