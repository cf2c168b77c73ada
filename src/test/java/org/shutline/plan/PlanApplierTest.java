package org.shutline.plan;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.shutline.analysis.PlanEvaluation;
import org.shutline.model.MainStatus;
import org.shutline.model.TapDevice;
import org.shutline.topology.Topology;
import org.shutline.trace.FeedTrace;

/** Applying steps to the network of {@link PlanNet}; answers worked by hand from its drawing. */
class PlanApplierTest {
    static final Topology T = PlanNet.build(List.of(PlanNet.tap("T-1", "RS-1", TapDevice.WORKER, 100, 60)));

    static PlanStates apply(String steps) throws PlanException {
        Plan p = PlanReader.parse("project: t\nphases:\n  - name: a\n    steps:\n" + steps, "t.yaml");
        return PlanApplier.apply(p, T, "t.yaml");
    }

    @Test
    void statesAreCumulativeAndTheBaseIsUntouched() throws PlanException {
        PlanStates ps = apply("      - close: V-1\n      - close: V-2\n      - open: V-1\n");
        assertThat(ps.steps()).hasSize(3);
        int v1 = 0, v2 = 1;
        assertThat(ps.steps().get(0).after().valveClosed(v1)).isTrue();
        assertThat(ps.steps().get(1).after().valveClosed(v1)).isTrue();
        assertThat(ps.steps().get(1).after().valveClosed(v2)).isTrue();
        assertThat(ps.steps().get(2).after().valveClosed(v1)).isFalse();
        assertThat(ps.steps().get(2).after().valveClosed(v2)).isTrue();
        assertThat(ps.base().valveClosed(v1)).isFalse();
        assertThat(ps.steps().get(1).before()).isSameAs(ps.steps().get(0).after());
    }

    @Test
    void cutSeparatesTheTwoSidesOfAMain() throws PlanException {
        // cut LP-B at x=200 between V-1 and V-2: S-1 and S-2 sit at x=200 (measure 100 of LP-B) and are both
        // on the first piece (a measure at the cut goes to the first piece); with V-1 closed, that piece is dead.
        PlanStates ps = apply("      - cut: { main: LP-B, at: [200, 0] }\n      - close: V-1\n");
        FeedTrace.Result afterCut = FeedTrace.run(ps.steps().get(0).after());
        assertThat(afterCut.fedServices().cardinality()).isEqualTo(4);
        FeedTrace.Result afterClose = FeedTrace.run(ps.steps().get(1).after());
        assertThat(afterClose.isFed(0)).isFalse();
        assertThat(afterClose.isFed(1)).isFalse();
        assertThat(afterClose.isFed(2)).isTrue();
        assertThat(ps.steps().get(0).workPoints()).singleElement().satisfies(w -> {
            assertThat(w.kind()).isEqualTo("cut");
            assertThat(w.x()).isEqualTo(200.0);
        });
    }

    @Test
    void bypassKeepsCustomersOnGasAcrossAnIsolatedPiece() throws PlanException {
        // bypass from LP-B at x=120 to LP-C at x=320 around V-1..V-2; then close V-1, V-2 and cut: with RS-2 out,
        // LP-C is fed only through the bypass from RS-1's side.
        PlanStates ps = apply("      - station_out: RS-2\n"
                + "      - bypass_install: { id: BP-1, from: [120, 0], to: [320, 0], valves: [BPV-1] }\n"
                + "      - close: [V-1, V-2]\n"
                + "      - close: BPV-1\n");
        FeedTrace.Result withBypass = FeedTrace.run(ps.steps().get(2).after());
        assertThat(withBypass.isFed(2)).as("S-3 on LP-C fed through the bypass").isTrue();
        assertThat(withBypass.isFed(0)).as("S-1 between the closed valves").isFalse();
        FeedTrace.Result closed = FeedTrace.run(ps.steps().get(3).after());
        assertThat(closed.isFed(2)).as("S-3 off once the bypass valve is closed").isFalse();
        assertThat(ps.steps().get(3).after().valveId(2)).isEqualTo("BPV-1");
    }

    @Test
    void tieInAndActivateCarryGas() throws PlanException {
        // No proposed main in the test network: abandon LP-C, then bring it back by tie-in and activation.
        PlanStates ps = apply("      - abandon: LP-C\n      - activate: LP-C\n");
        assertThat(ps.steps().get(0).after().mainStatus(3)).isEqualTo(MainStatus.ABANDONED);
        assertThat(ps.steps().get(1).after().mainStatus(3)).isEqualTo(MainStatus.ACTIVE);
        assertThat(FeedTrace.run(ps.steps().get(0).after()).isFed(2)).isFalse();
        assertThat(FeedTrace.run(ps.steps().get(1).after()).isFed(2)).isTrue();
        PlanStates tie = apply("      - station_out: RS-2\n      - cut: { main: LP-B, at: [295, 0] }\n"
                + "      - tie_in: { main: LP-C, to: LP-B, at: [292, 0] }\n");
        // with RS-2 out, the cut at x=295 leaves LP-C dead; the tie-in from LP-C's end (300,0) onto LP-B at x=292
        // feeds it again from RS-1
        assertThat(FeedTrace.run(tie.steps().get(1).after()).isFed(2)).isFalse();
        assertThat(FeedTrace.run(tie.steps().get(2).after()).isFed(2)).isTrue();
        assertThat(tie.steps().get(2).workPoints()).singleElement().satisfies(w -> assertThat(w.x()).isEqualTo(292.0));
    }

