package org.shutline.analysis;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

/** Crew arithmetic, worked by hand. Rates are common practice (docs/emergency.md). */
class ResponseSizingTest {

    @Test
    void worksTheArithmeticByHand() {
        // 120 meters, 10 shut-offs per tech-hour -> 12 tech-hours; within 2 h -> 6 techs -> 3 crews of 2.
        // relight: 120 x 1.10 = 132 visits / 1.25 per tech-hour = 105.6 tech-hours; within 8 h -> 13.2 -> 14 techs -> 7 crews.
        // with 4 crews (8 techs): shut-off 12/8 = 1.5 h; relight 105.6/8 = 13.2 h.
        ResponseSizing.Result r = ResponseSizing.size(120, 120, 2.0, 8.0, 4, ResponseRates.DEFAULT);
        assertThat(r.shutoffTechHours()).isCloseTo(12.0, within(1e-9));
        assertThat(r.shutoffTechs()).isEqualTo(6);
        assertThat(r.shutoffCrews()).isEqualTo(3);
        assertThat(r.relightVisits()).isCloseTo(132.0, within(1e-9));
        assertThat(r.relightTechHours()).isCloseTo(105.6, within(1e-9));
        assertThat(r.relightTechs()).isEqualTo(14);
        assertThat(r.relightCrews()).isEqualTo(7);
        assertThat(r.shutoffHoursWithCrews()).isCloseTo(1.5, within(1e-9));
        assertThat(r.relightHoursWithCrews()).isCloseTo(13.2, within(1e-9));
    }

    @Test
    void exactMultiplesDoNotRoundUpAndZeroIsZero() {
        // 40 meters / 10 per tech-hour = 4 tech-hours; within 2 h exactly 2 techs, 1 crew
        ResponseSizing.Result r = ResponseSizing.size(40, 0, 2.0, 8.0, 1, ResponseRates.DEFAULT);
        assertThat(r.shutoffTechs()).isEqualTo(2);
        assertThat(r.shutoffCrews()).isEqualTo(1);
        assertThat(r.relightTechs()).isZero();
        assertThat(r.relightCrews()).isZero();
    }

    @Test
    void deadDistrictRelightsEveryMeter() {
        // 10 meters shut at the leak, but the district (500 meters) went dead: all 500 are relit
        ResponseSizing.Result r = ResponseSizing.size(10, 500, 1.0, 24.0, 10, ResponseRates.DEFAULT);
        assertThat(r.relightVisits()).isCloseTo(550.0, within(1e-9));
        assertThat(r.relightTechHours()).isCloseTo(440.0, within(1e-9));
        assertThat(r.relightTechs()).isEqualTo(19); // 440 / 24 = 18.33 -> 19
    }

    @Test
    void rejectsNonsense() {
        assertThatThrownBy(() -> ResponseSizing.size(-1, 0, 1, 1, 1, ResponseRates.DEFAULT)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> ResponseSizing.size(1, 1, 0, 1, 1, ResponseRates.DEFAULT)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> new ResponseRates(0, 1, 0.1, 2, 8)).isInstanceOf(IllegalArgumentException.class);
    }
}
