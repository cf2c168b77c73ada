package org.shutline.render;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.geom.Rectangle2D;
import org.junit.jupiter.api.Test;

/** Segment clipping for street labels (Liang-Barsky): a street longer than the screen still gets a label place. */
class StreetLabelClipTest {
    private static final Rectangle2D SCREEN = new Rectangle2D.Double(0, 0, 100, 50);

    @Test
    void segmentThroughTheScreenIsCutAtBothEdges() {
        // from x = -1000 to x = 1000 along y = 20: the midpoint (0, 20) is on the left edge only; the clipped piece
        // is the full screen width
        assertThat(ContextPainter.clip(-1000, 20, 1000, 20, SCREEN)).containsExactly(0, 20, 100, 20);
        // a diagonal from (-50, -25) to (150, 75) enters at (0, 0) and leaves at (100, 50)
        assertThat(ContextPainter.clip(-50, -25, 150, 75, SCREEN)).containsExactly(0, 0, 100, 50);
    }

    @Test
    void segmentInsideIsKeptAndOutsideIsDropped() {
        assertThat(ContextPainter.clip(10, 10, 20, 30, SCREEN)).containsExactly(10, 10, 20, 30);
        assertThat(ContextPainter.clip(-10, 60, 200, 60, SCREEN)).isNull();
        assertThat(ContextPainter.clip(120, -10, 130, 80, SCREEN)).isNull();
    }
}
