package org.shutline.model;

import org.locationtech.jts.geom.Geometry;

/**
 * A main: pipe in one pressure system. Geometry is a LineString or MultiLineString
 * (each part its own line with its own ends) in the network CRS. Nullable numbers
 * are null when the field is empty.
 */
public record Main(String id, String systemId, MainStatus status, String material,
                   Double diamMm, Double maopKpa, Integer installYr, Geometry geometry) implements Feature {
    public Main withStatus(MainStatus s) {
        return new Main(id, systemId, s, material, diamMm, maopKpa, installYr, geometry);
    }
}
