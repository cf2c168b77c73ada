package org.shutline.report;

import java.awt.Graphics2D;

/**
 * One page of an exported document, drawn with Java2D in a coordinate space of
 * points (1/72 in) with the origin at the top left. Implementations must draw only
 * through the given graphics and must not keep it.
 */
@FunctionalInterface
public interface Sheet {
    void paint(Graphics2D g, double widthPt, double heightPt);
}