    @Test
    void stepsThatCannotBeAppliedNameTheStepAndReason() {
        assertThatThrownBy(() -> apply("      - abandon: LP-C\n      - cut: { main: LP-C, at: [350, 0] }\n"))
                .isInstanceOf(PlanException.class)
                .hasMessageContaining("t.yaml:6: step 2 (cut) cannot be applied: main LP-C is already abandoned");
        assertThatThrownBy(() -> apply("      - abandon: LP-C\n      - abandon: LP-C\n"))
                .hasMessageContaining("step 2 (abandon)").hasMessageContaining("already abandoned");
        assertThatThrownBy(() -> apply("      - cut: { main: LP-B, at: [200, 40] }\n"))
                .hasMessageContaining("step 1 (cut)").hasMessageContaining("40.0 m from main LP-B");
        assertThatThrownBy(() -> apply("      - open: V-99\n"))
                .hasMessageContaining("step 1 (open)").hasMessageContaining("no valve with id 'V-99'");
        assertThatThrownBy(() -> apply("      - transfer: { from: LP-B, to: LP-C, services: [S-4] }\n"))
                .hasMessageContaining("service S-4 is not on main LP-B");
    }

    @Test
    void noticesForStepsThatChangeNothing() throws PlanException {
        PlanStates ps = apply("      - open: V-1\n      - station_in: RS-1\n");
        assertThat(ps.steps().get(0).notices()).containsExactly("valve V-1 was already open");
        assertThat(ps.steps().get(1).notices()).containsExactly("station RS-1 was already in service");
    }

    @Test
    void customerHoursUseDurationsAndShareTheRestOfThePhase() throws PlanException {
        // Phase 07:00-17:00 = 10 h. Step 1 (close V-1, V-2: 2 services off) lasts 2 h; steps 2 and 3 share 8 h: 4 h each.
        // Step 2 (cut, still 2 off), step 3 (open V-1: LP-B's first piece [100..200] comes back: 0 off).
        // customer-hours = 2 x 2 + 2 x 4 + 0 x 4 = 12
        String yaml = "project: t\nphases:\n  - name: a\n    start: 2027-05-03T07:00\n    end: 2027-05-03T17:00\n    steps:\n"
                + "      - close: [V-1, V-2]\n        duration: 2h\n      - cut: { main: LP-B, at: [200, 0] }\n      - open: V-1\n";
        PlanStates ps = PlanApplier.apply(PlanReader.parse(yaml, "t.yaml"), T, "t.yaml");
        PlanEvaluation.Result r = PlanEvaluation.evaluate(ps, org.shutline.analysis.hazard.HazardChecks.discover(),
                org.shutline.analysis.hazard.StepContext.Settings.defaults(java.time.LocalDate.of(2026, 12, 1)), 12, org.shutline.model.Progress.NONE);
        assertThat(r.steps()).extracting(PlanEvaluation.StepResult::servicesOff).containsExactly(2, 2, 0);
        assertThat(r.phases().get(0).customerHours()).isEqualTo(12.0);
        assertThat(r.steps().get(2).cameBack()).containsExactly("S-1", "S-2");
        assertThat(r.steps().get(0).gasOff().isEmpty()).isFalse();
        assertThat(r.steps().get(0).gasOff().contains(PlanNet.pt(200, 0))).isTrue();
        assertThat(r.steps().get(0).gasOff().contains(PlanNet.pt(350, 0))).isFalse();
    }

    @Test
    void suggestedOrderPutsUpstreamFirstAndGivesFallbacksForUnknownValves() throws PlanException {
        Topology t = PlanNet.build(org.shutline.model.Operability.UNKNOWN, List.of());
        String yaml = "project: t\nphases:\n  - name: a\n    steps:\n      - close: [V-2, V-1]\n        ordered: false\n";
        PlanStates ps = PlanApplier.apply(PlanReader.parse(yaml, "t.yaml"), t, "t.yaml");
        PlanEvaluation.Result r = PlanEvaluation.evaluate(ps, List.of(),
                org.shutline.analysis.hazard.StepContext.Settings.defaults(java.time.LocalDate.of(2026, 12, 1)), 12, org.shutline.model.Progress.NONE);
        PlanEvaluation.Suggestion s = r.steps().get(0).suggestion();
        // hops from the source segment: V-1's near side is RS-1's outlet segment (IP -> RS-1 -> LP-A/LP-B start): 1 hop;
        // V-2's near side (LP-C, LP-D) is RS-2's outlet: also 1 hop; the tie is broken by id: V-1 then V-2.
        assertThat(s.order()).containsExactly("V-1", "V-2");
        // V-2 is unknown: if it fails, the region grows over LP-C/LP-D; RS-2 then feeds the region directly,
        // so valves alone cannot isolate it and S-3 is added.
        assertThat(s.fallbacks()).singleElement().satisfies(f -> {
            assertThat(f.valveId()).isEqualTo("V-2");
            assertThat(f.addedServices()).contains("S-3");
        });
    }
}
