package org.shutline.model;

/** Status of a main. Abandoned mains carry no gas; proposed mains carry none until activated. Default {@link #ACTIVE}. */
public enum MainStatus {
    ACTIVE, ABANDONED, PROPOSED;
    public static final MainStatus DEFAULT = ACTIVE;
}
