package org.shutline.cli;

import java.awt.geom.Point2D;
import java.util.Optional;
import org.shutline.analysis.WorkPackages;
import org.shutline.model.CrsInfo;
import org.shutline.render.GeoTransform;
import org.shutline.render.GridReference;

/**
 * US National Grid helpers for the emergency commands: the map sheet of a point (its
 * 1 km grid square, e.g. "15T VK 12 90"), a point's full reference, and the network
 * point of a typed reference. A network whose CRS has no transform has one sheet,
 * "all", and no references.
 */
final class GridSheets {
    private final GeoTransform geo;

    private GridSheets(GeoTransform geo) {
        this.geo = geo;
    }

    static GridSheets of(CrsInfo crs) {
        Optional<GeoTransform> g;
        try {
            g = GeoTransform.forCrs(crs);
        } catch (IllegalArgumentException e) {
            g = Optional.empty();
        }
        return new GridSheets(g.orElse(null));
    }

    boolean available() {
        return geo != null;
    }

    /** The sheet key: the 1 km square of the point, or "all" without a transform. */
    WorkPackages.SheetKey sheetKey() {
        return org.shutline.render.GridSheetKey.of(geo);
    }

    /** The 1 m reference of a network point, or "" without a transform. */
    String reference(double x, double y) {
        if (geo == null || Double.isNaN(x)) return "";
        try {
            return geo.gridReference(x, y).format(GridReference.Precision.M1);
        } catch (IllegalArgumentException e) {
            return "";
        }
    }

    /**
     * A typed reference's cell: the network point of its centre and the cell's side in
     * metres (1 m to 100 km by the digit count; a grid zone alone, "15T", has no square
     * and is given as {@link Integer#MAX_VALUE}).
     */
    record Cell(double x, double y, int sizeM, String text) {}

    /**
     * The network point of a typed reference: the centre of the cell it names (a
     * reference names a cell of 1 m to 100 km by its digit count; the grid library returns
     * its south-west corner, and half a cell is added each way), with the cell's size.
     *
     * @throws IllegalArgumentException when the text is not a reference or the network has no transform
     */
    Cell locate(String text) {
        if (geo == null) throw new IllegalArgumentException("the network's CRS is unknown: grid references cannot be used");
        GridReference sw = GridReference.parse(text);
        String compact = text.replaceAll("\\s+", "").toUpperCase(java.util.Locale.ROOT);
        int size = GridReference.cellMetres(text);
        if (size == 0) return new Cell(Double.NaN, Double.NaN, Integer.MAX_VALUE, compact);
        Point2D p = geo.fromGridReference(sw, size / 2.0, size / 2.0);
        return new Cell(p.getX(), p.getY(), size, compact);
    }
}
