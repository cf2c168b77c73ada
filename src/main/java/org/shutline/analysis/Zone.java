package org.shutline.analysis;

import java.util.List;
import org.locationtech.jts.geom.Polygon;

/**
 * What is to be isolated: a work zone or an incident point. See {@link Isolation} for
 * how each kind is turned into valve segments.
 */
public sealed interface Zone {
    /**
     * A point: the nearest active main (of system {@code systemId} when not null), on the
     * pipe edge of that main nearest the point. Exact distance ties go to the lower main id.
     */
    record AtPoint(double x, double y, String systemId) implements Zone {}

    /** Every active piece of the named mains. */
    record OfMains(List<String> mainIds) implements Zone {
        public OfMains {
            mainIds = List.copyOf(mainIds);
        }
    }

    /** Every active pipe edge whose line intersects the polygon (CRS of the network). */
    record InPolygon(Polygon polygon) implements Zone {}

    /** Valve segments by index (of the {@link org.shutline.trace.ValveSegments} in use). */
    record OfSegments(int[] segments) implements Zone {
        public OfSegments {
            segments = segments.clone();
        }

        @Override
        public int[] segments() {
            return segments.clone();
        }
    }

    static Zone main(String mainId) {
        return new OfMains(List.of(mainId));
    }

    static Zone point(double x, double y) {
        return new AtPoint(x, y, null);
    }
}
