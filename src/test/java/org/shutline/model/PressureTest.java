package org.shutline.model;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

/** Pressure unit factors, each checked against NIST SP 811 (2008), Appendix B.8 / B.9. */
class PressureTest {

    @Test
    void psiIsNistFactor() {
        // NIST SP 811 B.8: pound-force per square inch (psi) = 6.894 757 E+03 Pa
        assertThat(PressureUnit.PSI.pascals()).isCloseTo(6.894757e3, within(0.001));
        assertThat(Pressure.psi(1).pascals()).isCloseTo(6894.757, within(0.001));
    }

    @Test
    void inchOfWaterIsConventionalNistFactor() {
        // NIST SP 811 B.8: inch of water, conventional (inH2O) = 2.490 889 E+02 Pa
        assertThat(PressureUnit.IN_WC.pascals()).isCloseTo(2.490889e2, within(0.0001));
        // derived (trade-facts, from SP 811 values): 7 in w.c. = 1.744 kPa; 14 in w.c. = 3.487 kPa
        assertThat(Pressure.inchesWaterColumn(7).kpa()).isCloseTo(1.744, within(0.0005));
        assertThat(Pressure.inchesWaterColumn(14).kpa()).isCloseTo(3.487, within(0.0005));
        // derived: 1 psi = 27.68 in w.c. (conventional)
        assertThat(Pressure.psi(1).inchesWaterColumn()).isCloseTo(27.68, within(0.005));
    }

    @Test
    void millibarIsNistFactor() {
        // NIST SP 811 B.8: millibar (mbar) = 1.0 E+02 Pa; bar = 1.0 E+05 Pa
        assertThat(PressureUnit.MBAR.pascals()).isEqualTo(100.0);
        assertThat(Pressure.mbar(1000).kpa()).isEqualTo(100.0);
    }

    @Test
    void kilopascalIsSi() {
        // SI prefix kilo = 10^3 (NIST SP 811, Table 5)
        assertThat(PressureUnit.KPA.pascals()).isEqualTo(1000.0);
        assertThat(Pressure.kpa(1.744).in(PressureUnit.MBAR)).isCloseTo(17.44, within(1e-9));
    }

    @Test
    void roundTripsAndFormats() {
        Pressure p = Pressure.kpa(400);
        for (PressureUnit u : PressureUnit.values()) {
            assertThat(Pressure.of(p.in(u), u).pascals()).isCloseTo(400_000.0, within(1e-6));
        }
        assertThat(Pressure.inchesWaterColumn(7).format(PressureUnit.IN_WC)).isEqualTo("7.0 in w.c.");
        assertThat(Pressure.psi(60).format(PressureUnit.PSI)).isEqualTo("60.00 psi");
        assertThat(PressureUnit.parse("In W.C.")).contains(PressureUnit.IN_WC);
        assertThat(PressureUnit.parse("PSI")).contains(PressureUnit.PSI);
        assertThat(PressureUnit.parse("bogus")).isEmpty();
    }

    @Test
    void linearUnitsAreExact() {
        // NIST SP 811 B.8: foot = 3.048 E-01 m (exact); US survey foot = 1200/3937 m (exact)
        assertThat(LinearUnit.INTERNATIONAL_FOOT.metres()).isEqualTo(0.3048);
        assertThat(LinearUnit.US_SURVEY_FOOT.metres()).isCloseTo(0.3048006096, within(1e-10));
        assertThat(Tolerances.DEFAULT.inUnit(LinearUnit.INTERNATIONAL_FOOT).snapM()).isCloseTo(1.6404, within(1e-4));
    }

    @Test
    void wordsParseCaseInsensitively() {
        assertThat(Words.parse(MainStatus.class, " Abandoned ")).contains(MainStatus.ABANDONED);
        assertThat(Words.parse(Operability.class, "UNKNOWN")).contains(Operability.UNKNOWN);
        assertThat(Words.parse(ValveKind.class, "stn")).isEmpty();
        assertThat(Words.parse(ServiceClass.class, "")).isEmpty();
        assertThat(Words.word(TapDevice.BOTH)).isEqualTo("both");
    }
}
