package org.shutline.model;

/** Which regulating device of a station a sensing tap serves. Default {@link #WORKER}. */
public enum TapDevice {
    WORKER, MONITOR, BOTH;
    public static final TapDevice DEFAULT = WORKER;
}
