package org.shutline.model;

/** Normal position of a valve in the network as recorded. Default {@link #OPEN}. */
public enum NormalPosition {
    OPEN, CLOSED;
    public static final NormalPosition DEFAULT = OPEN;
}
