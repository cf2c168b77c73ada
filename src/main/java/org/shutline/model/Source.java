package org.shutline.model;

import org.locationtech.jts.geom.Point;

/** A supply point into a system (normally the highest-pressure one); {@code kpa} may be null. */
public record Source(String id, String systemId, Double kpa, Point geometry) implements Feature {
}
