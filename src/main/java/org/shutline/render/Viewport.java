package org.shutline.render;

import java.awt.geom.AffineTransform;
import java.awt.geom.NoninvertibleTransformException;
import java.awt.geom.Point2D;
import org.locationtech.jts.geom.Envelope;

/**
 * The part of the world shown in a pixel rectangle: an immutable value.
 *
 * <p>{@code centerX}/{@code centerY} are in CRS units, {@code scale} is CRS units per
 * pixel, {@code width}/{@code height} are pixels. World y points up, screen y points
 * down; the world centre falls on screen point (width/2, height/2). Every "with" method
 * returns a new viewport; equality is by value.
 */
public record Viewport(double centerX, double centerY, double scale, int width, int height) {

    public Viewport {
        if (!Double.isFinite(centerX) || !Double.isFinite(centerY)) {
            throw new IllegalArgumentException("viewport centre must be finite: " + centerX + ", " + centerY);
        }
        if (!(scale > 0) || !Double.isFinite(scale)) {
            throw new IllegalArgumentException("viewport scale must be positive and finite: " + scale);
        }
        if (width <= 0 || height <= 0) {
            throw new IllegalArgumentException("viewport size must be positive: " + width + " x " + height);
        }
    }

    /** A viewport of the given pixel size fitted to {@code env} with {@code marginPx} on every side. */
    public static Viewport fitting(Envelope env, int width, int height, double marginPx) {
        return new Viewport(0, 0, 1, width, height).fit(env, marginPx);
    }

    public Viewport withCenter(double x, double y) {
        return new Viewport(x, y, scale, width, height);
    }

    public Viewport withScale(double s) {
        return new Viewport(centerX, centerY, s, width, height);
    }

    /** Same centre and scale, new pixel size (a resized window shows more or less of the world). */
    public Viewport withSize(int w, int h) {
        return new Viewport(centerX, centerY, scale, w, h);
    }

    /**
     * Zoom by {@code factor} (above 1 zooms in: the scale is divided by it) keeping the
     * world point under screen point ({@code px}, {@code py}) where it is.
     */
    public Viewport zoomAround(double px, double py, double factor) {
        if (!(factor > 0) || !Double.isFinite(factor)) {
            throw new IllegalArgumentException("zoom factor must be positive and finite: " + factor);
        }
        double wx = worldX(px);
        double wy = worldY(py);
        double s = scale / factor;
        return new Viewport(wx - (px - width / 2.0) * s, wy + (py - height / 2.0) * s, s, width, height);
    }

    /**
     * Move the map content by ({@code dx}, {@code dy}) pixels on screen, as when it is
     * dragged: a positive {@code dx} moves the content right (the centre moves west).
     */
    public Viewport pan(double dx, double dy) {
        return new Viewport(centerX - dx * scale, centerY + dy * scale, scale, width, height);
    }

    /**
     * The viewport of the same pixel size centred on {@code env} at the fewest CRS units
     * per pixel that still show all of it inside a margin of {@code marginPx} pixels. A null or empty
     * envelope returns this viewport; a point (zero-size envelope) keeps the scale and
     * centres on it. When the margin leaves less than one pixel it is ignored.
     */
    public Viewport fit(Envelope env, double marginPx) {
        if (env == null || env.isNull()) return this;
        double cx = (env.getMinX() + env.getMaxX()) / 2.0;
        double cy = (env.getMinY() + env.getMaxY()) / 2.0;
        if (env.getWidth() == 0 && env.getHeight() == 0) return withCenter(cx, cy);
        double usableW = width - 2 * marginPx;
        double usableH = height - 2 * marginPx;
        if (usableW < 1 || usableH < 1) {
            usableW = width;
            usableH = height;
        }
        double s = Math.max(env.getWidth() / usableW, env.getHeight() / usableH);
        return new Viewport(cx, cy, s, width, height);
    }

    /** World to screen: x' = (x - cx)/s + w/2, y' = h/2 - (y - cy)/s. A new transform on each call. */
    public AffineTransform toScreen() {
        return new AffineTransform(1 / scale, 0, 0, -1 / scale,
                width / 2.0 - centerX / scale, height / 2.0 + centerY / scale);
    }

    /** Screen to world, the inverse of {@link #toScreen()}. */
    public AffineTransform toWorld() {
        try {
            return toScreen().createInverse();
        } catch (NoninvertibleTransformException e) {
            throw new IllegalStateException("viewport transform not invertible: " + this, e);
        }
    }

    public Point2D screenOf(double x, double y) {
        return new Point2D.Double(screenX(x), screenY(y));
    }

    public Point2D worldOf(double px, double py) {
        return new Point2D.Double(worldX(px), worldY(py));
    }

    public double screenX(double x) {
        return (x - centerX) / scale + width / 2.0;
    }

    public double screenY(double y) {
        return height / 2.0 - (y - centerY) / scale;
    }

    public double worldX(double px) {
        return centerX + (px - width / 2.0) * scale;
    }

    public double worldY(double py) {
        return centerY - (py - height / 2.0) * scale;
    }

    /** The world rectangle shown. */
    public Envelope worldEnvelope() {
        double hw = width * scale / 2.0;
        double hh = height * scale / 2.0;
        return new Envelope(centerX - hw, centerX + hw, centerY - hh, centerY + hh);
    }
}
