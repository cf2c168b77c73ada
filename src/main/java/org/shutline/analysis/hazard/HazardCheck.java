package org.shutline.analysis.hazard;

import org.shutline.model.Finding;
import java.util.List;

/**
 * A hazard rule. Implementations are stateless, have a public no-argument
 * constructor (for {@link java.util.ServiceLoader}) and return an empty list when the
 * state is sound.
 */
public interface HazardCheck {
    /** The code of the hazards this rule raises, lower-case words joined by hyphens. */
    String code();

    /** One line saying what the rule looks for. */
    String description();

    List<Finding> check(StepContext ctx);

    /**
     * True when a qualified person attending a station (able to shut it down, watching its
     * outlet pressure: the plan's {@code attend} step) mitigates this rule's hazards of that
     * station (a hazard is of a station when its features name it). Default false.
     */
    default boolean mitigatedByAttendance() {
        return false;
    }
}
