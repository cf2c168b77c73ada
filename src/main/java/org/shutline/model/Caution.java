package org.shutline.model;

/** The safety caution carried by every map, report, table and the about box. */
public final class Caution {
    private Caution() {}

    /** One paragraph, plain words. */
    public static final String TEXT =
            "CAUTION: Results depend on the completeness and accuracy of the GIS records. "
            + "Field-verify valve locations, valve condition and sensing-line locations before work. "
            + "Shutline does not replace the operator's procedures, local codes or licensed engineering review; "
            + "follow them.";

    /** A short form for status lines and map margins. */
    public static final String SHORT =
            "CAUTION: based on GIS records only; field-verify valves and sensing lines; operator procedures, local codes and licensed engineering review govern.";
}
