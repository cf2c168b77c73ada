package org.shutline.analysis;

import static org.assertj.core.api.Assertions.assertThat;

import java.time.LocalDate;
import org.junit.jupiter.api.Test;
import org.shutline.model.Operability;

/**
 * The one doubtful-valve rule. 49 CFR 192.747: each valve is checked "at least once each
 * calendar year, at intervals not exceeding 15 months". Boundary days worked by hand.
 */
class ValveDoubtTest {
    static ValveDoubt.Verdict v(Operability op, LocalDate checked, LocalDate asOf) {
        return ValveDoubt.of(op, checked, ValveDoubt.Settings.defaults(asOf));
    }

    @Test
    void fifteenMonthIntervalBoundary() {
        // checked 2026-06-01 + 15 months = 2027-09-01: on 2027-09-01 the interval is not exceeded,
        // on 2027-09-02 it is (192.747). Calendar year: 2026 was checked, so only the interval bites.
        LocalDate checked = LocalDate.of(2026, 6, 1);
        assertThat(v(Operability.YES, checked, LocalDate.of(2027, 9, 1)).doubtful()).isFalse();
        ValveDoubt.Verdict late = v(Operability.YES, checked, LocalDate.of(2027, 9, 2));
        assertThat(late.inspection()).isEqualTo(ValveDoubt.Inspection.PAST_INTERVAL);
        assertThat(late.why()).contains("15 months").contains("192.747");
    }

    @Test
    void calendarYearBoundary() {
        // as of 2027-03-01 the previous calendar year is 2026: checked 2026-01-01 is inside it (and
        // 2026-01-01 + 15 months = 2027-04-01 is not before 2027-03-01): current.
        LocalDate asOf = LocalDate.of(2027, 3, 1);
        assertThat(v(Operability.YES, LocalDate.of(2026, 1, 1), asOf).doubtful()).isFalse();
        // checked 2025-12-31: only 14 months before, within the interval (2025-12-31 + 15 months = 2027-03-31),
        // but nothing in calendar year 2026: doubtful under "at least once each calendar year" (192.747).
        ValveDoubt.Verdict missed = v(Operability.YES, LocalDate.of(2025, 12, 31), asOf);
        assertThat(missed.inspection()).isEqualTo(ValveDoubt.Inspection.MISSED_CALENDAR_YEAR);
        assertThat(missed.overdue()).isTrue();
        assertThat(missed.why()).contains("not checked in 2026");
        // on 2026-12-31 the same check (2025-12-31) is still fine: previous year 2025 was checked,
        // and 2025-12-31 + 15 months = 2027-03-31 is after the date.
        assertThat(v(Operability.YES, LocalDate.of(2025, 12, 31), LocalDate.of(2026, 12, 31)).doubtful()).isFalse();
    }

    @Test
    void operabilityAndNeverChecked() {
        LocalDate asOf = LocalDate.of(2026, 12, 1);
        LocalDate recent = LocalDate.of(2026, 10, 1);
        assertThat(v(Operability.UNKNOWN, recent, asOf).doubtful()).isTrue();
        assertThat(v(Operability.UNKNOWN, recent, asOf).overdue()).isFalse();
        assertThat(v(Operability.NO, recent, asOf).inoperable()).isTrue();
        assertThat(v(Operability.NO, recent, asOf).why()).isEqualTo("recorded inoperable");
        ValveDoubt.Verdict never = v(Operability.YES, null, asOf);
        assertThat(never.inspection()).isEqualTo(ValveDoubt.Inspection.NEVER_CHECKED);
        assertThat(never.doubtful()).isTrue();
        assertThat(v(Operability.YES, recent, asOf).why()).isNull();
    }
}
