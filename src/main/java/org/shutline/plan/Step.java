package org.shutline.plan;

import java.time.Duration;

/**
 * One field step: its number in the whole plan (1-based), the phase it belongs to
 * (0-based index), the action, an optional note and duration (null when not given),
 * and the line of the plan file it starts on.
 */
public record Step(int number, int phase, StepAction action, String note, Duration duration, int line) {
    /** A short description, e.g. "close V-12, V-14". */
    public String describe() {
        return StepText.describe(action);
    }
}
