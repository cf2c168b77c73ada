package org.shutline.model;

import org.locationtech.jts.geom.Point;

/** Where a station's control (sensing) line meets a main of the station's outlet system. */
public record SenseTap(String id, String stationId, TapDevice device, Point geometry) implements Feature {
}
