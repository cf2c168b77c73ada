package org.shutline.render;

import java.util.Objects;
import org.locationtech.jts.geom.Geometry;

/**
 * An area that goes off gas (a gas-off extent), for the map overlay. The geometry is
 * polygonal (Polygon or MultiPolygon) in the network CRS; other geometry types are
 * drawn as their outline only. Drawn hatched so it reads in black and white.
 */
public interface GasOffArea {
    Geometry area();

    /** A plain value holding one area. */
    static GasOffArea of(Geometry area) {
        return new Plain(area);
    }

    /** The plain implementation used by {@link #of}. */
    record Plain(Geometry area) implements GasOffArea {
        public Plain {
            Objects.requireNonNull(area, "area");
        }
    }
}
