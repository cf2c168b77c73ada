package org.shutline.model;

/**
 * Whether a valve can be relied on to operate. {@code NO} is never relied on;
 * {@code UNKNOWN} is relied on with a fallback. Default {@link #UNKNOWN}.
 */
public enum Operability {
    YES, NO, UNKNOWN;
    public static final Operability DEFAULT = UNKNOWN;
}
