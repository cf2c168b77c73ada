package org.shutline.model;

/** Kind of valve. All kinds behave alike in the trace; {@link #STATION} marks a station inlet valve. Default {@link #MAIN}. */
public enum ValveKind {
    MAIN, STATION, BYPASS, SERVICE;
    public static final ValveKind DEFAULT = MAIN;
}
