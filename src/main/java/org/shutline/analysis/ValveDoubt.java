package org.shutline.analysis;

import java.time.LocalDate;
import java.time.Period;
import java.util.Objects;
import org.shutline.model.Operability;
import org.shutline.trace.NetworkState;

/**
 * The one rule for a doubtful valve, used by isolation, hazard checks, suggested
 * orders, reports and the window. A valve is doubtful when its {@code operable} is
 * {@code unknown} or {@code no} (recorded inoperable), or its inspection is not current.
 * Its inspection is not current (49 CFR 192.747: "at least once each calendar year, at
 * intervals not exceeding 15 months") when it was never checked, when more than the
 * interval (15 months by default) has passed since {@code checked} (checked + interval
 * before the as-of date), or when it was not checked in the previous calendar year
 * ({@code checked} before 1 January of the year before the as-of date). Valves a plan
 * installs (index at or past the graph's valve count) are new and not doubtful. O(1).
 */
public final class ValveDoubt {
    /** Inspection interval of 49 CFR 192.747: at most 15 months. */
    public static final Period INTERVAL = Period.ofMonths(15);

    /** The settings of the rule: the date checks are measured against, and the interval. */
    public record Settings(LocalDate asOf, Period interval) {
        public Settings {
            Objects.requireNonNull(asOf, "asOf");
            Objects.requireNonNull(interval, "interval");
        }

        public static Settings defaults(LocalDate asOf) {
            return new Settings(asOf, INTERVAL);
        }
    }

    /** State of a valve's inspection. */
    public enum Inspection { CURRENT, NEVER_CHECKED, PAST_INTERVAL, MISSED_CALENDAR_YEAR }

    /** The verdict on one valve. */
    public record Verdict(Operability operable, LocalDate checked, Inspection inspection, Settings settings) {
        public boolean doubtful() {
            return operable != Operability.YES || inspection != Inspection.CURRENT;
        }

        /** True when the inspection is not current (whatever the operability). */
        public boolean overdue() {
            return inspection != Inspection.CURRENT;
        }

        public boolean inoperable() {
            return operable == Operability.NO;
        }

        /** Why the valve is doubtful, in words ("operability unknown; never checked"); null when it is not. */
        public String why() {
            if (!doubtful()) return null;
            StringBuilder sb = new StringBuilder();
            if (operable == Operability.NO) sb.append("recorded inoperable");
            else if (operable == Operability.UNKNOWN) sb.append("operability unknown");
            String insp = switch (inspection) {
                case CURRENT -> null;
                case NEVER_CHECKED -> "never checked (49 CFR 192.747)";
                case PAST_INTERVAL -> "last checked " + checked + ", more than " + settings.interval().toTotalMonths()
                        + " months before " + settings.asOf() + " (49 CFR 192.747)";
                case MISSED_CALENDAR_YEAR -> "last checked " + checked + ", not checked in " + (settings.asOf().getYear() - 1)
                        + " (49 CFR 192.747: once each calendar year)";
            };
            if (insp != null) sb.append(sb.length() == 0 ? "" : "; ").append(insp);
            return sb.toString();
        }
    }

    private ValveDoubt() {}

    /** The verdict on a valve with these records. */
    public static Verdict of(Operability operable, LocalDate checked, Settings s) {
        return new Verdict(operable, checked, inspection(checked, s), s);
    }

    /** The verdict on valve {@code v} of state {@code state}; a valve installed by a plan is new: operable and current. */
    public static Verdict of(NetworkState state, int v, Settings s) {
        if (v >= state.graph().valveCount()) return new Verdict(Operability.YES, s.asOf(), Inspection.CURRENT, s);
        return of(state.valveOperability(v), state.valveChecked(v), s);
    }

    /** The inspection state of a valve last checked on {@code checked} (null: never). */
    public static Inspection inspection(LocalDate checked, Settings s) {
        if (checked == null) return Inspection.NEVER_CHECKED;
        if (checked.plus(s.interval()).isBefore(s.asOf())) return Inspection.PAST_INTERVAL;
        if (checked.isBefore(LocalDate.of(s.asOf().getYear() - 1, 1, 1))) return Inspection.MISSED_CALENDAR_YEAR;
        return Inspection.CURRENT;
    }
}
