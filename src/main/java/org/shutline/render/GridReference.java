package org.shutline.render;

import java.text.ParseException;
import java.util.Locale;
import mil.nga.grid.features.Point;
import mil.nga.mgrs.MGRS;
import mil.nga.mgrs.grid.GridType;

/**
 * A US National Grid reference (FGDC-STD-011-2001; the same values as MGRS over
 * WGS84/UTM): grid zone (number and latitude band), 100 km square (column and row
 * letters) and the easting and northing in whole metres within that square (0 to
 * 99 999). Computed with NGA's {@code mil.nga:mgrs} library, which takes longitude
 * before latitude.
 *
 * <p>Formatted as {@code "18S UJ 23486 06483"}: at each coarser precision the digits
 * are truncated, never rounded, so a reference names the cell that contains the point
 * (the cell's south-west corner is the reference itself). Latitudes outside -80..84
 * (the polar UPS areas) are not supported.
 *
 * <p>From UTM coordinates ({@link #ofUtm}) the reference is built directly: the 100 km
 * square letters from the zone and the easting and northing, the digits the easting and
 * northing within the square truncated to the metre (FGDC-STD-011-2001: a reference
 * names the cell that contains the point). A network already in the point's UTM zone
 * goes this way (see {@link GeoTransform#gridReference}): a conversion to latitude and
 * longitude and back would give values a few nanometres below a whole metre for
 * whole-metre coordinates, and truncation then names the cell 1 m south or west.
 */
public record GridReference(int zone, char band, char column, char row, int easting, int northing) {

    /** Precision of a formatted reference: digits per coordinate and cell size in metres. */
    public enum Precision {
        M1(5, 1), M10(4, 10), M100(3, 100), KM1(2, 1000), KM10(1, 10_000);

        private final int digits;
        private final int metres;

        Precision(int digits, int metres) {
            this.digits = digits;
            this.metres = metres;
        }

        public int digits() {
            return digits;
        }

        public int metres() {
            return metres;
        }

        /** The precision with this many digits per coordinate (1 to 5). */
        public static Precision ofDigits(int d) {
            for (Precision p : values()) if (p.digits == d) return p;
            throw new IllegalArgumentException("a grid reference has 1 to 5 digits per coordinate: " + d);
        }
    }

    public GridReference {
        if (zone < 1 || zone > 60) throw new IllegalArgumentException("UTM zone out of range: " + zone);
        if (easting < 0 || easting > 99_999 || northing < 0 || northing > 99_999) {
            throw new IllegalArgumentException("easting and northing are metres within a 100 km square: "
                    + easting + ", " + northing);
        }
    }

