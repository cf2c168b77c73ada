package org.shutline.analysis;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.shutline.model.Caution;
import org.shutline.plan.PlanApplier;
import org.shutline.plan.PlanReader;
import org.shutline.plan.PlanStates;
import org.shutline.testnet.AsciiNet;
import org.shutline.testnet.TestNet;

/** Phase cards on the ring: the valves that stop gas at a cut, in the state after the phase. */
class EmergencyCardsTest {
    @TempDir Path dir;

    /*
     * IsolationTest.RING. Phase 1 closes V5 (d-e). Phase 2 cuts bc at (105, 0), in X2 (bc#1 ce#0).
     * After phase 1, X4 (e, s5) is fed only round by c; after the cut, the piece from the cut
     * through c to V4, and X4 behind it, are dead: s5 is already off in the state after phase 2.
     * The 2 m pit touches both sides of the cut; gas blowing there comes from the V2 side only:
     * close V2 (s3 off); V4 bounds the pit on the dead side and is not listed.
     */
    @Test
    void cardPerPhaseInTheStateAfterIt() throws Exception {
        TestNet t = AsciiNet.parse(IsolationTest.RING);
        Path plan = dir.resolve("p.yaml");
        Files.writeString(plan, """
                project: ring test
                phases:
                  - name: close the loop
                    steps:
                      - close: V5
                  - name: cut bc
                    steps:
                      - cut: { main: bc, at: [105.0, 0.0] }
                """);
        PlanStates ps = PlanApplier.apply(PlanReader.read(plan), t.topology(), "p.yaml");
        List<EmergencyCards.Card> cards = EmergencyCards.build(ps, IsolationTest.OPTIONS, ResponseSettings.DEFAULT,
                EmergencyCards.DEFAULT_PIT_RADIUS_M);
        assertThat(cards).hasSize(2);
        EmergencyCards.Card one = cards.get(0), two = cards.get(1);
        // phase 1 names no pipe: no work site; it touches valve V5 of HP: the over-pressure shut-off of HP
        assertThat(one.site()).isNull();
        assertThat(one.overpressure()).extracting(OverpressureShutoff.Result::systemId).containsExactly("HP");
        assertThat(one.overpressure().get(0).feeds()).extracting(OverpressureShutoff.Feed::id).containsExactly("Sa");
        assertThat(one.caution()).isEqualTo(Caution.TEXT);
        // phase 2: the cut on bc
        assertThat(two.siteDescription()).contains("cut on bc");
        assertThat(two.site().isolation().valveIds()).containsExactly("V2");
        assertThat(two.site().isolation().serviceIdsOff()).containsExactly("s3");
        assertThat(org.shutline.trace.FeedTrace.run(ps.afterPhase(1)).isFed(t.service("s5"))).isFalse();
        assertThat(two.site().isolation().unlistedValves()).containsExactly("V4");
        assertThat(two.site().restoration().criticalShutOff()).containsExactly("s3");
        assertThat(two.overpressure()).extracting(OverpressureShutoff.Result::systemId).containsExactly("HP");
    }
}
