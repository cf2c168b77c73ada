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
 */
record RawLayer(String name, String where, boolean dbf, List<String> fields, List<Feature> features, CrsInfo crs) {
    RawLayer {
        fields = List.copyOf(fields);
        features = Collections.unmodifiableList(new ArrayList<>(features));
    }

    /**
     * One feature: its number in the layer (shapefile record number from 1, or
     * GeoPackage fid), its geometry (null when absent or empty), the reason the
     * geometry could not be read (else null), and values aligned with the layer's
     * fields (null for empty).
     */
    record Feature(long fid, Geometry geometry, String geometryError, List<Object> values) {
        Feature {
            values = Collections.unmodifiableList(Arrays.asList(values.toArray()));
        }

        Feature withGeometry(Geometry g) {
            return new Feature(fid, g, geometryError, values);
        }
    }

    RawLayer withFeatures(List<Feature> fs) {
        return new RawLayer(name, where, dbf, fields, fs, crs);
    }
}
