package org.shutline.model;

import java.util.List;
import java.util.Map;
import org.locationtech.jts.geom.Geometry;

/** A layer drawn on maps and used to describe locations (streets, buildings), never traced. */
public record ContextLayer(String name, List<Item> items) {
    public ContextLayer {
        items = List.copyOf(items);
    }

    /** One feature of a context layer; attributes keyed by field name (values may be null). */
    public record Item(Geometry geometry, Map<String, Object> attributes) {
        public String text(String field) {
            Object v = attributes.get(field);
            return v == null ? null : v.toString();
        }
    }
}
