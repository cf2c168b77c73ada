package org.shutline.render;

import java.awt.Graphics2D;

/**
 * Paints one layer of a map into screen pixels. {@code g} has the identity transform
 * of the target (pixels), the painter converts world coordinates itself through the
 * context's viewport, draws only what meets the viewport, and records each kind of
 * symbol it drew with {@link PaintContext#drew}. A painter must leave the paint, stroke
 * and font of {@code g} as it found them.
 */
@FunctionalInterface
public interface LayerPainter {
    void paint(Graphics2D g, PaintContext ctx);
}
