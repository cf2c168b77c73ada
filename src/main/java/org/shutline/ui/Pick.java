package org.shutline.ui;

import org.locationtech.jts.geom.Geometry;
import org.shutline.model.Feature;

/** A feature picked on the map or found by a search: its layer, the feature and its index in that layer's list. */
public record Pick(Kind kind, Feature feature, int index) {
    /** The network layers a feature can be picked from, in pick priority (points before lines). */
    public enum Kind { STATION("regulator station"), VALVE("valve"), TAP("sensing tap"), SOURCE("source"),
        SERVICE("service"), MAIN("main");

        private final String word;

        Kind(String word) {
            this.word = word;
        }

        public String word() {
            return word;
        }
    }

    public String id() {
        return feature.id();
    }

    public Geometry geometry() {
        return feature.geometry();
    }

    /** "valve V-016". */
    public String label() {
        return kind.word() + " " + id();
    }
}
