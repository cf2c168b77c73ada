package org.shutline.io.sample;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.shutline.model.Network;
import org.shutline.model.SenseTap;

/** Grid towns: exact main counts, two services per grid main, determinism, taps on mains. */
class GridTownTest {
    @ParameterizedTest
    @ValueSource(ints = {20, 137, 1000, 20_000})
    void exactlyNMains(int n) {
        long seed = 31L * n;
        Network a = GridTown.generate(n, seed).network();
        assertThat(a.mains()).as("seed " + seed).hasSize(n);
        long grid = a.mains().stream().filter(m -> m.id().startsWith("M-")).count();
        assertThat(a.services()).as("seed " + seed).hasSize((int) (2 * grid));
        assertThat(a.mains().stream().map(m -> m.id()).distinct().count()).isEqualTo(n);
        for (SenseTap t : a.taps()) {
            assertThat(a.mains().stream().anyMatch(m -> m.systemId().equals("LP-1")
                && m.geometry().distance(t.geometry()) < 1e-9)).as(t.id() + " seed " + seed).isTrue();
        }
        assertThat(GridTown.generate(n, seed).network()).as("seed " + seed).isEqualTo(a);
    }

    @ParameterizedTest
    @ValueSource(ints = {0, 19})
    void tooSmall(int n) {
        assertThatThrownBy(() -> GridTown.generate(n, 1)).isInstanceOf(IllegalArgumentException.class);
    }
}
