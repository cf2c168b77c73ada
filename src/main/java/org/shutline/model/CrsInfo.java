package org.shutline.model;

/**
 * The projected CRS of a loaded network: a name, the EPSG code when known (else 0),
 * a proj4 definition when known (else null), and the linear unit.
 */
public record CrsInfo(String name, int epsg, String proj4, LinearUnit unit) {
    public static final CrsInfo UNKNOWN_METRES = new CrsInfo("unknown (metres assumed)", 0, null, LinearUnit.METRE);
}
