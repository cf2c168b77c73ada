package org.shutline.model;

import org.locationtech.jts.geom.Geometry;

/** A network feature: its input id and geometry in the network CRS. */
public interface Feature {
    String id();

    Geometry geometry();
}
