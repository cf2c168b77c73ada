package org.shutline.io;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import mil.nga.geopackage.GeoPackage;
import mil.nga.geopackage.GeoPackageException;
import mil.nga.geopackage.GeoPackageManager;
import mil.nga.geopackage.features.user.FeatureColumn;
import mil.nga.geopackage.features.user.FeatureDao;
import mil.nga.geopackage.features.user.FeatureResultSet;
import mil.nga.geopackage.features.user.FeatureRow;
import mil.nga.geopackage.geom.GeoPackageGeometryData;
import mil.nga.geopackage.srs.SpatialReferenceSystem;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.io.ParseException;
import org.locationtech.jts.io.WKBReader;
import org.shutline.model.CrsInfo;

/**
 * The GeoPackage reader before issue 15, kept as the reference the fast reader
 * ({@link GeoPackageSource}) is compared with feature by feature in {@code GeoPackageSourceTest}.
 *
 * <p>
 * Reads every feature table of a GeoPackage, opened read-only and validated with
 * NGA's {@code GeoPackageManager.open(false, file, true)}, into {@link RawLayer}s in the order
 * the GeoPackage lists them. Geometry: the row's {@code GeoPackageGeometryData} WKB
 * read by JTS {@code WKBReader}. CRS: from the table's {@code gpkg_spatial_ref_sys}
 * row, by its organization's EPSG code when it has one, else by its WKT definition;
 * the undefined systems (srs_id -1 and 0, definition "undefined") give a null CRS.
 * A file that is not an SQLite database, or that NGA cannot open as a GeoPackage, is
 * an {@link InputException} naming the file.
 */
final class NgaGeoPackageSource {
    private static final byte[] SQLITE_MAGIC = "SQLite format 3\0".getBytes(StandardCharsets.US_ASCII);

    private NgaGeoPackageSource() {}

    static List<RawLayer> read(Path file) throws InputException {
        checkMagic(file);
        GeoPackage gp;
        try {
            // open(writable, file, validate): NGA's two-argument open(file, boolean) takes "validate", not "writable"
            gp = GeoPackageManager.open(false, file.toFile(), true);
        } catch (GeoPackageException e) {
            throw new InputException(file + ": not a readable GeoPackage: " + e.getMessage(), e);
        }
        try {
            List<RawLayer> out = new ArrayList<>();
            for (String table : gp.getFeatureTables()) out.add(layer(gp, table, file));
            return out;
        } catch (GeoPackageException e) {
            throw new InputException(file + ": cannot read GeoPackage: " + e.getMessage(), e);
        } finally {
            gp.close();
        }
    }

    private static void checkMagic(Path file) throws InputException {
        byte[] head = new byte[SQLITE_MAGIC.length];
        int n;
        try (InputStream in = Files.newInputStream(file)) {
            n = in.readNBytes(head, 0, head.length);
        } catch (IOException e) {
            throw new InputException(file + ": cannot read: " + e.getMessage(), e);
        }
        if (n < head.length || !Arrays.equals(head, SQLITE_MAGIC)) {
            throw new InputException(file + ": not a GeoPackage (not an SQLite database)");
        }
    }

    private static RawLayer layer(GeoPackage gp, String table, Path file) throws InputException {
        String where = file + " layer " + table;
        FeatureDao dao = gp.getFeatureDao(table);
        List<String> names = new ArrayList<>();
        for (FeatureColumn c : dao.getTable().getColumns()) {
            if (!c.isPrimaryKey() && !c.isGeometry()) names.add(c.getName());
        }
        CrsInfo crs = crs(dao.getSrs(), where);
        WKBReader wkb = new WKBReader();
        List<RawLayer.Feature> fs = new ArrayList<>();
        FeatureResultSet rs = dao.queryForAll();
        try {
            while (rs.moveToNext()) {
                FeatureRow row = rs.getRow();
                Object[] vals = new Object[names.size()];
                for (int i = 0; i < vals.length; i++) vals[i] = plainDate(row.getValue(names.get(i)));
                Geometry g = null;
                String err = null;
                GeoPackageGeometryData data = row.getGeometry();
                if (data != null && !data.isEmpty()) {
                    try {
                        g = wkb.read(data.getWkb());
                        if (g.isEmpty()) g = null;
                    } catch (ParseException | IOException | RuntimeException e) {
                        err = "geometry not readable: " + e.getMessage();
                    }
                }
                fs.add(new RawLayer.Feature(row.getId(), g, err, Arrays.asList(vals)));
            }
        } finally {
            rs.close();
        }
        return new RawLayer(table, where, false, names, fs, crs);
    }

    /** NGA gives DATE and DATETIME columns as {@code java.util.Date} parsed in UTC: back to the calendar date. */
    private static Object plainDate(Object v) {
        if (v instanceof java.util.Date d) return d.toInstant().atZone(java.time.ZoneOffset.UTC).toLocalDate();
        return v;
    }

    private static CrsInfo crs(SpatialReferenceSystem srs, String where) throws InputException {
        if (srs == null) return null;
        long id = srs.getOrganizationCoordsysId();
        if ("EPSG".equalsIgnoreCase(srs.getOrganization()) && id > 0) {
            try {
                return Crs.fromEpsg((int) id);
            } catch (InputException e) {
                // proj4j's table lacks this code: fall back to the WKT definition below
                if (srs.getDefinition() == null) throw e;
            }
        }
        String def = srs.getDefinition();
        if (def == null || def.isBlank() || def.trim().equalsIgnoreCase("undefined") || srs.getSrsId() <= 0) return null;
        return Crs.fromWkt(def, where);
    }
}
