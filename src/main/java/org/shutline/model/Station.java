package org.shutline.model;

import org.locationtech.jts.geom.Point;

/**
 * A district regulator station: a one-way link from system {@code inSys} to
 * {@code outSys} at its location. Set, monitor and relief pressures in kPa (gauge);
 * monitor and relief are null when the station has none. {@code reliefFull}: the relief
 * is recorded as full-capacity (able to pass the full flow of a failed-open regulator),
 * {@code true}; recorded as token or partial capacity, {@code false}; not recorded, null.
 */
public record Station(String id, String inSys, String outSys, Double setKpa, Double monitorKpa,
                      Double reliefKpa, String name, Point geometry, Boolean reliefFull) implements Feature {
    /** A station whose relief capacity is not recorded. */
    public Station(String id, String inSys, String outSys, Double setKpa, Double monitorKpa,
                   Double reliefKpa, String name, Point geometry) {
        this(id, inSys, outSys, setKpa, monitorKpa, reliefKpa, name, geometry, null);
    }

    /** True when the station has a monitor regulator or a relief device. */
    public boolean hasSecondaryProtection() {
        return monitorKpa != null || reliefKpa != null;
    }

    /** True when a relief is recorded and recorded as full-capacity: only such a relief limits an over-pressure. */
    public boolean hasFullRelief() {
        return reliefKpa != null && Boolean.TRUE.equals(reliefFull);
    }
}
