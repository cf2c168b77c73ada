package org.shutline.model;

/**
 * Connectivity tolerances in metres (inclusive): snap between main ends, point
 * features to mains, services to mains, and the near-miss factor applied to the snap
 * tolerance. Convert with {@link #inUnit(LinearUnit)} before comparing CRS distances.
 */
public record Tolerances(double snapM, double pointM, double serviceM, double nearMissFactor) {
    public static final Tolerances DEFAULT = new Tolerances(0.5, 2.0, 60.0, 5.0);

    public Tolerances {
        if (!(snapM >= 0) || !(pointM >= 0) || !(serviceM >= 0) || !(nearMissFactor >= 1)) {
            throw new IllegalArgumentException("tolerances must be non-negative and the near-miss factor at least 1");
        }
    }

    /** Tolerances as lengths in the given CRS unit, in the same record shape. */
    public Tolerances inUnit(LinearUnit u) {
        return new Tolerances(u.fromMetres(snapM), u.fromMetres(pointM), u.fromMetres(serviceM), nearMissFactor);
    }

    public double nearMiss() {
        return snapM * nearMissFactor;
    }
}
