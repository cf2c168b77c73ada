package org.shutline.analysis;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import org.shutline.model.Pressure;
import org.shutline.model.PressureUnit;

/** 49 CFR 192.201(a) limits, worked by hand from the rule's text. */
class OverpressureLimitTest {
    @Test
    void maop60PsigOrMoreAddsTenPercent() {
        // (a)(2)(i): MAOP 60 psig -> 60 x 1.10 = 66 psig; 100 psig -> 110 psig
        assertThat(OverpressureLimit.ofMaop(Pressure.psi(60)).limit().psi()).isCloseTo(66.0, within(1e-9));
        assertThat(OverpressureLimit.ofMaop(Pressure.psi(100)).limit().psi()).isCloseTo(110.0, within(1e-9));
        assertThat(OverpressureLimit.ofMaop(Pressure.psi(60)).clause()).isEqualTo("49 CFR 192.201(a)(2)(i)");
        assertThat(OverpressureLimit.ofMaop(Pressure.psi(60)).basis()).contains("75 % SMYS cap").contains("not checked");
    }

    @Test
    void maop12To60PsigAddsSixPsi() {
        // (a)(2)(ii): 12 psig -> 12 + 6 = 18 psig; 59 psig -> 65 psig
        assertThat(OverpressureLimit.ofMaop(Pressure.psi(12)).limit().psi()).isCloseTo(18.0, within(1e-9));
        assertThat(OverpressureLimit.ofMaop(Pressure.psi(59)).limit().psi()).isCloseTo(65.0, within(1e-9));
        assertThat(OverpressureLimit.ofMaop(Pressure.psi(12)).clause()).endsWith("(a)(2)(ii)");
    }

    @Test
    void maopBelow12PsigAddsFiftyPercent() {
        // (a)(2)(iii): 11.9 psig -> 11.9 x 1.5 = 17.85 psig; 2 psig -> 3 psig
        assertThat(OverpressureLimit.ofMaop(Pressure.psi(11.9)).limit().psi()).isCloseTo(17.85, within(1e-9));
        assertThat(OverpressureLimit.ofMaop(Pressure.psi(2)).limit().psi()).isCloseTo(3.0, within(1e-9));
        assertThat(OverpressureLimit.ofMaop(Pressure.psi(2)).clause()).endsWith("(a)(2)(iii)");
    }

    @Test
    void lowPressureSystemUsesTheApplianceSetting() {
        // (a)(1): default 0.5 psig (common practice) = 0.5 x 27.68 = 13.8 in w.c. (NIST SP 811: 1 psi = 27.68 in w.c.)
        OverpressureLimit.Limit l = OverpressureLimit.lowPressure(OverpressureLimit.DEFAULT_LOW_PRESSURE_LIMIT);
        assertThat(l.clause()).isEqualTo("49 CFR 192.201(a)(1)");
        assertThat(OverpressureLimit.format(l.limit())).isEqualTo("13.8 in w.c.");
        assertThat(l.basis()).contains("common practice");
    }

    @Test
    void unitsFollowTheOnePsigBoundary() {
        // 1 psig and above in psig; below, in w.c.: 0.9 psig = 0.9 x 27.68 = 24.9 in w.c.
        assertThat(OverpressureLimit.format(Pressure.psi(1))).isEqualTo("1.00 psig");
        assertThat(OverpressureLimit.format(Pressure.psi(0.9))).isEqualTo("24.9 in w.c.");
        // 400 kPa / 6.894757 = 58.02 psig, also in the plan's unit
        assertThat(OverpressureLimit.format(Pressure.kpa(400), PressureUnit.KPA)).isEqualTo("58.02 psig (400.00 kPa)");
        assertThat(OverpressureLimit.format(Pressure.kpa(400), PressureUnit.PSI)).isEqualTo("58.02 psig");
    }
}