    /**
     * The reference of a WGS84 point to the metre (truncated).
     *
     * @throws IllegalArgumentException for a latitude outside -80..84 or a non-finite input
     */
    public static GridReference of(double lon, double lat) {
        if (!Double.isFinite(lon) || !Double.isFinite(lat) || lat < -80 || lat > 84) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "no US National Grid reference for longitude %.6f, latitude %.6f (latitude must be -80 to 84)",
                    lon, lat));
        }
        double l = lon;
        if (l >= 180) l -= 360;
        if (l < -180) l += 360;
        MGRS m = MGRS.from(l, lat);
        return new GridReference(m.getZone(), m.getBand(), m.getColumn(), m.getRow(),
                (int) m.getEasting(), (int) m.getNorthing());
    }

    /**
     * The reference of UTM (easting, northing) in metres in zone {@code zone} with latitude
     * band {@code band} (the northing of a southern-hemisphere zone includes its 10 000 km
     * false northing): square letters of the zone's lettering (NGA {@code MGRS} column and
     * row letters), digits truncated to the metre.
     *
     * @throws IllegalArgumentException for a non-finite coordinate or an easting outside 100 000..899 999 m
     */
    public static GridReference ofUtm(int zone, char band, double easting, double northing) {
        if (!Double.isFinite(easting) || !Double.isFinite(northing) || easting < 100_000 || easting >= 900_000 || northing < 0) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "no US National Grid reference for UTM zone %d easting %.3f northing %.3f", zone, easting, northing));
        }
        long e = (long) Math.floor(easting);
        long n = (long) Math.floor(northing);
        return new GridReference(zone, band, MGRS.getColumnLetter(zone, e), MGRS.getRowLetter(zone, n),
                (int) (e % 100_000), (int) (n % 100_000));
    }

    /** The UTM easting in metres of this reference's point (the south-west corner of its 1 m cell). */
    public double utmEasting() {
        return new MGRS(zone, band, column, row, easting, northing).getUTMEasting();
    }

    /** The UTM northing in metres of this reference's point (with the false northing in the south). */
    public double utmNorthing() {
        return new MGRS(zone, band, column, row, easting, northing).getUTMNorthing();
    }

    /** True for a southern-hemisphere latitude band (C to M). */
    public boolean south() {
        return band < 'N';
    }

    /**
     * Parses a reference with or without blanks ("18S UJ 234 064", "18SUJ234064"); the
     * result is the south-west corner of the cell named, to the metre.
     *
     * @throws IllegalArgumentException when the text is not a USNG/MGRS reference
     */
    public static GridReference parse(String text) {
        String t = text == null ? "" : text.replaceAll("\\s+", "").toUpperCase(Locale.ROOT);
        try {
            if (!MGRS.isMGRS(t)) throw new ParseException(t, 0);
            MGRS m = MGRS.parse(t);
            String columns = COLUMN_SETS[m.getZone() % 3];
            if (columns.indexOf(m.getColumn()) < 0) {
                throw new IllegalArgumentException("not a US National Grid reference: \"" + text + "\": column letter " + m.getColumn()
                        + " is not used in zone " + m.getZone() + " (its 100 km columns are " + columns.charAt(0) + " to "
                        + columns.charAt(columns.length() - 1) + ")");
            }
            return new GridReference(m.getZone(), m.getBand(), m.getColumn(), m.getRow(),
                    (int) m.getEasting(), (int) m.getNorthing());
        } catch (IllegalArgumentException e) {
            if (e.getMessage() != null && e.getMessage().startsWith("not a US National Grid reference")) throw e;
            throw new IllegalArgumentException("not a US National Grid reference: \"" + text + "\"", e);
        } catch (ParseException | RuntimeException e) {
            throw new IllegalArgumentException("not a US National Grid reference: \"" + text + "\"", e);
        }
    }

    /**
     * 100 km column letters by zone number mod 3 (zone 3, 6, ... use S to Z; 1, 4, ... A
     * to H; 2, 5, ... J to R; I and O are never used), as GeographicLib's GeoConvert
     * checks them ("Column letter A not in zone 15 set STUVWXYZ"); the tests compare
     * every zone and letter with it.
     */
    private static final String[] COLUMN_SETS = {"STUVWXYZ", "ABCDEFGH", "JKLMNPQR"};

    /**
     * The side in metres of the cell a typed reference names: 100 000 for a 100 km square
     * alone ("15T WJ"), 10 000 to 1 for 1 to 5 digits per coordinate, 0 for a grid zone
     * alone ("15T").
     *
     * @throws IllegalArgumentException when the text is not a USNG/MGRS reference
     */
    public static int cellMetres(String text) {
        String t = text == null ? "" : text.replaceAll("\\s+", "").toUpperCase(Locale.ROOT);
        try {
            GridType g = MGRS.precision(t);
            return g == GridType.GZD ? 0 : g.getPrecision();
        } catch (ParseException | RuntimeException e) {
            throw new IllegalArgumentException("not a US National Grid reference: \"" + text + "\"", e);
        }
    }

    /** Grid zone designation, e.g. "18S". */
    public String gridZone() {
        return zone + String.valueOf(band);
    }

    /** 100 km square identification, e.g. "UJ". */
    public String squareId() {
        return "" + column + row;
    }

    /** For example "18S UJ 23486 06483" (M1) or "18S UJ 234 064" (M100); digits truncated. */
    public String format(Precision p) {
        int div = p.metres();
        String fmt = "%0" + p.digits() + "d";
        return gridZone() + " " + squareId() + " "
                + String.format(Locale.ROOT, fmt, easting / div) + " "
                + String.format(Locale.ROOT, fmt, northing / div);
    }

    /** The reference of the cell of the given precision containing this one (its south-west corner). */
    public GridReference truncate(Precision p) {
        int div = p.metres();
        return new GridReference(zone, band, column, row, easting / div * div, northing / div * div);
    }

    /** WGS84 (longitude, latitude) of this reference's point, the south-west corner of its 1 m cell. */
    public double[] toLonLat() {
        MGRS m = new MGRS(zone, band, column, row, easting, northing);
        Point p = m.toPoint();
        return new double[] {p.getLongitude(), p.getLatitude()};
    }

    @Override
    public String toString() {
        return format(Precision.M1);
    }
}
