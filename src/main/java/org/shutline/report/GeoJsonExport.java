package org.shutline.report;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.time.LocalDate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.io.geojson.GeoJsonWriter;
import org.shutline.io.AtomicFiles;
import org.shutline.io.WriteLayer;
import org.shutline.model.CrsInfo;

/**
 * Writes one layer as a GeoJSON FeatureCollection in the <em>network CRS</em>, not in
 * WGS84 longitude/latitude as RFC 7946 asks: the result layers must line up with the
 * network in the user's GIS without a re-projection, and coordinates stay in metres or
 * feet. So that readers know the CRS, the collection carries the top-level
 * {@code "crs"} member of the 2008 GeoJSON specification
 * ({@code {"type":"name","properties":{"name":"urn:ogc:def:crs:EPSG::32615"}}}), which
 * GDAL/OGR and QGIS honour; when the CRS has no EPSG code the member is left out and
 * the foreign member {@code "shutline_crs"} gives its name and proj4 definition.
 *
 * <p>Geometry is written by JTS's {@link GeoJsonWriter} (with {@code setEncodeCRS(false)},
 * 3 decimals: millimetres in a metric CRS); features are wrapped with Jackson, with the
 * layer's columns as properties (numbers as JSON numbers, dates as ISO text, empty
 * values as null). A row with no geometry gets {@code "geometry": null}. The file is
 * written to a temporary file and moved into place.
 */
public final class GeoJsonExport {
    private static final ObjectMapper JSON = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private GeoJsonExport() {}

    public static void write(Path out, WriteLayer layer, CrsInfo crs) throws IOException {
        String text = format(layer, crs);
        AtomicFiles.write(out, os -> os.write(text.getBytes(StandardCharsets.UTF_8)));
    }

    /** The GeoJSON text of a layer. */
    public static String format(WriteLayer layer, CrsInfo crs) throws IOException {
        GeoJsonWriter gw = new GeoJsonWriter(3);
        gw.setEncodeCRS(false);
        ObjectNode root = JSON.createObjectNode();
        root.put("type", "FeatureCollection");
        root.put("name", layer.name());
        if (crs.epsg() > 0) {
            ObjectNode c = root.putObject("crs");
            c.put("type", "name");
            c.putObject("properties").put("name", "urn:ogc:def:crs:EPSG::" + crs.epsg());
        } else {
            ObjectNode c = root.putObject("shutline_crs");
            c.put("name", crs.name());
            if (crs.proj4() != null) c.put("proj4", crs.proj4());
            c.put("unit", crs.unit().symbol());
        }
        ArrayNode features = root.putArray("features");
        for (int i = 0; i < layer.size(); i++) {
            ObjectNode f = features.addObject();
            f.put("type", "Feature");
            ObjectNode props = f.putObject("properties");
            for (int c = 0; c < layer.columns().size(); c++) put(props, layer.columns().get(c), layer.value(i, c));
            Geometry g = layer.geometry(i);
            if (g == null || g.isEmpty()) {
                f.putNull("geometry");
            } else {
                try {
                    f.set("geometry", JSON.readTree(gw.write(g)));
                } catch (JsonProcessingException e) {
                    throw new IllegalStateException("JTS wrote GeoJSON that does not parse for row " + i + " of " + layer.name(), e);
                }
            }
        }
        return JSON.writeValueAsString(root) + "\n";
    }

    private static void put(ObjectNode props, WriteLayer.Column col, Object v) {
        String k = col.name();
        if (v == null) {
            props.putNull(k);
            return;
        }
        switch (col.type()) {
            case INTEGER -> props.put(k, ((Number) v).longValue());
            case REAL -> props.put(k, ((Number) v).doubleValue());
            case DATE -> props.put(k, v instanceof LocalDate d ? d.toString() : v.toString());
            case TEXT -> props.put(k, v.toString());
        }
    }
}
