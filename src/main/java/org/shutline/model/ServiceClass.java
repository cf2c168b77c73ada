package org.shutline.model;

/** Customer class of a service. Default {@link #RESIDENTIAL}. */
public enum ServiceClass {
    RESIDENTIAL, COMMERCIAL, INDUSTRIAL, CRITICAL;
    public static final ServiceClass DEFAULT = RESIDENTIAL;
}
