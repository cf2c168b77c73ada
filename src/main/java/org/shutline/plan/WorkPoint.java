package org.shutline.plan;

/**
 * Where a step works on the pipe: a cut or a tie-in point, located on pipe edge
 * {@code edge} at {@code measure} in the state the step is carried out in (the state
 * before the step), at (x, y). {@code kind} is "cut" or "tie-in".
 */
public record WorkPoint(String kind, String mainId, int edge, double measure, double x, double y) {
}
