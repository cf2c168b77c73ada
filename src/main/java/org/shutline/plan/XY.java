package org.shutline.plan;

/** A point in the network CRS, as written in a plan ({@code [x, y]}). */
public record XY(double x, double y) {
}
