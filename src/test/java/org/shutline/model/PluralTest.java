package org.shutline.model;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;

class PluralTest {
    @Test
    void oneTakesTheSingularEveryOtherCountThePlural() {
        assertThat(Plural.of(1, "technician")).isEqualTo("1 technician");
        assertThat(Plural.of(0, "crew")).isEqualTo("0 crews");
        assertThat(Plural.of(2, "service")).isEqualTo("2 services");
        assertThat(Plural.of(1L, "meter")).isEqualTo("1 meter");
        assertThat(Plural.of(3, "valve segment", "valve segments")).isEqualTo("3 valve segments");
        assertThat(Plural.noun(1, "service")).isEqualTo("service");
        assertThat(Plural.noun(-1, "service")).isEqualTo("services");
    }
}
