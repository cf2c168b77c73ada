package org.shutline.model;

import org.locationtech.jts.geom.Point;

/**
 * A district regulator station: a one-way link from system {@code inSys} to
 * {@code outSys} at its location. Set, monitor and relief pressures in kPa (gauge);
 * monitor and relief are null when the station has none.
 */
public record Station(String id, String inSys, String outSys, Double setKpa, Double monitorKpa,
                      Double reliefKpa, String name, Point geometry) implements Feature {
    /** True when the station has a monitor regulator or a relief device. */
    public boolean hasSecondaryProtection() {
        return monitorKpa != null || reliefKpa != null;
    }
}
