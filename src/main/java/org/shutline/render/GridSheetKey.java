package org.shutline.render;

import org.shutline.analysis.WorkPackages;

/** Work packages by map sheet: the 1 km US National Grid square of a point (one rule for the commands and the window). */
public final class GridSheetKey {
    private GridSheetKey() {}

    /** The sheet key of {@code geo}: the point's 1 km square, "(outside the grid)" where there is none; all one sheet without a transform. */
    public static WorkPackages.SheetKey of(GeoTransform geo) {
        if (geo == null) return WorkPackages.SheetKey.NONE;
        return (x, y) -> {
            try {
                return geo.gridReference(x, y).format(GridReference.Precision.KM1);
            } catch (IllegalArgumentException e) {
                return "(outside the grid)";
            }
        };
    }
}
