package org.shutline.plan;

/** A plan file that cannot be read or applied; the message names the file, line or step, and the reason. */
public class PlanException extends Exception {
    private final int line;

    public PlanException(String message, int line) {
        super(message);
        this.line = line;
    }

    /** The 1-based line of the plan file concerned, or 0 when none. */
    public int line() {
        return line;
    }
}
