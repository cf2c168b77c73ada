package org.shutline.render;

/**
 * An isolation circle around an incident point: centre in the network CRS, radius in
 * metres (converted to the CRS unit when drawn; labelled in the CRS unit's family,
 * metres or feet).
 */
public interface IsolationRing {
    double centerX();

    double centerY();

    double radiusMetres();

    static IsolationRing of(double centerX, double centerY, double radiusMetres) {
        return new Plain(centerX, centerY, radiusMetres);
    }

    /** The plain implementation used by {@link #of}. */
    record Plain(double centerX, double centerY, double radiusMetres) implements IsolationRing {
        public Plain {
            if (!(radiusMetres > 0)) throw new IllegalArgumentException("isolation radius must be positive: " + radiusMetres);
        }
    }
}
