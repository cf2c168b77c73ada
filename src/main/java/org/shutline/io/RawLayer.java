package org.shutline.io;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.List;
import org.locationtech.jts.geom.Geometry;
import org.shutline.model.CrsInfo;

/**
 * One layer as found in the input, before the data model is applied: its name,
 * where it came from (for messages), its field names in file order, its features,
 * and its CRS (null when the input gives none). {@code dbf} marks shapefile layers,
 * whose field names are at most 10 characters.
 *
 * <p>The feature list is held in one array list of its own; {@link #release} lets the
 * one decoder of the layer drop each feature once it has made its model record, so a
 * layer of a million services is not held twice while it is decoded. A feature list
 * given as an {@link ArrayList} is taken over, not copied (callers hand over a fresh one).
 */
final class RawLayer {
    private final String name;
    private final String where;
    private final boolean dbf;
    private final List<String> fields;
    private final ArrayList<Feature> features;
    private final CrsInfo crs;

    RawLayer(String name, String where, boolean dbf, List<String> fields, List<Feature> features, CrsInfo crs) {
        this.name = name;
        this.where = where;
        this.dbf = dbf;
        this.fields = List.copyOf(fields);
        this.features = features instanceof ArrayList<Feature> a ? a : new ArrayList<>(features);
        this.crs = crs;
    }

    String name() { return name; }

    String where() { return where; }

    boolean dbf() { return dbf; }

    List<String> fields() { return fields; }

    /** The features in input order (a slot is null once {@link #release}d). */
    List<Feature> features() { return Collections.unmodifiableList(features); }

    CrsInfo crs() { return crs; }

    /** Drops feature {@code i}: only for the layer's single consumer, after it has used it. */
    void release(int i) {
        features.set(i, null);
    }

    /**
     * One feature: its number in the layer (shapefile record number from 1, or
     * GeoPackage fid), its geometry (null when absent or empty), the reason the
     * geometry could not be read (else null), and values aligned with the layer's
     * fields (null for empty). The values array is owned by the feature (callers hand
     * over a fresh one) and never changed.
     */
    static final class Feature {
        private final long fid;
        private final Geometry geometry;
        private final String geometryError;
        private final Object[] values;

        Feature(long fid, Geometry geometry, String geometryError, List<Object> values) {
            this(fid, geometry, geometryError, values.toArray());
        }

        /** {@code values} is taken over, not copied: the caller must not keep or change it. */
        Feature(long fid, Geometry geometry, String geometryError, Object[] values) {
            this.fid = fid;
            this.geometry = geometry;
            this.geometryError = geometryError;
            this.values = values;
        }

        long fid() { return fid; }

        Geometry geometry() { return geometry; }

        String geometryError() { return geometryError; }

        /** Value of field {@code i} (null for empty). */
        Object value(int i) { return values[i]; }

        /** The values as an unmodifiable list view. */
        List<Object> values() { return Collections.unmodifiableList(Arrays.asList(values)); }

        Feature withGeometry(Geometry g) {
            return new Feature(fid, g, geometryError, values);
        }
    }
}
