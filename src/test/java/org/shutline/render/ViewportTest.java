package org.shutline.render;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.awt.geom.Point2D;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.locationtech.jts.geom.Envelope;

class ViewportTest {
    private final Viewport v = new Viewport(1000, 2000, 0.5, 800, 600);

    @Test
    void centreMapsToScreenCentreAndYIsFlipped() {
        Point2D c = v.toScreen().transform(new Point2D.Double(1000, 2000), null);
        assertThat(c.getX()).isCloseTo(400, within(1e-9));
        assertThat(c.getY()).isCloseTo(300, within(1e-9));
        // 10 units north of the centre is 20 pixels up (0.5 units per pixel).
        Point2D n = v.toScreen().transform(new Point2D.Double(1000, 2010), null);
        assertThat(n.getY()).isCloseTo(280, within(1e-9));
        Point2D e = v.toScreen().transform(new Point2D.Double(1010, 2000), null);
        assertThat(e.getX()).isCloseTo(420, within(1e-9));
        assertThat(v.screenOf(1010, 2010)).isEqualTo(new Point2D.Double(420, 280));
    }

    @ParameterizedTest
    @ValueSource(longs = {1L, 42L, 20261201L})
    void transformsRoundTrip(long seed) {
        Random r = new Random(seed);
        for (int i = 0; i < 200; i++) {
            Viewport w = new Viewport(r.nextDouble() * 1e6, r.nextDouble() * 5e6, 0.01 + r.nextDouble() * 50,
                    1 + r.nextInt(3000), 1 + r.nextInt(3000));
            double x = w.centerX() + (r.nextDouble() - 0.5) * 1e4;
            double y = w.centerY() + (r.nextDouble() - 0.5) * 1e4;
            Point2D s = w.toScreen().transform(new Point2D.Double(x, y), null);
            Point2D back = w.toWorld().transform(s, null);
            assertThat(back.getX()).as("seed %d, %s", seed, w).isCloseTo(x, within(1e-6));
            assertThat(back.getY()).as("seed %d, %s", seed, w).isCloseTo(y, within(1e-6));
            assertThat(w.screenX(x)).as("seed %d", seed).isCloseTo(s.getX(), within(1e-6));
            assertThat(w.worldY(s.getY())).as("seed %d", seed).isCloseTo(y, within(1e-6));
        }
    }

    @Test
    void zoomAroundKeepsThePointUnderTheCursor() {
        Point2D before = v.worldOf(123, 456);
        Viewport z = v.zoomAround(123, 456, 2);
        assertThat(z.scale()).isEqualTo(0.25);
        Point2D after = z.worldOf(123, 456);
        assertThat(after.getX()).isCloseTo(before.getX(), within(1e-9));
        assertThat(after.getY()).isCloseTo(before.getY(), within(1e-9));
        assertThat(v.zoomAround(400, 300, 0.5).centerX()).isEqualTo(1000);
        assertThatThrownBy(() -> v.zoomAround(0, 0, 0)).isInstanceOf(IllegalArgumentException.class);
    }

    @Test
    void panMovesTheContentWithTheDrag() {
        Viewport p = v.pan(10, -20);
        // The world point that was at (400, 300) is now at (410, 280).
        Point2D s = p.screenOf(1000, 2000);
        assertThat(s.getX()).isCloseTo(410, within(1e-9));
        assertThat(s.getY()).isCloseTo(280, within(1e-9));
        assertThat(p.scale()).isEqualTo(v.scale());
    }

    @Test
    void fitShowsTheWholeEnvelopeInsideTheMargin() {
        Envelope env = new Envelope(0, 3000, 0, 1000);
        Viewport f = v.fit(env, 50);
        // Width governs: 3000 / (800 - 100) units per pixel.
        assertThat(f.scale()).isCloseTo(3000 / 700.0, within(1e-12));
        assertThat(f.screenX(0)).isCloseTo(50, within(1e-9));
        assertThat(f.screenX(3000)).isCloseTo(750, within(1e-9));
        assertThat(f.screenY(1000)).isGreaterThanOrEqualTo(50).isLessThan(300);
        assertThat(f.worldEnvelope().contains(env)).isTrue();
        assertThat(v.fit(new Envelope(), 10)).isEqualTo(v);
        assertThat(v.fit(new Envelope(5, 5, 7, 7), 10)).isEqualTo(v.withCenter(5, 7));
    }

    @Test
    void worldEnvelopeAndValueSemantics() {
        assertThat(v.worldEnvelope()).isEqualTo(new Envelope(800, 1200, 1850, 2150));
        assertThat(v.withScale(0.5)).isEqualTo(v);
        assertThat(v.withSize(100, 100).worldEnvelope().getWidth()).isEqualTo(50);
        assertThatThrownBy(() -> v.withScale(0)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> v.withSize(0, 10)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> v.withCenter(Double.NaN, 0)).isInstanceOf(IllegalArgumentException.class);
    }
}
