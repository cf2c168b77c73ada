package org.shutline.topology;

/**
 * The codes of the connectivity findings made by {@link NetworkBuilder}; their
 * severities and meanings are listed in docs/connectivity.md.
 */
public final class FindingCodes {
    private FindingCodes() {}

    public static final String DANGLING_END = "dangling-end";
    public static final String NEAR_MISS = "near-miss";
    public static final String UNATTACHED_SERVICE = "unattached-service";
    public static final String SERVICE_MAIN_NOT_FOUND = "service-main-not-found";
    public static final String SERVICE_FAR_FROM_MAIN = "service-far-from-main";
    public static final String SERVICE_OTHER_SYSTEM = "service-other-system";
    public static final String VALVE_OFF_MAIN = "valve-off-main";
    public static final String TAP_OFF_MAIN = "tap-off-main";
    public static final String STATION_NO_INLET = "station-no-inlet";
    public static final String STATION_NO_OUTLET = "station-no-outlet";
    public static final String STATION_UNKNOWN = "station-unknown";
    public static final String SOURCE_OFF_MAIN = "source-off-main";
    public static final String SYSTEMS_TOUCHING = "systems-touching";
    public static final String SHARED_INTERIOR_VERTEX = "shared-interior-vertex";
    public static final String DUPLICATE_ID = "duplicate-id";
    public static final String EMPTY_GEOMETRY = "empty-geometry";
    public static final String INVALID_GEOMETRY = "invalid-geometry";
    public static final String ZERO_LENGTH_MAIN = "zero-length-main";
    public static final String UNKNOWN_SYSTEM = "unknown-system";

    /** Layer names used in findings. */
    public static final String MAINS = "mains";
    public static final String VALVES = "valves";
    public static final String STATIONS = "stations";
    public static final String TAPS = "sense_taps";
    public static final String SERVICES = "services";
    public static final String SOURCES = "sources";
}
