package org.shutline.io;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.SQLException;
import java.util.ArrayList;
import java.util.List;
import mil.nga.geopackage.BoundingBox;
import mil.nga.geopackage.GeoPackage;
import mil.nga.geopackage.GeoPackageException;
import mil.nga.geopackage.GeoPackageManager;
import mil.nga.geopackage.db.GeoPackageDataType;
import mil.nga.geopackage.db.TableColumnKey;
import mil.nga.geopackage.features.columns.GeometryColumns;
import mil.nga.geopackage.features.user.FeatureColumn;
import mil.nga.geopackage.features.user.FeatureDao;
import mil.nga.geopackage.features.user.FeatureRow;
import mil.nga.geopackage.features.user.FeatureTableMetadata;
import mil.nga.geopackage.geom.GeoPackageGeometryData;
import mil.nga.geopackage.srs.SpatialReferenceSystem;
import mil.nga.sf.GeometryType;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.io.WKBWriter;
import org.shutline.model.CrsInfo;
import org.shutline.model.Progress;

/**
 * Writes layers to a new GeoPackage (NGA geopackage library): one feature table per
 * {@link WriteLayer}, geometry column {@code geom}, primary key {@code fid}, the
 * layer's columns with their types (TEXT, REAL, MEDIUMINT (32-bit) for INTEGER, DATE), one SRS row for the
 * CRS (organisation EPSG and the code when known, else organisation NONE with srs_id
 * 100000; the definition is {@link CrsWkt#ogc}), and the table's extent in
 * {@code gpkg_contents}. The geometry type of a table is the one JTS type all its
 * rows share, else GEOMETRY. Geometries go in as 2D WKB from JTS's {@link WKBWriter}.
 *
 * <p>The file is built under a temporary name in the target folder, then moved over
 * the target (replacing it). Rows are inserted in one transaction per 10,000 rows.
 */
public final class GeoPackageWriter {
    private static final int BATCH = 10_000;

    private GeoPackageWriter() {}

    /** Write {@code layers} in {@code crs} to {@code target}, replacing any file there. */
    public static void write(Path target, CrsInfo crs, List<WriteLayer> layers, Progress progress) throws IOException {
        Files.createDirectories(target.toAbsolutePath().getParent());
        Path tmp = AtomicFiles.tempBeside(target, ".gpkg");
        boolean moved = false;
        try {
            GeoPackage gp = GeoPackageManager.open(GeoPackageManager.create(tmp.toFile()));
            try {
                SpatialReferenceSystem srs = srs(gp, crs);
                for (WriteLayer layer : layers) writeLayer(gp, srs, layer, progress);
            } finally {
                gp.close();
            }
            AtomicFiles.moveIntoPlace(tmp, target);
            moved = true;
        } catch (SQLException | GeoPackageException e) {
            throw new IOException("cannot write GeoPackage " + target + ": " + e.getMessage(), e);
        } finally {
            if (!moved) Files.deleteIfExists(tmp);
        }
    }

    private static SpatialReferenceSystem srs(GeoPackage gp, CrsInfo crs) throws SQLException {
        if (crs.epsg() <= 0 && crs.proj4() == null) {
            // a network with no CRS: the GeoPackage's own "undefined Cartesian SRS" row, srs_id -1 (OGC 12-128r18, 1.1.2.1.2)
            SpatialReferenceSystem undefined = gp.getSpatialReferenceSystemDao().queryForId(-1L);
            if (undefined != null) return undefined;
        }
        SpatialReferenceSystem s = new SpatialReferenceSystem();
        long id = crs.epsg() > 0 ? crs.epsg() : 100000;
        s.setSrsName(crs.name());
        s.setSrsId(id);
        s.setOrganization(crs.epsg() > 0 ? "EPSG" : "NONE");
        s.setOrganizationCoordsysId(id);
        s.setDefinition(CrsWkt.ogc(crs));
        s.setDescription(crs.name());
        gp.getSpatialReferenceSystemDao().createOrUpdate(s);
        return s;
    }

    private static void writeLayer(GeoPackage gp, SpatialReferenceSystem srs, WriteLayer layer, Progress progress)
            throws IOException {
        GeometryColumns gc = new GeometryColumns();
        gc.setId(new TableColumnKey(layer.name(), "geom"));
        gc.setGeometryType(geometryType(layer));
        gc.setZ((byte) 0);
        gc.setM((byte) 0);
        gc.setSrs(srs);
        List<FeatureColumn> cols = new ArrayList<>();
        for (WriteLayer.Column c : layer.columns()) cols.add(FeatureColumn.createColumn(c.name(), dataType(c.type())));
        gp.createFeatureTable(FeatureTableMetadata.create(gc, "fid", cols, extent(layer)));
        FeatureDao dao = gp.getFeatureDao(layer.name());
        WKBWriter wkb = new WKBWriter(2);
        progress.begin("writing " + layer.name(), layer.size());
        gp.beginTransaction();
        boolean ok = false;
        try {
            for (int i = 0; i < layer.size(); i++) {
                FeatureRow row = dao.newRow();
                Geometry g = layer.geometry(i);
                if (g != null && !g.isEmpty()) {
                    row.setGeometry(GeoPackageGeometryData.createFromWkbAndBuildEnvelope(srs.getSrsId(), wkb.write(g)));
                }
                for (int c = 0; c < layer.columns().size(); c++) {
                    row.setValue(layer.columns().get(c).name(), cell(layer.columns().get(c).type(), layer.value(i, c)));
                }
                dao.create(row);
                if ((i + 1) % BATCH == 0) {
                    gp.endAndBeginTransaction();
                    progress.done(i + 1);
                    progress.checkCancelled();
                }
            }
            ok = true;
        } finally {
            gp.endTransaction(ok);
        }
        progress.done(layer.size());
    }

    private static Object cell(WriteLayer.ColumnType type, Object v) {
        if (v == null) return null;
        return switch (type) {
            case TEXT, DATE -> v.toString();
            case REAL -> ((Number) v).doubleValue();
            case INTEGER -> Math.toIntExact(((Number) v).longValue());
        };
    }

    private static GeoPackageDataType dataType(WriteLayer.ColumnType t) {
        return switch (t) {
            case TEXT -> GeoPackageDataType.TEXT;
            case REAL -> GeoPackageDataType.REAL;
            case INTEGER -> GeoPackageDataType.MEDIUMINT; // 32-bit; GDAL reads it as Integer (INTEGER would be Integer64)
            case DATE -> GeoPackageDataType.DATE;
        };
    }

    private static GeometryType geometryType(WriteLayer layer) {
        String type = null;
        for (int i = 0; i < layer.size(); i++) {
            Geometry g = layer.geometry(i);
            if (g == null) continue;
            if (type == null) type = g.getGeometryType();
            else if (!type.equals(g.getGeometryType())) return GeometryType.GEOMETRY;
        }
        if (type == null) {
            return switch (layer.kind()) {
                case POINT -> GeometryType.POINT;
                case LINE -> GeometryType.LINESTRING;
                case POLYGON -> GeometryType.POLYGON;
            };
        }
        return GeometryType.findName(type.toUpperCase(java.util.Locale.ROOT));
    }

    private static BoundingBox extent(WriteLayer layer) {
        Envelope e = new Envelope();
        for (int i = 0; i < layer.size(); i++) {
            Geometry g = layer.geometry(i);
            if (g != null) e.expandToInclude(g.getEnvelopeInternal());
        }
        return e.isNull() ? null : new BoundingBox(e.getMinX(), e.getMinY(), e.getMaxX(), e.getMaxY());
    }
}
